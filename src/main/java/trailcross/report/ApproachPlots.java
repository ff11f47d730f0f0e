package trailcross.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.DateAxis;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;
import trailcross.encounter.DensityProfile;
import trailcross.forecast.ApproachRun;

/**
 * The approach run's plots: each particle's closest-approach distance against its time (logarithmic
 * distance, one colour per return, the parent's own approach and the reported distances marked) and the
 * fluence profile at the target with its resampling band.
 */
public final class ApproachPlots {

    private ApproachPlots() {
    }

    /**
     * @param dir the output folder
     * @param title the plots' title
     * @param r the result
     * @return the files written
     */
    public static List<Path> write(Path dir, String title, ApproachRun.Result r) {
        System.setProperty("java.awt.headless", "true");
        List<Path> out = new ArrayList<>();
        out.add(ForecastPlots.save(dir.resolve("approach-distances.png"), distances(title, r)));
        if (r.fluence() != null) {
            out.add(ForecastPlots.save(dir.resolve("approach-profile.png"), profile(title, r)));
        }
        return out;
    }

    private static double ms(double t) {
        return (t + 10957.5) * 86400000.0;
    }

    private static DateAxis time() {
        DateAxis a = new DateAxis("UTC");
        a.setTimeZone(java.util.TimeZone.getTimeZone("UTC"));
        return a;
    }

    private static JFreeChart distances(String title, ApproachRun.Result r) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (int y : r.returns()) {
            XYSeries s = new XYSeries(r.returns().size() == 1 && y == r.returns().get(0) ? "particles (" + y + ")"
                    : y + " particles", false);
            for (ApproachRun.Row row : r.rows()) {
                if (row.returnYear() == y && row.approach().distance() > 0) {
                    s.add(ms(row.approach().t()), row.approach().distance());
                }
            }
            data.addSeries(s);
        }
        if (r.parent() != null && r.parent().distance() > 0) {
            XYSeries p = new XYSeries("parent");
            p.add(ms(r.parent().t()), r.parent().distance());
            data.addSeries(p);
        }
        XYLineAndShapeRenderer dots = ForecastPlots.points(data.getSeriesCount());
        if (r.parent() != null) {
            int k = data.getSeriesCount() - 1;
            dots.setSeriesPaint(k, new Color(0x20, 0x30, 0x40));
            dots.setSeriesShape(k, new java.awt.geom.Rectangle2D.Double(-5, -5, 10, 10));
        }
        LogAxis dist = new LogAxis("closest approach (au)");
        dist.setSmallestValue(1e-9);
        XYPlot plot = new XYPlot(data, time(), dist, dots);
        for (ApproachRun.Band b : r.bands()) {
            ValueMarker m = new ValueMarker(b.withinAu(), new Color(0x80, 0x80, 0x80), new BasicStroke(1f));
            m.setLabel(b.withinAu() + " au");
            m.setLabelAnchor(org.jfree.chart.ui.RectangleAnchor.TOP_LEFT);
            m.setLabelTextAnchor(org.jfree.chart.ui.TextAnchor.BOTTOM_LEFT);
            plot.addRangeMarker(m);
        }
        return ForecastPlots.chart(title + ": closest approach of each particle", plot);
    }

    private static JFreeChart profile(String title, ApproachRun.Result r) {
        DensityProfile.Result d = r.fluence().profile();
        YIntervalSeriesCollection data = new YIntervalSeriesCollection();
        YIntervalSeries s = new YIntervalSeries("fluence rate, " + r.massLimit());
        for (int k = 0; k < d.grid().length; k++) {
            s.add(ms(d.grid()[k]), d.value()[k] / 24, d.low()[k] / 24, d.high()[k] / 24);
        }
        data.addSeries(s);
        DeviationRenderer lines = new DeviationRenderer(true, false);
        Color c = ForecastPlots.colour(0, 1);
        lines.setSeriesPaint(0, c);
        lines.setSeriesFillPaint(0, c);
        lines.setSeriesStroke(0, new BasicStroke(2f));
        lines.setAlpha(0.25f);
        XYPlot plot = new XYPlot(data, time(), ForecastPlots.axis("meteoroids per km² per hour"
                + (r.absolute() ? "" : " (per kg/s of dust)"), true), lines);
        return ForecastPlots.chart(title + ": fluence at the target (model; band: resampling 16-84%)", plot);
    }
}
