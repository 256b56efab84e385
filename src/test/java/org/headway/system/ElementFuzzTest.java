package org.headway.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Random;
import java.util.function.Supplier;
import org.headway.caution.InputException;
import org.headway.fluid.FluidState;
import org.headway.friction.FlowRegimes;
import org.headway.friction.FrictionMethods;
import org.headway.pipe.Darby2001ThreeK;
import org.headway.pipe.HazenWilliamsCoefficient;
import org.headway.pipe.Hooper1981TwoK;
import org.headway.pipe.Weisbach1845FixedK;
import org.junit.jupiter.api.Test;

/**
 * Seeded random elements of every kind, with random valid parameters and flows over many decades,
 * against invariants that hold for any element law; and random invalid parameters, each of which
 * must be refused with an {@link InputException} naming the field — never another exception type,
 * never a silent result. Every failure message carries the seed and case number for replay.
 *
 * <p>Invariants (common practice, no source, unless stated): results are finite; a passive element
 * (anything but a pump) loses head in the direction of flow, more head for more flow (h
 * non-decreasing in Q, slope ≥ 0), and where it allows reverse flow its law is odd in Q (a
 * diameter change meets the opposite change in reverse, so its law is odd with its bores swapped);
 * the slope agrees with a centred difference of the head loss to a loose 10⁻⁵ (the tight check is
 * {@link ElementSlopeTest}).
 */
class ElementFuzzTest {

    private static final long SEED = 0x5eed_e1e7L;
    private static final int CASES = 10_000;

    private static final List<String> TURBULENT_METHODS =
            List.of("colebrook", "swamee-jain", "haaland", "serghides", "goudar-sonnad", "blasius");
    private static final List<String> ALL_REGIME_METHODS = List.of("auto", "laminar", "churchill");

    // ---- random numbers -----------------------------------------------------------------------

    private static double logUniform(Random r, double low, double high) {
        return low * Math.pow(high / low, r.nextDouble());
    }

    private static double uniform(Random r, double low, double high) {
        return low + (high - low) * r.nextDouble();
    }

    private static double randomSign(Random r) {
        return r.nextBoolean() ? 1.0 : -1.0;
    }

    private static FluidState randomFluid(Random r) {
        double density = uniform(r, 600, 1600);
        return RunFixtures.liquid(density, logUniform(r, 2e-4, 2.0), logUniform(r, 1, 5e4));
    }

    /** A flow magnitude over ten decades (m³/s). */
    private static double randomFlow(Random r) {
        return logUniform(r, 1e-8, 1e2);
    }

    private static double reynolds(double flow, double diameter, FluidState fluid) {
        return 4.0 * fluid.density() * Math.abs(flow) / (Math.PI * diameter * fluid.dynamicViscosity());
    }

    // ---- invariants ---------------------------------------------------------------------------

    private static String where(long seed, int i, Object what) {
        return "case " + i + " (seed " + seed + "): " + what;
    }

    private static void assertFinite(double value, Supplier<String> what) {
        if (!Double.isFinite(value)) {
            fail(what.get() + " is not finite: " + value);
        }
    }

    /**
     * The checks every passive element must pass at a flow magnitude q > 0 and a larger flow q2.
     *
     * @param reverse whether to check oddness in Q (elements that allow reverse flow with a symmetric law)
     * @param checkDifference whether the centred difference is meaningful here (not across a kink)
     */
    private static void checkPassive(
            Element e,
            FlowContext c,
            double q,
            double q2,
            boolean reverse,
            boolean checkDifference,
            Supplier<String> label) {
        double h = e.headLoss(q, c);
        double h2 = e.headLoss(q2, c);
        double slope = e.headLossSlope(q, c);
        assertFinite(h, () -> label.get() + " h(Q)");
        assertFinite(h2, () -> label.get() + " h(Q2)");
        assertFinite(slope, () -> label.get() + " slope");
        assertTrue(h >= 0, () -> label.get() + ": loses head in the flow direction, h = " + h);
        assertTrue(h2 >= h, () -> label.get() + ": h non-decreasing, h(" + q + ") = " + h + " > h(" + q2 + ") = " + h2);
        assertTrue(slope >= 0, () -> label.get() + ": slope ≥ 0, got " + slope);
        assertEquals(0.0, e.headLoss(0.0, c), 0.0, () -> label.get() + ": no flow, no loss");
        if (reverse) {
            assertEquals(-h, e.headLoss(-q, c), 0.0, () -> label.get() + ": odd in Q");
            assertEquals(slope, e.headLossSlope(-q, c), 0.0, () -> label.get() + ": slope even in Q");
        }
        if (checkDifference) {
            checkDifference(e, c, q, label);
        }
    }

