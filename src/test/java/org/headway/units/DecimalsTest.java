package org.headway.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The fast decimal reading and writing against the JDK's own {@link Double#parseDouble} (the
 * reference: a general-purpose library routine specified to round correctly).
 */
class DecimalsTest {

    @Test
    void parsesToTheSameDoubleAsTheJdk() {
        SplittableRandom random = new SplittableRandom(17);
        for (int i = 0; i < 500_000; i++) {
            double v = i % 2 == 0 ? Double.longBitsToDouble(random.nextLong()) : random.nextDouble(-1e4, 1e4);
            if (!Double.isFinite(v)) {
                continue;
            }
            String jdk = Double.toString(v);
            assertEquals(Double.parseDouble(jdk), Decimals.parse(jdk), jdk);
            // Short decimals as people type them: rounded to a few places.
            String typed = String.format(java.util.Locale.ROOT, "%." + random.nextInt(0, 8) + "f", v % 1e6);
            assertEquals(Double.parseDouble(typed), Decimals.parse(typed), typed);
        }
        for (String s : new String[] {"1e400", "-1e-400", "0.1", "4.9e-324", "2.2250738585072011e-308", "+7", ".5"}) {
            assertEquals(Double.parseDouble(s), Decimals.parse(s), s);
        }
    }

    @Test
    void refusesWhatTheJdkRefuses() {
        for (String s : new String[] {"", "1,5", "1.2.3", "e5", "12 m", "--1"}) {
            assertThrows(NumberFormatException.class, () -> Double.parseDouble(s), s);
            assertThrows(NumberFormatException.class, () -> Decimals.parse(s), s);
        }
    }

    @Test
    void formatsShortestTextsThatReadBackExactly() {
        SplittableRandom random = new SplittableRandom(3);
        for (int i = 0; i < 500_000; i++) {
            double v = i % 2 == 0 ? Double.longBitsToDouble(random.nextLong()) : random.nextDouble() * 1000;
            if (!Double.isFinite(v)) {
                continue;
            }
            String text = Decimals.format(v);
            assertEquals(v, Double.parseDouble(text), text);
            // Never longer than the JDK's own text (Java 17's is at times a digit longer).
            assertEquals(true, text.length() <= Double.toString(v).length(), text + " vs " + Double.toString(v));
        }
        assertEquals("5.0E-5", Decimals.format(5e-5));
        assertEquals("0.05", Decimals.format(0.05));
        assertEquals("96.5", Decimals.format(96.5));
        assertEquals("1.0E7", Decimals.format(1e7));
    }
}
