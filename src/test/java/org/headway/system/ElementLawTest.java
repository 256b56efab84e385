package org.headway.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.InputException;
import org.headway.fluid.FluidState;
import org.headway.friction.FrictionMethods;
import org.headway.pipe.Darby2001ThreeK;
import org.headway.pipe.HazenWilliamsCoefficient;
import org.headway.pipe.Hooper1981TwoK;
import org.headway.pipe.Weisbach1845FixedK;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Each element's law of head loss against an independent formula written out here from its
 * published form, never from the code under test.
 */
class ElementLawTest {

    /** A handful of floating-point operations apart: a few ulp. */
    private static final double EXACT = 1e-12;

    private static final double G = 9.80665; // standard gravity, exact by definition (3rd CGPM 1901)

    /**
     * Water near 20 °C: ρ = 998.2 kg/m³, μ = 1.0016 mPa·s, p_v = 2339 Pa (IAPWS values; from memory).
     * Only the numbers matter for these laws, not whether they are water's.
     */
    private static final FluidState WATER = RunFixtures.liquid(998.2, 1.0016e-3, 2339);

    private static FlowContext context(FluidState fluid, String method) {
        return new FlowContext(fluid, FrictionMethods.byId(method));
    }

    private static void assertRelative(double expected, double actual, double tolerance, String what) {
        assertEquals(expected, actual, Math.abs(expected) * tolerance, what);
    }

    // ---- valves by flow coefficient ----------------------------------------------------------

    /**
     * IEC 60534-1 / VDI/VDE 2173 definition of K_v: the flow of water in m³/h through the valve at a
     * pressure drop of 1 bar, so that for a liquid of density ρ, Δp = (ρ/1000)(Q/K_v)² × 1 bar with
     * Q in m³/h (the ρ/ρ₀ form with ρ₀ = 1000 kg/m³ is IEC 60534-2-1's sizing equation for
     * turbulent liquid flow).
     */
    @ParameterizedTest(name = "Kv {0}, Q {1} m³/h, ρ {2}")
    @CsvSource({
        "0.5, 0.1, 998.2",
        "25, 10, 998.2",
        "25, 40, 870",
        "400, 300, 1200",
        "400, -300, 1200",
        "1.6, 0.002, 1030"
    })
    void kvValveFollowsTheKvDefinition(double kv, double flowPerHour, double density) {
        FluidState fluid = RunFixtures.liquid(density, 1e-3, 2000);
        FlowCoefficientValve valve = FlowCoefficientValve.ofKv("v1", "control valve", kv);
        double flow = flowPerHour / 3600.0;
        double ratio = flowPerHour / kv;
        // Reverse flow loses head in the reverse direction: the law is odd in Q (common practice, no source).
        double expectedDp = Math.signum(flowPerHour) * (density / 1000.0) * ratio * ratio * 1e5;
        ElementResult r = valve.evaluate(flow, context(fluid, "auto"));
        assertRelative(expectedDp, r.pressureDrop(), EXACT, "Δp by the Kv definition");
        assertRelative(expectedDp / (density * G), valve.headLoss(flow, context(fluid, "auto")), EXACT, "head loss");
    }

    /** At Q = K_v m³/h the drop is exactly 1 bar of water at ρ₀ = 1000 kg/m³ (IEC 60534-1 definition). */
    @Test
    void kvValveDropsOneBarAtItsRatedFlow() {
        FluidState reference = RunFixtures.liquid(1000.0, 1e-3, 2000);
        double kv = 63;
        FlowCoefficientValve valve = FlowCoefficientValve.ofKv("v", "v", kv);
        double dp = valve.evaluate(kv / 3600.0, context(reference, "auto")).pressureDrop();
        assertRelative(1e5, dp, EXACT, "1 bar at Q = Kv");
    }