    private static void checkDifference(Element e, FlowContext c, double q, Supplier<String> label) {
        double delta = 1e-6 * Math.abs(q);
        double numerical = (e.headLoss(q + delta, c) - e.headLoss(q - delta, c)) / (2 * delta);
        double slope = e.headLossSlope(q, c);
        double scale = Math.max(Math.abs(slope), Math.abs(e.headLoss(q, c) / q));
        assertTrue(
                Math.abs(slope - numerical) <= 1e-5 * scale,
                () -> label.get() + ": slope " + slope + " against centred difference " + numerical);
    }

    // ---- random valid elements --------------------------------------------------------------

    private static Segment randomSegment(Random r, boolean hazenWilliams, int i) {
        double d = logUniform(r, 0.005, 2.0);
        double relativeRoughness = r.nextInt(4) == 0 ? 0 : logUniform(r, 1e-6, 0.05);
        Segment.Builder b = Segment.builder("pipe " + i)
                .id("p" + i)
                .length(r.nextInt(10) == 0 ? 0 : logUniform(r, 0.1, 5000))
                .bore(d, relativeRoughness * d)
                .extraLossCoefficient(r.nextBoolean() ? 0 : uniform(r, 0, 10))
                .elevationChange(uniform(r, -100, 100));
        int fittings = r.nextInt(4);
        for (int f = 0; f < fittings; f++) {
            int count = 1 + r.nextInt(6);
            switch (r.nextInt(3)) {
                case 0 ->
                    b.fitting(new FittingUse(
                            new Weisbach1845FixedK("k" + f, "fixed", uniform(r, 0, 5), "random"), count));
                case 1 ->
                    b.fitting(new FittingUse(
                            new Hooper1981TwoK("t" + f, "2-K", uniform(r, 0, 2000), uniform(r, 0, 1), "random"),
                            count));
                default ->
                    b.fitting(new FittingUse(
                            new Darby2001ThreeK(
                                    "h" + f, "3-K", uniform(r, 0, 2000), uniform(r, 0, 1), uniform(r, 0, 5), "random"),
                            count));
            }
        }
        if (hazenWilliams) {
            b.hazenWilliams(new HazenWilliamsCoefficient(uniform(r, 40, 150), "random"));
        }
        return b.build();
    }

