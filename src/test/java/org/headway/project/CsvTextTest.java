package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.regex.Pattern;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;

/**
 * The line list's CSV reader against Apache Commons CSV (a general-purpose reference library,
 * {@code CSVFormat.DEFAULT} with trimming and blank lines ignored, the reader the line list used
 * before): same fields and the same refusals on 20,000 random texts built from the characters that
 * matter to CSV.
 */
class CsvTextTest {

    private static final String[] PIECES = {"a", "12.5", " ", "\t", ",", "\"", "\"\"", "\n", "\r\n", "\r", "x y", "é"};

    @Test
    void agreesWithCommonsCsvOnRandomTexts() throws IOException {
        SplittableRandom random = new SplittableRandom(12);
        int accepted = 0;
        int refused = 0;
        for (int i = 0; i < 20_000; i++) {
            StringBuilder b = new StringBuilder();
            int parts = random.nextInt(1, 14);
            for (int p = 0; p < parts; p++) {
                b.append(PIECES[random.nextInt(PIECES.length)]);
            }
            String text = b.toString();
            List<List<String>> expected;
            try {
                expected = reference(text);
            } catch (IllegalStateException | java.io.UncheckedIOException e) {
                assertThrows(CsvText.Malformed.class, () -> CsvText.records(text), () -> "text " + show(text));
                refused++;
                continue;
            }
            List<List<String>> actual = new ArrayList<>();
            for (CsvText.Line line : CsvText.records(text)) {
                actual.add(line.fields());
            }
            assertEquals(expected, actual, () -> "text " + show(text));
            accepted++;
        }
        assertTrue(accepted > 5_000 && refused > 500, accepted + " accepted, " + refused + " refused");
    }

    @Test
    void lineNumbersCountPhysicalLines() {
        List<CsvText.Line> lines = CsvText.records("id,x\n\nn1,\"two\nlines\"\r\nn2,3\n");
        assertEquals(3, lines.size());
        assertEquals(1, lines.get(0).number());
        assertEquals(4, lines.get(1).number(), "the record ends on line 4");
        assertEquals("two\nlines", lines.get(1).fields().get(1));
        assertEquals(5, lines.get(2).number());
        CsvText.Malformed open = assertThrows(CsvText.Malformed.class, () -> CsvText.records("a\nb,\"open\nc"));
        assertEquals(2, open.line);
        CsvText.Malformed after = assertThrows(CsvText.Malformed.class, () -> CsvText.records("a\n\"q\"x,b"));
        assertEquals(2, after.line);
    }

    /** The regular expression the line list used for a cell under a column unit. */
    private static final Pattern BARE_NUMBER = Pattern.compile("^[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?$");

    @Test
    void bareNumberCheckAgreesWithTheRegularExpression() {
        String alphabet = "0123456789.+-eE x٣";
        SplittableRandom random = new SplittableRandom(7);
        for (int i = 0; i < 50_000; i++) {
            int len = random.nextInt(0, 8);
            StringBuilder b = new StringBuilder();
            for (int c = 0; c < len; c++) {
                b.append(alphabet.charAt(random.nextInt(alphabet.length())));
            }
            String s = b.toString();
            assertEquals(BARE_NUMBER.matcher(s).matches(), LineList.isBareNumber(s), () -> "\"" + s + "\"");
        }
    }

    private static List<List<String>> reference(String text) throws IOException {
        List<List<String>> out = new ArrayList<>();
        try (CSVParser p = CSVFormat.DEFAULT
                .builder()
                .setIgnoreEmptyLines(true)
                .setTrim(true)
                .get()
                .parse(new StringReader(text))) {
            for (CSVRecord r : p) {
                List<String> fields = r.toList();
                if (fields.stream().allMatch(String::isBlank)) {
                    continue;
                }
                out.add(fields);
            }
        }
        return out;
    }

    private static String show(String text) {
        return "\"" + text.replace("\r", "\\r").replace("\n", "\\n").replace("\t", "\\t") + "\"";
    }
}