    /**
     * ANSI/ISA-75.01.01 definition of C_v: the flow of water in US gal/min at a pressure drop of
     * 1 psi. With 1 US gal = 3.785 411 784 L and 1 psi = 6894.757 293 168 Pa (both exact by
     * definition; NIST SP 811 (2008) Appendix B.8), K_v = C_v (0.227 124 7 m³/h per gpm)
     * √(10⁵/6894.757) = 0.864 97 C_v, so C_v/K_v ≈ 1.156 (ISA-75.01.01 quotes K_v = 0.865 C_v; the
     * rounded 1.156 is from memory).
     */
    @Test
    void cvValveFollowsTheCvDefinition() {
        double gpmInCubicMetresPerHour = 3.785411784e-3 * 60.0;
        double psi = 4.4482216152605 / (0.0254 * 0.0254); // lbf / in², both exact (NIST SP 811 B.8)
        double kvPerCv = gpmInCubicMetresPerHour * Math.sqrt(1e5 / psi);
        assertEquals(1.156, 1.0 / kvPerCv, 5e-4, "Cv/Kv ratio (ISA-75.01.01, rounded; from memory)");

        double cv = 29;
        FlowCoefficientValve byCv = FlowCoefficientValve.ofCv("cv", "globe", cv);
        assertRelative(cv * kvPerCv, byCv.flowCoefficient(), EXACT, "Kv of a Cv valve");

        // The definition itself: water (taken at ρ₀ = 1000 kg/m³ as the code's K_v reference) flowing at
        // Q = C_v US gal/min loses exactly 1 psi.
        FluidState reference = RunFixtures.liquid(1000.0, 1e-3, 2000);
        double flow = cv * 3.785411784e-3 / 60.0; // m³/s
        double dp = byCv.evaluate(flow, context(reference, "auto")).pressureDrop();
        assertRelative(psi, dp, EXACT, "1 psi at Q = Cv gpm");
    }

    /** A C_v valve and a K_v valve of equal capacity (K_v = 0.864 97 C_v, as above) lose the same head. */
    @ParameterizedTest(name = "Kv {0}")
    @CsvSource({"0.01", "2.5", "25", "630", "40000"})
    void cvAndKvValvesOfEqualCapacityLoseAlike(double kv) {
        double kvPerCv = 3.785411784e-3 * 60.0 * Math.sqrt(1e5 / (4.4482216152605 / (0.0254 * 0.0254)));
        FlowCoefficientValve byKv = FlowCoefficientValve.ofKv("a", "a", kv);
        FlowCoefficientValve byCv = FlowCoefficientValve.ofCv("b", "b", kv / kvPerCv);
        FlowContext c = context(WATER, "auto");
        for (double flow : new double[] {1e-6, 1e-3, 0.05, 2.0, -0.05}) {
            assertRelative(byKv.headLoss(flow, c), byCv.headLoss(flow, c), EXACT, "Q " + flow);
        }
    }

    // ---- rated component -----------------------------------------------------------------------

    /**
     * A component rated Δp_rated at Q_rated: Δp = Δp_rated (Q/Q_rated)ⁿ (the power law of a fixed
     * loss coefficient for n = 2; makers of coils quote n ≈ 1.85 — common practice, no source), and
     * in reverse flow the same magnitude with the opposite sign (odd function, common practice, no
     * source).
     */
    @ParameterizedTest(name = "n {0}, Q/Qr {1}")
    @CsvSource({
        "2.0, 1.0",
        "2.0, 0.3",
        "2.0, 1.7",
        "2.0, -0.8",
        "1.85, 1.0",
        "1.85, 0.05",
        "1.85, 2.5",
        "1.85, -1.3",
        "1.0, 0.4",
        "1.0, -0.4"
    })
    void ratedComponentFollowsItsPowerLaw(double exponent, double flowRatio) {
        double ratedDrop = 45_000; // Pa
        double ratedFlow = 0.0125; // m³/s
        RatedComponent coil = new RatedComponent("coil", "cooling coil", ratedDrop, ratedFlow, exponent);
        double flow = flowRatio * ratedFlow;
        double expected = Math.signum(flowRatio) * ratedDrop * Math.pow(Math.abs(flowRatio), exponent);
        FlowContext c = context(WATER, "auto");
        assertRelative(expected, coil.evaluate(flow, c).pressureDrop(), EXACT, "Δp");
        assertRelative(expected / (WATER.density() * G), coil.headLoss(flow, c), EXACT, "head loss");
        assertEquals(-coil.headLoss(flow, c), coil.headLoss(-flow, c), 0.0, "odd in Q");
    }