    @Test
    void randomPipesKeepTheInvariants() {
        Random r = new Random(SEED);
        for (int i = 0; i < CASES; i++) {
            FluidState fluid = randomFluid(r);
            boolean hw = r.nextInt(5) == 0;
            Segment pipe = randomSegment(r, hw, i);
            String method;
            double re;
            if (hw) {
                method = "colebrook";
                re = logUniform(r, 1, 1e8);
            } else if (r.nextBoolean()) {
                method = TURBULENT_METHODS.get(r.nextInt(TURBULENT_METHODS.size()));
                re = logUniform(r, FlowRegimes.TURBULENT_LIMIT, 1e8);
            } else {
                method = ALL_REGIME_METHODS.get(r.nextInt(ALL_REGIME_METHODS.size()));
                re = logUniform(r, 1e-2, 1e8);
            }
            FlowContext c = new FlowContext(fluid, FrictionMethods.byId(method));
            double q = re * fluid.dynamicViscosity() * Math.PI * pipe.innerDiameter() / (4 * fluid.density());
            double q2 = q * (1 + logUniform(r, 1e-6, 1));
            // The auto method's slope jumps at Re 2300 and 4000 (continuous, not smooth: its documented blend), so
            // no difference is taken across them.
            double reLow = reynolds(q * (1 - 2e-6), pipe.innerDiameter(), fluid);
            double reHigh = reynolds(q * (1 + 2e-6), pipe.innerDiameter(), fluid);
            boolean acrossKink = method.equals("auto")
                    && ((reLow < FlowRegimes.LAMINAR_LIMIT && reHigh >= FlowRegimes.LAMINAR_LIMIT)
                            || (reLow < FlowRegimes.TURBULENT_LIMIT && reHigh >= FlowRegimes.TURBULENT_LIMIT));
            int n = i;
            Supplier<String> label = () -> where(SEED, n, method + " " + pipe + " at Re " + re);
            checkPassive(pipe, c, q, q2, true, !acrossKink, label);
            if (i % 10 == 0) {
                ElementResult full = pipe.evaluate(q, c);
                assertFinite(full.pressureDrop(), () -> label.get() + " Δp");
                double h = pipe.headLoss(q, c);
                assertEquals(
                        h, full.headLoss(), Math.abs(h) * 1e-10, () -> label.get() + ": evaluate agrees with headLoss");
            }
        }
    }

    @Test
    void randomValvesAndComponentsKeepTheInvariants() {
        Random r = new Random(SEED + 1);
        for (int i = 0; i < CASES; i++) {
            FlowContext c = new FlowContext(randomFluid(r), FrictionMethods.byId("auto"));
            double q = randomFlow(r);
            double q2 = q * (1 + logUniform(r, 1e-6, 1));
            double kv = logUniform(r, 1e-3, 1e5);
            Element valve = r.nextBoolean()
                    ? FlowCoefficientValve.ofKv("v" + i, null, kv)
                    : FlowCoefficientValve.ofCv("v" + i, null, kv);
            int n = i;
            checkPassive(valve, c, q, q2, true, true, () -> where(SEED + 1, n, valve));

            double ratedFlow = logUniform(r, 1e-5, 10);
            RatedComponent component =
                    new RatedComponent("c" + i, null, logUniform(r, 10, 1e7), ratedFlow, uniform(r, 1.0, 2.5));
            double qc = ratedFlow * logUniform(r, 1e-4, 1e2);
            checkPassive(
                    component,
                    c,
                    qc,
                    qc * (1 + logUniform(r, 1e-6, 1)),
                    true,
                    true,
                    () -> where(SEED + 1, n, component));
        }
    }

    @Test
    void randomDiameterChangesKeepTheInvariants() {
        Random r = new Random(SEED + 2);
        for (int i = 0; i < CASES; i++) {
            FlowContext c = new FlowContext(randomFluid(r), FrictionMethods.byId("auto"));
            double inlet = logUniform(r, 0.005, 2.0);
            double outlet = logUniform(r, 0.005, 2.0);
            double angle = r.nextInt(3) == 0 ? DiameterChange.SUDDEN : uniform(r, 1e-3, Math.PI);
            DiameterChange change = new DiameterChange("r" + i, null, inlet, outlet, angle);
            DiameterChange swapped = new DiameterChange("r" + i, null, outlet, inlet, angle);
            double q = randomFlow(r);
            int n = i;
            Supplier<String> label = () -> where(SEED + 2, n, change);
            checkPassive(change, c, q, q * (1 + logUniform(r, 1e-6, 1)), false, true, label);
            checkPassive(swapped, c, q, q * (1 + logUniform(r, 1e-6, 1)), false, true, () -> label.get() + " swapped");
            assertEquals(
                    -swapped.headLoss(q, c), change.headLoss(-q, c), 0.0, () -> label.get() + ": reverse = swapped");
            assertEquals(
                    swapped.headLossSlope(q, c),
                    change.headLossSlope(-q, c),
                    0.0,
                    () -> label.get() + ": slope in reverse");
        }
    }

