package org.headway.fluid;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import org.headway.Fuzz;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * User fluid tables fuzzed: 10,000 generated files per run (random text and bytes, mutations of a
 * bundled glycol table: deleted, duplicated and swapped lines and columns, nasty numbers, BOM and
 * CRLF, long lines). Each load gives a fluid whose states are finite and positive at a few
 * temperatures inside its table, or an {@link InputException} naming the file — never another
 * exception, never NaN, never a hang.
 */
class UserFluidTableFuzzTest {

    static final int INPUTS = 10_000;
    static final long SEED = 8_404L;
    static final long PER_INPUT_BUDGET_MS = 2_000;

    @Test
    void everyTableGivesAFiniteFluidOrALocatedError(@TempDir Path dir) throws Exception {
        String valid;
        try (InputStream in = getClass().getResourceAsStream("/fluids-data/fluids/ethylene-glycol-20.csv")) {
            valid = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        Random random = new Random(SEED);
        Path file = dir.resolve("my-brine.csv");
        int rejected = 0;
        int loaded = 0;
        for (int i = 0; i < INPUTS; i++) {
            String input = generate(random, valid);
            // Every tenth input goes through a real file; the rest through the same parser in memory,
            // which keeps the run short on a slow disk.
            boolean viaFile = i % 10 == 0;
            if (viaFile) {
                Files.writeString(file, input, StandardCharsets.UTF_8);
            }
            long start = System.nanoTime();
            try {
                TabulatedFluid fluid = viaFile
                        ? UserFluidTable.load(file)
                        : UserFluidTable.parse(input, "my-brine.csv", "my-brine", "user table my-brine.csv");
                checkStates(fluid, i);
                loaded++;
            } catch (InputException e) {
                rejected++;
                Fuzz.assertLocated(e, "my-brine.csv", SEED, i);
            } catch (RuntimeException | StackOverflowError e) {
                fail("case " + i + " (seed " + SEED + ") threw " + e + " for input:\n" + Fuzz.abbreviate(input), e);
            }
            long ms = (System.nanoTime() - start) / 1_000_000;
            assertTrue(ms < PER_INPUT_BUDGET_MS, "case " + i + " (seed " + SEED + ") took " + ms + " ms");
        }
        org.headway.Fuzz.summary("user fluid table fuzz: " + INPUTS + " files, " + rejected
                + " rejected with a located error, " + loaded + " loaded");
        assertTrue(rejected > 0 && loaded > 0, "both outcomes must be exercised");
    }

    /** States at the ends and middle of the table must be finite and positive. */
    private static void checkStates(TabulatedFluid fluid, int i) {
        double low = fluid.minTemperature();
        double high = fluid.maxTemperature();
        // Inside its own table a loaded fluid must give a state: no error is acceptable here.
        for (double t : new double[] {low, 0.5 * (low + high), high}) {
            FluidState s = fluid.state(t, 101_325.0);
            String m = "case " + i + " (seed " + SEED + "): state at " + t + " K is " + s;
            assertTrue(Double.isFinite(s.density()) && s.density() > 0, m);
            assertTrue(Double.isFinite(s.dynamicViscosity()) && s.dynamicViscosity() > 0, m);
            assertTrue(Double.isFinite(s.kinematicViscosity()) && s.kinematicViscosity() > 0, m);
        }
    }

    private static String generate(Random random, String valid) {
        return switch (random.nextInt(14)) {
            case 0 -> Fuzz.randomText(random, "0123456789,.-e \n#[]degCKkgm3Pa*s", 200);
            case 1 -> Fuzz.randomBytesAsText(random, 300);
            case 2 -> "\uFEFF" + valid.replace("\n", "\r\n");
            case 3 -> valid + "1" + "0".repeat(random.nextInt(random.nextInt(50) == 0 ? 200_000 : 400)) + ", 1000, 1\n";
            case 4 -> valid.replace("\n", "\r");
            case 5 -> Fuzz.mutateLines(random, valid);
            case 6 -> Fuzz.mutateColumns(random, valid);
            case 7, 8, 9 -> Fuzz.replaceCell(random, valid);
            default -> Fuzz.mutate(random, valid, 1 + random.nextInt(3));
        };
    }
}