    @Test
    void ratedComponentRefusesExponentsOutsideItsRange() {
        InputException e = assertThrows(InputException.class, () -> new RatedComponent("hx", "hx", 1e4, 0.01, 3.0));
        assertTrue(e.getMessage().contains("hx.exponent"), e.getMessage());
    }

    // ---- Hazen–Williams pipe -------------------------------------------------------------------

    /**
     * Hazen–Williams in SI, V = 0.849 C R^0.63 S^0.54 with R = D/4 (Williams &amp; Hazen, Hydraulic
     * Tables, 1905, SI form), solved for the friction slope: h = L (V/(0.849 C (D/4)^0.63))^(1/0.54).
     * The code uses that form with the exponents 1/0.54 and 2.63/0.54 exactly, so it must agree to
     * round-off; the rounded SI form h = 10.67 L Q^1.852/(C^1.852 D^4.8704) (as printed in most water
     * supply texts, e.g. Mays, Water Resources Engineering; from memory) must agree within its own
     * rounding, about 0.3 % over ordinary flows, bores and C.
     */
    @ParameterizedTest(name = "Q {0}, D {1}, C {2}")
    @CsvSource({
        "0.001, 0.05, 150",
        "0.01, 0.1, 130",
        "0.03, 0.2, 100",
        "0.3, 0.5, 120",
        "1.0, 1.0, 60",
        "0.02, 0.15, 40"
    })
    void hazenWilliamsPipeFollowsTheSiFormula(double flow, double diameter, double c) {
        double length = 850;
        Segment pipe = Segment.builder("main")
                .length(length)
                .bore(diameter, 1e-4)
                .hazenWilliams(new HazenWilliamsCoefficient(c, "test"))
                .build();
        FlowContext ctx = context(WATER, "colebrook");
        double h = pipe.headLoss(flow, ctx);

        double area = Math.PI * diameter * diameter / 4.0;
        double velocity = flow / area;
        double exact = length * Math.pow(velocity / (0.849 * c * Math.pow(diameter / 4.0, 0.63)), 1.0 / 0.54);
        assertRelative(exact, h, EXACT, "exact SI form");

        double rounded = 10.67 * length * Math.pow(flow, 1.852) / (Math.pow(c, 1.852) * Math.pow(diameter, 4.8704));
        assertRelative(rounded, h, 5e-3, "rounded 10.67 form");
        assertEquals(-h, pipe.headLoss(-flow, ctx), 0.0, "odd in Q");
    }

    // ---- diameter change -----------------------------------------------------------------------

    /**
     * Sudden expansion, Borda–Carnot: h = (V₁ − V₂)²/(2 g) from the momentum and energy balances
     * across the step (any fluid-mechanics text, e.g. White, Fluid Mechanics, Sec. 6.9; from memory).
     */
    @ParameterizedTest(name = "{0} → {1} m at {2} m³/s")
    @CsvSource({"0.05, 0.1, 0.004", "0.1, 0.3, 0.05", "0.2, 0.21, 0.08", "0.025, 1.0, 0.001"})
    void suddenExpansionFollowsBordaCarnot(double small, double large, double flow) {
        DiameterChange step = new DiameterChange("x1", "enlarger", small, large, DiameterChange.SUDDEN);
        double v1 = flow / (Math.PI * small * small / 4.0);
        double v2 = flow / (Math.PI * large * large / 4.0);
        double expected = (v1 - v2) * (v1 - v2) / (2.0 * G);
        assertRelative(expected, step.headLoss(flow, context(WATER, "auto")), EXACT, "Borda–Carnot");
    }

