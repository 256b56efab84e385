package org.headway.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.fluid.FluidState;
import org.headway.friction.FlowRegime;
import org.junit.jupiter.api.Test;

class HeadLossCalculatorTest {

    /** Double-precision arithmetic of a handful of operations: a few ulp. */
    private static final double EXACT = 1e-13;

    private static final FluidState OIL = RunFixtures.liquid(870, 0.05, 100);
    private static final FluidState WATER = RunFixtures.liquid(998.2, 1.0016e-3, 2339);

    @Test
    void laminarSegmentMatchesHagenPoiseuilleExactly() {
        // Hagen–Poiseuille: Δp = 128 μ L Q / (π D⁴), exact for fully developed laminar flow
        // (any fluid-mechanics text, e.g. White, Fluid Mechanics, Sec. 6.4; formula is common practice).
        double length = 25;
        double diameter = 0.05;
        double flow = 2e-4; // Re ≈ 88, well laminar
        PipeRun run = RunFixtures.run(OIL, "auto", List.of(RunFixtures.pipe("oil line", length, diameter, 0)));
        RunResult r = HeadLossCalculator.solve(run, flow);
        double expectedDp = 128 * OIL.dynamicViscosity() * length * flow / (Math.PI * Math.pow(diameter, 4));
        assertEquals(FlowRegime.LAMINAR, r.segments().get(0).regime());
        assertEquals(expectedDp, r.totals().pressureDrop(), expectedDp * EXACT);
    }

    @Test
    void frictionLossIsProportionalToLength() {
        PipeRun short1 = RunFixtures.run(WATER, "colebrook", List.of(RunFixtures.pipe("a", 40, 0.1, 4.5e-5)));
        PipeRun long1 = RunFixtures.run(WATER, "colebrook", List.of(RunFixtures.pipe("a", 120, 0.1, 4.5e-5)));
        double q = 0.012;
        assertEquals(
                3 * HeadLossCalculator.headLossOnly(short1, q), HeadLossCalculator.headLossOnly(long1, q), 3e-13 * 3);
    }

    @Test
    void splittingASegmentChangesNothing() {
        Segment whole = Segment.builder("whole")
                .length(300)
                .bore(0.08, 1.5e-4)
                .extraLossCoefficient(2.5)
                .elevationChange(12)
                .build();
        Segment first = Segment.builder("first")
                .length(120)
                .bore(0.08, 1.5e-4)
                .extraLossCoefficient(1.0)
                .elevationChange(5)
                .build();
        Segment second = Segment.builder("second")
                .length(180)
                .bore(0.08, 1.5e-4)
                .extraLossCoefficient(1.5)
                .elevationChange(7)
                .build();
        double q = 0.009;
        RunResult a = HeadLossCalculator.solve(RunFixtures.run(WATER, "auto", List.of(whole)), q);
        RunResult b = HeadLossCalculator.solve(RunFixtures.run(WATER, "auto", List.of(first, second)), q);
        assertEquals(
                a.totals().totalHead(),
                b.totals().totalHead(),
                Math.abs(a.totals().totalHead()) * EXACT);
        assertEquals(a.totals().staticHead(), b.totals().staticHead(), 1e-12);
        assertEquals(
                a.totals().frictionHeadLoss(),
                b.totals().frictionHeadLoss(),
                a.totals().frictionHeadLoss() * EXACT);
    }

    @Test
    void zeroFlowGivesStaticHeadOnly() {
        Segment rise = Segment.builder("riser")
                .length(50)
                .bore(0.1, 4.5e-5)
                .elevationChange(18)
                .build();
        PipeRun run = RunFixtures.run(WATER, "auto", List.of(rise));
        RunResult r = HeadLossCalculator.solve(run, 0);
        assertEquals(18.0, r.totals().totalHead(), 0);
        assertEquals(0.0, r.totals().frictionHeadLoss(), 0);
        assertEquals(0.0, r.segments().get(0).frictionFactor(), 0);
        assertTrue(Double.isFinite(r.segments().get(0).reynolds()));
    }

    @Test
    void minorLossOfFixedKScalesWithFlowSquared() {
        // A fixed K loss is K V²/2g, exactly quadratic in flow (common practice, no source).
        Segment valve = Segment.builder("valve")
                .length(0)
                .bore(0.1, 0)
                .extraLossCoefficient(5)
                .build();
        PipeRun run = RunFixtures.run(WATER, "auto", List.of(valve));
        double h1 = HeadLossCalculator.headLossOnly(run, 0.01);
        double h2 = HeadLossCalculator.headLossOnly(run, 0.03);
        assertEquals(9 * h1, h2, 9 * h1 * EXACT);
        double v = 0.01 / (Math.PI * 0.01 / 4);
        assertEquals(5 * v * v / (2 * Gravity.STANDARD), h1, h1 * EXACT);
    }

    @Test
    void fullyRoughLossApproachesFlowSquared() {
        // In the fully rough regime f no longer depends on Re (von Kármán rough-pipe law), so h_f ∝ Q².
        // At ε/D = 0.05 and Re of order 1e8 the Re term in Colebrook changes f by < 1e-4 relative.
        Segment rough = RunFixtures.pipe("rough", 100, 0.5, 0.025);
        FluidState thin = RunFixtures.liquid(1000, 1e-6, 2000);
        PipeRun run = RunFixtures.run(thin, "colebrook", List.of(rough));
        double q1 = 100;
        double q2 = 200;
        double ratio = HeadLossCalculator.headLossOnly(run, q2) / HeadLossCalculator.headLossOnly(run, q1);
        assertEquals(4.0, ratio, 4.0 * 1e-4);
    }

