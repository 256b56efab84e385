package org.headway.system;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.stream.Stream;
import org.headway.caution.InputException;
import org.headway.fluid.FluidState;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionMethods;
import org.headway.pipe.Darby2001ThreeK;
import org.headway.pipe.HazenWilliamsCoefficient;
import org.headway.pipe.Hooper1981TwoK;
import org.headway.pipe.Weisbach1845FixedK;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every element's {@link Element#headLossSlope} — documented as the exact dh/dQ of its law — against
 * a numerical derivative of {@link Element#headLoss}: the centred difference (h(Q+δ) − h(Q−δ))/(2δ)
 * with δ = 10⁻⁶|Q| (truncation about δ² h‴/6, some 10⁻¹² relative; round-off about
 * 10⁻¹⁶ |h|/δ, some 10⁻¹⁰ relative), and at Q = 0 the one-sided limit by Richardson extrapolation of
 * forward differences. Agreement is asked to 10⁻⁷ relative.
 *
 * <p>Regime switches: the auto friction method joins the laminar law, a straight line in Re and
 * Colebrook–White at Re 2300 and 4000, continuous but with a jump of slope there (its documented
 * rule; the limits are common practice, no source). No case below straddles those two Reynolds
 * numbers, since no derivative exists at the joins. The diameter change switches between its
 * expansion and contraction law at Q = 0, where both slopes are zero, so the slope is continuous
 * there and Q = 0 is tested.
 */
class ElementSlopeTest {

    private static final double TOLERANCE = 1e-7;

    /** Water near 20 °C (ρ 998.2 kg/m³, μ 1.0016 mPa·s, p_v 2339 Pa; IAPWS values, from memory). */
    private static final FluidState WATER = RunFixtures.liquid(998.2, 1.0016e-3, 2339);

    /** A viscous oil, so that laminar flow comes at ordinary bores and flows (invented properties). */
    private static final FluidState OIL = RunFixtures.liquid(870, 0.05, 100);

    private static FlowContext context(FluidState fluid, String method) {
        return new FlowContext(fluid, FrictionMethods.byId(method));
    }

    private static double flowForReynolds(double reynolds, double diameter, FluidState fluid) {
        return ElementLawTest.flowForReynolds(reynolds, diameter, fluid);
    }

    private static Segment plainPipe(double diameter, double relativeRoughness) {
        return RunFixtures.pipe("pipe", 140, diameter, relativeRoughness * diameter);
    }

    private static Segment pipeWithFittings(double length, double diameter) {
        return Segment.builder("fitted")
                .length(length)
                .bore(diameter, 4.6e-5)
                .fitting(new FittingUse(new Hooper1981TwoK("elbow", "90° elbow", 800, 0.25, "invented"), 4))
                .fitting(new FittingUse(new Darby2001ThreeK("tee", "tee", 500, 0.07, 4.0, "invented"), 2))
                .fitting(new FittingUse(new Weisbach1845FixedK("exit", "exit", 1.0, "invented"), 1))
                .extraLossCoefficient(0.8)
                .build();
    }

    private static Segment hazenWilliamsPipe(double diameter) {
        return Segment.builder("hw")
                .length(900)
                .bore(diameter, 1e-4)
                .hazenWilliams(new HazenWilliamsCoefficient(120, "invented"))
                .fitting(new FittingUse(new Hooper1981TwoK("elbow", "90° elbow", 800, 0.25, "invented"), 2))
                .build();
    }

    private static PumpCurve curve(int degree) {
        return PumpCurve.fit(
                "test pump",
                List.of(
                        new PumpCurve.Point(0.0, 42.0),
                        new PumpCurve.Point(0.01, 40.5),
                        new PumpCurve.Point(0.02, 36.0),
                        new PumpCurve.Point(0.03, 28.0),
                        new PumpCurve.Point(0.04, 17.5)),
                degree,
                OptionalDouble.of(3));
    }

    private static Arguments at(String label, Element element, FlowContext context, double flow) {
        return Arguments.of(label + String.format(Locale.ROOT, " at Q %.4g", flow), element, context, flow);
    }

    /** Cases away from Q = 0, in both directions where the element allows reverse flow. */
    static Stream<Arguments> flowingCases() {
        List<Arguments> cases = new ArrayList<>();
        double d = 0.1;
        // Turbulent flow, every Darcy method: Re 1e4 to 1e7, smooth to rough.
        for (String method : List.of(
                "auto", "colebrook", "swamee-jain", "haaland", "serghides", "churchill", "goudar-sonnad", "blasius")) {
            for (double re : new double[] {1e4, 1e5, 1e6, 1e7}) {
                for (double roughness : new double[] {0, 1e-4, 1e-2}) {
                    double q = flowForReynolds(re, d, WATER);
                    String label = method + " Re " + re + " ε/D " + roughness;
                    cases.add(at(label, plainPipe(d, roughness), context(WATER, method), q));
                    cases.add(at(label, plainPipe(d, roughness), context(WATER, method), -q));
                }
            }
        }
        // Transitional flow, Re 3000: inside the auto method's straight-line blend (2300–4000), where
        // its law is smooth; Churchill's single equation; Colebrook–White and Swamee–Jain pushed
        // below their validity (computed, flagged by a caution, still smooth).
        for (String method : List.of("auto", "churchill", "colebrook", "swamee-jain")) {
            for (double roughness : new double[] {0, 1e-3, 0.05}) {
                double q = flowForReynolds(3000, d, WATER);
                cases.add(at(method + " Re 3000 ε/D " + roughness, plainPipe(d, roughness), context(WATER, method), q));
                cases.add(
                        at(method + " Re 3000 ε/D " + roughness, plainPipe(d, roughness), context(WATER, method), -q));
            }
        }
        // Laminar flow, Re 500: the methods with a laminar branch.
        for (String method : List.of("auto", "laminar", "churchill")) {
            double q = flowForReynolds(500, d, OIL);
            cases.add(at(method + " Re 500", plainPipe(d, 1e-3), context(OIL, method), q));
            cases.add(at(method + " Re 500", plainPipe(d, 1e-3), context(OIL, method), -q));
        }
        // 2-K and 3-K fittings (K₁/Re part) with fixed K and an extra K, laminar to turbulent.
        for (double re : new double[] {500, 3000, 1e4, 1e6}) {
            FluidState fluid = re < 2300 ? OIL : WATER;
            double q = flowForReynolds(re, d, fluid);
            cases.add(at("fittings auto Re " + re, pipeWithFittings(60, d), context(fluid, "auto"), q));
            cases.add(at("fittings auto Re " + re, pipeWithFittings(60, d), context(fluid, "auto"), -q));
            cases.add(at("fittings only Re " + re, pipeWithFittings(0, d), context(fluid, "auto"), q));
        }
        for (String method : List.of("colebrook", "swamee-jain", "churchill")) {
            double q = flowForReynolds(2e5, d, WATER);
            cases.add(at("fittings " + method + " Re 2e5", pipeWithFittings(60, d), context(WATER, method), q));
        }
        // Hazen–Williams (no Reynolds dependence in its friction, 2-K elbows still depend on Re).
        for (double re : new double[] {1e4, 1e5, 1e6, 1e7}) {
            double q = flowForReynolds(re, 0.2, WATER);
            cases.add(at("hazen-williams Re " + re, hazenWilliamsPipe(0.2), context(WATER, "colebrook"), q));
            cases.add(at("hazen-williams Re " + re, hazenWilliamsPipe(0.2), context(WATER, "colebrook"), -q));
        }
        FlowContext water = context(WATER, "auto");
        for (double q : new double[] {1e-5, 3e-3, 0.2, -0.04}) {
            cases.add(at("valve Kv 16", FlowCoefficientValve.ofKv("v", "v", 16), water, q));
            cases.add(at("valve Cv 120", FlowCoefficientValve.ofCv("v", "v", 120), water, q));
            for (double n : new double[] {1.0, 1.3, 1.85, 2.0, 2.5}) {
                cases.add(at("component n " + n, new RatedComponent("c", "c", 3e4, 0.01, n), water, q));
            }
            cases.add(at("sudden expansion", new DiameterChange("r", "r", 0.05, 0.1, DiameterChange.SUDDEN), water, q));
            cases.add(
                    at("gradual expansion 30°", new DiameterChange("r", "r", 0.05, 0.1, Math.toRadians(30)), water, q));
            cases.add(at(
                    "gradual contraction 60°", new DiameterChange("r", "r", 0.15, 0.1, Math.toRadians(60)), water, q));
            cases.add(at(
                    "isolation open",
                    new IsolationValve("i", "i", true, LocalLoss.ofLossCoefficient(0.15, 0.1)),
                    water,
                    q));
            if (q > 0) {
                cases.add(
                        at("check valve", new CheckValve("cv", "cv", LocalLoss.ofLossCoefficient(2.0, 0.1)), water, q));
            }
        }
        for (int degree = 1; degree <= 3; degree++) {
            for (double s : new double[] {0.6, 1.0, 1.4}) {
                for (double q : new double[] {0.002, 0.017, 0.035}) {
                    cases.add(
                            at("pump degree " + degree + " s " + s, new PumpElement("p", curve(degree), s), water, q));
                }
            }
        }
        return cases.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("flowingCases")
    void slopeMatchesCentredDifference(String label, Element element, FlowContext context, double flow) {
        double delta = 1e-6 * Math.abs(flow);
        double numerical =
                (element.headLoss(flow + delta, context) - element.headLoss(flow - delta, context)) / (2 * delta);
        double exact = element.headLossSlope(flow, context);
        // Scale: the slope itself, or the secant |h/Q| where the slope is small (a pump near its
        // shut-off head), since the difference's round-off grows with |h|/δ.
        double scale = Math.max(Math.abs(exact), Math.abs(element.headLoss(flow, context) / flow));
        assertTrue(
                Math.abs(exact - numerical) <= TOLERANCE * scale,
                () -> String.format(
                        Locale.ROOT,
                        "%s: slope %.15g, centred difference %.15g, relative deviation %.3g",
                        label,
                        exact,
                        numerical,
                        Math.abs(exact - numerical) / scale));
    }

    /**
     * Cases at Q = 0 with a reference flow that sets the scale; the one-sided limit of the slope
     * exists for them. Not Colebrook–White and the methods built on it: as Re → 0 its root tends
     * to f ∝ 1/Re², so h would tend to a non-zero constant; the code refuses Re &lt; 1 there, so
     * there is no limit to compare with. A rated component with 1 &lt; n &lt; 2 near 1 is left out
     * too: its slope does tend to 0, but as Q^(n−1), too slowly for a finite step to show it.
     */
    static Stream<Arguments> zeroFlowCases() {
        List<Arguments> cases = new ArrayList<>();
        double d = 0.1;
        double laminar = flowForReynolds(500, d, OIL);
        double turbulent = flowForReynolds(1e5, d, WATER);
        for (String method : List.of("auto", "laminar", "churchill")) {
            cases.add(Arguments.of(method + " laminar", plainPipe(d, 1e-3), context(OIL, method), laminar));
            cases.add(Arguments.of(method + " with fittings", pipeWithFittings(60, d), context(OIL, method), laminar));
        }
        cases.add(Arguments.of("fittings only", pipeWithFittings(0, d), context(OIL, "auto"), laminar));
        cases.add(Arguments.of("swamee-jain", plainPipe(d, 1e-3), context(WATER, "swamee-jain"), turbulent));
        cases.add(Arguments.of("blasius", plainPipe(d, 0), context(WATER, "blasius"), turbulent));
        cases.add(Arguments.of("hazen-williams", hazenWilliamsPipe(0.2), context(WATER, "colebrook"), turbulent));
        FlowContext water = context(WATER, "auto");
        cases.add(Arguments.of("valve", FlowCoefficientValve.ofKv("v", "v", 16), water, 0.01));
        for (double n : new double[] {1.0, 1.85, 2.0, 2.5}) {
            cases.add(Arguments.of("component n " + n, new RatedComponent("c", "c", 3e4, 0.01, n), water, 0.01));
        }
        cases.add(Arguments.of(
                "sudden expansion", new DiameterChange("r", "r", 0.05, 0.1, DiameterChange.SUDDEN), water, 0.01));
        cases.add(Arguments.of(
                "check valve", new CheckValve("cv", "cv", LocalLoss.ofLossCoefficient(2.0, 0.1)), water, 0.01));
        cases.add(Arguments.of(
                "isolation open",
                new IsolationValve("i", "i", true, LocalLoss.ofLossCoefficient(0.15, 0.1)),
                water,
                0.01));
        for (int degree = 1; degree <= 3; degree++) {
            cases.add(Arguments.of("pump degree " + degree, new PumpElement("p", curve(degree), 0.9), water, 0.03));
        }
        return cases.stream();
    }

    /**
     * At Q = 0 the documented slope is the limit as Q → 0⁺: with D(δ) = (h(δ) − h(0))/δ, the
     * Richardson combination 2 D(δ/2) − D(δ) removes the O(δ) term. Steps: 10⁻¹⁰ Q_ref where h(0) = 0
     * (no cancellation, and a non-analytic law such as Q^1.852 needs a tiny step to approach its
     * zero limit); 10⁻⁴ Q_ref for a pump, whose h(0) is its shut-off head and would swamp a tiny
     * difference. Tolerance 10⁻⁷ of the larger of the slope at zero and the slope at Q_ref.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("zeroFlowCases")
    void slopeAtZeroFlowIsTheOneSidedLimit(String label, Element element, FlowContext context, double reference) {
        double atZero = element.headLoss(0.0, context);
        double delta = (atZero == 0 ? 1e-10 : 1e-4) * reference;
        double wide = (element.headLoss(delta, context) - atZero) / delta;
        double narrow = (element.headLoss(delta / 2, context) - atZero) / (delta / 2);
        double limit = 2 * narrow - wide;
        double exact = element.headLossSlope(0.0, context);
        double scale = Math.max(Math.abs(exact), Math.abs(element.headLossSlope(reference, context)));
        assertTrue(
                Math.abs(exact - limit) <= TOLERANCE * scale,
                () -> String.format(
                        Locale.ROOT,
                        "%s: slope at 0 %.15g, one-sided limit %.15g, deviation %.3g of the slope scale %.6g",
                        label,
                        exact,
                        limit,
                        Math.abs(exact - limit) / scale,
                        scale));
    }

    /**
     * A pipe's slope at Q = 0 counts the Hagen–Poiseuille term 32 μ L/(ρ g D² A) exactly for the
     * friction methods that say they follow f = 64/Re at small Re. That claim must be true of every
     * method that does and false of every one that does not: f·Re → 64 as Re → 0 (the laminar law,
     * Hagen 1839 / Poiseuille 1840 in Darcy form). A method that refuses so small an Re cannot
     * follow it.
     */
    @Test
    void laminarClaimMatchesEachMethodsLowReynoldsLimit() {
        for (FrictionCorrelation method : FrictionMethods.all()) {
            double reynolds = 1e-3;
            double product;
            try {
                product = method.frictionFactor(reynolds, 1e-3) * reynolds;
            } catch (InputException refused) {
                product = Double.NaN;
            }
            boolean followsLaminarLaw = Math.abs(product / 64.0 - 1.0) < 1e-9;
            double shown = product;
            assertTrue(
                    followsLaminarLaw == method.laminarAtLowReynolds(),
                    () -> method.id() + ": f·Re at Re 1e-3 is " + shown + ", but laminarAtLowReynolds() says "
                            + method.laminarAtLowReynolds());
        }
    }
}
