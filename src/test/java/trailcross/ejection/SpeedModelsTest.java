package trailcross.ejection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** The ejection-velocity models against their published formulas and limits. */
class SpeedModelsTest {

    /** Radius (m) of a 1-g sphere of 1 g/cm³. */
    private static final double ONE_GRAM_RADIUS_M = Math.cbrt(1e-3 / (4.0 / 3.0 * Math.PI * 1000.0));

    @Test
    void whippleAndJonesGiveTheirCoefficientsInUnitConditions() {
        // Whipple (1951) V = 8.03 r^-1.125 rho^-1/3 R^1/2 m^-1/6 and Jones (1995) V = 10.2 r^-1.038 ...,
        // r au, rho g/cm^3, R km, m g, V m/s (../shared/REFERENCES.md, from memory): at r = 1, rho = 1,
        // R = 1, m = 1 the speed is the coefficient itself.
        assertThat(new WhippleSpeed(1.0, 1000.0).speedMs(1.0, ONE_GRAM_RADIUS_M)).isCloseTo(8.03, within(1e-12));
        assertThat(new JonesSpeed(1.0, 1000.0).speedMs(1.0, ONE_GRAM_RADIUS_M)).isCloseTo(10.2, within(1e-12));
    }

    @Test
    void whippleAndJonesScaleAsTheirExponents() {
        // The exponents of the same formulas: r^-1.125 (Whipple) and r^-1.038 (Jones); R^1/2; m^-1/6, i.e.
        // radius^-1/2 at fixed density; rho^-1/3 m^-1/6 = rho^-1/2 at fixed radius.
        EjectionSpeedModel w = new WhippleSpeed(4.0, 800.0);
        EjectionSpeedModel j = new JonesSpeed(4.0, 800.0);
        double a = 1e-3;
        assertThat(slope(w.speedMs(1.0, a), w.speedMs(3.0, a), 3.0)).isCloseTo(-1.125, within(1e-12));
        assertThat(slope(j.speedMs(1.0, a), j.speedMs(3.0, a), 3.0)).isCloseTo(-1.038, within(1e-12));
        assertThat(slope(w.speedMs(1.0, a), w.speedMs(1.0, 10 * a), 10.0)).isCloseTo(-0.5, within(1e-12));
        assertThat(slope(new WhippleSpeed(1.0, 800).speedMs(1, a), w.speedMs(1, a), 4.0)).isCloseTo(0.5, within(1e-12));
        assertThat(slope(w.speedMs(1, a), new WhippleSpeed(4.0, 3200).speedMs(1, a), 4.0)).isCloseTo(-0.5, within(1e-12));
        // Jones's speeds exceed Whipple's by 10.2/8.03 at 1 au (the two fits as quoted).
        assertThat(j.speedMs(1.0, a) / w.speedMs(1.0, a)).isCloseTo(10.2 / 8.03, within(1e-12));
    }

    @Test
    void crifoRodionovHasItsFittedLimits() {
        // Crifo & Rodionov (1997) fit V = V_g / (1.2 + 0.72 sqrt(a/a*)) (as quoted; from memory): small grains
        // move at V_g/1.2, a grain of a* at V_g/1.92, large grains as a^-1/2 (Whipple's law).
        CrifoRodionovSpeed c = new CrifoRodionovSpeed(2.0, 1000.0, 1e28, 2.0);
        double vg = c.gasSpeedMs(1.0);
        double aStar = c.characteristicRadiusM(1.0);
        assertThat(vg).isEqualTo(580.0);
        assertThat(c.speedMs(1.0, aStar * 1e-12)).isCloseTo(vg / 1.2, within(1e-3));
        assertThat(c.speedMs(1.0, aStar)).isCloseTo(vg / 1.92, within(1e-9));
        assertThat(slope(c.speedMs(1.0, aStar * 1e8), c.speedMs(1.0, aStar * 1e10), 100.0)).isCloseTo(-0.5, within(1e-3));
        // a* = 3 Q m_g / (8 pi R rho V_g): doubling the gas production doubles a*; at 2 au the production
        // falls as r^-2 and the gas speed as r^-1/2 (Delsemme 1982, from memory), so a* falls as r^-1.5.
        assertThat(new CrifoRodionovSpeed(2.0, 1000.0, 2e28, 2.0).characteristicRadiusM(1.0) / aStar)
                .isCloseTo(2.0, within(1e-12));
        assertThat(c.characteristicRadiusM(2.0) / aStar).isCloseTo(Math.pow(2.0, -1.5), within(1e-12));
    }

    @Test
    void escapeSpeedOfTheEarthFromItsMeanDensity() {
        // The Earth: R = 6371 km, mean density 5514 kg/m^3, escape speed 11.186 km/s (common knowledge;
        // values from memory).
        assertThat(new NucleusEscape(6371.0, 5514.0).speedMs()).isCloseTo(11186.0, within(5.0));
        NucleusEscape n = new NucleusEscape(3.0, 500.0);
        double ve = n.speedMs();
        assertThat(n.speedAtInfinity(2 * ve)).isCloseTo(Math.sqrt(3) * ve, within(1e-12));
        assertThat(n.speedAtInfinity(0.5 * ve)).isNegative();
    }

    @Test
    void fixedSpeedIgnoresDistanceAndSize() {
        FixedSpeed f = new FixedSpeed(12.5);
        assertThat(f.speedMs(0.3, 1e-5)).isEqualTo(12.5);
        assertThat(f.speedMs(3.0, 1e-2)).isEqualTo(12.5);
    }

    private static double slope(double v1, double v2, double factor) {
        return Math.log(v2 / v1) / Math.log(factor);
    }
}
