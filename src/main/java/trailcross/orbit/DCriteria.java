package trailcross.orbit;

/**
 * Orbital similarity criteria between two orbits, from q, e, i, Ω, ω:
 * Southworth &amp; Hawkins (1963, Smithson. Contrib. Astrophys. 7, 261) D_SH; Drummond (1981, Icarus 45,
 * 545) D'; and Jopek (1993, Icarus 106, 603) D_H, which is D_SH with Drummond's normalised q term. I21 is
 * the angle between the orbital planes and Π21 the difference of the arguments of perihelion measured
 * from the orbits' mutual node; θ21 (Drummond) is the angle between the perihelion directions.
 */
public final class DCriteria {

    private DCriteria() {
    }

    /**
     * @param a one orbit
     * @param b the other
     * @return D_SH (Southworth &amp; Hawkins 1963)
     */
    public static double southworthHawkins(Elements a, Elements b) {
        double twoSinHalfI = twoSinHalfI21(a, b);
        double de = b.e() - a.e();
        double dq = b.q() - a.q();
        double pi21 = pi21(a, b, twoSinHalfI);
        double em = (a.e() + b.e()) / 2;
        double tp = 2 * Math.sin(pi21 / 2);
        return Math.sqrt(de * de + dq * dq + twoSinHalfI * twoSinHalfI + em * em * tp * tp);
    }

    /**
     * @param a one orbit
     * @param b the other
     * @return D_H (Jopek 1993)
     */
    public static double jopek(Elements a, Elements b) {
        double twoSinHalfI = twoSinHalfI21(a, b);
        double de = b.e() - a.e();
        double dq = (b.q() - a.q()) / (b.q() + a.q());
        double pi21 = pi21(a, b, twoSinHalfI);
        double em = (a.e() + b.e()) / 2;
        double tp = 2 * Math.sin(pi21 / 2);
        return Math.sqrt(de * de + dq * dq + twoSinHalfI * twoSinHalfI + em * em * tp * tp);
    }

    /**
     * @param a one orbit
     * @param b the other
     * @return D' (Drummond 1981)
     */
    public static double drummond(Elements a, Elements b) {
        double de = (b.e() - a.e()) / (b.e() + a.e());
        double dq = (b.q() - a.q()) / (b.q() + a.q());
        double i21 = 2 * Math.asin(Math.min(1, twoSinHalfI21(a, b) / 2));
        double[] la = perihelionDirection(a);
        double[] lb = perihelionDirection(b);
        double theta = Math.acos(Math.max(-1, Math.min(1,
                Math.cos(la[1]) * Math.cos(lb[1]) * Math.cos(lb[0] - la[0]) + Math.sin(la[1]) * Math.sin(lb[1]))));
        double em = (a.e() + b.e()) / 2;
        return Math.sqrt(de * de + dq * dq + (i21 / Math.PI) * (i21 / Math.PI) + em * em * (theta / Math.PI) * (theta / Math.PI));
    }

    /** 2 sin(I21/2) = √[(2 sin((i2 − i1)/2))² + sin i1 sin i2 (2 sin((Ω2 − Ω1)/2))²]. */
    static double twoSinHalfI21(Elements a, Elements b) {
        double x = 2 * Math.sin((b.i() - a.i()) / 2);
        double y = 2 * Math.sin((b.node() - a.node()) / 2);
        return Math.sqrt(x * x + Math.sin(a.i()) * Math.sin(b.i()) * y * y);
    }

    /**
     * Π21 = ω2 − ω1 + 2 arcsin[cos((i2 + i1)/2) sin((Ω2 − Ω1)/2) sec(I21/2)] (Southworth &amp; Hawkins
     * 1963), with Ω2 − Ω1 reduced to (−180°, 180°], which is their sign rule for |Ω2 − Ω1| &gt; 180°.
     */
    static double pi21(Elements a, Elements b, double twoSinHalfI) {
        double halfI = Math.asin(Math.min(1, twoSinHalfI / 2));
        double dNode = Math.IEEEremainder(b.node() - a.node(), 2 * Math.PI);
        double s = Math.cos((b.i() + a.i()) / 2) * Math.sin(dNode / 2) / Math.cos(halfI);
        double arc = 2 * Math.asin(Math.max(-1, Math.min(1, s)));
        return b.peri() - a.peri() + arc;
    }

    /** Ecliptic longitude and latitude of the perihelion: λ = Ω + atan2(cos i sin ω, cos ω), β = asin(sin ω sin i). */
    static double[] perihelionDirection(Elements el) {
        double lambda = el.node() + Math.atan2(Math.cos(el.i()) * Math.sin(el.peri()), Math.cos(el.peri()));
        double beta = Math.asin(Math.sin(el.peri()) * Math.sin(el.i()));
        return new double[] {lambda, beta};
    }
}
