package trailcross.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.DateAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import trailcross.encounter.Encounter;
import trailcross.encounter.RadiantTable;
import trailcross.encounter.TrailEncounter;
import trailcross.forecast.ForecastRun;
import trailcross.frames.Angles;

/**
 * The forecast's pictures, PNG, drawn headless with JFreeChart: the node map (each crossing at its solar
 * longitude and delta r, one series per return, the Earth's path at delta r = 0), the activity profile
 * (each trail's predicted rate against UTC: a Gaussian of the trail's FWHM at its peak, scaled to its ZHR,
 * or to 1 when the ZHR is unknown) and the radiant chart (the crossings' radiants near the Earth and the
 * daily table). Each file is written to a temporary file and moved into place.
 */
public final class ForecastPlots {

    /** A palette of our own: deep teal, amber, plum, slate, rust, olive. */
    private static final Color[] PALETTE = {
        new Color(0x00, 0x6d, 0x77), new Color(0xe0, 0x9f, 0x3e), new Color(0x7b, 0x2d, 0x6b),
        new Color(0x4a, 0x5a, 0x6a), new Color(0xb5, 0x4a, 0x1f), new Color(0x6b, 0x7a, 0x1e)
    };
    private static final int WIDTH = 1000;
    private static final int HEIGHT = 640;

    private ForecastPlots() {
    }

    /**
     * @param dir the output folder
     * @param title the chart titles' prefix
     * @param r the forecast
     * @param table the daily radiant table (may be empty)
     * @return the files written
     */
    public static List<Path> write(Path dir, String title, ForecastRun.Result r, List<RadiantTable.Row> table) {
        System.setProperty("java.awt.headless", "true");
        List<Path> out = new ArrayList<>();
        out.add(save(dir.resolve("node-map.png"), nodeMap(title, r)));
        if (r.settings().span()) {
            for (int y = r.settings().firstYear(); y <= r.settings().lastYear(); y++) {
                int year = y;
                if (r.meetings().stream().anyMatch(m -> m.year() == year && m.cloud() != null)) {
                    out.add(save(dir.resolve("activity-" + y + ".png"), activity(title, r, y)));
                }
            }
        } else {
            out.add(save(dir.resolve("activity.png"), activity(title, r, r.settings().firstYear())));
        }
        out.add(save(dir.resolve("radiants.png"), radiants(title, r, table)));
        return out;
    }

