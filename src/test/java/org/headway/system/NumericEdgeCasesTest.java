package org.headway.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.ArrayList;
import java.util.List;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.fluid.FluidState;
import org.headway.fluid.Fluids;
import org.headway.friction.FrictionMethods;
import org.headway.friction.FrictionResult;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/**
 * Numeric edge cases through every engine, one row each in {@code numeric-edge-cases.csv}: subnormal
 * and huge values, zero flow, zero length, ε = 0, ε/D = 0.5, temperatures at the property models'
 * limits. Each row gives either a finite number (with the caution the row names, if any) or an
 * {@link InputException} whose message contains the row's text — never NaN, never another
 * exception. The expected outcomes are Headway's own design decisions (common practice, no source);
 * the ranges they rest on are cited in the engine classes.
 */
class NumericEdgeCasesTest {

    private static final FluidState WATER_20C = Fluids.byId("water").state(293.15, 101_325);

    @ParameterizedTest(name = "{0} {1}: {2} {3} {4} {5} -> {6} {7}")
    @CsvFileSource(resources = "numeric-edge-cases.csv", numLinesToSkip = 1, delimiter = ';')
    void edgeCaseGivesANumberWithACautionOrAClearError(
            String engine, String method, double a, double b, double c, double d, String expect, String fragment) {
        List<Double> numbers = new ArrayList<>();
        List<Caution> cautions = new ArrayList<>();
        String outcome;
        try {
            switch (engine) {
                case "friction" -> {
                    FrictionResult r = FrictionMethods.byId(method).evaluate(a, b);
                    numbers.add(r.frictionFactor());
                    cautions.addAll(r.cautions());
                }
                case "fluid" -> {
                    FluidState s = Fluids.byId(method).state(a, b);
                    numbers.add(s.density());
                    numbers.add(s.dynamicViscosity());
                    numbers.add(s.kinematicViscosity());
                    cautions.addAll(s.cautions());
                }
                case "run" -> {
                    PipeRun run = RunFixtures.run(WATER_20C, method, List.of(RunFixtures.pipe("pipe", a, b, c)));
                    RunResult r = HeadLossCalculator.solve(run, d);
                    numbers.add(r.totals().totalHead());
                    numbers.add(r.totals().pressureDrop());
                    for (SegmentResult s : r.segments()) {
                        numbers.add(s.velocity());
                        numbers.add(s.majorHeadLoss());
                        numbers.add(s.minorHeadLoss());
                        cautions.addAll(s.cautions());
                    }
                    cautions.addAll(r.cautions());
                }
                default -> throw new IllegalArgumentException("unknown engine " + engine);
            }
            outcome = "number";
        } catch (InputException e) {
            assertEquals("error", expect, "unexpected error: " + e.getMessage());
            assertTrue(e.getMessage().contains(fragment), "message does not say '" + fragment + "': " + e.getMessage());
            return;
        } catch (RuntimeException e) {
            fail("threw " + e, e);
            return;
        }
        for (double x : numbers) {
            assertTrue(Double.isFinite(x), "non-finite result " + numbers);
        }
        List<String> codes = cautions.stream()
                .filter(k -> !k.equals(Caution.GENERAL_REVIEW))
                .map(Caution::code)
                .toList();
        if (expect.equals("caution")) {
            assertTrue(codes.stream().anyMatch(k -> k.contains(fragment)), "no caution '" + fragment + "' in " + codes);
        } else {
            assertEquals(expect, outcome, "cautions " + codes);
        }
    }
}
