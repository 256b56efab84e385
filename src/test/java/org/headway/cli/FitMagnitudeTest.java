package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Fit data at extreme magnitudes: refused with the file, line and column where squares would leave
 * the range of a double (no NaN or Infinity printed with exit 0, no internal error), and fitted to
 * the same relative answer as data near 1 where they are inside it.
 */
class FitMagnitudeTest {

    @TempDir
    Path dir;

    private Path data(double scale) throws Exception {
        StringBuilder b = new StringBuilder("x,y\n");
        for (int i = 1; i <= 7; i++) {
            b.append(i)
                    .append(',')
                    .append(String.format(Locale.ROOT, "%.17g", scale * (2 * i + 1 + 0.1 * (i % 3))))
                    .append('\n');
        }
        Path p = dir.resolve("d" + Math.abs(Double.hashCode(scale)) + ".csv");
        Files.writeString(p, b.toString());
        return p;
    }

    @Test
    void magnitudesWhoseSquaresLeaveTheDoubleRangeAreRefusedWithTheirCell() throws Exception {
        for (double scale : new double[] {1e-170, 1e160, 1e308}) {
            for (String[] form : new String[][] {
                {"--form", "linear"}, {"--form", "power"}, {"--expression", "a*x+b", "--start", "a=1,b=1"}
            }) {
                String[] base = {"fit", data(scale).toString(), "--y", "y", "--x", "x"};
                String[] args = new String[base.length + form.length];
                System.arraycopy(base, 0, args, 0, base.length);
                System.arraycopy(form, 0, args, base.length, form.length);
                CliRun r = CliRun.of(args);
                assertEquals(2, r.exitCode(), scale + " " + String.join(" ", form) + ": " + r.out() + r.err());
                assertTrue(r.err().contains("line 2, column y"), r.err());
                assertFalse(r.out().contains("NaN") || r.out().contains("Infinity"));
                assertFalse(r.err().contains("internal error"), r.err());
            }
        }
    }

    @Test
    void insideTheRangeTheFitScalesWithTheData() throws Exception {
        CliRun unit =
                CliRun.of("fit", data(1).toString(), "--y", "y", "--x", "x", "--form", "linear", "--format", "json");
        CliRun small = CliRun.of(
                "fit", data(1e-90).toString(), "--y", "y", "--x", "x", "--form", "linear", "--format", "json");
        assertEquals(0, unit.exitCode(), unit.err());
        assertEquals(0, small.exitCode(), small.err());
        var a = new com.fasterxml.jackson.databind.ObjectMapper().readTree(unit.out());
        var b = new com.fasterxml.jackson.databind.ObjectMapper().readTree(small.out());
        // Least squares is linear in y: scaling y by 1e-90 scales every parameter and error by 1e-90.
        var pa = a.findValues("value");
        var pb = b.findValues("value");
        assertTrue(!pa.isEmpty() && pa.size() == pb.size());
        for (int i = 0; i < pa.size(); i++) {
            if (pa.get(i).isNumber()) {
                assertEquals(
                        pa.get(i).asDouble() * 1e-90,
                        pb.get(i).asDouble(),
                        1e-12 * Math.abs(pa.get(i).asDouble() * 1e-90));
            }
        }
        assertFalse(small.out().contains("NaN"));
    }
}