    private static JFreeChart nodeMap(String title, ForecastRun.Result r) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (ForecastRun.Trail t : r.trails()) {
            XYSeries s = new XYSeries(t.returnYear() + " trail");
            for (Encounter e : t.encounters()) {
                if (Math.abs(e.daysAfterEarth()) <= TrailEncounter.MAX_ALONG_TRAIL_DAYS) {
                    s.add(e.solarLongitudeDeg(), e.deltaR());
                }
            }
            if (s.getItemCount() > 0) {
                data.addSeries(s);
            }
        }
        XYPlot plot = new XYPlot(data, axis("solar longitude (deg, J2000)", false), axis("delta r (au)", false),
                points(data.getSeriesCount()));
        ValueMarker earth = new ValueMarker(0.0, new Color(0x20, 0x30, 0x40), new BasicStroke(1.5f));
        earth.setLabel("Earth's path (delta r = 0)");
        earth.setLabelAnchor(org.jfree.chart.ui.RectangleAnchor.TOP_RIGHT);
        earth.setLabelTextAnchor(org.jfree.chart.ui.TextAnchor.BOTTOM_RIGHT);
        plot.addRangeMarker(earth);
        return chart(title + ": node map (crossings within " + (int) TrailEncounter.MAX_ALONG_TRAIL_DAYS
                + " days of the Earth)", plot);
    }

    /**
     * The activity profiles of one year's meetings: each cloud meeting's ZHR (or relative intensity) against
     * time with its resampling band (16th–84th percentiles), each over its peak ± 3 FWHM (at least ± 1 h); the
     * time axis spans those hours only. One colour per trail, none reused in a plot; when two or more trails
     * meet the Earth, their sum ({@link trailcross.encounter.CombinedActivity}) dashed in black with its band.
     */
    private static JFreeChart activity(String title, ForecastRun.Result r, int year) {
        YIntervalSeriesCollection data = new YIntervalSeriesCollection();
        double max = 0;
        for (ForecastRun.Meeting mt : r.meetings()) {
            if (mt.year() == year && mt.cloud() != null) {
                max = Math.max(max, mt.cloud().zhr());
            }
        }
        double scale = r.absolute() || max == 0 ? 1 : 1 / max;
        double from = Double.POSITIVE_INFINITY;
        double to = Double.NEGATIVE_INFINITY;
        for (ForecastRun.Meeting mt : r.meetings()) {
            TrailEncounter m = mt.cloud();
            if (mt.year() != year || m == null) {
                continue;
            }
            YIntervalSeries s = new YIntervalSeries(mt.returnYear() + " trail");
            double half = trailcross.encounter.CombinedActivity.halfSpanDays(m);
            double[] t = m.profileTimes();
            var prof = m.profile();
            for (int k = 0; k < t.length; k++) {
                if (Math.abs(t[k] - m.peakT()) <= half) {
                    double ms = (t[k] + 10957.5) * 86400000.0;
                    s.add(ms, prof.value()[k] * scale, prof.low()[k] * scale, prof.high()[k] * scale);
                }
            }
            data.addSeries(s);
            from = Math.min(from, m.peakT() - half);
            to = Math.max(to, m.peakT() + half);
        }
        int trails = data.getSeriesCount();
        List<trailcross.encounter.CombinedActivity> groups = r.combined(year);
        for (int g = 0; g < groups.size(); g++) {
            trailcross.encounter.CombinedActivity all = groups.get(g);
            YIntervalSeries s = new YIntervalSeries(groups.size() == 1 ? "trails together" : "trails together " + (g + 1));
            double[] t = all.times();
            for (int k = 0; k < t.length; k++) {
                if (t[k] >= from && t[k] <= to) {
                    s.add((t[k] + 10957.5) * 86400000.0, all.value()[k] * scale, all.low()[k] * scale,
                            all.high()[k] * scale);
                }
            }
            data.addSeries(s);
        }
        DateAxis time = new DateAxis("UTC (" + year + ")");
        time.setTimeZone(java.util.TimeZone.getTimeZone("UTC"));
        DeviationRenderer lines = new DeviationRenderer(true, false);
        for (int k = 0; k < trails; k++) {
            Color c = colour(k, trails);
            lines.setSeriesPaint(k, c);
            lines.setSeriesFillPaint(k, c);
            lines.setSeriesStroke(k, new BasicStroke(2f));
        }
        for (int k = trails; k < data.getSeriesCount(); k++) {
            // Sums in black, dashed, so that they are told from every trail's colour (groups do not overlap in time).
            lines.setSeriesPaint(k, Color.BLACK);
            lines.setSeriesFillPaint(k, Color.GRAY);
            lines.setSeriesStroke(k, new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                    new float[] {6f, 4f}, 0f));
        }
        lines.setAlpha(0.25f);
        XYPlot plot = new XYPlot(data, time, axis(r.absolute() ? "ZHR" : "relative intensity", true), lines);
        return chart(title + ": activity profile (model; bands: resampling 16-84%)", plot);
    }

    /** The k-th of n distinct colours: the palette, then evenly spaced hues when it runs out. */
    static Color colour(int k, int n) {
        if (n <= PALETTE.length) {
            return PALETTE[k];
        }
        return Color.getHSBColor((float) k / n, 0.75f, 0.8f);
    }

    private static JFreeChart radiants(String title, ForecastRun.Result r, List<RadiantTable.Row> table) {
        XYSeriesCollection data = new XYSeriesCollection();
        Double ref = table.isEmpty() ? null : table.get(0).raDeg();
        for (ForecastRun.Trail t : r.trails()) {
            XYSeries s = new XYSeries(t.returnYear() + " trail");
            for (Encounter e : t.encounters()) {
                if (Math.abs(e.deltaR()) <= 0.01 && Math.abs(e.daysAfterEarth()) <= TrailEncounter.MAX_ALONG_TRAIL_DAYS) {
                    if (ref == null) {
                        ref = e.radiant().raDeg();
                    }
                    s.add(unwrap(e.radiant().raDeg(), ref), e.radiant().decDeg());
                }
            }
            if (s.getItemCount() > 0) {
                data.addSeries(s);
            }
        }
        XYLineAndShapeRenderer renderer = points(data.getSeriesCount() + 1);
        if (!table.isEmpty()) {
            XYSeries drift = new XYSeries("daily table (0h UTC)", false);
            for (RadiantTable.Row row : table) {
                drift.add(unwrap(row.raDeg(), ref), row.decDeg());
            }
            data.addSeries(drift);
            int k = data.getSeriesCount() - 1;
            renderer.setSeriesLinesVisible(k, true);
            renderer.setSeriesPaint(k, new Color(0x20, 0x30, 0x40));
        }
        NumberAxis ra = axis("right ascension (deg, J2000)", false);
        ra.setInverted(true);
        XYPlot plot = new XYPlot(data, ra, axis("declination (deg, J2000)", false), renderer);
        return chart(title + ": radiants of crossings near the Earth", plot);
    }

    private static double unwrap(double deg, double ref) {
        return ref + Math.toDegrees(Angles.difference(Math.toRadians(deg), Math.toRadians(ref)));
    }

    static NumberAxis axis(String label, boolean zero) {
        NumberAxis a = new NumberAxis(label);
        a.setAutoRangeIncludesZero(zero);
        return a;
    }

    static XYLineAndShapeRenderer points(int series) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(false, true);
        style(r, series);
        return r;
    }

    private static void style(XYLineAndShapeRenderer r, int series) {
        for (int k = 0; k < series; k++) {
            r.setSeriesPaint(k, colour(k, series));
            r.setSeriesShape(k, new java.awt.geom.Ellipse2D.Double(-2.5, -2.5, 5, 5));
            r.setSeriesStroke(k, new BasicStroke(2f));
        }
    }

    static JFreeChart chart(String title, XYPlot plot) {
        plot.setBackgroundPaint(new Color(0xf7, 0xf5, 0xf0));
        plot.setDomainGridlinePaint(new Color(0xd8, 0xd4, 0xcc));
        plot.setRangeGridlinePaint(new Color(0xd8, 0xd4, 0xcc));
        JFreeChart c = new JFreeChart(title, new Font(Font.SANS_SERIF, Font.BOLD, 15), plot, true);
        c.setBackgroundPaint(Color.WHITE);
        return c;
    }

    static Path save(Path file, JFreeChart chart) {
        try {
            Files.createDirectories(file.toAbsolutePath().getParent());
            Path tmp = Files.createTempFile(file.toAbsolutePath().getParent(), "." + file.getFileName(), ".tmp");
            try {
                ChartUtils.saveChartAsPNG(tmp.toFile(), chart, WIDTH, HEIGHT);
                Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } finally {
                Files.deleteIfExists(tmp);
            }
            return file;
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot write: " + e.getMessage(), e);
        }
    }
}
