package org.headway.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.headway.friction.FlowRegimes;
import org.headway.friction.FrictionCorrelation;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.LogarithmicAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYErrorRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYIntervalSeriesCollection;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The friction chart: Darcy friction factor against Reynolds number on log–log axes, one curve per
 * chosen relative roughness, the laminar line, the transitional range shaded, and on top the
 * pipe-run's operating points, rig data with uncertainty bars and fitted correlations (solid over
 * the range they were fitted on, dashed beyond it).
 */
public final class FrictionChart {

    /** Points per decade of Re on each curve; enough for a smooth line at print resolution. */
    private static final int POINTS_PER_DECADE = 40;

    /** Rig points beyond this many are thinned evenly for drawing (all are kept for statistics). */
    public static final int MAX_DRAWN_RIG_POINTS = 5_000;

    /**
     * A labelled point (a segment's operating point).
     *
     * @param label segment name
     * @param reynolds Reynolds number (ratio)
     * @param frictionFactor friction factor (ratio)
     */
    public record MarkedPoint(String label, double reynolds, double frictionFactor) {}

    /**
     * A measured point with standard uncertainties.
     *
     * @param reynolds Reynolds number (ratio)
     * @param frictionFactor friction factor (ratio)
     * @param reynoldsUncertainty expanded uncertainty of Re (ratio, absolute), 0 if none
     * @param frictionUncertainty expanded uncertainty of f (ratio, absolute), 0 if none
     */
    public record RigPoint(
            double reynolds, double frictionFactor, double reynoldsUncertainty, double frictionUncertainty) {}

    /**
     * A fitted correlation f(Re) to draw.
     *
     * @param name legend text
     * @param function f as a function of Re
     * @param fittedMinReynolds lowest Re of the data it was fitted on
     * @param fittedMaxReynolds highest Re of the data it was fitted on
     */
    public record FittedCurve(
            String name, DoubleUnaryOperator function, double fittedMinReynolds, double fittedMaxReynolds) {}

    /**
     * What to draw.
     *
     * @param title chart title (may be empty)
     * @param method correlation for the roughness curves
     * @param relativeRoughness ε/D values, one curve each (0 draws the smooth-pipe curve)
     * @param minReynolds left end of the Re axis
     * @param maxReynolds right end of the Re axis
     * @param operatingPoints segments' operating points
     * @param rigPoints rig data
     * @param fitted fitted correlations
     */
    public record Spec(
            String title,
            FrictionCorrelation method,
            List<Double> relativeRoughness,
            double minReynolds,
            double maxReynolds,
            List<MarkedPoint> operatingPoints,
            List<RigPoint> rigPoints,
            List<FittedCurve> fitted) {

        public Spec {
            relativeRoughness = List.copyOf(relativeRoughness);
            operatingPoints = List.copyOf(operatingPoints);
            rigPoints = List.copyOf(rigPoints);
            fitted = List.copyOf(fitted);
        }

        /** Default roughness set, spanning smooth to very rough pipe. */
        public static final List<Double> USUAL_ROUGHNESS =
                List.of(0.0, 1e-5, 1e-4, 5e-4, 1e-3, 2e-3, 5e-3, 1e-2, 2e-2, 5e-2);
    }

    private FrictionChart() {}

    /** Builds the chart. */
    public static JFreeChart build(Spec spec) {
        double[] fRange = frictionRange(spec);
        XYPlot plot = new XYPlot();
        plot.setDomainAxis(reynoldsAxis(spec));
        plot.setRangeAxis(frictionAxis(fRange[0], fRange[1]));
        plot.setInsets(new RectangleInsets(4, 4, 4, 24));

        Drawn[] roughness = roughnessCurves(spec, plot);
        Drawn[] fitted = fittedCurves(spec);
        // Operating points of the run's segments.
        XYLineAndShapeRenderer opRenderer = new XYLineAndShapeRenderer(false, true);
        opRenderer.setSeriesShape(0, new Rectangle2D.Double(-4.5, -4.5, 9, 9));
        opRenderer.setSeriesPaint(0, new Color(0x8A2F1B));
        // Draw order: datasets with higher index are drawn first under the REVERSE order; keep points on top.
        Drawn[] layers = {
            new Drawn(operatingPoints(spec, plot), opRenderer),
            new Drawn(rigData(spec), rigRenderer()),
            fitted[0],
            fitted[1],
            laminarLine(spec, fRange[1]),
            roughness[0],
            roughness[1]
        };
        for (int i = 0; i < layers.length; i++) {
            plot.setDataset(i, layers[i].data());
            plot.setRenderer(i, layers[i].renderer());
        }
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.REVERSE);