    @Test
    void randomCheckAndIsolationValvesKeepTheInvariants() {
        Random r = new Random(SEED + 3);
        for (int i = 0; i < CASES; i++) {
            FlowContext c = new FlowContext(randomFluid(r), FrictionMethods.byId("auto"));
            LocalLoss loss = r.nextBoolean()
                    ? LocalLoss.ofLossCoefficient(uniform(r, 0, 20), logUniform(r, 0.005, 2))
                    : LocalLoss.ofFlowCoefficient(FlowCoefficientValve.ofKv("k", null, logUniform(r, 1e-2, 1e5)));
            double q = randomFlow(r);
            double q2 = q * (1 + logUniform(r, 1e-6, 1));
            CheckValve check = new CheckValve("nrv" + i, null, loss);
            int n = i;
            String label = "case " + i + " (seed " + (SEED + 3) + "): check valve";
            checkPassive(check, c, q, q2, false, true, () -> where(SEED + 3, n, check));
            InputException reverse = expectRefusal(() -> check.headLoss(-q, c), label + " reverse");
            assertTrue(reverse.getMessage().startsWith("nrv" + i), reverse.getMessage());

            IsolationValve open = new IsolationValve("iv" + i, null, true, loss);
            checkPassive(open, c, q, q2, true, true, () -> where(SEED + 3, n, open));
            IsolationValve shut = new IsolationValve("iv" + i, null, false, loss);
            assertTrue(shut.isClosed());
            double signed = q * randomSign(r);
            InputException closed = expectRefusal(() -> shut.headLoss(signed, c), label + " closed");
            assertTrue(closed.getMessage().startsWith("iv" + i), closed.getMessage());
            expectRefusal(() -> shut.headLossSlope(signed, c), label + " closed slope");
        }
    }

