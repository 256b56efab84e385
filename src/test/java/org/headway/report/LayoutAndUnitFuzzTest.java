package org.headway.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import org.headway.caution.InputException;
import org.headway.units.DimensionParser;
import org.junit.jupiter.api.Test;

/**
 * Fuzzing of two paths the earlier fuzz tests did not reach: the unit-to-dimension parser of
 * {@code groups} and the sheet's line breaking. Each mutated input either gives a result that keeps
 * the contract or an {@link InputException}; nothing else escapes (no stack overflow, no int wrap,
 * no index error). Seeded, so a failure repeats.
 */
class LayoutAndUnitFuzzTest {

    static final String UNIT_ALPHABET = "mgsKANJWLhkMµ^*/·.()-+0123456789 ²³⁻¹ePaHzbarminrpmdcolx";

    @Test
    void theUnitParserGivesBoundedExponentsOrALocatedError() {
        SplittableRandom random = new SplittableRandom(20261203);
        int parsed = 0;
        int refused = 0;
        for (int i = 0; i < 20_000; i++) {
            int length = 1 + random.nextInt(random.nextInt(10) == 0 ? 400 : 16);
            StringBuilder b = new StringBuilder();
            for (int k = 0; k < length; k++) {
                b.append(UNIT_ALPHABET.charAt(random.nextInt(UNIT_ALPHABET.length())));
            }
            String unit = b.toString();
            try {
                int[] e = DimensionParser.parse(unit, "--var x");
                assertEquals(DimensionParser.BASE_DIMENSIONS, e.length);
                for (int x : e) {
                    assertTrue(Math.abs(x) <= DimensionParser.MAX_EXPONENT, unit);
                }
                parsed++;
            } catch (InputException ex) {
                assertTrue(ex.getMessage().startsWith("--var x"), ex.getMessage());
                refused++;
            }
        }
        assertTrue(parsed > 100 && refused > 100, parsed + " parsed, " + refused + " refused");
    }

    @Test
    void lineBreakingKeepsEveryLineWithinItsWidthOrRefusesTheText() throws Exception {
        SplittableRandom random = new SplittableRandom(42);
        int[][] ranges = {
            {0x20, 0x7e},
            {0xa0, 0x17f},
            {0x370, 0x3ff},
            {0x400, 0x4ff},
            {0x590, 0x6ff},
            {0x2000, 0x206f},
            {0x4e00, 0x4e20},
            {0x1f600, 0x1f64f},
            {0x0, 0x1f}
        };
        int drawn = 0;
        int refused = 0;
        try (PdfLayout pdf = new PdfLayout()) {
            for (int i = 0; i < 3_000; i++) {
                StringBuilder b = new StringBuilder();
                int length = random.nextInt(random.nextInt(20) == 0 ? 3000 : 80);
                int[] range = ranges[random.nextInt(ranges.length)];
                for (int k = 0; k < length; k++) {
                    int[] r = random.nextInt(4) == 0 ? ranges[random.nextInt(ranges.length)] : range;
                    b.appendCodePoint(random.nextInt(5) == 0 ? ' ' : r[0] + random.nextInt(r[1] - r[0] + 1));
                }
                float width = 20 + random.nextInt(500);
                try {
                    List<String> lines =
                            pdf.wrap(b.toString(), random.nextBoolean() ? pdf.regular : pdf.bold, 8f, width);
                    for (String line : lines) {
                        assertTrue(pdf.widthOf(line, pdf.regular, 8f) <= width * 1.2f + 1, "too wide: " + line);
                    }
                    drawn++;
                } catch (InputException e) {
                    assertTrue(e.getMessage().contains("cannot print"), e.getMessage());
                    refused++;
                }
            }
        }
        assertTrue(drawn > 100 && refused > 100, drawn + " drawn, " + refused + " refused");
    }
}
