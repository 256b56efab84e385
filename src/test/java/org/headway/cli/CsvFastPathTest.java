package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;

/**
 * The friction batch's own CSV reader and cell writer against the general-purpose commons-csv
 * library (the reference): on generated text the records read must equal the library's, malformed
 * text must be refused by both, and written cells must be the library's bytes. The generator leans
 * on the characters that matter (quotes, commas, CR, LF, spaces, tabs, vertical tab, formula signs).
 */
class CsvFastPathTest {

    private static final CSVFormat READ =
            CSVFormat.DEFAULT.builder().setIgnoreSurroundingSpaces(true).get();

    private static final String ALPHABET = "ab1.e-,,,\"\"\n\n\r  \t\u000b#=+@x\u00e9\u20ac\ud83d\ude00";

    private static List<List<String>> library(String text) throws IOException {
        List<List<String>> records = new ArrayList<>();
        try (CSVParser parser = READ.parse(new StringReader(text))) {
            for (CSVRecord record : parser) {
                records.add(record.toList());
            }
        }
        return records;
    }

    private static List<List<String>> ours(String text, int bufferLimit) throws IOException {
        List<List<String>> records = new ArrayList<>();
        // A reader that hands out a few characters at a time, so that fields cross buffer ends.
        java.io.Reader in = new java.io.FilterReader(new StringReader(text)) {
            @Override
            public int read(char[] cbuf, int off, int len) throws IOException {
                return super.read(cbuf, off, Math.min(len, bufferLimit));
            }
        };
        CsvRecordReader reader = new CsvRecordReader(in, "test");
        String[] record;
        while ((record = reader.next()) != null) {
            records.add(List.of(record));
        }
        return records;
    }

    private static String generate(Random random) {
        int length = random.nextInt(60);
        StringBuilder s = new StringBuilder();
        for (int i = 0; i < length; i++) {
            s.append(ALPHABET.charAt(random.nextInt(ALPHABET.length())));
        }
        return s.toString();
    }

    /** A cell as a data file mostly holds: letters, digits, point, minus. */
    private static String plainCell(Random random) {
        String letters = "abcxyz0123456789.-e";
        StringBuilder s = new StringBuilder();
        for (int i = 1 + random.nextInt(12); i > 0; i--) {
            s.append(letters.charAt(random.nextInt(letters.length())));
        }
        return s.toString();
    }

    @Test
    void readsTheRecordsTheLibraryReads() throws Exception {
        Random random = new Random(20_261_203L);
        int agreedRecords = 0;
        int bothRefused = 0;
        for (int i = 0; i < 20_000; i++) {
            String text = generate(random);
            List<List<String>> expected;
            try {
                expected = library(text);
            } catch (IOException | UncheckedIOException e) {
                expected = null;
            }
            for (int limit : new int[] {1, 3, 1 << 16}) {
                List<List<String>> actual;
                try {
                    actual = ours(text, limit);
                } catch (InputException e) {
                    actual = null;
                }
                String m = "case " + i + " buffer " + limit + ": "
                        + text.replace("\r", "\\r").replace("\n", "\\n");
                assertEquals(expected, actual, m);
            }
            if (expected == null) {
                bothRefused++;
            } else {
                agreedRecords += expected.size();
            }
        }
        assertTrue(agreedRecords > 10_000 && bothRefused > 1_000, agreedRecords + " records, " + bothRefused);
    }

    @Test
    void malformedTextNamesItsLine() {
        InputException open = org.junit.jupiter.api.Assertions.assertThrows(
                InputException.class, () -> ours("a,b\n1,2\n3,\"open\n4,5\n", 1 << 16));
        assertTrue(open.getMessage().contains("line 3") && open.getMessage().contains("not closed"), open.getMessage());
        InputException after = org.junit.jupiter.api.Assertions.assertThrows(
                InputException.class, () -> ours("a,b\n\"x\" y,2\n", 1 << 16));
        assertTrue(after.getMessage().contains("line 2") && after.getMessage().contains("'y'"), after.getMessage());
    }

    @Test
    void writesTheBytesTheLibraryWrites() throws Exception {
        Random random = new Random(4_242L);
        int quoted = 0;
        for (int i = 0; i < 20_000; i++) {
            int cells = 1 + random.nextInt(4);
            List<String> record = new ArrayList<>();
            for (int k = 0; k < cells; k++) {
                record.add(random.nextInt(5) == 0 ? "" : random.nextBoolean() ? plainCell(random) : generate(random));
            }
            StringWriter expected = new StringWriter();
            try (CSVPrinter printer = new CSVPrinter(expected, CSVFormat.DEFAULT)) {
                printer.printRecord(record);
            }
            Utf8Text actual = new Utf8Text(8);
            for (int k = 0; k < cells; k++) {
                // Half the cells through the array view the batch uses for echoed input.
                String cell = record.get(k);
                CharSequence view = random.nextBoolean()
                        ? cell
                        : new CharSlice().set(("xx" + cell + "y").toCharArray(), 2, cell.length());
                CsvCells.append(actual, view, k == 0);
            }
            CsvCells.endRecord(actual);
            // Bytes compared, as written: a lone surrogate half (the generator makes some) becomes '?'
            // in both, as String.getBytes does.
            org.junit.jupiter.api.Assertions.assertArrayEquals(
                    expected.toString().getBytes(java.nio.charset.StandardCharsets.UTF_8),
                    actual.toByteArray(),
                    "record " + record);
            if (expected.toString().startsWith("\"")) {
                quoted++;
            }
        }
        assertTrue(quoted > 1_000, "quoting exercised: " + quoted);
        assertFalse(quoted > 19_000, "plain cells exercised: " + quoted);
    }
}
