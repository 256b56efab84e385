package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import org.headway.Fuzz;
import org.headway.caution.InputException;
import org.headway.correlation.FitStatistics;
import org.headway.correlation.FittedCorrelation;
import org.headway.fitting.FittedParameter;
import org.headway.fitting.VariableRange;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Saved fitted-correlation JSON fuzzed: 10,000 generated files per run (random text, random bytes,
 * mutations of a valid file with nasty values, duplicated and deleted pieces, BOM and CRLF, long
 * strings and deep nesting). Each load gives a correlation whose numbers are all finite, or an
 * {@link InputException} naming the file — never another exception, never a hang.
 */
class FittedCorrelationFileFuzzTest {

    static final int INPUTS = 10_000;
    static final long SEED = 8_303L;
    static final long PER_INPUT_BUDGET_MS = 2_000;

    private static final String[] NASTY_VALUES = {
        "NaN",
        "\"NaN\"",
        "Infinity",
        "-Infinity",
        "1e999",
        "-1e999",
        "1e-400",
        "4.9e-324",
        "null",
        "true",
        "[]",
        "{}",
        "\"\"",
        "\"a\"",
        "-1",
        "0",
        "2147483648",
        "1.5",
        "\"" + "x".repeat(2_000) + "\"",
        "9".repeat(2_000)
    };

    @Test
    void everyFileGivesAFiniteCorrelationOrALocatedError(@TempDir Path dir) throws Exception {
        FittedCorrelation fit = new FittedCorrelation(
                "f",
                "power: f = a Re^b",
                "a*Re^b",
                List.of("Re"),
                List.of(
                        new FittedParameter("a", 0.3164, 0.01, 0.29, 0.34),
                        new FittedParameter("b", -0.25, 0.002, -0.254, -0.246)),
                List.of(new VariableRange("Re", 4000.0, 100000.0)),
                new FitStatistics(1.2e-7, 1.1e-4, 0.998, 0.997, 10, 12));
        String valid = FittedCorrelationFile.toJson(fit).toPrettyString();
        Random random = new Random(SEED);
        Path file = dir.resolve("rig-fit.json");
        int rejected = 0;
        int loaded = 0;
        for (int i = 0; i < INPUTS; i++) {
            String input = generate(random, valid);
            // Every tenth input goes through a real file; the rest through the same parser in memory.
            boolean viaFile = i % 10 == 0;
            if (viaFile) {
                Files.writeString(file, input, StandardCharsets.UTF_8);
            }
            long start = System.nanoTime();
            try {
                FittedCorrelation read = viaFile
                        ? FittedCorrelationFile.load(file)
                        : FittedCorrelationFile.parse(input, file.toString());
                assertFinite(read, i);
                loaded++;
            } catch (InputException e) {
                rejected++;
                Fuzz.assertLocated(e, file.toString(), SEED, i);
            } catch (RuntimeException | StackOverflowError e) {
                fail("case " + i + " (seed " + SEED + ") threw " + e + " for input:\n" + Fuzz.abbreviate(input), e);
            }
            long ms = (System.nanoTime() - start) / 1_000_000;
            assertTrue(ms < PER_INPUT_BUDGET_MS, "case " + i + " (seed " + SEED + ") took " + ms + " ms");
        }
        org.headway.Fuzz.summary("fitted-correlation JSON fuzz: " + INPUTS + " files, " + rejected
                + " rejected with a located error, " + loaded + " loaded");
        assertTrue(rejected > 0 && loaded > 0, "both outcomes must be exercised");
    }

    private static void assertFinite(FittedCorrelation c, int i) {
        String m = "case " + i + " (seed " + SEED + "): non-finite number in " + c;
        for (FittedParameter p : c.parameters()) {
            assertTrue(Double.isFinite(p.value()) && Double.isFinite(p.standardError()), m);
            assertTrue(Double.isFinite(p.ci95Low()) && Double.isFinite(p.ci95High()), m);
        }
        for (VariableRange r : c.variableRanges()) {
            assertTrue(Double.isFinite(r.min()) && Double.isFinite(r.max()), m);
        }
        FitStatistics s = c.statistics();
        assertTrue(Double.isFinite(s.residualSumOfSquares()) && Double.isFinite(s.residualStandardDeviation()), m);
        assertTrue(Double.isFinite(s.rSquared()) && Double.isFinite(s.adjustedRSquared()), m);
    }

    private static String generate(Random random, String valid) {
        return switch (random.nextInt(16)) {
            case 0 -> Fuzz.randomText(random, "{}[]\":,0123456789.eE+- abfrmsRe\\\n\t", 300);
            case 1 -> Fuzz.randomBytesAsText(random, 400);
            case 2 -> "\uFEFF" + valid.replace("\n", "\r\n");
            case 3 -> "[".repeat(random.nextInt(5_000)) + "]".repeat(random.nextInt(5_000));
            case 4 ->
                valid.replace(
                        "\"citation\" : \"",
                        "\"citation\" : \"" + "x".repeat(random.nextInt(random.nextInt(50) == 0 ? 300_000 : 400)));
            case 5 ->
                valid.replace("\"parameters\" : [", "\"parameters\" : [" + "{\"n\":".repeat(random.nextInt(2_000)));
            default -> mutate(random, valid, 1 + random.nextInt(3));
        };
    }

    private static String mutate(Random random, String text, int times) {
        String s = text;
        for (int t = 0; t < times; t++) {
            if (random.nextInt(3) == 0) {
                s = Fuzz.mutate(random, s, 1);
                continue;
            }
            int colon = s.indexOf(" : ", random.nextInt(Math.max(1, s.length())));
            if (colon < 0) {
                continue;
            }
            int startValue = colon + 3;
            int end = startValue;
            if (end < s.length() && s.charAt(end) == '"') {
                int close = s.indexOf('"', end + 1);
                end = close < 0 ? s.length() : close + 1;
            } else {
                while (end < s.length() && ",}]\n".indexOf(s.charAt(end)) < 0) {
                    end++;
                }
            }
            String replacement = switch (random.nextInt(4)) {
                case 0 -> NASTY_VALUES[random.nextInt(NASTY_VALUES.length)];
                case 1 -> Fuzz.nastyNumber(random);
                case 2 -> "\"" + Fuzz.nastyNumber(random) + "\"";
                default ->
                    s.substring(startValue, end) + ", \""
                            + s.substring(startValue, end).replace("\"", "") + "\" : 1";
            };
            s = s.substring(0, startValue) + replacement + s.substring(end);
        }
        return s;
    }
}