        IntervalMarker band = new IntervalMarker(FlowRegimes.LAMINAR_LIMIT, FlowRegimes.TURBULENT_LIMIT);
        band.setPaint(ChartStyle.SHADE);
        band.setAlpha(0.6f);
        band.setLabel("transitional");
        band.setLabelFont(ChartStyle.FONT.deriveFont(9f));
        band.setLabelAnchor(RectangleAnchor.TOP);
        band.setLabelTextAnchor(TextAnchor.TOP_CENTER);
        plot.addDomainMarker(band, Layer.BACKGROUND);

        String title = spec.title() == null ? "" : spec.title();
        JFreeChart chart = new JFreeChart(title.isEmpty() ? null : title, ChartStyle.FONT, plot, true);
        ChartStyle.apply(chart);
        return chart;
    }

    /** One dataset of the plot with the renderer that draws it. */
    private record Drawn(org.jfree.data.xy.XYDataset data, org.jfree.chart.renderer.xy.XYItemRenderer renderer) {}

    private static LogAxis reynoldsAxis(Spec spec) {
        LogAxis reAxis = new LogAxis("Reynolds number Re = ρVD/μ");
        reAxis.setBase(10);
        reAxis.setTickUnit(new NumberTickUnit(1.0));
        reAxis.setMinorTickMarksVisible(true);
        reAxis.setRange(spec.minReynolds(), spec.maxReynolds());
        reAxis.setSmallestValue(1e-300);
        return reAxis;
    }

    /** The usual Moody range, widened so that no measured point (with its bar) falls off the chart. */
    private static double[] frictionRange(Spec spec) {
        double fLow = 0.005;
        double fHigh = 0.11;
        for (RigPoint p : spec.rigPoints()) {
            if (p.frictionFactor() > 0 && Double.isFinite(p.frictionFactor())) {
                fHigh = Math.max(fHigh, (p.frictionFactor() + p.frictionUncertainty()) * 1.1);
                double low = p.frictionFactor() - p.frictionUncertainty();
                fLow = Math.min(fLow, (low > 0 ? low : p.frictionFactor()) / 1.1);
            }
        }
        return new double[] {fLow, fHigh};
    }

    private static LogarithmicAxis frictionAxis(double fLow, double fHigh) {
        LogarithmicAxis fAxis = new LogarithmicAxis("Darcy friction factor f");
        fAxis.setRange(fLow, fHigh);
        fAxis.setStrictValuesFlag(false);
        fAxis.setAutoRangeNextLogFlag(false);
        return fAxis;
    }

    /**
     * The roughness curves, labelled at their right-hand end: solid where the flow is turbulent and,
     * below the turbulent limit, where the correlation is extrapolated, dashed.
     *
     * @return the solid layer and the dashed layer
     */
    private static Drawn[] roughnessCurves(Spec spec, XYPlot plot) {
        XYSeriesCollection curves = new XYSeriesCollection();
        XYSeriesCollection curvesLow = new XYSeriesCollection();
        for (double rr : spec.relativeRoughness()) {
            XYSeries s = new XYSeries("ε/D = " + label(rr), false, true);
            XYSeries low = new XYSeries("ε/D = " + label(rr) + " (transitional)", false, true);
            double start = Math.max(spec.minReynolds(), FlowRegimes.LAMINAR_LIMIT);
            for (double re : logSpace(start, spec.maxReynolds())) {
                double f = spec.method().evaluate(re, rr).frictionFactor();
                if (re >= FlowRegimes.TURBULENT_LIMIT) {
                    s.add(re, f);
                } else {
                    low.add(re, f);
                }
            }
            double edge =
                    spec.method().evaluate(FlowRegimes.TURBULENT_LIMIT, rr).frictionFactor();
            low.add(FlowRegimes.TURBULENT_LIMIT, edge);
            curves.addSeries(s);
            curvesLow.addSeries(low);
            double endF = spec.method().evaluate(spec.maxReynolds(), rr).frictionFactor();
            XYTextAnnotation a = new XYTextAnnotation(label(rr), spec.maxReynolds(), endF);
            a.setFont(ChartStyle.FONT.deriveFont(9f));
            a.setTextAnchor(TextAnchor.BOTTOM_RIGHT);
            a.setPaint(ChartStyle.INK);
            plot.addAnnotation(a);
        }
        XYLineAndShapeRenderer curveRenderer = new XYLineAndShapeRenderer(true, false);
        XYLineAndShapeRenderer lowRenderer = new XYLineAndShapeRenderer(true, false);
        // Drawn as one path: segment by segment each short piece restarts the dash and the line looks solid.
        lowRenderer.setDrawSeriesLineAsPath(true);
        for (int i = 0; i < curves.getSeriesCount(); i++) {
            curveRenderer.setSeriesPaint(i, ChartStyle.family(i));
            curveRenderer.setSeriesStroke(i, ChartStyle.solid(1.2f));
            curveRenderer.setSeriesVisibleInLegend(i, false);
            lowRenderer.setSeriesPaint(i, ChartStyle.family(i));
            lowRenderer.setSeriesStroke(i, ChartStyle.dashed(0.8f));
            lowRenderer.setSeriesVisibleInLegend(i, false);
        }
        return new Drawn[] {new Drawn(curves, curveRenderer), new Drawn(curvesLow, lowRenderer)};
    }

    /** Laminar line f = 64/Re up to the turbulent limit (dashed beyond the laminar limit). */
    private static Drawn laminarLine(Spec spec, double fHigh) {
        XYSeriesCollection laminar = new XYSeriesCollection();
        XYSeries lam = new XYSeries("laminar f = 64/Re", false, true);
        double lamStart = Math.max(spec.minReynolds(), 64 / fHigh);
        for (double re : logSpace(lamStart, FlowRegimes.TURBULENT_LIMIT)) {
            lam.add(re, 64 / re);
        }
        laminar.addSeries(lam);
        XYLineAndShapeRenderer lamRenderer = new XYLineAndShapeRenderer(true, false);
        lamRenderer.setSeriesPaint(0, ChartStyle.PLUM);
        lamRenderer.setSeriesStroke(0, ChartStyle.solid(1.4f));
        return new Drawn(laminar, lamRenderer);
    }

    /**
     * Fitted correlations: solid over the Reynolds numbers they were fitted on, dashed beyond.
     *
     * @return the fitted-range layer and the extrapolated layer
     */
    private static Drawn[] fittedCurves(Spec spec) {
        XYSeriesCollection fittedIn = new XYSeriesCollection();
        XYSeriesCollection fittedOut = new XYSeriesCollection();
        for (FittedCurve fc : spec.fitted()) {
            XYSeries in = new XYSeries(fc.name(), false, true);
            XYSeries below = new XYSeries(fc.name() + " (extrapolated)", false, true);
            XYSeries above = new XYSeries(fc.name() + " (extrapolated) ", false, true);
            for (double re : logSpace(spec.minReynolds(), spec.maxReynolds())) {
                double f = fc.function().applyAsDouble(re);
                if (!(f > 0) || !Double.isFinite(f)) {
                    continue;
                }
                if (re < fc.fittedMinReynolds()) {
                    below.add(re, f);
                } else if (re > fc.fittedMaxReynolds()) {
                    above.add(re, f);
                } else {
                    in.add(re, f);
                }
            }
            fittedIn.addSeries(in);
            fittedOut.addSeries(below);
            fittedOut.addSeries(above);
        }
        XYLineAndShapeRenderer fitRenderer = new XYLineAndShapeRenderer(true, false);
        XYLineAndShapeRenderer fitOutRenderer = new XYLineAndShapeRenderer(true, false);
        fitOutRenderer.setDrawSeriesLineAsPath(true);
        for (int i = 0; i < fittedIn.getSeriesCount(); i++) {
            fitRenderer.setSeriesPaint(i, ChartStyle.TEAL);
            fitRenderer.setSeriesStroke(i, ChartStyle.solid(2.2f));
        }
        for (int i = 0; i < fittedOut.getSeriesCount(); i++) {
            fitOutRenderer.setSeriesPaint(i, ChartStyle.TEAL);
            fitOutRenderer.setSeriesStroke(i, ChartStyle.dashed(1.6f));
            fitOutRenderer.setSeriesVisibleInLegend(i, false);
        }
        return new Drawn[] {new Drawn(fittedIn, fitRenderer), new Drawn(fittedOut, fitOutRenderer)};
    }

    /** Rig data with uncertainty bars. */
    private static XYErrorRenderer rigRenderer() {
        XYErrorRenderer rigRenderer = new XYErrorRenderer();
        rigRenderer.setDefaultLinesVisible(false);
        rigRenderer.setSeriesShapesVisible(0, true);
        rigRenderer.setSeriesShape(0, new Ellipse2D.Double(-3, -3, 6, 6));
        rigRenderer.setSeriesPaint(0, ChartStyle.ACCENT);
        rigRenderer.setErrorPaint(new Color(0xC4622D).brighter());
        rigRenderer.setErrorStroke(new BasicStroke(0.8f));
        rigRenderer.setCapLength(3);
        return rigRenderer;
    }

    /** Rig data with uncertainty bars, thinned evenly when there are very many. */
    private static XYIntervalSeriesCollection rigData(Spec spec) {
        XYIntervalSeriesCollection rig = new XYIntervalSeriesCollection();
        if (!spec.rigPoints().isEmpty()) {
            boolean bars =
                    spec.rigPoints().stream().anyMatch(p -> p.reynoldsUncertainty() > 0 || p.frictionUncertainty() > 0);
            XYIntervalSeries rs = new XYIntervalSeries(bars ? "rig data (±U)" : "rig data", false, true);
            int n = spec.rigPoints().size();
            int stride = Math.max(1, (n + MAX_DRAWN_RIG_POINTS - 1) / MAX_DRAWN_RIG_POINTS);
            for (int i = 0; i < n; i += stride) {
                RigPoint p = spec.rigPoints().get(i);
                rs.add(
                        p.reynolds(),
                        p.reynolds() - p.reynoldsUncertainty(),
                        p.reynolds() + p.reynoldsUncertainty(),
                        p.frictionFactor(),
                        p.frictionFactor() - p.frictionUncertainty(),
                        p.frictionFactor() + p.frictionUncertainty());
            }
            rig.addSeries(rs);
        }
        return rig;
    }

    /** Operating points of the run's segments, their labels added to the plot. */
    private static XYSeriesCollection operatingPoints(Spec spec, XYPlot plot) {
        XYSeriesCollection ops = new XYSeriesCollection();
        if (!spec.operatingPoints().isEmpty()) {
            XYSeries os = new XYSeries("pipe-run segments", false, true);
            // Segments at the same point (same bore and flow) share one marker and one label.
            java.util.Map<String, List<String>> labels = new java.util.LinkedHashMap<>();
            java.util.Map<String, double[]> where = new java.util.HashMap<>();
            for (MarkedPoint p : spec.operatingPoints()) {
                if (p.reynolds() > 0 && p.frictionFactor() > 0) {
                    String key = String.format(java.util.Locale.ROOT, "%.4g|%.4g", p.reynolds(), p.frictionFactor());
                    labels.computeIfAbsent(key, k -> new ArrayList<>()).add(p.label());
                    where.putIfAbsent(key, new double[] {p.reynolds(), p.frictionFactor()});
                }
            }
            // Each label sits right of its marker, or left of it when another marker lies just to the right
            // (distances in decades of Re and f, about a label's width and height at print scale).
            for (var e : labels.entrySet()) {
                double[] at = where.get(e.getKey());
                os.add(at[0], at[1]);
                boolean rightTaken = false;
                for (double[] other : where.values()) {
                    double dx = Math.log10(other[0]) - Math.log10(at[0]);
                    double dy = Math.abs(Math.log10(other[1]) - Math.log10(at[1]));
                    if (other != at && dx > 0 && dx < 0.25 && dy < 0.04) {
                        rightTaken = true;
                    }
                }
                double x = at[0] * (rightTaken ? 1 / 1.22 : 1.22);
                XYTextAnnotation a = new XYTextAnnotation(String.join(", ", e.getValue()), x, at[1]);
                a.setFont(ChartStyle.FONT.deriveFont(Font.BOLD, 9f));
                a.setTextAnchor(rightTaken ? TextAnchor.CENTER_RIGHT : TextAnchor.CENTER_LEFT);
                a.setPaint(new Color(0x8A2F1B));
                plot.addAnnotation(a);
            }
            ops.addSeries(os);
        }
        return ops;
    }

    /** Evenly spaced values in log space from a to b inclusive. */
    static List<Double> logSpace(double a, double b) {
        List<Double> values = new ArrayList<>();
        if (!(a > 0) || !(b > a)) {
            return values;
        }
        int n = Math.max(2, (int) Math.ceil(Math.log10(b / a) * POINTS_PER_DECADE) + 1);
        double la = Math.log10(a);
        double lb = Math.log10(b);
        for (int i = 0; i < n; i++) {
            values.add(i == n - 1 ? b : Math.pow(10, la + (lb - la) * i / (n - 1)));
        }
        return values;
    }

    private static String label(double rr) {
        if (rr == 0) {
            return "smooth";
        }
        String s = String.format(java.util.Locale.ROOT, "%.0e", rr);
        return s.replace("e-0", "e-");
    }
}
