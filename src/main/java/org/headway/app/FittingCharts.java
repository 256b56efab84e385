package org.headway.app;

import java.awt.geom.Ellipse2D;
import org.headway.chart.ChartStyle;
import org.headway.fitting.FitResult;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/** The residual plot of a fit: yᵢ − ŷᵢ against x, with the zero line. */
final class FittingCharts {

    private FittingCharts() {}

    /** Residuals against the (first) explanatory column; a log x axis when x spans a decade or more. */
    static JFreeChart residuals(FitResult fit, double[] x) {
        double[] r = fit.residuals();
        String xName =
                fit.variableNames().isEmpty() ? "point" : fit.variableNames().get(0);
        XYSeries s = new XYSeries("residual y − ŷ", false, true);
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < r.length; i++) {
            double xi = x == null || x.length != r.length ? i + 1 : x[i];
            s.add(xi, r[i]);
            min = Math.min(min, xi);
            max = Math.max(max, xi);
        }
        ValueAxis xAxis;
        if (min > 0 && max / min >= 10) {
            LogAxis log = new LogAxis(xName);
            log.setBase(10);
            log.setTickUnit(new NumberTickUnit(1.0));
            log.setSmallestValue(min / 2);
            xAxis = log;
        } else {
            NumberAxis lin = new NumberAxis(xName);
            lin.setAutoRangeIncludesZero(false);
            xAxis = lin;
        }
        NumberAxis yAxis = new NumberAxis("residual " + fit.responseName() + " − fitted");
        yAxis.setAutoRangeIncludesZero(true);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(false, true);
        renderer.setSeriesShape(0, new Ellipse2D.Double(-3, -3, 6, 6));
        renderer.setSeriesPaint(0, ChartStyle.ACCENT);
        XYPlot plot = new XYPlot(new XYSeriesCollection(s), xAxis, yAxis, renderer);
        ValueMarker zero = new ValueMarker(0, ChartStyle.INK, ChartStyle.solid(1f));
        plot.addRangeMarker(zero);
        JFreeChart chart = new JFreeChart(
                "Residuals of the " + fit.formId() + " fit (" + fit.pointCount() + " points)",
                ChartStyle.FONT,
                plot,
                false);
        ChartStyle.apply(chart);
        return chart;
    }
}
