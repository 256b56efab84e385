package org.headway.fitting;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.List;
import java.util.Random;
import org.headway.Fuzz;
import org.headway.caution.InputException;
import org.headway.correlation.FitStatistics;
import org.headway.correlation.FittedCorrelation;
import org.headway.correlation.FittedFrictionCorrelation;
import org.headway.friction.FrictionResult;
import org.junit.jupiter.api.Test;

/**
 * User expressions fuzzed: 10,000 generated texts per run. Parsing gives a compiled expression or
 * an {@link InputException} naming the expression column; a compiled expression evaluates with
 * derivatives on a few points without throwing; used as a fitted friction correlation it gives a
 * finite, positive friction factor or an {@link InputException} naming the correlation — never
 * another exception, never NaN, never a hang.
 */
class ExpressionFuzzTest {

    static final int INPUTS = 10_000;
    static final long SEED = 8_202L;
    static final long PER_INPUT_BUDGET_MS = 2_000;

    private static final List<String> VARIABLES = List.of("Re", "eps");
    private static final List<String> PARAMETERS = List.of("a", "b", "c");
    private static final double[] PARAMETER_VALUES = {0.3164, -0.25, 0.01};
    /** Reynolds number and relative roughness at which each correlation is tried. */
    private static final double[][] POINTS = {{1.0e3, 0.0}, {1.0e5, 1.0e-4}, {1.0e8, 0.05}};

    private static final String[] VALID = {
        "a*Re^b",
        "a*Re^b + c",
        "(-2*log10(eps/3.7 + 2.51/(Re*sqrt(c))))^-2",
        "a*exp(-b*Re) + c",
        "64/Re + a*eps",
        "a + b*ln(Re) + c*ln(Re)^2",
        "abs(sin(a*Re))*cos(b) + tan(c)/atan(eps+1)",
        "a*Re**b*(1+eps)^c",
        "pi*a/Re",
        "-a^2 + 1e-3*Re^0.5"
    };

    private static final String[] TOKENS = {
        "a",
        "b",
        "c",
        "Re",
        "eps",
        "x",
        "1",
        "0",
        "2.5",
        "1e308",
        "1e-320",
        "1e999",
        ".5",
        "+",
        "-",
        "*",
        "/",
        "^",
        "**",
        "(",
        ")",
        "exp(",
        "log(",
        "ln(",
        "log10(",
        "sqrt(",
        "sin(",
        "cos(",
        "tan(",
        "atan(",
        "abs(",
        "pi",
        "foo(",
        " ",
        ",",
        "NaN",
        "Infinity",
        "é",
        "$"
    };

    @Test
    void everyTextCompilesAndEvaluatesOrGivesALocatedError() {
        Random random = new Random(SEED);
        int rejected = 0;
        int compiled = 0;
        int evaluated = 0;
        int refusedValues = 0;
        for (int i = 0; i < INPUTS; i++) {
            String text = generate(random);
            long start = System.nanoTime();
            try {
                Expression e = Expression.parse(text, VARIABLES, PARAMETERS);
                compiled++;
                double[][] columns = {{1.0e3, 1.0e5, 1.0e8}, {0.0, 1.0e-4, 0.05}};
                double[] values = new double[3];
                double[][] jacobian = new double[3][3];
                e.evaluate(columns, PARAMETER_VALUES, values, jacobian);
                refusedValues += useAsFriction(text, i);
                evaluated++;
            } catch (InputException ex) {
                rejected++;
                Fuzz.assertLocated(ex, "expression", SEED, i);
            } catch (RuntimeException | StackOverflowError ex) {
                fail("case " + i + " (seed " + SEED + ") threw " + ex + " for \"" + Fuzz.abbreviate(text) + "\"", ex);
            }
            long ms = (System.nanoTime() - start) / 1_000_000;
            assertTrue(ms < PER_INPUT_BUDGET_MS, "case " + i + " (seed " + SEED + ") took " + ms + " ms");
        }
        org.headway.Fuzz.summary(
                "expression fuzz: " + INPUTS + " texts, " + rejected + " rejected with a located error, "
                        + compiled + " compiled and evaluated (" + refusedValues
                        + " friction-factor values refused as non-finite or non-positive)");
        assertTrue(rejected > 0 && compiled > 0 && evaluated == compiled, "both outcomes must be exercised");
    }

