package trailcross.encounter;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import trailcross.orbit.Elements;
import trailcross.orbit.Moid;
import trailcross.orbit.StateVector;

/**
 * The radiant a meteoroid orbit would have if it met the Earth, for each local minimum of the distance
 * between it and the Earth's orbit (a branch: a parent can feed one shower inbound and one outbound).
 * When the minimum is not zero the orbit is first replaced by a nearby orbit that does meet the Earth's,
 * by one of two adjustments:
 * <ul>
 * <li>{@link Adjustment#TRANSLATION} (default): the meteoroid keeps its heliocentric velocity at its point of
 * closest approach and is moved by the miss vector onto the Earth's orbit — the smallest change of
 * position that makes the orbits meet (common practice for near-intersecting orbits);</li>
 * <li>{@link Adjustment#OMEGA}: only the argument of perihelion ω changes, until the branch's node (on the
 * Earth's orbital plane) lies on the Earth's orbit (the ω-adjustment among those compared by Neslušan, Svoreň &amp; Porubčan 1998,
 * A&amp;A 331, 411; from memory); impossible when the node cannot reach the Earth's distance, then the
 * translation is used.</li>
 * </ul>
 * The radiant is −(v − v⊕) with v⊕ the Earth's orbital velocity at the meeting point.
 *
 * @param minimum the branch's local minimum of the distance between the orbits
 * @param ascending whether the branch's nearer node is the ascending one
 * @param nodeDistanceAu the heliocentric distance of that node on the unadjusted orbit, au
 * @param applied the adjustment applied
 * @param adjusted the orbit that meets the Earth's
 * @param radiant the radiant, Vg and solar longitude
 */