    /**
     * The same step met by reverse flow is a sudden contraction: Crane TP-410 (1988) p. A-26,
     * K = 0.5 (1 − β²) referred to the small-pipe velocity, β = d_small/d_large (from memory).
     */
    @Test
    void reverseFlowThroughAnEnlargerMeetsASuddenContraction() {
        double small = 0.05;
        double large = 0.1;
        double flow = 0.004;
        DiameterChange step = new DiameterChange("x1", "enlarger", small, large, DiameterChange.SUDDEN);
        double beta = small / large;
        double v = flow / (Math.PI * small * small / 4.0);
        double expected = 0.5 * (1 - beta * beta) * v * v / (2.0 * G);
        assertRelative(-expected, step.headLoss(-flow, context(WATER, "auto")), EXACT, "reverse = contraction");
    }

    // ---- pump --------------------------------------------------------------------------------

    /**
     * Affinity laws for a geometrically similar operating point: Q ∝ n, H ∝ n² (e.g. Gülich,
     * Centrifugal Pumps, 3rd ed. 2014, Table 3.4; from memory). So at speed ratio s the head at
     * s·Q is s² times the full-speed head at Q, and the pump's head loss is minus that head.
     */
    @ParameterizedTest(name = "s {0}")
    @CsvSource({"0.5", "0.8", "1.0", "1.2", "1.5"})
    void pumpFollowsTheAffinityLaws(double s) {
        PumpCurve curve = PumpCurve.fit(
                "test pump",
                List.of(
                        new PumpCurve.Point(0.0, 42.0),
                        new PumpCurve.Point(0.01, 40.5),
                        new PumpCurve.Point(0.02, 36.0),
                        new PumpCurve.Point(0.03, 28.0),
                        new PumpCurve.Point(0.04, 17.5)),
                OptionalDouble.of(3.2));
        PumpElement full = new PumpElement("p1", curve);
        PumpElement scaled = new PumpElement("p1", curve, s);
        FlowContext c = context(WATER, "auto");
        for (double q : new double[] {0.0, 0.004, 0.015, 0.03, 0.045}) {
            double expected = s * s * full.head(q);
            assertRelative(expected, scaled.head(s * q), EXACT, "H(sQ) = s² H₀(Q) at Q " + q);
            assertRelative(-expected, scaled.headLoss(s * q, c), EXACT, "head loss = −head at Q " + q);
        }
        // NPSH required scales as n² by the same laws (a rough rule; Gülich, ibid.; from memory).
        assertRelative(s * s * 3.2, scaled.npshRequired().getAsDouble(), EXACT, "NPSHr ∝ s²");
    }

    /** A quadratic through three points is unique, so a three-point fit reproduces the maker's points. */
    @Test
    void threePointPumpCurvePassesThroughItsPoints() {
        List<PumpCurve.Point> points =
                List.of(new PumpCurve.Point(0.0, 30), new PumpCurve.Point(0.02, 26), new PumpCurve.Point(0.05, 12));
        PumpCurve curve = PumpCurve.fit("three", points, OptionalDouble.empty());
        for (PumpCurve.Point p : points) {
            assertEquals(p.head(), curve.head(p.flow()), 1e-12 * 30, "point at " + p.flow());
        }
    }

    @Test
    void pumpRefusesReverseFlow() {
        PumpCurve curve = PumpCurve.fit(
                "p",
                List.of(new PumpCurve.Point(0, 20), new PumpCurve.Point(0.01, 18), new PumpCurve.Point(0.02, 12)),
                OptionalDouble.empty());
        PumpElement pump = new PumpElement("p7", curve);
        InputException e = assertThrows(InputException.class, () -> pump.headLoss(-1e-3, context(WATER, "auto")));
        assertTrue(e.getMessage().startsWith("p7"), e.getMessage());
    }

    // ---- check and isolation valves ------------------------------------------------------------

    /**
     * A check valve open in forward flow loses K V²/(2 g) for its given K (common practice, no
     * source), and refuses reverse flow: it closes, so no law for reverse flow exists.
     */
    @Test
    void checkValveLosesItsKForwardAndRefusesReverseFlow() {
        double diameter = 0.08;
        double k = 2.0;
        CheckValve check = new CheckValve("nrv1", "swing check", LocalLoss.ofLossCoefficient(k, diameter));
        FlowContext c = context(WATER, "auto");
        double flow = 0.01;
        double v = flow / (Math.PI * diameter * diameter / 4.0);
        assertRelative(k * v * v / (2.0 * G), check.headLoss(flow, c), EXACT, "open loss");
        assertTrue(check.blocksReverseFlow());
        InputException e = assertThrows(InputException.class, () -> check.headLoss(-flow, c));
        assertTrue(e.getMessage().startsWith("nrv1"), e.getMessage());
        assertTrue(e.getMessage().contains("reverse"), e.getMessage());
        assertThrows(InputException.class, () -> check.headLossSlope(-flow, c));
        assertThrows(InputException.class, () -> check.evaluate(-flow, c));
    }

