package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.headway.Fuzz;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Friction batch CSV fuzzed: 10,000 generated input files per run through {@code headway friction
 * --input FILE --output FILE}. Exit code 0, 1 or 2 only; on 2 one line on stderr naming the input and
 * the previous output file untouched; never a stack trace or "internal error"; a written output has
 * the input columns plus the result columns on every row, and its friction factors are finite and
 * positive (never NaN or Infinity written).
 */
class FrictionBatchFuzzTest {

    static final int INPUTS = 10_000;
    static final long SEED = 8_606L;
    static final long PER_INPUT_BUDGET_MS = 2_000;

    private static final String VALID = "point,re,relative_roughness,note\n"
            + "p1,100000,0.0001,rig A\n"
            + "p2,1500,0,\"laminar, clean\"\n"
            + "p3,3000,0.001,transition\n"
            + "p4,5e6,0.01,rough\n"
            + "p5,2.3e4,1e-5,\n";

    @Test
    void everyBatchExitsCleanlyAndWritesWellFormedRows(@TempDir Path dir) throws Exception {
        Random random = new Random(SEED);
        Path input = dir.resolve("points.csv");
        Path output = dir.resolve("result.csv");
        String previous = "previous good result\n";
        CommandLine cl = HeadwayCommand.commandLine();
        int[] exits = new int[3];
        boolean outputIsPrevious = false;
        for (int i = 0; i < INPUTS; i++) {
            String text = generate(random);
            Files.writeString(input, text, StandardCharsets.UTF_8);
            if (!outputIsPrevious) {
                Files.writeString(output, previous, StandardCharsets.UTF_8);
            }
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            cl.setOut(new PrintWriter(out));
            cl.setErr(new PrintWriter(err));
            long start = System.nanoTime();
            int code = cl.execute("friction", "--input", input.toString(), "--output", output.toString(), "--force");
            long ms = (System.nanoTime() - start) / 1_000_000;
            String m = "case " + i + " (seed " + SEED + ") exit " + code + ", stderr: " + err + "\ninput:\n"
                    + Fuzz.abbreviate(text);
            assertTrue(ms < PER_INPUT_BUDGET_MS, m + "\ntook " + ms + " ms");
            assertTrue(code >= 0 && code <= 2, m);
            exits[code]++;
            String e = err.toString();
            assertFalse(e.contains("internal error") || e.contains("\tat ") || e.contains("Exception"), m);
            if (code == 2) {
                assertEquals(1, e.lines().count(), m);
                assertTrue(e.startsWith("headway: --input " + input), m);
                assertEquals(previous, Files.readString(output), m + "\nthe previous output was touched");
                outputIsPrevious = true;
            } else {
                outputIsPrevious = false;
                checkOutput(text, Files.readString(output, StandardCharsets.UTF_8), code, e, m);
            }
        }
        org.headway.Fuzz.summary("friction batch CSV fuzz: " + INPUTS + " files, " + exits[2]
                + " rejected whole (exit 2) with a located error, " + exits[1] + " with some rows refused (exit 1), "
                + exits[0] + " clean (exit 0)");
        assertTrue(exits[0] > 0 && exits[1] > 0 && exits[2] > 0, "all outcomes must be exercised");
    }

    private static void checkOutput(String input, String written, int code, String err, String m) throws Exception {
        List<CSVRecord> records;
        try (CSVParser p = CSVParser.parse(new StringReader(written), CSVFormat.DEFAULT)) {
            records = p.getRecords();
        }
        assertFalse(records.isEmpty(), m + "\nno header written");
        List<String> header = records.get(0).toList();
        int resultColumn = header.indexOf("friction_factor");
        int errorColumn = header.indexOf("error");
        assertTrue(resultColumn > 0 && errorColumn == header.size() - 1, m + "\nheader " + header);
        int failed = 0;
        for (CSVRecord r : records.subList(1, records.size())) {
            assertEquals(header.size(), r.size(), m + "\nrow " + r.getRecordNumber() + " " + r.toList());
            String f = r.get(resultColumn);
            if (f.isEmpty()) {
                failed++;
                assertFalse(r.get(errorColumn).isEmpty(), m + "\nrow without result and without error");
                assertTrue(r.get(errorColumn).startsWith("row "), m + "\nerror does not name its row: " + r);
            } else {
                double value = Double.parseDouble(f);
                assertTrue(Double.isFinite(value) && value > 0, m + "\nf = " + f);
                assertTrue(r.get(errorColumn).isEmpty(), m);
            }
            for (String cell : r.toList().subList(resultColumn, header.size() - 1)) {
                assertFalse(cell.contains("NaN") || cell.contains("Infinity"), m + "\nnon-finite written: " + r);
            }
        }
        if (code == 1) {
            assertTrue(failed > 0, m);
            assertEquals(1, err.lines().count(), m);
            assertTrue(err.startsWith("headway: " + failed + " of "), m);
        } else {
            assertEquals(0, failed, m);
            assertTrue(err.isEmpty(), m);
        }
    }

    static String generate(Random random) {
        return switch (random.nextInt(16)) {
            case 0 -> Fuzz.randomText(random, "0123456789,.-e \n\"re_lativughns", 200);
            case 1 -> Fuzz.randomBytesAsText(random, 300);
            case 2 -> "\uFEFF" + VALID.replace("\n", "\r\n");
            case 3 -> VALID + "p6," + "1".repeat(random.nextInt(random.nextInt(50) == 0 ? 200_000 : 400)) + ",0,long\n";
            case 4 -> VALID.replace("\n", "\r");
            case 5 -> VALID + "p7,\"" + "x\n".repeat(random.nextInt(1_000)) + "\",0,open quote";
            case 6 -> Fuzz.mutateLines(random, VALID);
            case 7 -> Fuzz.mutateColumns(random, VALID);
            case 8, 9, 10 -> {
                String s = VALID;
                for (int k = 0; k <= random.nextInt(3); k++) {
                    s = Fuzz.replaceCell(random, s);
                }
                yield s;
            }
            case 11 -> VALID.replace("re,", random.nextBoolean() ? "Re," : "re,error,");
            default -> Fuzz.mutate(random, VALID, 1 + random.nextInt(3));
        };
    }
}
