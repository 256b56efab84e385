package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Random;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.system.HeadLossCalculator;
import org.headway.system.RunResult;
import org.headway.system.SegmentResult;
import org.junit.jupiter.api.Test;

/**
 * Project JSON fuzzed with 10,000 generated inputs per run: random text, random bytes and
 * mutations of the demo project (deleted, duplicated and swapped pieces, huge and tiny numbers, NaN
 * and Infinity spelled several ways, wrong units, BOMs and CRLF, long lines, deep nesting). Every
 * outcome must be a finite result or an {@link InputException} that says where — never another
 * exception, never NaN, never a hang.
 */
class ProjectFuzzTest {

    static final int INPUTS = 10_000;
    /** Seed printed on failure so a case can be replayed. */
    static final long SEED = 20_261_201L;
    /** Longest any single input may take (ms): generous for a loaded CI machine. */
    static final long PER_INPUT_BUDGET_MS = 2_000;

    private static final String[] NASTY = {
        "NaN",
        "\"NaN m\"",
        "\"nan\"",
        "Infinity",
        "\"Infinity m\"",
        "\"-inf L/s\"",
        "\"∞ m\"",
        "1e308",
        "1e-320",
        "\"1e308 m\"",
        "\"4.9e-324 mm\"",
        "-0",
        "\"-1 m\"",
        "\"0 mm\"",
        "\"12 L/s\"",
        "\"20 degC\"",
        "\"12 kPa\"",
        "\"3 F\"",
        "\"\"",
        "null",
        "true",
        "[]",
        "{}",
        "\"" + "9".repeat(400) + " m\"",
        "\"0.5\"",
        "\"5 %\"",
        "\"150 %\"",
        "\"1/0 m\"",
        "\"\\u0000\"",
        "-1",
        "0",
        "2147483648",
        "3.5"
    };

    @Test
    void everyInputGivesAResultOrALocatedError() throws Exception {
        fuzz("/fluids-data/examples/demo-orchard-booster.json", SEED);
    }

    /**
     * The element-model inputs: valves by Kv, rated components, reducers, isolation valves, site
     * altitude and pressure limits, mutated the same way.
     */
    @Test
    void elementModelInputsGiveAResultOrALocatedError() throws Exception {
        fuzz("/fluids-data/examples/coil-branch.json", SEED + 1);
    }