    /** Returns how many of the points were refused (non-finite or non-positive f). */
    private static int useAsFriction(String text, int i) {
        FittedCorrelation fit = new FittedCorrelation(
                "f",
                "fuzzed",
                text,
                VARIABLES,
                List.of(
                        new FittedParameter("a", PARAMETER_VALUES[0], 0.0, PARAMETER_VALUES[0], PARAMETER_VALUES[0]),
                        new FittedParameter("b", PARAMETER_VALUES[1], 0.0, PARAMETER_VALUES[1], PARAMETER_VALUES[1]),
                        new FittedParameter("c", PARAMETER_VALUES[2], 0.0, PARAMETER_VALUES[2], PARAMETER_VALUES[2])),
                List.of(new VariableRange("Re", 4.0e3, 1.0e6), new VariableRange("eps", 0.0, 0.01)),
                new FitStatistics(0.0, 0.0, 1.0, 1.0, 10, 13));
        FittedFrictionCorrelation friction = new FittedFrictionCorrelation("fuzz-fit", fit);
        int refused = 0;
        for (double[] p : POINTS) {
            try {
                FrictionResult r = friction.evaluate(p[0], p[1]);
                assertTrue(
                        Double.isFinite(r.frictionFactor()) && r.frictionFactor() > 0,
                        "case " + i + " (seed " + SEED + "): f = " + r.frictionFactor() + " for \"" + text + "\"");
            } catch (InputException ex) {
                refused++;
                Fuzz.assertLocated(ex, "fitted correlation fuzz-fit", SEED, i);
            }
        }
        return refused;
    }

    /** A random well-formed expression, so that evaluation and derivatives get exercised too. */
    private static String wellFormed(Random random, int depth) {
        if (depth == 0 || random.nextInt(4) == 0) {
            String[] leaves = {"a", "b", "c", "Re", "eps", "pi", "2", "0", "1e-300", "1e300", "0.5", "-1"};
            return leaves[random.nextInt(leaves.length)];
        }
        String[] functions = {"exp", "log", "ln", "log10", "sqrt", "sin", "cos", "tan", "atan", "abs"};
        String[] operators = {"+", "-", "*", "/", "^", "**"};
        return switch (random.nextInt(4)) {
            case 0 -> functions[random.nextInt(functions.length)] + "(" + wellFormed(random, depth - 1) + ")";
            case 1 -> "-" + wellFormed(random, depth - 1);
            case 2 -> "(" + wellFormed(random, depth - 1) + ")";
            default ->
                wellFormed(random, depth - 1)
                        + operators[random.nextInt(operators.length)]
                        + wellFormed(random, depth - 1);
        };
    }

    private static String generate(Random random) {
        String valid = VALID[random.nextInt(VALID.length)];
        return switch (random.nextInt(16)) {
            case 0 -> Fuzz.randomText(random, "abcRepsx0123456789.+-*/^() elogxpqrtinsu", 40);
            case 1 -> Fuzz.randomBytesAsText(random, 40);
            case 2, 3, 4 -> {
                StringBuilder b = new StringBuilder();
                int n = 1 + random.nextInt(15);
                for (int k = 0; k < n; k++) {
                    b.append(TOKENS[random.nextInt(TOKENS.length)]);
                }
                yield b.toString();
            }
            case 5 -> "(".repeat(random.nextInt(20_000)) + "a" + ")".repeat(random.nextInt(20_000));
            case 6 -> "a" + "+a".repeat(random.nextInt(50_000));
            case 7 -> "-".repeat(random.nextInt(50_000)) + "a";
            case 8 -> "a" + "^a".repeat(random.nextInt(50_000));
            case 9 -> "exp(".repeat(random.nextInt(5_000)) + "a" + ")".repeat(random.nextInt(5_000));
            case 10 -> "\uFEFF" + valid + "\r\n";
            case 11, 12 -> wellFormed(random, 4);
            default -> Fuzz.mutate(random, valid, 1 + random.nextInt(3));
        };
    }
}
