package org.headway.chart;

import java.awt.Color;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

/**
 * Energy grade line, hydraulic grade line and pipe elevation along the run, in display units.
 * Each array holds one value per node (run inlet, then each segment's outlet); distances are
 * cumulative pipe lengths.
 */
public final class GradeLineChart {

    /**
     * @param title chart title (may be empty)
     * @param distanceLabel axis label for distance with unit
     * @param headLabel axis label for elevation/head with unit
     * @param distance cumulative distance at each node
     * @param elevation pipe elevation at each node
     * @param energyIn energy grade at each segment inlet (after a pump there), one per segment
     * @param energyOut energy grade at each segment outlet, one per segment
     * @param hydraulicIn hydraulic grade at each segment inlet, one per segment
     * @param hydraulicOut hydraulic grade at each segment outlet, one per segment
     */
    public record Spec(
            String title,
            String distanceLabel,
            String headLabel,
            double[] distance,
            double[] elevation,
            double[] energyIn,
            double[] energyOut,
            double[] hydraulicIn,
            double[] hydraulicOut) {}

    private GradeLineChart() {}

    /**
     * Heads at which the gauge pressure reaches its limits, one per node (display units); NaN where
     * a limit is not set.
     *
     * @param label legend text
     * @param low head at the minimum gauge pressure at each node
     * @param high head at the maximum gauge pressure at each node
     */
    public record Band(String label, double[] low, double[] high) {}

    /** Builds the chart. */
    public static JFreeChart build(Spec s) {
        return build(s, null);
    }

    /**
     * Builds the chart with the pressure limits drawn as heads (dashed lines, and the permitted band
     * shaded where both limits are set).
     *
     * @param band the limits, or null for none
     */
    public static JFreeChart build(Spec s, Band band) {
        XYSeries egl = new XYSeries("energy grade line", false, true);
        XYSeries hgl = new XYSeries("hydraulic grade line", false, true);
        XYSeries pipe = new XYSeries("pipe elevation", false, true);
        for (int i = 0; i < s.energyIn().length; i++) {
            egl.add(s.distance()[i], s.energyIn()[i]);
            egl.add(s.distance()[i + 1], s.energyOut()[i]);
            hgl.add(s.distance()[i], s.hydraulicIn()[i]);
            hgl.add(s.distance()[i + 1], s.hydraulicOut()[i]);
        }
        for (int i = 0; i < s.distance().length; i++) {
            pipe.add(s.distance()[i], s.elevation()[i]);
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(egl);
        data.addSeries(hgl);
        data.addSeries(pipe);
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        r.setSeriesPaint(0, ChartStyle.INK);
        r.setSeriesStroke(0, ChartStyle.solid(2f));
        r.setSeriesPaint(1, ChartStyle.TEAL);
        r.setSeriesStroke(1, ChartStyle.dashed(1.6f));
        r.setSeriesPaint(2, new Color(0x8C7A66));
        r.setSeriesStroke(2, ChartStyle.solid(3f));
        NumberAxis x = new NumberAxis(s.distanceLabel());
        NumberAxis y = new NumberAxis(s.headLabel());
        y.setAutoRangeIncludesZero(false);
        XYPlot plot = new XYPlot(data, x, y, r);
        if (band != null) {
            addBand(plot, s.distance(), band);
        }
        JFreeChart chart = new JFreeChart(
                s.title() == null || s.title().isEmpty() ? null : s.title(), ChartStyle.FONT, plot, true);
        ChartStyle.apply(chart);
        return chart;
    }

    private static void addBand(XYPlot plot, double[] distance, Band band) {
        YIntervalSeries shade = new YIntervalSeries(band.label(), false, true);
        XYSeries low = new XYSeries("minimum pressure", false, true);
        XYSeries high = new XYSeries("maximum pressure", false, true);
        for (int i = 0; i < distance.length; i++) {
            double lo = band.low()[i];
            double hi = band.high()[i];
            if (Double.isFinite(lo)) {
                low.add(distance[i], lo);
            }
            if (Double.isFinite(hi)) {
                high.add(distance[i], hi);
            }
            if (Double.isFinite(lo) && Double.isFinite(hi)) {
                shade.add(distance[i], 0.5 * (lo + hi), lo, hi);
            }
        }
        int at = 1;
        if (shade.getItemCount() > 0) {
            YIntervalSeriesCollection shaded = new YIntervalSeriesCollection();
            shaded.addSeries(shade);
            DeviationRenderer d = new DeviationRenderer(false, false);
            d.setSeriesPaint(0, new Color(0, 0, 0, 0));
            d.setSeriesFillPaint(0, ChartStyle.SHADE);
            d.setAlpha(0.55f);
            plot.setDataset(at, shaded);
            plot.setRenderer(at++, d);
        }
        XYSeriesCollection lines = new XYSeriesCollection();
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        int series = 0;
        if (low.getItemCount() > 0) {
            lines.addSeries(low);
            r.setSeriesPaint(series, ChartStyle.ACCENT);
            r.setSeriesStroke(series++, ChartStyle.dashed(1.2f));
        }
        if (high.getItemCount() > 0) {
            lines.addSeries(high);
            r.setSeriesPaint(series, ChartStyle.PLUM);
            r.setSeriesStroke(series, ChartStyle.dashed(1.2f));
        }
        if (lines.getSeriesCount() > 0) {
            plot.setDataset(at, lines);
            plot.setRenderer(at, r);
        }
        // The grade lines over the band.
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.REVERSE);
    }
}
