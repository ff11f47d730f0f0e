package trailcross.forecast;

import java.util.ArrayList;
import java.util.List;
import trailcross.encounter.TheoreticalRadiant;
import trailcross.orbit.Elements;
import trailcross.orbit.Moid;

/**
 * Can a parent's meteoroids reach the Earth, at one epoch: every branch (local minimum of the distance
 * between the parent's orbit and the Earth's), its theoretical radiant ({@link TheoreticalRadiant}) and
 * the least ejection speed that closes it ({@link EjectionReach}).
 *
 * @param t the epoch, TDB days since J2000
 * @param label what the epoch is ("epoch", "return")
 * @param orbit the parent's osculating orbit
 * @param earth the Earth's orbit
 * @param moidAu the MOID (the smallest branch distance), au
 * @param branches the branches, nearest first
 */
public record Reachability(double t, String label, Elements orbit, Elements earth, double moidAu, List<Branch> branches) {

    /**
     * One branch.
     *
     * @param radiant the theoretical radiant (with the local minimum and the node)
     * @param leastEjectionMs the least ejection speed that closes it, m/s (NaN: none below the cap)
     */
    public record Branch(TheoreticalRadiant radiant, double leastEjectionMs) {
    }

    /**
     * @param t the epoch, TDB days since J2000
     * @param label what the epoch is
     * @param orbit the parent's osculating orbit
     * @param earth the Earth's orbit at t
     * @param inboundAu activity limit before perihelion, au
     * @param outboundAu activity limit after perihelion, au
     * @param adjustment how a missing orbit is moved onto the Earth's for its radiant
     * @return the analysis
     */
    public static Reachability of(double t, String label, Elements orbit, Elements earth, double inboundAu,
            double outboundAu, TheoreticalRadiant.Adjustment adjustment) {
        List<Branch> out = new ArrayList<>();
        List<Moid.Minimum> minima = Moid.minima(orbit, earth);
        for (Moid.Minimum m : minima) {
            TheoreticalRadiant r = TheoreticalRadiant.of(orbit, earth, m, adjustment);
            out.add(new Branch(r, EjectionReach.leastSpeedMs(orbit, earth, m, inboundAu, outboundAu)));
        }
        return new Reachability(t, label, orbit, earth, minima.get(0).distance(), out);
    }
}