    @Test
    void closedIsolationValveReportsClosedAndCarriesNoFlow() {
        FlowCoefficientValve kv = FlowCoefficientValve.ofKv("ref", "ref", 250);
        IsolationValve shut = new IsolationValve("iv2", "gate valve", false, LocalLoss.ofFlowCoefficient(kv));
        IsolationValve open = new IsolationValve("iv3", "gate valve", true, LocalLoss.ofFlowCoefficient(kv));
        FlowContext c = context(WATER, "auto");
        assertTrue(shut.isClosed());
        assertFalse(open.isClosed());
        InputException e = assertThrows(InputException.class, () -> shut.headLoss(0.01, c));
        assertTrue(e.getMessage().startsWith("iv2"), e.getMessage());
        assertEquals(0.0, shut.headLoss(0.0, c), 0.0, "no flow, no loss");
        // Open, it loses what its K_v says (IEC 60534-1 definition, as for the K_v valve above).
        double perHour = 90;
        double expectedDp = (WATER.density() / 1000.0) * (perHour / 250) * (perHour / 250) * 1e5;
        assertRelative(expectedDp / (WATER.density() * G), open.headLoss(perHour / 3600.0, c), EXACT, "open loss");
    }

    // ---- Darcy–Weisbach pipe -------------------------------------------------------------------

    /**
     * Independent Colebrook–White solve, 1/√f = −2 log₁₀(ε/(3.7 D) + 2.51/(Re √f)) (Colebrook,
     * J. Inst. Civ. Eng. 11, 1939): plain fixed-point iteration on x = 1/√f, which contracts by
     * about (2/ln 10)/x &lt; 0.3 per step in turbulent flow, until a step changes x by at most
     * 1e-15 relative.
     */
    static double colebrook(double reynolds, double relativeRoughness) {
        double x = 8.0;
        for (int i = 0; i < 500; i++) {
            double next = -2.0 * Math.log10(relativeRoughness / 3.7 + 2.51 * x / reynolds);
            boolean done = Math.abs(next - x) <= 1e-15 * Math.abs(next);
            x = next;
            if (done) {
                break;
            }
        }
        return 1.0 / (x * x);
    }

    /** Flow that gives a Reynolds number in a bore: Re = ρ V D/μ with V = Q/A. */
    static double flowForReynolds(double reynolds, double diameter, FluidState fluid) {
        return reynolds * fluid.dynamicViscosity() * Math.PI * diameter / (4.0 * fluid.density());
    }

    /** Darcy–Weisbach h = f (L/D) V²/(2 g) with f by Colebrook–White solved independently above. */
    @ParameterizedTest(name = "Re {0}, ε/D {1}")
    @CsvSource({
        "4000, 0",
        "1e4, 0",
        "1e5, 1e-4",
        "1e6, 1e-3",
        "1e7, 1e-5",
        "1e8, 0.01",
        "3e5, 0.05",
    })
    void darcyWeisbachPipeWithColebrookWhite(double reynolds, double relativeRoughness) {
        double diameter = 0.15;
        double length = 320;
        Segment pipe = RunFixtures.pipe("p", length, diameter, relativeRoughness * diameter);
        double flow = flowForReynolds(reynolds, diameter, WATER);
        double v = flow / (Math.PI * diameter * diameter / 4.0);
        double f = colebrook(reynolds, relativeRoughness);
        double expected = f * length / diameter * v * v / (2.0 * G);
        assertRelative(expected, pipe.headLoss(flow, context(WATER, "colebrook")), EXACT, "Colebrook");
        // The auto method uses Colebrook–White from Re 4000 (its stated regime rule; common practice, no source).
        assertRelative(expected, pipe.headLoss(flow, context(WATER, "auto")), EXACT, "auto, turbulent");
        assertEquals(
                -pipe.headLoss(flow, context(WATER, "colebrook")), pipe.headLoss(-flow, context(WATER, "colebrook")));
    }

