package org.headway.friction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The caution messages' fast six-digit formatting against {@link BigDecimal}, the JDK's exact
 * decimal arithmetic (a general-purpose reference library): same text for every value not within
 * 10⁻⁹ of a rounding tie, where the two may round the tie differently.
 */
class FrictionChecksFormatTest {

    @Test
    void agreesWithBigDecimalOverTwentyDecades() {
        SplittableRandom random = new SplittableRandom(20261202);
        int compared = 0;
        for (int i = 0; i < 200_000; i++) {
            double v = Math.pow(10, random.nextDouble(-12, 12)) * (random.nextBoolean() ? 1 : -1);
            if (i % 5 == 0) {
                // Short decimals such as Re = 4000 or ε/D = 0.0003 are what messages mostly show.
                v = Math.round(v * 1e3) / 1e3;
                if (v == 0) {
                    continue;
                }
            }
            if (nearTie(v)) {
                continue;
            }
            assertEquals(FrictionChecks.formatExactly(v), FrictionChecks.format(v), "value " + v);
            compared++;
        }
        assertTrue(compared > 180_000, "compared " + compared);
    }

    @Test
    void spellingsAtTheEdges() {
        // Expected spellings worked out by hand from BigDecimal.toString's documented rules.
        assertEquals("4000", FrictionChecks.format(4000));
        assertEquals("0.0003", FrictionChecks.format(3e-4));
        assertEquals("0.00005", FrictionChecks.format(5e-5));
        assertEquals("0.0000015", FrictionChecks.format(1.5e-6));
        assertEquals("1e-7", FrictionChecks.format(1e-7));
        assertEquals("1e8", FrictionChecks.format(1e8));
        assertEquals("1.23457e7", FrictionChecks.format(12345678));
        assertEquals("10000000", FrictionChecks.format(9999999.7));
        assertEquals("1000", FrictionChecks.format(999.9996));
        assertEquals("-2.5", FrictionChecks.format(-2.5));
        assertEquals("0.000001", FrictionChecks.format(9.999996e-7));
        for (double v : new double[] {1e-4, 1e7, 1e-6, 123456.7, 0.1, 1, 99999.95, 1e-300, 1e300, 4.9e-324}) {
            assertEquals(FrictionChecks.formatExactly(v), FrictionChecks.format(v), "value " + v);
        }
    }

    /** Whether v's shortest decimal lies within 10⁻⁹ (relative) of a six-digit half-way point. */
    private static boolean nearTie(double v) {
        BigDecimal d = BigDecimal.valueOf(Math.abs(v));
        BigDecimal down = d.round(new MathContext(6, RoundingMode.DOWN));
        BigDecimal ulp = down.ulp();
        BigDecimal half = down.add(ulp.divide(BigDecimal.valueOf(2)));
        return d.subtract(half).abs().compareTo(d.multiply(new BigDecimal("1e-9"))) < 0;
    }
}