    private void fuzz(String base, long seed) throws Exception {
        String demo;
        try (InputStream in = getClass().getResourceAsStream(base)) {
            demo = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        Random random = new Random(seed);
        int rejected = 0;
        int solved = 0;
        for (int i = 0; i < INPUTS; i++) {
            String input = generate(random, demo);
            long start = System.nanoTime();
            try {
                ResolvedProject r = ProjectResolver.resolve(ProjectFile.parse(input), Catalog.bundled(), Path.of("."));
                RunResult result = HeadLossCalculator.solve(r.run(), r.run().designFlow());
                assertFinite(result, i);
                solved++;
            } catch (InputException e) {
                rejected++;
                assertFalse(e.getMessage() == null || e.getMessage().isBlank(), "empty message, case " + i);
                // A place: the key path or the line and column, never only a colon inside the prose; a
                // list of several problems names one on every line.
                boolean located = !e.where().isBlank();
                if (!located && e.problem().matches("(?s)\\d+ problems:\n.*")) {
                    located = e.problem()
                            .lines()
                            .skip(1)
                            .allMatch(l -> l.strip().matches("[A-Za-z_$][^ :]*(\\[[0-9]+\\])?[^:]*: .*"));
                }
                assertTrue(located, "case " + i + " (seed " + seed + "): message names no place: " + e.getMessage());
                assertFalse(e.problem().isBlank(), "case " + i + ": no problem stated");
            } catch (RuntimeException | StackOverflowError e) {
                fail("case " + i + " (seed " + seed + ") threw " + e + " for input:\n" + abbreviate(input), e);
            }
            long ms = (System.nanoTime() - start) / 1_000_000;
            assertTrue(ms < PER_INPUT_BUDGET_MS, "case " + i + " took " + ms + " ms");
        }
        org.headway.Fuzz.summary("project JSON fuzz of " + base + ": " + INPUTS + " inputs, " + rejected
                + " rejected with a located error, " + solved + " solved");
        assertTrue(solved > 0 && rejected > 0, "the generator must exercise both outcomes");
    }

    private static void assertFinite(RunResult r, int i) {
        assertTrue(Double.isFinite(r.totals().totalHead()), "case " + i);
        assertTrue(Double.isFinite(r.totals().pressureDrop()), "case " + i);
        for (SegmentResult s : r.segments()) {
            assertTrue(Double.isFinite(s.frictionFactor()) && Double.isFinite(s.reynolds()), "case " + i);
            assertTrue(Double.isFinite(s.majorHeadLoss()) && Double.isFinite(s.minorHeadLoss()), "case " + i);
        }
    }

    static String generate(Random random, String valid) {
        int kind = random.nextInt(20);
        return switch (kind) {
            case 0 -> randomText(random);
            case 1 -> new String(randomBytes(random), StandardCharsets.UTF_8);
            case 2 -> "\uFEFF" + valid.replace("\n", "\r\n");
            case 3 -> "{".repeat(random.nextInt(5000)) + "}".repeat(random.nextInt(5000));
            case 4 -> valid.replace("\"title\": \"", "\"title\": \"" + "x".repeat(200_000));
            default -> mutate(random, valid, 1 + random.nextInt(3));
        };
    }

    private static String mutate(Random random, String text, int times) {
        String s = text;
        for (int t = 0; t < times; t++) {
            int choice = random.nextInt(6);
            int a = random.nextInt(s.length());
            int b = Math.min(s.length(), a + random.nextInt(60));
            switch (choice) {
                case 0 -> s = s.substring(0, a) + s.substring(b); // delete a piece
                case 1 -> s = s.substring(0, b) + s.substring(a, b) + s.substring(b); // duplicate a piece
                case 2 -> { // replace a quoted value by something nasty
                    int q = s.indexOf(": ", a);
                    if (q > 0) {
                        int end = nextValueEnd(s, q + 2);
                        s = s.substring(0, q + 2) + NASTY[random.nextInt(NASTY.length)] + s.substring(end);
                    }
                }
                case 3 -> { // swap two pieces
                    int c = random.nextInt(s.length());
                    int d = Math.min(s.length(), c + random.nextInt(40));
                    if (b <= c) {
                        s = s.substring(0, a)
                                + s.substring(c, d)
                                + s.substring(b, c)
                                + s.substring(a, b)
                                + s.substring(d);
                    }
                }
                case 4 -> s = s.replace("\" m\"", "\" L/s\"").replace("\"m\"", "\"kg\""); // wrong units
                default -> s = s.substring(0, a) + (char) random.nextInt(0x3000) + s.substring(a); // a stray character
            }
        }
        return s;
    }

    private static int nextValueEnd(String s, int from) {
        int i = from;
        if (i < s.length() && s.charAt(i) == '"') {
            int close = s.indexOf('"', i + 1);
            return close < 0 ? s.length() : close + 1;
        }
        while (i < s.length() && ",}]\n".indexOf(s.charAt(i)) < 0) {
            i++;
        }
        return i;
    }

    private static String randomText(Random random) {
        StringBuilder b = new StringBuilder();
        int n = random.nextInt(300);
        String alphabet = "{}[]\":,0123456789.eE+- abcdefghijklmnopqrstuvwxyzLsmkPa°µ\\\n\t";
        for (int i = 0; i < n; i++) {
            b.append(alphabet.charAt(random.nextInt(alphabet.length())));
        }
        return b.toString();
    }

    private static byte[] randomBytes(Random random) {
        byte[] bytes = new byte[random.nextInt(500)];
        random.nextBytes(bytes);
        return bytes;
    }

    private static String abbreviate(String s) {
        return s.length() <= 2000 ? s : s.substring(0, 2000) + "…";
    }
}
