package trailcross.time;

/**
 * ΔT = TT − UT in seconds for epochs before UTC existed (before 1960), from the polynomial expressions
 * of Espenak &amp; Meeus (2006), "Five Millennium Canon of Solar Eclipses", NASA/TP-2006-214141,
 * section 2.6 (coefficients reproduced from memory of that publication; the tests check its continuity
 * and the values it tabulates for 1900 and 1950).
 *
 * <p>Meteor forecasts use it for historical returns (for example a trail ejected in 1899), where the
 * ejection epoch is known in TT and UT matters only for display.
 */
public final class DeltaT {

    private DeltaT() {
    }

    /**
     * ΔT in seconds at a decimal year.
     *
     * @param year decimal year (e.g. 1899.87)
     * @return TT − UT in seconds
     */
    public static double seconds(double year) {
        double y = year;
        if (y < -500 || y >= 2150) {
            double u = (y - 1820) / 100;
            return -20 + 32 * u * u;
        }
        if (y < 500) {
            double u = y / 100;
            return poly(u, 10583.6, -1014.41, 33.78311, -5.952053, -0.1798452, 0.022174192, 0.0090316521);
        }
        if (y < 1600) {
            double u = (y - 1000) / 100;
            return poly(u, 1574.2, -556.01, 71.23472, 0.319781, -0.8503463, -0.005050998, 0.0083572073);
        }
        if (y < 1700) {
            double t = y - 1600;
            return poly(t, 120, -0.9808, -0.01532, 1.0 / 7129);
        }
        if (y < 1800) {
            double t = y - 1700;
            return poly(t, 8.83, 0.1603, -0.0059285, 0.00013336, -1.0 / 1174000);
        }
        if (y < 1860) {
            double t = y - 1800;
            return poly(t, 13.72, -0.332447, 0.0068612, 0.0041116, -0.00037436, 0.0000121272,
                    -0.0000001699, 0.000000000875);
        }
        if (y < 1900) {
            double t = y - 1860;
            return poly(t, 7.62, 0.5737, -0.251754, 0.01680668, -0.0004473624, 1.0 / 233174);
        }
        if (y < 1920) {
            double t = y - 1900;
            return poly(t, -2.79, 1.494119, -0.0598939, 0.0061966, -0.000197);
        }
        if (y < 1941) {
            double t = y - 1920;
            return poly(t, 21.20, 0.84493, -0.076100, 0.0020936);
        }
        if (y < 1961) {
            double t = y - 1950;
            return poly(t, 29.07, 0.407, -1.0 / 233, 1.0 / 2547);
        }
        if (y < 1986) {
            double t = y - 1975;
            return poly(t, 45.45, 1.067, -1.0 / 260, -1.0 / 718);
        }
        if (y < 2005) {
            double t = y - 2000;
            return poly(t, 63.86, 0.3345, -0.060374, 0.0017275, 0.000651814, 0.00002373599);
        }
        if (y < 2050) {
            double t = y - 2000;
            return poly(t, 62.92, 0.32217, 0.005589);
        }
        double u = (y - 1820) / 100;
        return -20 + 32 * u * u - 0.5628 * (2150 - y);
    }

    private static double poly(double x, double... c) {
        double s = 0;
        for (int k = c.length - 1; k >= 0; k--) {
            s = s * x + c[k];
        }
        return s;
    }
}