    private static PumpCurve randomCurve(Random r) {
        int n = 3 + r.nextInt(5);
        double shutOff = logUniform(r, 5, 200);
        double maximumFlow = logUniform(r, 1e-3, 1);
        double droop = uniform(r, 0.2, 0.9);
        List<PumpCurve.Point> points = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            double x = (double) k / (n - 1);
            double head = shutOff * (1 - droop * x * x) * (1 + uniform(r, -0.01, 0.01));
            points.add(new PumpCurve.Point(x * maximumFlow, head));
        }
        OptionalDouble npsh = r.nextBoolean() ? OptionalDouble.of(uniform(r, 0.5, 10)) : OptionalDouble.empty();
        return PumpCurve.fit("random", points, 1 + r.nextInt(Math.min(3, n - 1)), npsh);
    }

    @Test
    void randomPumpsKeepTheInvariants() {
        Random r = new Random(SEED + 4);
        for (int i = 0; i < CASES; i++) {
            FlowContext c = new FlowContext(randomFluid(r), FrictionMethods.byId("auto"));
            PumpCurve curve = randomCurve(r);
            double s = uniform(r, PumpElement.MIN_SPEED_RATIO, PumpElement.MAX_SPEED_RATIO);
            PumpElement pump = new PumpElement("pump" + i, curve, s);
            double q = s * curve.maximumDataFlow() * logUniform(r, 1e-4, 1.2);
            int n = i;
            Supplier<String> label = () -> where(SEED + 4, n, "pump s " + s + " at " + q + ", " + curve.points());
            assertFinite(pump.headLoss(q, c), () -> label.get() + " head loss");
            assertFinite(pump.headLossSlope(q, c), () -> label.get() + " slope");
            assertFinite(pump.headLoss(0, c), () -> label.get() + " shut-off");
            assertFinite(pump.headLossSlope(0, c), () -> label.get() + " slope at shut-off");
            checkDifference(pump, c, q, label);
            if (curve.npshRequired().isPresent()) {
                assertFinite(pump.npshRequired().getAsDouble(), () -> label.get() + " NPSHr");
            }
            String refusal = "case " + i + " (seed " + (SEED + 4) + "): pump";
            expectRefusal(() -> pump.headLoss(-q, c), refusal + " reverse");
            expectRefusal(() -> pump.headLossSlope(-q, c), refusal + " reverse slope");
        }
    }

    // ---- random invalid parameters ------------------------------------------------------------

    /** Runs an action that must be refused with an InputException, and returns it. */
    private static InputException expectRefusal(Supplier<?> action, String label) {
        Object result;
        try {
            result = action.get();
        } catch (InputException e) {
            assertTrue(e.problem() != null && !e.problem().isBlank(), label + ": empty problem");
            return e;
        } catch (RuntimeException other) {
            throw new AssertionError(label + ": refused with " + other + " instead of an InputException", other);
        }
        return fail(label + ": accepted silently, gave " + result);
    }

    private static void expectRefusal(Supplier<?> action, String field, String label) {
        InputException e = expectRefusal(action, label);
        assertTrue(
                e.getMessage().contains(field),
                label + ": the message does not name '" + field + "': " + e.getMessage());
    }

    /** A value no finite-number field accepts. */
    private static double notFinite(Random r) {
        return switch (r.nextInt(3)) {
            case 0 -> Double.NaN;
            case 1 -> Double.POSITIVE_INFINITY;
            default -> Double.NEGATIVE_INFINITY;
        };
    }

    /** A value a non-negative field refuses: not finite, or below zero. */
    private static double notNonNegative(Random r) {
        return r.nextInt(3) == 0 ? notFinite(r) : -logUniform(r, 1e-300, 1e300);
    }

    /** A value a positive field refuses: not finite, zero (either sign) or below zero. */
    private static double notPositive(Random r) {
        return switch (r.nextInt(4)) {
            case 0 -> notFinite(r);
            case 1 -> r.nextBoolean() ? 0.0 : -0.0;
            default -> -logUniform(r, 1e-300, 1e300);
        };
    }

    @Test
    void invalidPipeParametersAreRefusedNamingTheField() {
        Random r = new Random(SEED + 5);
        for (int i = 0; i < CASES; i++) {
            double length = logUniform(r, 1, 1000);
            double d = logUniform(r, 0.01, 1);
            double roughness = 1e-4 * d;
            String label = where(SEED + 5, i, "pipe");
            // A high point now and then, so that its check cannot mask another field's.
            boolean highPoint = r.nextBoolean();
            Supplier<Segment.Builder> base = () -> {
                Segment.Builder b = Segment.builder("pipe").length(length).bore(d, roughness);
                return highPoint ? b.highPoint(0.5 * length, 3) : b;
            };
            switch (r.nextInt(11)) {
                case 0 -> {
                    double bad = r.nextInt(4) == 0 ? logUniform(r, 1.01e7, 1e300) : notNonNegative(r);
                    expectRefusal(() -> base.get().length(bad).build(), "length", label + " length " + bad);
                }
                case 1 -> {
                    double bad = r.nextInt(4) == 0 ? logUniform(r, 101, 1e300) : notPositive(r);
                    expectRefusal(() -> base.get().bore(bad, 0).build(), "inner diameter", label + " diameter " + bad);
                }
                case 2 -> {
                    double bad = r.nextInt(4) == 0 ? d * uniform(r, 1, 10) : notNonNegative(r);
                    expectRefusal(() -> base.get().bore(d, bad).build(), "roughness", label + " roughness " + bad);
                }
                case 3 -> {
                    double bad = r.nextInt(4) == 0 ? logUniform(r, 1.01e6, 1e300) : notNonNegative(r);
                    expectRefusal(
                            () -> base.get().extraLossCoefficient(bad).build(),
                            "loss coefficient",
                            label + " K " + bad);
                }
                case 4 -> {
                    double bad = r.nextInt(4) == 0 ? randomSign(r) * logUniform(r, 1.01e5, 1e300) : notFinite(r);
                    expectRefusal(
                            () -> base.get().elevationChange(bad).build(), "elevation change", label + " rise " + bad);
                }
                case 5 -> {
                    double bad = switch (r.nextInt(3)) {
                        case 0 -> notFinite(r);
                        case 1 -> uniform(r, -1e3, HazenWilliamsCoefficient.MIN - 1e-9);
                        default -> logUniform(r, HazenWilliamsCoefficient.MAX + 1e-9, 1e300);
                    };
                    expectRefusal(
                            () -> base.get()
                                    .hazenWilliams(new HazenWilliamsCoefficient(bad, "x"))
                                    .build(),
                            "Hazen–Williams C",
                            label + " C " + bad);
                }
                case 6 -> {
                    int bad = -r.nextInt(1000);
                    expectRefusal(
                            () -> base.get()
                                    .fitting(new FittingUse(new Weisbach1845FixedK("e", "e", 0.3, "x"), bad))
                                    .build(),
                            "count",
                            label + " count " + bad);
                }
                case 7 -> {
                    double bad = notNonNegative(r);
                    switch (r.nextInt(4)) {
                        case 0 ->
                            expectRefusal(
                                    () -> new Weisbach1845FixedK("e", "e", bad, "x"), "k", label + " fixed K " + bad);
                        case 1 ->
                            expectRefusal(
                                    () -> new Hooper1981TwoK("e", "e", bad, 0.2, "x"), "k1", label + " K1 " + bad);
                        case 2 ->
                            expectRefusal(
                                    () -> new Darby2001ThreeK("e", "e", 500, bad, 4, "x"),
                                    "k_inf",
                                    label + " Ki " + bad);
                        default ->
                            expectRefusal(
                                    () -> new Darby2001ThreeK("e", "e", 500, 0.1, bad, "x"),
                                    "k_d",
                                    label + " Kd " + bad);
                    }
                }
                case 8 -> {
                    double bad = r.nextBoolean() ? notNonNegative(r) : length * uniform(r, 1.001, 1e3);
                    expectRefusal(
                            () -> Segment.builder("pipe")
                                    .length(length)
                                    .bore(d, roughness)
                                    .highPoint(bad, 3)
                                    .build(),
                            "high point distance",
                            label + " high point at " + bad);
                }
                case 9 -> {
                    double bad = notFinite(r);
                    expectRefusal(
                            () -> Segment.builder("pipe")
                                    .length(length)
                                    .bore(d, roughness)
                                    .highPoint(0.5 * length, bad)
                                    .build(),
                            "high point rise",
                            label + " high point rise " + bad);
                }
                default -> {
                    double bad = notFinite(r);
                    Segment pipe = base.get().build();
                    FlowContext c = new FlowContext(randomFluid(r), FrictionMethods.byId("auto"));
                    expectRefusal(() -> pipe.headLoss(bad, c), "flow", label + " flow " + bad);
                    expectRefusal(() -> pipe.headLossSlope(bad, c), "flow", label + " flow " + bad);
                    expectRefusal(() -> pipe.evaluate(bad, c), "flow", label + " flow " + bad);
                }
            }
        }
    }

    @Test
    void invalidValveAndComponentParametersAreRefusedNamingTheField() {
        Random r = new Random(SEED + 6);
        for (int i = 0; i < CASES; i++) {
            String id = "e" + i;
            String label = where(SEED + 6, i, id);
            switch (r.nextInt(9)) {
                case 0 -> {
                    double bad = r.nextInt(4) == 0 ? logUniform(r, 1.01e6, 1e300) : notPositive(r);
                    expectRefusal(() -> FlowCoefficientValve.ofKv(id, null, bad), id + ".kv", label + " Kv " + bad);
                }
                case 1 -> {
                    double bad = r.nextInt(4) == 0 ? logUniform(r, 1.2e6, 1e300) : notPositive(r);
                    expectRefusal(() -> FlowCoefficientValve.ofCv(id, null, bad), id + ".cv", label + " Cv " + bad);
                }
                case 2 -> {
                    double bad = r.nextInt(4) == 0 ? logUniform(r, 1.01e9, 1e300) : notPositive(r);
                    expectRefusal(
                            () -> new RatedComponent(id, null, bad, 0.01, 2),
                            id + ".rated_pressure_drop",
                            label + " Δp " + bad);
                }
                case 3 -> {
                    double bad = r.nextInt(4) == 0 ? logUniform(r, 1.01e4, 1e300) : notPositive(r);
                    expectRefusal(
                            () -> new RatedComponent(id, null, 3e4, bad, 2), id + ".rated_flow", label + " Q " + bad);
                }
                case 4 -> {
                    double bad = switch (r.nextInt(3)) {
                        case 0 -> notFinite(r);
                        case 1 -> uniform(r, -10, RatedComponent.MIN_EXPONENT - 1e-9);
                        default -> uniform(r, RatedComponent.MAX_EXPONENT + 1e-9, 1e3);
                    };
                    expectRefusal(
                            () -> new RatedComponent(id, null, 3e4, 0.01, bad), id + ".exponent", label + " n " + bad);
                }
                case 5 -> {
                    double bad = r.nextInt(4) == 0 ? logUniform(r, 101, 1e300) : notPositive(r);
                    boolean inlet = r.nextBoolean();
                    String field = inlet ? id + ".inlet_diameter" : id + ".outlet_diameter";
                    expectRefusal(
                            () -> new DiameterChange(id, null, inlet ? bad : 0.1, inlet ? 0.1 : bad, Math.PI),
                            field,
                            label + " bore " + bad);
                }
                case 6 -> {
                    double bad = switch (r.nextInt(3)) {
                        case 0 -> notFinite(r);
                        case 1 -> -logUniform(r, 1e-300, 1e300) * (r.nextBoolean() ? 1 : 0);
                        default -> Math.PI * uniform(r, 1.000001, 10);
                    };
                    expectRefusal(
                            () -> new DiameterChange(id, null, 0.1, 0.05, bad), id + ".angle", label + " angle " + bad);
                }
                case 7 -> {
                    double bad = notNonNegative(r);
                    switch (r.nextInt(3)) {
                        case 0 ->
                            expectRefusal(
                                    () -> new CheckValve(id, null, LocalLoss.ofLossCoefficient(bad, 0.1)),
                                    "loss coefficient",
                                    label + " K " + bad);
                        case 1 ->
                            expectRefusal(
                                    () -> new IsolationValve(
                                            id, null, true, LocalLoss.ofLossCoefficient(1, -Math.abs(bad))),
                                    "diameter",
                                    label + " bore " + bad);
                        default ->
                            expectRefusal(
                                    () -> new IsolationValve(id, null, true, new LocalLoss(bad, "x")),
                                    "resistance",
                                    label + " resistance " + bad);
                    }
                }
                default -> {
                    double bad = notFinite(r);
                    FlowContext c = new FlowContext(randomFluid(r), FrictionMethods.byId("auto"));
                    List<Element> elements = List.of(
                            FlowCoefficientValve.ofKv(id, null, 10),
                            new RatedComponent(id, null, 3e4, 0.01, 1.9),
                            new DiameterChange(id, null, 0.1, 0.2, 1.0),
                            new CheckValve(id, null, LocalLoss.ofLossCoefficient(2, 0.1)),
                            new IsolationValve(id, null, true, LocalLoss.NONE),
                            new IsolationValve(id, null, false, LocalLoss.NONE));
                    Element e = elements.get(r.nextInt(elements.size()));
                    InputException refused = expectRefusal(() -> e.headLoss(bad, c), label + " flow " + bad);
                    assertTrue(
                            refused.getMessage().startsWith(id)
                                    && refused.getMessage().contains("flow"),
                            label);
                    expectRefusal(() -> e.headLossSlope(bad, c), "flow", label + " slope at flow " + bad);
                    expectRefusal(() -> e.evaluate(bad, c), "flow", label + " evaluate at flow " + bad);
                }
            }
        }
    }

    @Test
    void invalidPumpParametersAreRefusedNamingTheField() {
        Random r = new Random(SEED + 7);
        List<PumpCurve.Point> good =
                List.of(new PumpCurve.Point(0, 40), new PumpCurve.Point(0.01, 37), new PumpCurve.Point(0.02, 30));
        PumpCurve curve = PumpCurve.fit("p", good, OptionalDouble.of(3));
        for (int i = 0; i < CASES; i++) {
            String label = where(SEED + 7, i, "pump");
            switch (r.nextInt(5)) {
                case 0 -> {
                    double bad = switch (r.nextInt(3)) {
                        case 0 -> notFinite(r);
                        case 1 -> uniform(r, -10, PumpElement.MIN_SPEED_RATIO - 1e-9);
                        default -> logUniform(r, PumpElement.MAX_SPEED_RATIO + 1e-9, 1e300);
                    };
                    expectRefusal(() -> new PumpElement("pu", curve, bad), "pu.speed", label + " speed " + bad);
                }
                case 1 -> {
                    int k = r.nextInt(3);
                    double bad = notNonNegative(r);
                    List<PumpCurve.Point> points = new ArrayList<>(good);
                    points.set(k, new PumpCurve.Point(bad, good.get(k).head()));
                    expectRefusal(
                            () -> PumpCurve.fit("p", points, OptionalDouble.empty()),
                            "pump.points[" + k + "].flow",
                            label + " flow " + bad);
                }
                case 2 -> {
                    int k = r.nextInt(3);
                    double bad = notNonNegative(r);
                    List<PumpCurve.Point> points = new ArrayList<>(good);
                    points.set(k, new PumpCurve.Point(good.get(k).flow(), bad));
                    expectRefusal(
                            () -> PumpCurve.fit("p", points, OptionalDouble.empty()),
                            "pump.points[" + k + "].head",
                            label + " head " + bad);
                }
                case 3 -> {
                    double bad = notNonNegative(r);
                    expectRefusal(
                            () -> PumpCurve.fit("p", good, OptionalDouble.of(bad)),
                            "pump.npshRequired",
                            label + " NPSHr " + bad);
                }
                default -> {
                    double bad = notFinite(r);
                    PumpElement pump = new PumpElement("pu", curve, uniform(r, 0.2, 1.5));
                    FlowContext c = new FlowContext(randomFluid(r), FrictionMethods.byId("auto"));
                    expectRefusal(() -> pump.headLoss(bad, c), "flow", label + " flow " + bad);
                    expectRefusal(() -> pump.headLossSlope(bad, c), "flow", label + " flow " + bad);
                    expectRefusal(() -> pump.evaluate(bad, c), "flow", label + " flow " + bad);
                }
            }
        }
    }

    /** A run's flow that is not a finite number ≥ 0 is refused the same way, naming the flow. */
    @Test
    void invalidRunFlowIsRefusedNamingTheField() {
        Random r = new Random(SEED + 8);
        PipeRun run = RunFixtures.run(
                RunFixtures.liquid(998.2, 1.0016e-3, 2339), "auto", List.of(RunFixtures.pipe("a", 100, 0.1, 4.5e-5)));
        for (int i = 0; i < 1000; i++) {
            double bad = notNonNegative(r);
            expectRefusal(() -> HeadLossCalculator.solve(run, bad), "flow", where(SEED + 8, i, "solve " + bad));
            expectRefusal(
                    () -> HeadLossCalculator.headLossOnly(run, bad), "flow", where(SEED + 8, i, "headLossOnly " + bad));
        }
    }
}
