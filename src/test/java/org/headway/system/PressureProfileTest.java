package org.headway.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.Caution;
import org.headway.caution.Severity;
import org.headway.fluid.FluidState;
import org.headway.friction.FrictionMethods;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Pressures along a run against an energy balance written out here: the energy equation between
 * the source surface and a point of the pipe, z₁ + p₁/(ρg) + V₁²/(2g) = z₂ + p₂/(ρg) + V₂²/(2g) +
 * h_L (any fluid-mechanics text; common practice), with h_L by Darcy–Weisbach and Colebrook–White
 * solved independently ({@link ElementLawTest#colebrook}), a still source surface, and friction
 * spread evenly along a uniform pipe (the Darcy–Weisbach friction slope is constant there). The
 * invented data are a gravity main over a ridge and a small pumped lift.
 */
class PressureProfileTest {

    private static final double G = 9.80665; // standard gravity, exact by definition (3rd CGPM 1901)

    /** Water near 20 °C (ρ 998.2 kg/m³, μ 1.0016 mPa·s, p_v 2339 Pa; IAPWS values, from memory). */
    private static final FluidState WATER = RunFixtures.liquid(998.2, 1.0016e-3, 2339);

    /** A run built element by element, at a site, with no pressure limits. */
    private static PipeRun run(List<Element> elements, EndCondition source, SiteAtmosphere site, double flow) {
        return new PipeRun(
                "test",
                WATER,
                FrictionMethods.byId("colebrook"),
                elements,
                source,
                EndCondition.OPEN_AT_PIPE_END,
                site,
                flow,
                0.0,
                DesignLimits.USUAL,
                PressureLimits.NONE);
    }

    /** Darcy–Weisbach friction head f (L/D) V²/(2g) with the independent Colebrook–White f. */
    private static double frictionHead(double flow, double length, double diameter, double roughness) {
        double area = Math.PI * diameter * diameter / 4.0;
        double v = flow / area;
        double reynolds = WATER.density() * v * diameter / WATER.dynamicViscosity();
        return ElementLawTest.colebrook(reynolds, roughness / diameter) * length / diameter * v * v / (2 * G);
    }

    private static double velocityHead(double flow, double diameter) {
        double v = flow / (Math.PI * diameter * diameter / 4.0);
        return v * v / (2 * G);
    }

    // ---- gravity main over a high point -----------------------------------------------------

    private static final double SOURCE_LEVEL = 5.0; // reservoir surface above the main's inlet (m)
    private static final double LENGTH = 2400;
    private static final double BORE = 0.25;
    private static final double ROUGHNESS = 1e-4;
    private static final double HIGH_POINT_DISTANCE = 900;
    private static final double FLOW = 0.06;

    private static Segment ridgeMain(double highPointRise) {
        return Segment.builder("ridge main")
                .id("m1")
                .length(LENGTH)
                .bore(BORE, ROUGHNESS)
                .highPoint(HIGH_POINT_DISTANCE, highPointRise)
                .elevationChange(-45)
                .build();
    }

    /** Gauge pressure head at the high point by the energy equation from the reservoir surface. */
    private static double highPointGaugeHead(double highPointRise) {
        double share = HIGH_POINT_DISTANCE / LENGTH;
        return SOURCE_LEVEL
                - velocityHead(FLOW, BORE)
                - share * frictionHead(FLOW, LENGTH, BORE, ROUGHNESS)
                - highPointRise;
    }

    /**
     * The main rises 20 m above its inlet, 15 m above the reservoir level, on the way to a delivery
     * 45 m below: the hydraulic grade passes some 19 m under the crest, more than the ~10.1 m of
     * (p_atm − p_v)/(ρg) an open water column can hang by, so the column separates there (common
     * practice, no source): a SERIOUS caution naming the pipe's id. The main either discharges at
     * the delivery itself or through a valve after it; the crest's pressure is the same either way.
     */
    @ParameterizedTest(name = "valve after the main: {0}")
    @CsvSource({"false", "true"})
    void highPointAboveTheGradeLineByMoreThanAnAtmosphereIsSerious(boolean valveAfter) {
        List<Element> elements = valveAfter
                ? List.of(ridgeMain(20), FlowCoefficientValve.ofKv("v9", "control valve", 400))
                : List.of(ridgeMain(20));
        PipeRun gravity = run(elements, new EndCondition(SOURCE_LEVEL, 0), SiteAtmosphere.SEA_LEVEL, FLOW);
        RunResult r = HeadLossCalculator.solve(gravity, FLOW);

        double expectedGauge = WATER.density() * G * highPointGaugeHead(20);
        double computed = r.element("m1").orElseThrow().highPointPressure().getAsDouble();
        assertEquals(expectedGauge, computed, Math.abs(expectedGauge) * 1e-9, "gauge pressure at the crest");
        assertTrue(expectedGauge + SiteAtmosphere.SEA_LEVEL_PRESSURE < 2339, "the data put the crest below p_v");

        List<Caution> serious = r.cautions().stream()
                .filter(c -> c.severity() == Severity.SERIOUS && c.code().equals("below-vapour-pressure"))
                .toList();
        assertEquals(1, serious.size(), r.cautions().toString());
        assertTrue(serious.get(0).message().startsWith("m1: "), serious.get(0).message());
        assertTrue(
                serious.get(0).message().contains("high point"), serious.get(0).message());
        assertTrue(r.element("m1").orElseThrow().cautions().contains(serious.get(0)), "on the pipe's own profile");
    }

    /**
     * Across crest heights, the column-separation caution appears exactly when the independent
     * absolute pressure at the crest, p_atm + ρ g h_gauge, is below the vapour pressure (threshold
     * near a 10.9 m rise for these data; the rises stay a metre or more from it).
     */
    @ParameterizedTest(name = "crest {0} m above the inlet")
    @CsvSource({"2", "6", "9.5", "12", "15", "30"})
    void separationCautionFollowsTheAbsolutePressureAtTheCrest(double rise) {
        PipeRun gravity =
                run(List.of(ridgeMain(rise)), new EndCondition(SOURCE_LEVEL, 0), SiteAtmosphere.SEA_LEVEL, FLOW);
        RunResult r = HeadLossCalculator.solve(gravity, FLOW);
        double absolute = SiteAtmosphere.SEA_LEVEL_PRESSURE + WATER.density() * G * highPointGaugeHead(rise);
        boolean expected = absolute < WATER.vapourPressure().getAsDouble();
        boolean flagged = r.cautions().stream()
                .anyMatch(c -> c.severity() == Severity.SERIOUS && c.code().equals("below-vapour-pressure"));
        assertEquals(expected, flagged, "absolute pressure at the crest " + absolute + " Pa; " + r.cautions());
    }

    // ---- pumped lift at altitude --------------------------------------------------------------

    private static final double TANK_LEVEL = 3.0; // suction tank surface above the suction inlet (m)
    private static final double SUCTION_RISE = 1.0; // pump above the suction inlet (m)
    private static final double ENTRANCE_K = 0.5; // square-edged entrance (common practice, no source)

    private static PipeRun pumpedLift(SiteAtmosphere site, double flow) {
        Segment suction = Segment.builder("suction")
                .id("s1")
                .length(8)
                .bore(0.1, 4.5e-5)
                .extraLossCoefficient(ENTRANCE_K)
                .elevationChange(SUCTION_RISE)
                .build();
        PumpCurve curve = PumpCurve.fit(
                "lift pump",
                List.of(new PumpCurve.Point(0, 45), new PumpCurve.Point(0.01, 43), new PumpCurve.Point(0.02, 37)),
                OptionalDouble.of(2.5));
        Segment discharge = Segment.builder("rising main")
                .id("d1")
                .length(150)
                .bore(0.08, 4.5e-5)
                .elevationChange(25)
                .build();
        return run(
                List.of(suction, new PumpElement("p1", curve), discharge), new EndCondition(TANK_LEVEL, 0), site, flow);
    }

    /**
     * NPSH available = total head at the pump inlet above the vapour head: (p_atm − p_v)/(ρg) plus
     * the suction surface above the pump, less the suction losses (the definition of ISO 17769-1;
     * from memory), with the losses by Darcy–Weisbach plus the entrance K.
     */
    private static double npshAvailable(double atmosphere, double flow) {
        double losses = frictionHead(flow, 8, 0.1, 4.5e-5) + ENTRANCE_K * velocityHead(flow, 0.1);
        return (atmosphere - WATER.vapourPressure().getAsDouble()) / (WATER.density() * G)
                + TANK_LEVEL
                - SUCTION_RISE
                - losses;
    }

    /**
     * Standard atmosphere in the troposphere: p = p₀ (1 − L h/T₀)^5.255 88 with p₀ = 101 325 Pa,
     * T₀ = 288.15 K, L = 0.0065 K/m (ISO 2533:1975 / U.S. Standard Atmosphere 1976; from memory).
     */
    private static double standardAtmosphere(double altitude) {
        return 101_325.0 * Math.pow(1.0 - 0.0065 * altitude / 288.15, 5.25588);
    }

    @ParameterizedTest(name = "Q {0} m³/s")
    @CsvSource({"0.004", "0.012", "0.018"})
    void npshAvailableAtAltitudeFallsByTheLossOfBarometricHead(double flow) {
        RunResult sea = HeadLossCalculator.solve(pumpedLift(SiteAtmosphere.SEA_LEVEL, flow), flow);
        RunResult high = HeadLossCalculator.solve(pumpedLift(SiteAtmosphere.atAltitude(1500), flow), flow);
        double npshSea = sea.npshAvailable().getAsDouble();
        double npshHigh = high.npshAvailable().getAsDouble();

        double p0 = standardAtmosphere(0);
        double p1500 = standardAtmosphere(1500);
        assertEquals(npshAvailable(p0, flow), npshSea, npshSea * 1e-9, "NPSHa at sea level");
        assertEquals(npshAvailable(p1500, flow), npshHigh, npshHigh * 1e-9, "NPSHa at 1500 m");
        double drop = (p0 - p1500) / (WATER.density() * G);
        assertEquals(drop, npshSea - npshHigh, drop * 1e-9, "NPSHa falls by the barometric head lost");
    }

    /**
     * ISO 2533 / U.S. Standard Atmosphere 1976 at 1500 m: about 84 556 Pa, by p = 101 325
     * (1 − 2.255 77 × 10⁻⁵ h)^5.255 88 (from memory), to 0.1 %; and the site's pressure follows that
     * formula at other altitudes of the troposphere, to the 10⁻⁶ that the rounded 2.255 77 × 10⁻⁵
     * (= L/T₀ = 2.255 769 6 × 10⁻⁵) allows.
     */
    @Test
    void standardAtmosphereAtFifteenHundredMetres() {
        assertEquals(84_556, SiteAtmosphere.atAltitude(1500).pressure(), 84_556 * 1e-3);
        for (double h : new double[] {-400, 0, 250, 1500, 3000, 8848, 11_000}) {
            double expected = 101_325.0 * Math.pow(1.0 - 2.25577e-5 * h, 5.25588);
            assertEquals(expected, SiteAtmosphere.atAltitude(h).pressure(), expected * 1e-6, "at " + h + " m");
        }
    }
}