    @Test
    void gradeLinesCloseOnTheDeliveryHeadWithAPump() {
        Segment a = Segment.builder("suction")
                .length(10)
                .bore(0.1, 4.5e-5)
                .elevationChange(-1)
                .build();
        Segment b = Segment.builder("discharge")
                .length(200)
                .bore(0.08, 4.5e-5)
                .elevationChange(20)
                .build();
        PumpCurve pump = PumpCurve.fit(
                "p",
                List.of(new PumpCurve.Point(0, 40), new PumpCurve.Point(0.01, 36), new PumpCurve.Point(0.02, 25)),
                java.util.OptionalDouble.of(2.0));
        PipeRun run = PipeRun.of(
                "t",
                WATER,
                RunFixtures.method("auto"),
                List.of(a, b),
                new EndCondition(2, 0),
                new EndCondition(1, 0),
                Optional.of(pump),
                1,
                SiteAtmosphere.SEA_LEVEL_PRESSURE,
                0.01,
                0.05,
                DesignLimits.USUAL);
        RunResult r = HeadLossCalculator.solve(run, 0.01);
        SegmentResult last = r.segments().get(1);
        // Energy grade at the outlet = outlet elevation + delivery head (velocity at the delivery neglected).
        assertEquals(19 + 1, last.outletEnergyGrade(), 1e-9);
        assertTrue(r.npshAvailable().isPresent());
        // NPSHa = p_atm/ρg + source level − suction losses − pump elevation − p_v/ρg.
        double g = Gravity.STANDARD;
        double expected = 2
                - r.segments().get(0).headLoss()
                - (-1)
                + (SiteAtmosphere.SEA_LEVEL_PRESSURE - 2339) / (WATER.density() * g);
        assertEquals(expected, r.npshAvailable().getAsDouble(), 1e-9);
        assertTrue(r.cautions().contains(Caution.GENERAL_REVIEW));
    }

    @Test
    void smallNpshMarginRaisesACavitationCaution() {
        Segment a = Segment.builder("long suction")
                .length(400)
                .bore(0.05, 4.5e-5)
                .elevationChange(4)
                .build();
        PumpCurve pump = PumpCurve.fit(
                "p",
                List.of(new PumpCurve.Point(0, 30), new PumpCurve.Point(0.004, 27), new PumpCurve.Point(0.008, 20)),
                java.util.OptionalDouble.of(3.0));
        PipeRun run = PipeRun.of(
                "t",
                RunFixtures.liquid(983, 4.7e-4, 31_000),
                RunFixtures.method("auto"),
                List.of(a),
                new EndCondition(0, 0),
                new EndCondition(0, 0),
                Optional.of(pump),
                1,
                SiteAtmosphere.SEA_LEVEL_PRESSURE,
                0.006,
                0,
                DesignLimits.USUAL);
        RunResult r = HeadLossCalculator.solve(run, 0.006);
        assertTrue(r.cautions().stream().anyMatch(c -> c.code().equals("cavitation-risk")), r.cautions()::toString);
    }

    @Test
    void velocityOutsideTheUsualRangeIsCautioned() {
        PipeRun run = RunFixtures.run(WATER, "auto", List.of(RunFixtures.pipe("narrow", 10, 0.025, 1.5e-6)));
        RunResult r = HeadLossCalculator.solve(run, 0.003); // V ≈ 6.1 m/s
        assertTrue(r.cautions().stream().anyMatch(c -> c.code().equals("velocity-high")));
        RunResult slow = HeadLossCalculator.solve(run, 0.00005);
        assertTrue(slow.cautions().stream().anyMatch(c -> c.code().equals("velocity-low")));
    }

    @Test
    void transitionalFlowCarriesTheFrictionCaution() {
        PipeRun run = RunFixtures.run(OIL, "auto", List.of(RunFixtures.pipe("mid", 10, 0.05, 0)));
        // Re = ρ V D / μ = 3000 → V = 3000 μ / (ρ D)
        double v = 3000 * OIL.dynamicViscosity() / (OIL.density() * 0.05);
        RunResult r = HeadLossCalculator.solve(run, v * Math.PI * 0.05 * 0.05 / 4);
        assertEquals(FlowRegime.TRANSITIONAL, r.segments().get(0).regime());
        // The transitional caution itself, not just any caution (the case may also raise others).
        assertTrue(
                r.segments().get(0).cautions().stream().anyMatch(c -> c.code().equals("transitional-flow")),
                r.segments().get(0).cautions().toString());
    }

    @Test
    void negativeOrNonFiniteFlowIsRejected() {
        PipeRun run = RunFixtures.run(WATER, "auto", List.of(RunFixtures.pipe("a", 10, 0.05, 0)));
        InputException e = assertThrows(InputException.class, () -> HeadLossCalculator.solve(run, -1));
        assertTrue(e.getMessage().startsWith("flow:"), e.getMessage());
        assertThrows(InputException.class, () -> HeadLossCalculator.headLossOnly(run, Double.NaN));
    }

    @Test
    void segmentRejectsRoughnessNotSmallerThanBore() {
        InputException e = assertThrows(
                InputException.class,
                () -> Segment.builder("bad").length(1).bore(0.01, 0.02).build());
        assertTrue(e.getMessage().contains("not smaller than the inner diameter"), e.getMessage());
    }
}
