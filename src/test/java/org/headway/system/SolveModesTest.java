package org.headway.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.headway.caution.InputException;
import org.headway.fluid.FluidState;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class SolveModesTest {

    private static final FluidState WATER = RunFixtures.liquid(998.2, 1.0016e-3, 2339);
    private static final FluidState OIL = RunFixtures.liquid(870, 0.05, 100);

    private static PipeRun gravityRun(FluidState fluid, double sourceLevel, String method) {
        Segment a = Segment.builder("a")
                .length(150)
                .bore(0.1, 4.5e-5)
                .extraLossCoefficient(0.5)
                .build();
        Segment b = Segment.builder("b")
                .length(300)
                .bore(0.08, 4.5e-5)
                .elevationChange(-6)
                .extraLossCoefficient(1.0)
                .build();
        return PipeRun.of(
                "gravity",
                fluid,
                RunFixtures.method(method),
                List.of(a, b),
                new EndCondition(sourceLevel, 0),
                EndCondition.OPEN_AT_PIPE_END,
                Optional.empty(),
                0,
                SiteAtmosphere.SEA_LEVEL_PRESSURE,
                0.01,
                0.05,
                DesignLimits.USUAL);
    }

    /** Round trip: flow for the head that the head-loss mode gives returns the flow (issue target 1e-9). */
    @ParameterizedTest
    @CsvSource({"0.0001, auto", "0.002, auto", "0.01, auto", "0.03, colebrook", "0.01, swamee-jain", "0.02, haaland"})
    void flowForHeadInvertsHeadLoss(double flow, String method) {
        PipeRun run = gravityRun(WATER, 0, method);
        double needed = HeadLossCalculator.totalHead(run, flow);
        FlowSolver.Solution s = FlowSolver.solve(run, needed);
        assertEquals(FlowSolver.Outcome.FLOWING, s.outcome());
        assertEquals(flow, s.flow(), flow * 1e-9);
    }

    @Test
    void flowForHeadWorksInLaminarFlow() {
        PipeRun run = gravityRun(OIL, 0, "auto");
        double flow = 2e-4; // Re ≈ 28 in the 80 mm pipe
        FlowSolver.Solution s = FlowSolver.solve(run, HeadLossCalculator.totalHead(run, flow));
        assertEquals(flow, s.flow(), flow * 1e-9);
        assertEquals(
                org.headway.friction.FlowRegime.LAMINAR,
                s.result().segments().get(0).regime());
    }

    @Test
    void gravityRunFindsItsOwnFlow() {
        PipeRun run = gravityRun(WATER, 4, "auto"); // 4 m + 6 m fall drive the flow
        FlowSolver.Solution s = FlowSolver.solve(run, 0);
        assertEquals(FlowSolver.Outcome.FLOWING, s.outcome());
        assertEquals(0.0, s.result().totals().totalHead(), 1e-9);
    }

    @Test
    void reverseAndNoFlowAreReported() {
        PipeRun uphill = gravityRun(WATER, 0, "auto")
                .withElements(List.of(Segment.builder("up")
                        .length(10)
                        .bore(0.1, 0)
                        .elevationChange(5)
                        .build()));
        FlowSolver.Solution s = FlowSolver.solve(uphill, 2);
        assertEquals(FlowSolver.Outcome.REVERSE, s.outcome());
        assertTrue(s.message().contains("back to source"), s.message());
        assertEquals(FlowSolver.Outcome.NO_FLOW, FlowSolver.solve(uphill, 5).outcome());
    }

    @Test
    void sizeSelectionPicksWhatABruteForceScanPicks() {
        List<SizeSelector.CandidateSize> sizes = new ArrayList<>();
        for (int i = 0; i < 30; i++) {
            double d = 0.02 * Math.pow(1.12, i);
            sizes.add(new SizeSelector.CandidateSize("D" + i, d));
        }
        PipeRun run = gravityRun(WATER, 0, "auto").withDesignFlow(0.015);
        DesignLimits limits = DesignLimits.USUAL.withSizing(2.4, 3.0, 30);
        SizeSelector.Selection sel = SizeSelector.select(run, sizes, limits);
        // Brute force: every candidate, every limit, smallest passing bore.
        SizeSelector.CandidateSize best = null;
        for (SizeSelector.CandidateSize c : sizes) {
            PipeRun trial = SizeSelector.apply(run, c);
            RunResult r = HeadLossCalculator.solve(trial, 0.015);
            boolean ok = r.totals().totalHead() <= 30;
            for (int i = 0; i < r.segments().size(); i++) {
                ok &= r.segments().get(i).velocity() <= 2.4;
                ok &= r.segments().get(i).majorHeadLoss()
                                / trial.segments().get(i).length()
                                * 100
                        <= 3.0;
            }
            if (ok && (best == null || c.innerDiameter() < best.innerDiameter())) {
                best = c;
            }
        }
        assertEquals(Optional.ofNullable(best), sel.chosen());
        assertEquals(sizes.size(), sel.candidates().size());
        assertTrue(sel.candidates().get(0).reasons().size() > 0);
    }

    @Test
    void sizeSelectionSaysWhenNothingFits() {
        PipeRun run = gravityRun(WATER, 0, "auto").withDesignFlow(0.5);
        SizeSelector.Selection sel =
                SizeSelector.select(run, List.of(new SizeSelector.CandidateSize("tiny", 0.01)), DesignLimits.USUAL);
        assertTrue(sel.chosen().isEmpty());
        assertFalse(sel.candidates().get(0).accepted());
    }

    @Test
    void pumpCurveFitIsExactForAQuadratic() {
        // H = 50 − 2e4 Q² sampled at five flows: least squares must return it to rounding.
        List<PumpCurve.Point> pts = new ArrayList<>();
        for (int i = 0; i <= 4; i++) {
            double q = 0.01 * i;
            pts.add(new PumpCurve.Point(q, 50 - 2e4 * q * q));
        }
        PumpCurve p = PumpCurve.fit("quad", pts, OptionalDouble.empty());
        assertEquals(50, p.coefficients()[0], 1e-10);
        assertEquals(0, p.coefficients()[1], 1e-8);
        assertEquals(-2e4, p.coefficients()[2], 1e-6);
        assertEquals(1.0, p.rSquared(), 1e-14);
    }

    @Test
    void operatingPointLiesOnBothCurves() {
        PumpCurve pump = PumpCurve.fit(
                "p",
                List.of(
                        new PumpCurve.Point(0, 45),
                        new PumpCurve.Point(0.01, 42),
                        new PumpCurve.Point(0.02, 33),
                        new PumpCurve.Point(0.03, 18)),
                OptionalDouble.empty());
        PipeRun base = gravityRun(WATER, 0, "auto");
        PipeRun run = PipeRun.of(
                "p",
                WATER,
                base.friction(),
                base.segments(),
                base.source(),
                new EndCondition(20, 0),
                Optional.of(pump),
                0,
                SiteAtmosphere.SEA_LEVEL_PRESSURE,
                0.01,
                0,
                DesignLimits.USUAL);
        OperatingPoint op = OperatingPoint.find(run);
        assertTrue(op.found(), op.message());
        assertEquals(op.head(), HeadLossCalculator.totalHead(run, op.flow()), 1e-9);
        assertEquals(op.head(), pump.head(op.flow()), 1e-12);
    }

    @Test
    void operatingPointReportsNoIntersection() {
        PumpCurve weak = PumpCurve.fit(
                "weak",
                List.of(new PumpCurve.Point(0, 10), new PumpCurve.Point(0.01, 9), new PumpCurve.Point(0.02, 6)),
                OptionalDouble.empty());
        PipeRun base = gravityRun(WATER, 0, "auto");
        PipeRun run = PipeRun.of(
                "p",
                WATER,
                base.friction(),
                base.segments(),
                base.source(),
                new EndCondition(30, 0),
                Optional.of(weak),
                0,
                SiteAtmosphere.SEA_LEVEL_PRESSURE,
                0.01,
                0,
                DesignLimits.USUAL);
        OperatingPoint op = OperatingPoint.find(run);
        assertFalse(op.found());
        assertTrue(op.message().startsWith("no intersection"), op.message());
    }

    @Test
    void systemCurveStartsAtStaticHeadAndRises() {
        PipeRun run = gravityRun(WATER, 0, "auto");
        List<SystemCurve.Point> c = SystemCurve.compute(run, 0, 0.03, 31);
        assertEquals(31, c.size());
        assertEquals(run.staticHead(), c.get(0).totalHead(), 0);
        for (int i = 1; i < c.size(); i++) {
            assertTrue(c.get(i).totalHead() > c.get(i - 1).totalHead());
        }
        assertThrows(InputException.class, () -> SystemCurve.compute(run, 0.03, 0.01, 5));
    }

    @Test
    void uncertaintyBandBracketsTheNominal() {
        Segment aged = Segment.builder("aged")
                .length(500)
                .bore(0.1, 1.5e-4)
                .roughnessRange(4.5e-5, 1e-3)
                .build();
        PipeRun run = gravityRun(WATER, 0, "auto").withElements(List.of(aged)).withDesignFlow(0.01);
        UncertaintyBand band = UncertaintyBand.evaluate(run);
        assertTrue(band.headLoss().low() < band.headLoss().nominal());
        assertTrue(band.headLoss().high() > band.headLoss().nominal());
    }

    @Test
    void bandTakesTurbulentFrictionInTransitionalFlow() {
        // Re ≈ 3000 in the 80 mm pipe: the auto blend is below Colebrook there, so the high end must use Colebrook.
        FluidState oil = RunFixtures.liquid(870, 0.02, 100);
        Segment s = Segment.builder("mid").length(100).bore(0.08, 0).build();
        double flow = 3000 * 0.02 / (870 * 0.08) * Math.PI * 0.08 * 0.08 / 4;
        PipeRun run = gravityRun(oil, 0, "auto").withElements(List.of(s)).withDesignFlow(flow);
        UncertaintyBand band = UncertaintyBand.evaluate(run);
        double u = run.flowUncertainty(); // the high end is also at Q(1 + u)
        double colebrook = org.headway.friction.FrictionMethods.byId("colebrook")
                .evaluate(3000 * (1 + u), 0)
                .frictionFactor();
        double v = flow * (1 + u) / s.area();
        double expectedHigh = colebrook * 100 / 0.08 * v * v / (2 * Gravity.STANDARD);
        assertEquals(expectedHigh, band.headLoss().high(), expectedHigh * 1e-12);
        assertTrue(band.headLoss().high() > band.headLoss().nominal());
    }
}