public record TheoreticalRadiant(Moid.Minimum minimum, boolean ascending, double nodeDistanceAu, Adjustment applied,
        Elements adjusted, GeocentricRadiant radiant) {

    /** How an orbit that misses the Earth's is moved onto it. */
    public enum Adjustment {
        /** Move the closest point onto the Earth's orbit, velocity kept. */
        TRANSLATION("translation"),
        /** Change ω until the node lies on the Earth's orbit. */
        OMEGA("omega");

        private final String key;

        Adjustment(String key) {
            this.key = key;
        }

        /** @return the command-line name */
        public String key() {
            return key;
        }

        /**
         * @param key a command-line name
         * @return the adjustment, or empty
         */
        public static Optional<Adjustment> of(String key) {
            for (Adjustment a : values()) {
                if (a.key.equals(key.toLowerCase(Locale.ROOT))) {
                    return Optional.of(a);
                }
            }
            return Optional.empty();
        }

        /**
         * @param key the value of {@code --adjustment}
         * @return the adjustment
         * @throws IllegalArgumentException naming the option and the accepted names
         */
        public static Adjustment ofOption(String key) {
            return of(key).orElseThrow(() -> new IllegalArgumentException("--adjustment: unknown '" + key
                    + "' (translation, omega)"));
        }
    }

    /**
     * @param orbit a meteoroid (or parent) orbit
     * @param earth the Earth's orbit
     * @param maxDistanceAu branches whose minimum distance exceeds this are left out
     * @param adjustment how to move a missing orbit onto the Earth's
     * @return one radiant per branch, nearest first
     */
    public static List<TheoreticalRadiant> of(Elements orbit, Elements earth, double maxDistanceAu,
            Adjustment adjustment) {
        List<TheoreticalRadiant> out = new ArrayList<>();
        for (Moid.Minimum m : Moid.minima(orbit, earth)) {
            if (m.distance() <= maxDistanceAu) {
                out.add(of(orbit, earth, m, adjustment));
            }
        }
        return out;
    }

    /**
     * The radiant of one branch.
     *
     * @param orbit a meteoroid (or parent) orbit
     * @param earth the Earth's orbit
     * @param m the branch's local minimum
     * @param adjustment how to move a missing orbit onto the Earth's
     * @return the branch's radiant
     */
    public static TheoreticalRadiant of(Elements orbit, Elements earth, Moid.Minimum m, Adjustment adjustment) {
        double nuAsc = -orbit.peri();
        double nuDesc = Math.PI - orbit.peri();
        boolean asc = Math.abs(Math.IEEEremainder(m.trueAnomalyA() - nuAsc, 2 * Math.PI))
                <= Math.abs(Math.IEEEremainder(m.trueAnomalyA() - nuDesc, 2 * Math.PI));
        double nodeR = orbit.p() / (1 + orbit.e() * Math.cos(asc ? nuAsc : nuDesc));
        if (adjustment == Adjustment.OMEGA) {
            double[] nu = new double[1];
            Elements adj = omegaAdjusted(orbit, earth, asc, nu);
            if (adj != null) {
                StateVector s = adj.stateAtTrueAnomaly(nu[0]);
                StateVector e = earthAlong(earth, s.position());
                return new TheoreticalRadiant(m, asc, nodeR, Adjustment.OMEGA, adj,
                        GeocentricRadiant.of(s.velocity(), e.position(), e.velocity()));
            }
        }
        StateVector s = orbit.stateAtTrueAnomaly(m.trueAnomalyA());
        StateVector e = earth.stateAtTrueAnomaly(m.trueAnomalyB());
        double[] p = e.position();
        double[] v = s.velocity();
        Elements adj = Elements.of(new StateVector(p[0], p[1], p[2], v[0], v[1], v[2]), orbit.perihelionJd(), orbit.gm());
        return new TheoreticalRadiant(m, asc, nodeR, Adjustment.TRANSLATION, adj,
                GeocentricRadiant.of(v, p, e.velocity()));
    }

    /** The Earth's state at the point of its orbit in the heliocentric direction of {@code dir}. */
    static StateVector earthAlong(Elements earth, double[] dir) {
        double[] pq = earth.axes();
        double x = dir[0] * pq[0] + dir[1] * pq[1] + dir[2] * pq[2];
        double y = dir[0] * pq[3] + dir[1] * pq[4] + dir[2] * pq[5];
        return earth.stateAtTrueAnomaly(Math.atan2(y, x));
    }

    /**
     * The orbit with ω changed by the least amount that puts its chosen node — taken on the Earth's orbital
     * plane, so that the orbits truly meet — at the Earth's distance in the node's direction: changing ω by
     * Δω moves the node to true anomaly ν0 − Δω, and p / (1 + e cos(ν0 − Δω)) = r⊕ is solved in closed form.
     *
     * @param nuOut receives the node's true anomaly on the adjusted orbit
     * @return the adjusted orbit, or null when |cos| would exceed 1
     */
    static Elements omegaAdjusted(Elements orbit, Elements earth, boolean ascending, double[] nuOut) {
        double[] pe = earth.axes();
        double[] pm = orbit.axes();
        double[] ne = cross(pe, 0, pe, 3);
        double[] nm = cross(pm, 0, pm, 3);
        double[] n = cross(ne, 0, nm, 0);
        double len = Math.sqrt(n[0] * n[0] + n[1] * n[1] + n[2] * n[2]);
        double sign = ascending ? 1 : -1;
        double[] dir = {sign * n[0] / len, sign * n[1] / len, sign * n[2] / len};
        double nu0 = Math.atan2(dir[0] * pm[3] + dir[1] * pm[4] + dir[2] * pm[5], dir[0] * pm[0] + dir[1] * pm[1] + dir[2] * pm[2]);
        double rE = earthAlong(earth, dir).r();
        double c = (orbit.p() / rE - 1) / orbit.e();
        if (!(Math.abs(c) <= 1)) {
            return null;
        }
        double nu1 = Math.acos(c);
        double d1 = Math.IEEEremainder(nu0 - nu1, 2 * Math.PI);
        double d2 = Math.IEEEremainder(nu0 + nu1, 2 * Math.PI);
        double dw = Math.abs(d1) <= Math.abs(d2) ? d1 : d2;
        nuOut[0] = nu0 - dw;
        return new Elements(orbit.q(), orbit.e(), orbit.i(), orbit.node(),
                trailcross.frames.Angles.normalise(orbit.peri() + dw), orbit.perihelionJd(), orbit.gm());
    }

    private static double[] cross(double[] a, int oa, double[] b, int ob) {
        return new double[] {a[oa + 1] * b[ob + 2] - a[oa + 2] * b[ob + 1], a[oa + 2] * b[ob] - a[oa] * b[ob + 2],
            a[oa] * b[ob + 1] - a[oa + 1] * b[ob]};
    }
}
