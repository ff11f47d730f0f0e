package trailcross.report;

import java.io.PrintWriter;
import java.util.Locale;
import trailcross.orbit.Elements;
import trailcross.stream.EjectionSettings;
import trailcross.stream.ParentBody;
import trailcross.stream.ParticleSettings;
import trailcross.stream.StreamDefinition;
import trailcross.time.Epoch;
import trailcross.time.EpochFormat;

/**
 * The console description of a stream definition as trailcross will use it: every value, defaults
 * included, with its unit, and the orbit's derived quantities (a, period, aphelion, Tisserand's T_J).
 */
public final class StreamReport {

    private StreamReport() {
    }

    /**
     * @param d the definition
     * @param out where to write
     */
    public static void print(StreamDefinition d, PrintWriter out) {
        ParentBody p = d.parent();
        Elements el = p.elements();
        out.println("stream            " + d.name() + (d.description().isEmpty() ? "" : " — " + d.description()));
        out.println("file              " + d.source());
        out.printf(Locale.ROOT, "population index  r = %.2f%n", d.populationIndex());
        out.println();
        out.println("parent            " + p.name());
        out.println("  epoch           " + EpochFormat.tdb(p.epoch(), 3));
        out.println("  perihelion      " + EpochFormat.tdb(Epoch.ofTdb(el.perihelionJd()), 3)
                + String.format(Locale.ROOT, "  (JD %.6f TDB)", el.perihelionJd()));
        out.printf(Locale.ROOT, "  q               %.8f au%n", el.q());
        out.printf(Locale.ROOT, "  e               %.8f%n", el.e());
        out.printf(Locale.ROOT, "  i               %.6f deg%n", Math.toDegrees(el.i()));
        out.printf(Locale.ROOT, "  node            %.6f deg%n", Math.toDegrees(el.node()));
        out.printf(Locale.ROOT, "  peri            %.6f deg%n", Math.toDegrees(el.peri()));
        if (el.e() < 1) {
            out.printf(Locale.ROOT, "  a               %.6f au, period %.3f yr, aphelion %.4f au%n", el.a(),
                    el.period() / 365.25, el.aphelion());
        } else {
            out.printf(Locale.ROOT, "  unbound         e >= 1: one passage only (a = %.6f au)%n", el.a());
        }
        out.printf(Locale.ROOT, "  Tisserand T_J   %.3f%n", el.tisserandJupiter());
        out.printf(Locale.ROOT, "  non-grav.       A1 %.6e  A2 %.6e  A3 %.6e au/d^2%n", p.a1(), p.a2(), p.a3());
        out.printf(Locale.ROOT, "  nucleus         radius %.3f km, density %.0f kg/m^3%n", p.radiusKm(), p.densityKgM3());
        out.println("  dust production " + (p.dustProductionKgS() == null ? "not given (no ZHR estimates)"
                : String.format(Locale.ROOT, "%.4g kg/s at 1 au", p.dustProductionKgS())));
        out.println("  gas production  " + (p.gasProductionMolS() == null ? "not given"
                : String.format(Locale.ROOT, "%.4g molecules/s at 1 au", p.gasProductionMolS())));
        EjectionSettings e = d.ejection();
        out.println();
        out.println("ejection          model " + e.model().key() + String.format(Locale.ROOT, " x %.3g", e.speedScale())
                + (e.model() == trailcross.stream.VelocityModel.FIXED
                        ? String.format(Locale.ROOT, " (%.3g m/s)", e.fixedSpeedMs()) : ""));
        out.println("  directions      " + e.directions().key()
                + (e.directions() == trailcross.stream.DirectionLaw.CONE
                        ? String.format(Locale.ROOT, " (half-angle %.1f deg)", e.coneHalfAngleDeg()) : ""));
        out.printf(Locale.ROOT, "  active arc      inbound from %.3f au, outbound to %.3f au%n", e.activeInboundAu(),
                e.activeOutboundAu());
        out.println("  production      " + (e.hasProductionTable()
                ? "table of " + e.productionTableDays().length + " points"
                : String.format(Locale.ROOT, "Q ~ r^-%.2f", e.productionExponent())));
        ParticleSettings s = d.particles();
        out.println();
        out.printf(Locale.ROOT, "particles         radius %.3g .. %.3g m, density %.0f kg/m^3%n", s.radiusMinM(),
                s.radiusMaxM(), s.densityKgM3());
        out.printf(Locale.ROOT, "  mass index      s = %.3f, Q_pr = %.2f, %d size bins%s%n", s.massIndex(),
                s.radiationPressureEfficiency(), s.sizeBins(), s.stratified() ? ", stratified" : "");
    }
}
