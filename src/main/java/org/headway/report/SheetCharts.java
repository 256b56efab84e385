package org.headway.report;

import java.util.ArrayList;
import java.util.List;
import org.headway.chart.FrictionChart;
import org.headway.chart.GradeLineChart;
import org.headway.chart.SystemChart;
import org.headway.friction.FrictionMethods;
import org.headway.system.HeadLossCalculator;
import org.headway.system.PipeRun;
import org.headway.system.PumpCurve;
import org.headway.system.Segment;
import org.headway.system.SegmentResult;
import org.headway.system.SystemCurve;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;
import org.jfree.chart.JFreeChart;

/** The sheet's three charts, built from the same data as its tables. Shared with the desktop app. */
public final class SheetCharts {

    private SheetCharts() {}

    /** System curve with band, pump curve and operating point, in the chosen units. */
    public static JFreeChart system(HeadLossSheet sheet, UnitSystem u) {
        PipeRun run = sheet.run();
        QuantityKind qk = QuantityKind.VOLUMETRIC_FLOW;
        QuantityKind hk = QuantityKind.HEAD;
        int n = sheet.curve().size();
        double[] flows = new double[n];
        double[] heads = new double[n];
        double[] low = new double[0];
        double[] high = new double[0];
        for (int i = 0; i < n; i++) {
            SystemCurve.Point p = sheet.curve().get(i);
            flows[i] = Quantities.fromSi(p.flow(), qk, u);
            heads[i] = Quantities.fromSi(p.totalHead(), hk, u);
        }
        if (sheet.band() != null) {
            low = new double[n];
            high = new double[n];
            PipeRun lowRun = withRoughness(run, false);
            PipeRun highRun = withRoughness(run, true);
            double uq = run.flowUncertainty();
            for (int i = 0; i < n; i++) {
                double q = sheet.curve().get(i).flow();
                low[i] = Quantities.fromSi(HeadLossCalculator.totalHead(lowRun, q * (1 - uq)), hk, u);
                high[i] = Quantities.fromSi(HeadLossCalculator.totalHead(highRun, q * (1 + uq)), hk, u);
            }
        }
        double[] pf = new double[0];
        double[] ph = new double[0];
        java.util.function.DoubleUnaryOperator pumpCurve = null;
        if (run.pump().isPresent()) {
            PumpCurve pump = run.pump().get();
            pf = pump.points().stream()
                    .mapToDouble(p -> Quantities.fromSi(p.flow(), qk, u))
                    .toArray();
            ph = pump.points().stream()
                    .mapToDouble(p -> Quantities.fromSi(p.head(), hk, u))
                    .toArray();
            double perDisplayFlow = Quantities.fromSi(1.0, qk, u);
            pumpCurve = qd -> Quantities.fromSi(pump.head(qd / perDisplayFlow), hk, u);
        }
        double opQ = Double.NaN;
        double opH = Double.NaN;
        if (sheet.operatingPoint() != null && sheet.operatingPoint().found()) {
            opQ = Quantities.fromSi(sheet.operatingPoint().flow(), qk, u);
            opH = Quantities.fromSi(sheet.operatingPoint().head(), hk, u);
        }
        return SystemChart.build(new SystemChart.Spec(
                "System curve" + (run.pump().isPresent() ? " and pump curve" : ""),
                "flow [" + Quantities.unitSymbol(qk, u) + "]",
                "head [" + Quantities.unitSymbol(hk, u) + "]",
                flows,
                heads,
                low,
                high,
                pf,
                ph,
                pumpCurve,
                opQ,
                opH,
                Quantities.fromSi(run.designFlow(), qk, u)));
    }

    /** The friction chart with each segment's operating point. */
    public static JFreeChart friction(HeadLossSheet sheet) {
        return friction(sheet, List.of(), List.of());
    }

    /**
     * The friction chart with each segment's operating point, measured points with their
     * uncertainty bars, and fitted correlations (solid over their fitted range, dashed beyond).
     */
    public static JFreeChart friction(
            HeadLossSheet sheet, List<FrictionChart.RigPoint> rigPoints, List<FrictionChart.FittedCurve> fitted) {
        List<FrictionChart.MarkedPoint> points = new ArrayList<>();
        double maxRe = 1e8;
        double minRe = 1e3;
        for (int i = 0; i < sheet.result().segments().size(); i++) {
            SegmentResult s = sheet.result().segments().get(i);
            if (s.reynolds() > 0) {
                // Numbered like the results table; full names would pile up where segments share a point.
                points.add(new FrictionChart.MarkedPoint(String.valueOf(i + 1), s.reynolds(), s.frictionFactor()));
                maxRe = Math.max(maxRe, s.reynolds() * 3);
                minRe = Math.min(minRe, s.reynolds() / 3);
            }
        }
        for (FrictionChart.RigPoint p : rigPoints) {
            if (p.reynolds() > 0) {
                maxRe = Math.max(maxRe, p.reynolds() * 2);
                minRe = Math.min(minRe, p.reynolds() / 2);
            }
        }
        List<Double> roughness = new ArrayList<>(FrictionChart.Spec.USUAL_ROUGHNESS);
        return FrictionChart.build(new FrictionChart.Spec(
                "Friction factor against Reynolds number (Colebrook–White curves; squares: segments by number)",
                FrictionMethods.byId("colebrook"),
                roughness,
                Math.max(minRe, 500),
                maxRe,
                points,
                rigPoints,
                fitted));
    }

    /** Energy and hydraulic grade lines along the run. */
    public static JFreeChart grades(HeadLossSheet sheet, UnitSystem u) {
        List<SegmentResult> rs = sheet.result().segments();
        int n = rs.size();
        double[] distance = new double[n + 1];
        double[] elevation = new double[n + 1];
        double[] ein = new double[n];
        double[] eout = new double[n];
        double[] hin = new double[n];
        double[] hout = new double[n];
        QuantityKind lk = QuantityKind.LENGTH;
        QuantityKind hk = QuantityKind.HEAD;
        elevation[0] = Quantities.fromSi(rs.isEmpty() ? 0 : rs.get(0).inletElevation(), hk, u);
        for (int i = 0; i < n; i++) {
            SegmentResult r = rs.get(i);
            Segment s = (Segment) sheet.run().element(r.id()).orElseThrow();
            distance[i + 1] = distance[i] + Quantities.fromSi(s.length(), lk, u);
            elevation[i + 1] = Quantities.fromSi(r.outletElevation(), hk, u);
            ein[i] = Quantities.fromSi(r.inletEnergyGrade(), hk, u);
            eout[i] = Quantities.fromSi(r.outletEnergyGrade(), hk, u);
            hin[i] = Quantities.fromSi(r.inletHydraulicGrade(), hk, u);
            hout[i] = Quantities.fromSi(r.outletHydraulicGrade(), hk, u);
        }
        return GradeLineChart.build(new GradeLineChart.Spec(
                "Grade lines along the run (datum: run inlet)",
                "distance along the run [" + Quantities.unitSymbol(lk, u) + "]",
                "elevation / head [" + Quantities.unitSymbol(hk, u) + "]",
                distance,
                elevation,
                ein,
                eout,
                hin,
                hout));
    }

    private static PipeRun withRoughness(PipeRun run, boolean high) {
        List<Segment> segments = new ArrayList<>();
        for (Segment s : run.segments()) {
            segments.add(s.withRoughness(high ? s.roughnessHigh() : s.roughnessLow()));
        }
        return run.withSegments(segments);
    }
}
