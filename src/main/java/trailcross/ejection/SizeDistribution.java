package trailcross.ejection;

/**
 * Meteoroid masses from a truncated power law dN ∝ m^−s dm between the masses of the smallest and the
 * largest radius (s the differential mass index), optionally in logarithmic bins of equal width for
 * stratified sampling. Masses are drawn by inverting the cumulative distribution; the integrals
 * ∫ m^p dm are written through expm1 so that s = 2 (equal mass per decade) needs no special case.
 */
public final class SizeDistribution {

    private final double massIndex;
    private final double density;
    private final double[] edges;
    private final double[] numberFraction;
    private final double meanMass;
    private final double[] spans;

    /**
     * @param radiusMinM smallest radius, m
     * @param radiusMaxM largest radius, m (≥ the smallest)
     * @param densityKgM3 bulk density, kg/m³
     * @param massIndex s &gt; 1
     * @param bins number of logarithmic bins (≥ 1)
     */
    public SizeDistribution(double radiusMinM, double radiusMaxM, double densityKgM3, double massIndex, int bins) {
        if (!(radiusMinM > 0 && radiusMaxM >= radiusMinM && massIndex > 1 && bins >= 1 && densityKgM3 > 0)) {
            throw new IllegalArgumentException("size distribution: need 0 < r_min <= r_max, s > 1, bins >= 1");
        }
        this.massIndex = massIndex;
        this.density = densityKgM3;
        double mMin = EjectionSpeedModel.sphereMassKg(radiusMinM, densityKgM3);
        double mMax = EjectionSpeedModel.sphereMassKg(radiusMaxM, densityKgM3);
        int k = mMax > mMin ? bins : 1;
        edges = new double[k + 1];
        double l = Math.log(mMax / mMin);
        for (int j = 0; j <= k; j++) {
            edges[j] = j == k ? mMax : mMin * Math.exp(l * j / k);
        }
        numberFraction = new double[k];
        double total = integral(mMin, mMax, -massIndex);
        for (int j = 0; j < k; j++) {
            numberFraction[j] = total > 0 ? integral(edges[j], edges[j + 1], -massIndex) / total : 1.0;
        }
        meanMass = total > 0 ? integral(mMin, mMax, 1 - massIndex) / total : mMin;
        spans = new double[k + 1];
        for (int j = 0; j < k; j++) {
            spans[j] = span(edges[j], edges[j + 1]);
        }
        spans[k] = span(edges[0], edges[k]);
    }

    /**
     * The constant of {@link #invert} for the range [a, b]: (b/a)^(1−s) − 1. Kept per bin (and, last, for the
     * whole law) because a mass is drawn for every candidate ejection and the two calls it takes cost as
     * much as the draw's own.
     */
    private double span(double a, double b) {
        return Math.expm1((1 - massIndex) * Math.log(b / a));
    }

    /**
     * ∫_a^b m^p dm, stable for p → −1 and for b → a.
     */
    static double integral(double a, double b, double p) {
        double l = Math.log(b / a);
        double x = (p + 1) * l;
        double ratio = Math.abs(x) < 1e-12 ? 1.0 : Math.expm1(x) / x;
        return Math.pow(a, p + 1) * l * ratio;
    }

    /**
     * A mass drawn from the law inside one bin.
     *
     * @param bin bin index, 0 … {@link #bins()} − 1
     * @param u uniform in [0, 1)
     * @return the mass, kg
     */
    public double massInBin(int bin, double u) {
        return invert(edges[bin], edges[bin + 1], spans[bin], u);
    }

    /**
     * A mass drawn from the whole law.
     *
     * @param u uniform in [0, 1)
     * @return the mass, kg
     */
    public double mass(double u) {
        return invert(edges[0], edges[edges.length - 1], spans[spans.length - 1], u);
    }

    /** The inverse of CDF(m) = (m^(1−s) − a^(1−s)) / (b^(1−s) − a^(1−s)) relative to a; x = (b/a)^(1−s) − 1. */
    private double invert(double a, double b, double x, double u) {
        if (b == a) {
            return a;
        }
        return a * Math.exp(Math.log1p(u * x) / (1 - massIndex));
    }

    /**
     * @param massKg a mass, kg
     * @return the radius of a sphere of that mass and the distribution's density, m
     */
    public double radius(double massKg) {
        return Math.cbrt(massKg / (4.0 / 3.0 * Math.PI * density));
    }

    /** @return the number of bins */
    public int bins() {
        return numberFraction.length;
    }

    /**
     * @param bin a bin
     * @return the fraction of the meteoroids (by number) in that bin
     */
    public double numberFraction(int bin) {
        return numberFraction[bin];
    }

    /**
     * @param bin a bin
     * @return its lower mass edge, kg
     */
    public double lowerEdge(int bin) {
        return edges[bin];
    }

    /**
     * @param bin a bin
     * @return its upper mass edge, kg
     */
    public double upperEdge(int bin) {
        return edges[bin + 1];
    }

    /** @return the mean mass of the law, kg */
    public double meanMass() {
        return meanMass;
    }

    /** @return the differential mass index s */
    public double massIndex() {
        return massIndex;
    }

    /**
     * @param bin a bin
     * @param massKg a mass
     * @return the fraction of the meteoroids (by number, of the whole law) in that bin heavier than the mass
     */
    public double numberFractionAbove(int bin, double massKg) {
        double a = edges[bin];
        double b = edges[bin + 1];
        if (massKg <= a) {
            return numberFraction[bin];
        }
        if (massKg >= b || b == a) {
            return 0;
        }
        double e = 1 - massIndex;
        return numberFraction[bin] * (Math.pow(b, e) - Math.pow(massKg, e)) / (Math.pow(b, e) - Math.pow(a, e));
    }
}
