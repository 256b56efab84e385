package org.headway.units;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.Random;
import org.headway.Fuzz;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;

/**
 * Quantity strings fuzzed: 10,000 generated strings per run, each parsed as every {@link
 * QuantityKind}. Every outcome must be a finite SI value or an {@link InputException} naming the
 * field it was given — never another exception, never NaN or infinity, never a hang.
 */
class QuantitiesFuzzTest {

    static final int INPUTS = 10_000;
    static final long SEED = 8_101L;
    /** Longest any single string may take for all kinds together (ms), generous for a loaded machine. */
    static final long PER_INPUT_BUDGET_MS = 2_000;

    private static final String[] VALID = {
        "150 mm",
        "6 in",
        "35 m",
        "12 ft",
        "0.045 mm",
        "12 L/s",
        "43 m3/h",
        "190 gpm",
        "2.5 m/s",
        "8 ft/s",
        "250 kPa",
        "2.4 bar",
        "35 psi",
        "1 atm",
        "20 degC",
        "68 degF",
        "293.15 K",
        "25°C",
        "998 kg/m3",
        "62.4 lb/ft³",
        "1.0 mPa*s",
        "1 cP",
        "1.0e-6 m2/s",
        "1 cSt",
        "0.5",
        "3 m^3/s",
        "12 mbar",
        "40 um"
    };

    private static final String[] UNITS = {
        "m", "mm", "km", "in", "ft", "L/s", "m3/h", "m^3/s", "gpm", "gal/min", "kPa", "MPa", "bar", "psi", "atm",
        "degC", "°C", "degF", "°F", "K", "F", "C", "kg/m3", "lb/ft3", "Pa*s", "mPa·s", "cP", "cSt", "m2/s", "s", "kg",
        "%", "1/0", "m/0", "m^999", "m^-1", "(m)", "m**2", "mm/mm", "h", "min", "lb", "µm", "um", "N", "J/kg"
    };

    @Test
    void everyStringGivesAFiniteValueOrALocatedError() {
        Random random = new Random(SEED);
        long tried = 0;
        long rejected = 0;
        for (int i = 0; i < INPUTS; i++) {
            String input = generate(random);
            long start = System.nanoTime();
            for (QuantityKind kind : QuantityKind.values()) {
                tried++;
                String where = "--field-" + kind.name();
                try {
                    double value = Quantities.parse(input, kind, where);
                    assertTrue(
                            Double.isFinite(value),
                            "case " + i + " (seed " + SEED + "): " + kind + " \"" + Fuzz.abbreviate(input) + "\" gave "
                                    + value);
                } catch (InputException e) {
                    rejected++;
                    Fuzz.assertLocated(e, where, SEED, i);
                } catch (RuntimeException | StackOverflowError e) {
                    fail(
                            "case " + i + " (seed " + SEED + "): " + kind + " \"" + Fuzz.abbreviate(input) + "\" threw "
                                    + e,
                            e);
                }
            }
            long ms = (System.nanoTime() - start) / 1_000_000;
            assertTrue(ms < PER_INPUT_BUDGET_MS, "case " + i + " (seed " + SEED + ") took " + ms + " ms");
        }
        org.headway.Fuzz.summary("quantity strings fuzz: " + INPUTS + " strings × " + QuantityKind.values().length
                + " kinds = " + tried + " parses, " + rejected + " rejected with a located error");
        assertTrue(rejected > 0 && rejected < tried, "the generator must exercise both outcomes");
    }

    private static String generate(Random random) {
        String valid = VALID[random.nextInt(VALID.length)];
        return switch (random.nextInt(12)) {
            case 0 -> Fuzz.randomText(random, "0123456789.eE+- mkLsgpaPCFK°/^*·³²()%degin", 30);
            case 1 -> Fuzz.randomBytesAsText(random, 40);
            case 2 ->
                Fuzz.nastyNumber(random) + (random.nextBoolean() ? " " : "") + UNITS[random.nextInt(UNITS.length)];
            case 3 -> Fuzz.nastyNumber(random);
            case 4 -> "\uFEFF" + valid + "\r\n";
            case 5 -> valid + " " + "m/".repeat(random.nextInt(random.nextInt(50) == 0 ? 5_000 : 30)) + "s";
            case 6 -> "1 " + "(".repeat(random.nextInt(3_000)) + "m" + ")".repeat(random.nextInt(3_000));
            case 7 ->
                (random.nextBoolean() ? "1e" : "-1e") + (random.nextInt(700) - 350) + " "
                        + UNITS[random.nextInt(UNITS.length)];
            case 8 ->
                "1" + "0".repeat(random.nextInt(random.nextInt(50) == 0 ? 100_000 : 400)) + " "
                        + UNITS[random.nextInt(UNITS.length)];
            default -> Fuzz.mutate(random, valid, 1 + random.nextInt(3));
        };
    }
}
