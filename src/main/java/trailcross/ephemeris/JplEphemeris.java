package trailcross.ephemeris;

import java.nio.file.Path;
import trailcross.frames.EclipticFrame;

/**
 * An {@link Ephemeris} read from a JPL DE file ({@link JplDeFile}): barycentric ICRF positions in km are
 * divided by the header's AU and rotated into ecliptic J2000; the Earth is the Earth–Moon barycentre less
 * Moon/(1 + EMRAT), the Moon the Earth plus the geocentric Moon (JPL's own construction, {@code testeph}).
 */
public final class JplEphemeris implements Ephemeris {

    private static final int SUN = 10;
    private static final int MOON = 9;
    private static final int EMB = 2;

    private final JplDeFile file;
    private final double au;
    private final double emrat;

    /**
     * @param path a JPL DE file
     */
    public JplEphemeris(Path path) {
        this(new JplDeFile(path));
    }

    /**
     * @param file an opened JPL DE file
     */
    public JplEphemeris(JplDeFile file) {
        this.file = file;
        this.au = file.constant("AU");
        this.emrat = file.constant("EMRAT");
    }

    /** @return the underlying file */
    public JplDeFile file() {
        return file;
    }

    @Override
    public String name() {
        return "JPL DE" + file.denum() + " (" + file.path().getFileName() + ")";
    }

    @Override
    public double firstDay() {
        return file.startJd() - 2451545.0;
    }

    @Override
    public double lastDay() {
        return file.endJd() - 2451545.0;
    }

    /**
     * The barycentric ICRF state of a body in au, au/d — JPL's own frame, for comparisons with JPL test points.
     *
     * @param body the body
     * @param jd1 first part of the Julian date, TDB
     * @param jd2 second part
     * @param out receives x, y, z, vx, vy, vz
     */
    public void barycentricIcrf(Body body, double jd1, double jd2, double[] out) {
        double[] tmp = new double[6];
        switch (body) {
            case EARTH, MOON -> {
                file.evaluate(EMB, jd1, jd2, out);
                file.evaluate(MOON, jd1, jd2, tmp);
                double f = 1 / (1 + emrat);
                for (int k = 0; k < 6; k++) {
                    out[k] -= f * tmp[k];
                    if (body == Body.MOON) {
                        out[k] += tmp[k];
                    }
                }
            }
            default -> file.evaluate(item(body), jd1, jd2, out);
        }
        for (int k = 0; k < 6; k++) {
            out[k] /= au;
        }
    }

    private static int item(Body body) {
        return switch (body) {
            case MERCURY -> 0;
            case VENUS -> 1;
            case EARTH_MOON_BARYCENTRE -> EMB;
            case MARS -> 3;
            case JUPITER -> 4;
            case SATURN -> 5;
            case URANUS -> 6;
            case NEPTUNE -> 7;
            case SUN -> SUN;
            default -> throw new IllegalArgumentException("no JPL item for " + body);
        };
    }

    @Override
    public void heliocentric(Body body, double t, double[] out) {
        checkSpan(t);
        if (body == Body.SUN) {
            java.util.Arrays.fill(out, 0, 6, 0.0);
            return;
        }
        double[] sun = new double[6];
        barycentricIcrf(Body.SUN, 2451545.0, t, sun);
        barycentricIcrf(body, 2451545.0, t, out);
        for (int k = 0; k < 6; k++) {
            out[k] -= sun[k];
        }
        EclipticFrame.toEcliptic(out, 0);
        EclipticFrame.toEcliptic(out, 3);
    }

    @Override
    public void sunBarycentric(double t, double[] out) {
        checkSpan(t);
        barycentricIcrf(Body.SUN, 2451545.0, t, out);
        EclipticFrame.toEcliptic(out, 0);
        EclipticFrame.toEcliptic(out, 3);
    }
}
