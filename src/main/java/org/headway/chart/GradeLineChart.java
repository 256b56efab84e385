package org.headway.chart;

import java.awt.Color;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

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

    /** Builds the chart. */
    public static JFreeChart build(Spec s) {
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
        JFreeChart chart = new JFreeChart(
                s.title() == null || s.title().isEmpty() ? null : s.title(), ChartStyle.FONT, plot, true);
        ChartStyle.apply(chart);
        return chart;
    }
}
