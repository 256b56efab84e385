package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionMethods;
import org.headway.friction.FrictionResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * The parallel friction batch against a plain one-row-at-a-time reference built on the
 * general-purpose commons-csv library for reading and writing: on the batch fuzzer's generated
 * files (and a file of many blocks) the output must be the same bytes, and a file the library
 * cannot read must be refused whole (exit 2) by the batch too.
 */
class FrictionBatchReferenceTest {

    /** The reference: what the batch must write for {@code text}, or null where the file is unreadable. */
    private static String reference(String text, FrictionCorrelation correlation) throws Exception {
        if (!text.isEmpty() && text.charAt(0) == '\uFEFF') {
            text = text.substring(1);
        }
        StringWriter out = new StringWriter();
        try (CSVParser parser = CSVFormat.DEFAULT
                .builder()
                .setHeader()
                .setSkipHeaderRecord(true)
                .setIgnoreSurroundingSpaces(true)
                .get()
                .parse(new StringReader(text))) {
            List<String> columns = parser.getHeaderNames();
            if (!columns.contains("re") || !columns.contains("relative_roughness")) {
                return null;
            }
            for (String produced : FrictionCommand.RESULT_COLUMNS) {
                if (columns.contains(produced)) {
                    return null;
                }
            }
            List<String> header = new ArrayList<>();
            columns.forEach(c -> header.add(org.headway.report.SafeText.echoedCell(c)));
            header.addAll(FrictionCommand.RESULT_COLUMNS);
            CSVPrinter printer = CSVFormat.DEFAULT
                    .builder()
                    .setHeader(header.toArray(String[]::new))
                    .get()
                    .print(out);
            long row = 0;
            for (CSVRecord record : parser) {
                row++;
                List<String> cells = new ArrayList<>();
                for (int i = 0; i < columns.size(); i++) {
                    cells.add(i < record.size() ? org.headway.report.SafeText.echoedCell(record.get(i)) : "");
                }
                try {
                    if (record.size() != columns.size()) {
                        throw new InputException(
                                "row " + row, "has " + record.size() + " fields, the header has " + columns.size());
                    }
                    FrictionResult r = evaluate(correlation, record, row);
                    cells.add(org.headway.units.Decimals.format(r.frictionFactor()));
                    cells.add(r.regime().name().toLowerCase(java.util.Locale.ROOT));
                    cells.add(r.method());
                    cells.add(String.join(
                            ";", r.cautions().stream().map(Caution::code).toList()));
                    cells.add("");
                } catch (InputException | org.apache.commons.math3.exception.ConvergenceException e) {
                    cells.addAll(List.of("", "", correlation.id(), "", e.getMessage()));
                }
                printer.printRecord(cells);
            }
            printer.flush();
        } catch (java.io.IOException | java.io.UncheckedIOException | IllegalArgumentException e) {
            return null;
        }
        return out.toString();
    }

    private static FrictionResult evaluate(FrictionCorrelation correlation, CSVRecord record, long row) {
        String where = "row " + row;
        double re = number(record.get("re"), where + ", column re");
        double rr = number(record.get("relative_roughness"), where + ", column relative_roughness");
        try {
            return correlation.evaluate(re, rr);
        } catch (InputException e) {
            throw e.at(where + ", ");
        }
    }

    private static double number(String text, String where) {
        String t = text.strip();
        boolean nonFinite = List.of("NaN", "+NaN", "-NaN", "Infinity", "+Infinity", "-Infinity")
                .contains(t);
        if (!org.headway.units.Decimals.isPlainDecimal(text) && !nonFinite) {
            throw new InputException(where, "not a number: '" + text + "'");
        }
        try {
            return org.headway.units.Decimals.parse(text);
        } catch (NumberFormatException e) {
            throw new InputException(where, "not a number: '" + text + "'");
        }
    }

    private static void compare(Path dir, String text, String method, String m) throws Exception {
        Path input = dir.resolve("points.csv");
        Path output = dir.resolve("result.csv");
        Files.writeString(input, text, StandardCharsets.UTF_8);
        Files.deleteIfExists(output);
        CommandLine cl = HeadwayCommand.commandLine();
        cl.setOut(new PrintWriter(new StringWriter()));
        cl.setErr(new PrintWriter(new StringWriter()));
        int code =
                cl.execute("friction", "--method", method, "--input", input.toString(), "--output", output.toString());
        String expected;
        try {
            expected = reference(text, FrictionMethods.byId(method));
        } catch (InputException e) {
            expected = null;
        }
        if (expected == null) {
            assertEquals(2, code, m + "\nthe reference cannot read this file; the batch wrote it");
        } else if (code == 2) {
            // The reference reads files the batch refuses only where the batch checks more (none today).
            throw new AssertionError(m + "\nthe batch refused a file the reference reads");
        } else {
            assertEquals(expected, Files.readString(output, StandardCharsets.UTF_8), m);
        }
    }

    @Test
    void sameBytesAsTheReferenceOnGeneratedFiles(@TempDir Path dir) throws Exception {
        Random random = new Random(77_001L);
        for (int i = 0; i < 3_000; i++) {
            String text = FrictionBatchFuzzTest.generate(random);
            compare(
                    dir,
                    text,
                    i % 3 == 0 ? "colebrook" : "auto",
                    "case " + i + ":\n" + org.headway.Fuzz.abbreviate(text));
        }
    }

    @Test
    void sameBytesOverManyBlocksWithBadRowsSpread(@TempDir Path dir) throws Exception {
        Random random = new Random(5L);
        StringBuilder text = new StringBuilder("point,re,relative_roughness,note\n");
        int rows = 30_000;
        for (int i = 0; i < rows; i++) {
            double re = Math.pow(10, 2 + 6 * random.nextDouble());
            double rr = random.nextInt(1_000) == 0 ? -1 : 1e-6 * Math.pow(10, 4 * random.nextDouble());
            text.append('p').append(i).append(',').append(re).append(',').append(rr);
            text.append(random.nextInt(50) == 0 ? ",\"a, quoted \"\"note\"\"\"\n" : ",\n");
        }
        compare(dir, text.toString(), "auto", "30,000 rows");
        String written = Files.readString(dir.resolve("result.csv"));
        assertEquals(rows + 1, written.split("\r\n", -1).length - 1, "one line per row and the header");
        assertTrue(written.contains("not a number") || written.contains("relative"), "bad rows carry errors");
    }
}
