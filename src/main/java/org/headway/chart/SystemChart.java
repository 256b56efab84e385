package org.headway.chart;

import java.awt.Color;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * System curve (total head against flow) with its low/high uncertainty curves, the pump's fitted
 * curve and the maker's points, and the operating point. Values arrive already converted to the
 * display units named in the axis labels.
 */
public final class SystemChart {

    /**
     * What to draw, in display units.
     *
     * @param title chart title (may be empty)
     * @param flowLabel axis label for flow with unit
     * @param headLabel axis label for head with unit
     * @param flows flows of the system curve
     * @param heads total heads of the system curve
     * @param lowHeads low end of the band per flow (empty for none)
     * @param highHeads high end of the band per flow (empty for none)
     * @param pumpPointsFlow maker's points, flow (empty for no pump)
     * @param pumpPointsHead maker's points, head
     * @param pumpCurve fitted pump head as a function of flow (display units), or null
     * @param operatingFlow operating point flow, NaN if none
     * @param operatingHead operating point head, NaN if none
     * @param designFlow design flow marker, NaN if none
     */
    public record Spec(
            String title,
            String flowLabel,
            String headLabel,
            double[] flows,
            double[] heads,
            double[] lowHeads,
            double[] highHeads,
            double[] pumpPointsFlow,
            double[] pumpPointsHead,
            DoubleUnaryOperator pumpCurve,
            double operatingFlow,
            double operatingHead,
            double designFlow) {}

    private SystemChart() {}

    /** Builds the chart. */
    public static JFreeChart build(Spec s) {
        XYPlot plot = new XYPlot();
        NumberAxis x = new NumberAxis(s.flowLabel());
        x.setAutoRangeIncludesZero(true);
        NumberAxis y = new NumberAxis(s.headLabel());
        y.setAutoRangeIncludesZero(true);
        plot.setDomainAxis(x);
        plot.setRangeAxis(y);

        XYSeriesCollection system = new XYSeriesCollection();
        XYSeries sys = new XYSeries("system curve", false, true);
        for (int i = 0; i < s.flows().length; i++) {
            sys.add(s.flows()[i], s.heads()[i]);
        }
        system.addSeries(sys);
        if (s.lowHeads().length == s.flows().length && s.highHeads().length == s.flows().length) {
            XYSeries lo = new XYSeries("band, low", false, true);
            XYSeries hi = new XYSeries("band, high", false, true);
            for (int i = 0; i < s.flows().length; i++) {
                lo.add(s.flows()[i], s.lowHeads()[i]);
                hi.add(s.flows()[i], s.highHeads()[i]);
            }
            system.addSeries(lo);
            system.addSeries(hi);
        }
        XYLineAndShapeRenderer sr = new XYLineAndShapeRenderer(true, false);
        sr.setSeriesPaint(0, ChartStyle.INK);
        sr.setSeriesStroke(0, ChartStyle.solid(2f));
        for (int i = 1; i < system.getSeriesCount(); i++) {
            sr.setSeriesPaint(i, ChartStyle.INK.brighter());
            sr.setSeriesStroke(i, ChartStyle.dashed(1f));
        }

        XYSeriesCollection pump = new XYSeriesCollection();
        XYLineAndShapeRenderer pr = new XYLineAndShapeRenderer(true, false);
        if (s.pumpCurve() != null && s.pumpPointsFlow().length > 0) {
            XYSeries fit = new XYSeries("pump curve (fitted)", false, true);
            double qmax = s.pumpPointsFlow()[s.pumpPointsFlow().length - 1];
            double end = Math.max(qmax, s.flows().length > 0 ? s.flows()[s.flows().length - 1] : qmax);
            for (int i = 0; i <= 80; i++) {
                double q = Math.min(end, qmax * 1.1) * i / 80;
                fit.add(q, s.pumpCurve().applyAsDouble(q));
            }
            pump.addSeries(fit);
            XYSeries pts = new XYSeries("pump data", false, true);
            for (int i = 0; i < s.pumpPointsFlow().length; i++) {
                pts.add(s.pumpPointsFlow()[i], s.pumpPointsHead()[i]);
            }
            pump.addSeries(pts);
            pr.setSeriesPaint(0, ChartStyle.TEAL);
            pr.setSeriesStroke(0, ChartStyle.solid(2f));
            pr.setSeriesPaint(1, ChartStyle.TEAL);
            pr.setSeriesLinesVisible(1, false);
            pr.setSeriesShapesVisible(1, true);
            pr.setSeriesShape(1, new Ellipse2D.Double(-3.5, -3.5, 7, 7));
        }

        XYSeriesCollection op = new XYSeriesCollection();
        XYLineAndShapeRenderer or = new XYLineAndShapeRenderer(false, true);
        if (Double.isFinite(s.operatingFlow())) {
            XYSeries o = new XYSeries("operating point", false, true);
            o.add(s.operatingFlow(), s.operatingHead());
            op.addSeries(o);
            or.setSeriesPaint(0, ChartStyle.ACCENT);
            or.setSeriesShape(0, new Rectangle2D.Double(-5, -5, 10, 10));
            XYTextAnnotation a = new XYTextAnnotation(
                    String.format(java.util.Locale.ROOT, "  %.4g, %.4g", s.operatingFlow(), s.operatingHead()),
                    s.operatingFlow(),
                    s.operatingHead());
            a.setTextAnchor(TextAnchor.BOTTOM_LEFT);
            a.setFont(ChartStyle.FONT);
            a.setPaint(ChartStyle.ACCENT.darker());
            plot.addAnnotation(a);
        }
        if (Double.isFinite(s.designFlow())) {
            org.jfree.chart.plot.ValueMarker m = new org.jfree.chart.plot.ValueMarker(s.designFlow());
            m.setPaint(new Color(0x888888));
            m.setStroke(ChartStyle.dashed(1f));
            m.setLabel("design flow");
            m.setLabelFont(ChartStyle.FONT.deriveFont(9f));
            m.setLabelTextAnchor(TextAnchor.TOP_LEFT);
            plot.addDomainMarker(m);
        }
        plot.setDataset(0, op);
        plot.setRenderer(0, or);
        plot.setDataset(1, pump);
        plot.setRenderer(1, pr);
        plot.setDataset(2, system);
        plot.setRenderer(2, sr);
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.REVERSE);
        JFreeChart chart = new JFreeChart(
                s.title() == null || s.title().isEmpty() ? null : s.title(), ChartStyle.FONT, plot, true);
        ChartStyle.apply(chart);
        return chart;
    }

    /** Convenience: list of doubles to array. */
    public static double[] array(List<Double> values) {
        return values.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