    /**
     * Laminar flow, f = 64/Re (Hagen–Poiseuille in Darcy form; Hagen 1839, Poiseuille 1840), the same
     * as Δp = 128 μ L Q/(π D⁴): the auto method and the laminar method both follow it.
     */
    @ParameterizedTest(name = "Re {0}")
    @CsvSource({"1", "50", "500", "2000"})
    void darcyWeisbachPipeInLaminarFlow(double reynolds) {
        FluidState oil = RunFixtures.liquid(870, 0.05, 100);
        double diameter = 0.05;
        double length = 25;
        Segment pipe = RunFixtures.pipe("oil line", length, diameter, 4.5e-5);
        double flow = flowForReynolds(reynolds, diameter, oil);
        double v = flow / (Math.PI * diameter * diameter / 4.0);
        double expected = 64.0 / reynolds * length / diameter * v * v / (2.0 * G);
        double poiseuille = 128 * oil.dynamicViscosity() * length * flow / (Math.PI * Math.pow(diameter, 4));
        assertRelative(poiseuille / (oil.density() * G), expected, EXACT, "the two laminar forms agree");
        assertRelative(expected, pipe.headLoss(flow, context(oil, "auto")), EXACT, "auto");
        assertRelative(expected, pipe.headLoss(flow, context(oil, "laminar")), EXACT, "laminar");
    }

    /**
     * Fittings add K V²/(2 g) each at the pipe's own Reynolds number and bore: a fixed K; Hooper's
     * 2-K, K = K₁/Re + K∞ (1 + 1/D[in]) (Hooper, Chem. Eng. Aug. 24 1981); Darby's 3-K,
     * K = K₁/Re + Kᵢ (1 + K_d/D[in]^0.3) (Darby, Chem. Eng. Fluid Mechanics 2001; from memory);
     * with the pipe's own friction by Darcy–Weisbach and Colebrook–White as above. The coefficients
     * are invented for the test.
     */
    @ParameterizedTest(name = "Re {0}")
    @CsvSource({"800", "6000", "2e5"})
    void fittingsAddTheirLossCoefficients(double reynolds) {
        double diameter = 0.1023; // about a 4-in bore
        double length = 60;
        double extraK = 0.5;
        Hooper1981TwoK elbow = new Hooper1981TwoK("elbow", "90° elbow", 800, 0.25, "invented");
        Darby2001ThreeK tee = new Darby2001ThreeK("tee", "tee through branch", 500, 0.07, 4.0, "invented");
        Weisbach1845FixedK entrance = new Weisbach1845FixedK("entrance", "square entrance", 0.5, "invented");
        Segment pipe = Segment.builder("branch")
                .length(length)
                .bore(diameter, 4.6e-5)
                .fitting(new FittingUse(elbow, 3))
                .fitting(new FittingUse(tee, 1))
                .fitting(new FittingUse(entrance, 1))
                .extraLossCoefficient(extraK)
                .build();
        double flow = flowForReynolds(reynolds, diameter, WATER);
        double v = flow / (Math.PI * diameter * diameter / 4.0);
        double inches = diameter / 0.0254; // international inch, exact (1959)
        double k = extraK
                + 3 * (800 / reynolds + 0.25 * (1 + 1 / inches))
                + (500 / reynolds + 0.07 * (1 + 4.0 / Math.pow(inches, 0.3)))
                + 0.5;
        // Friction by the auto method's branches: 64/Re laminar, Colebrook–White turbulent.
        double f = reynolds < 2300 ? 64.0 / reynolds : colebrook(reynolds, 4.6e-5 / diameter);
        double expected = (f * length / diameter + k) * v * v / (2.0 * G);
        assertRelative(expected, pipe.headLoss(flow, context(WATER, "auto")), EXACT, "pipe with fittings");
    }
}
