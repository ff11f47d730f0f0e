package trailcross.encounter;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.hipparchus.analysis.interpolation.SplineInterpolator;
import org.hipparchus.analysis.polynomials.PolynomialSplineFunction;
import org.hipparchus.analysis.solvers.BrentSolver;

/**
 * Where the Earth meets a trail's axis, in the published dust-trail sense (McNaught &amp; Asher 1999; Asher
 * 1999): a one-parameter family of particles ejected at perihelion along the orbit, the parameter their
 * orbital period offset ΔP0; per forecast year, each member's node time, node distance r_D and longitude
 * are smooth functions of ΔP0 on well-behaved trail sections. The Earth meets the axis where the member
 * passes its node when the Earth passes that longitude: the root of (node time − the Earth's time) in ΔP0,
 * found by Brent's method on a cubic spline through the family (Hipparchus), on each run of consecutive
 * members that cross. There: delta r = r_D − r_E, the Earth's time (the axis peak), the solar longitude,
 * and fM = 1/|d t_node / d ΔP0| (unperturbed: 1/N after N revolutions). The interpolation's own error is
 * estimated by the distance between the spline's root and the linear interpolation's root.
 */
public final class AxisMeeting {

    /**
     * One member's node crossing.
     *
     * @param offsetDays its period offset ΔP0, days
     * @param nodeT its node passage, TDB days since J2000
     * @param earthT the Earth's passage of the same longitude, TDB days since J2000
     * @param deltaR r_D − r_E, au
     * @param solarLongitudeDeg the solar longitude at the Earth's passage, degrees
     */
    public record Point(double offsetDays, double nodeT, double earthT, double deltaR, double solarLongitudeDeg) {
    }

    /**
     * One meeting.
     *
     * @param offsetDays the offset of the member met
     * @param peakT the Earth's time there, TDB days since J2000
     * @param deltaR delta r there, au
     * @param solarLongitudeDeg the solar longitude there, degrees
     * @param fM 1/|d t_node / d ΔP0|
     * @param sigmaMin the interpolation's timing uncertainty, minutes
     */
    public record Root(double offsetDays, double peakT, double deltaR, double solarLongitudeDeg, double fM,
            double sigmaMin) {
    }

    private AxisMeeting() {
    }

    /**
     * @param points the family's crossings in one year (one per member, any order)
     * @param gapDays two members farther apart in ΔP0 than this do not belong to one run
     * @return every meeting, closest to the Earth's path (|delta r|) first
     */
    public static List<Root> of(List<Point> points, double gapDays) {
        List<Point> sorted = new ArrayList<>(points);
        sorted.sort(Comparator.comparingDouble(Point::offsetDays));
        List<Root> roots = new ArrayList<>();
        int start = 0;
        for (int k = 1; k <= sorted.size(); k++) {
            if (k == sorted.size() || sorted.get(k).offsetDays() - sorted.get(k - 1).offsetDays() > gapDays
                    || sorted.get(k).offsetDays() == sorted.get(k - 1).offsetDays()) {
                roots.addAll(run(sorted.subList(start, k)));
                start = k;
            }
        }
        roots.sort(Comparator.comparingDouble(r -> Math.abs(r.deltaR())));
        return roots;
    }

    private static List<Root> run(List<Point> p) {
        List<Root> out = new ArrayList<>();
        int n = p.size();
        if (n < 2) {
            return out;
        }
        double[] x = new double[n];
        double[] g = new double[n];
        double[] node = new double[n];
        double[] earth = new double[n];
        double[] dr = new double[n];
        double[] lon = new double[n];
        double lon0 = p.get(0).solarLongitudeDeg();
        for (int k = 0; k < n; k++) {
            Point q = p.get(k);
            x[k] = q.offsetDays();
            g[k] = q.nodeT() - q.earthT();
            node[k] = q.nodeT();
            earth[k] = q.earthT();
            dr[k] = q.deltaR();
            lon[k] = lon0 + Math.toDegrees(trailcross.frames.Angles.difference(Math.toRadians(q.solarLongitudeDeg()),
                    Math.toRadians(lon0)));
        }
        boolean spline = n >= 4;
        SplineInterpolator si = new SplineInterpolator();
        PolynomialSplineFunction gs = spline ? si.interpolate(x, g) : null;
        PolynomialSplineFunction ns = spline ? si.interpolate(x, node) : null;
        PolynomialSplineFunction es = spline ? si.interpolate(x, earth) : null;
        PolynomialSplineFunction ds = spline ? si.interpolate(x, dr) : null;
        PolynomialSplineFunction ls = spline ? si.interpolate(x, lon) : null;
        BrentSolver solver = new BrentSolver(1e-12, 1e-10);
        for (int k = 0; k + 1 < n; k++) {
            if (g[k] == 0 || g[k] * g[k + 1] < 0) {
                double linear = g[k] == 0 ? x[k] : x[k] - g[k] * (x[k + 1] - x[k]) / (g[k + 1] - g[k]);
                double root = g[k] == 0 || !spline ? linear : solver.solve(200, gs::value, x[k], x[k + 1]);
                double f = (root - x[k]) / (x[k + 1] - x[k]);
                double peakT = spline ? es.value(root) : earth[k] + f * (earth[k + 1] - earth[k]);
                double deltaR = spline ? ds.value(root) : dr[k] + f * (dr[k + 1] - dr[k]);
                double l = spline ? ls.value(root) : lon[k] + f * (lon[k + 1] - lon[k]);
                double slope = spline ? ns.polynomialSplineDerivative().value(root)
                        : (node[k + 1] - node[k]) / (x[k + 1] - x[k]);
                // The root's timing error: the two interpolations' roots apart, in the Earth's time.
                double dEarth = (earth[k + 1] - earth[k]) / (x[k + 1] - x[k]);
                double dG = (g[k + 1] - g[k]) / (x[k + 1] - x[k]);
                double sigma = Math.max(Math.abs(root - linear) * Math.abs(dEarth) * 1440, 0.1);
                if (!spline) {
                    sigma = Math.max(sigma, Math.abs(dG) * (x[k + 1] - x[k]) * 1440 / 4);
                }
                out.add(new Root(root, peakT, deltaR, trailcross.frames.Angles.normaliseDeg(l), 1 / Math.abs(slope),
                        sigma));
            }
        }
        return out;
    }
}
