package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.headway.caution.InputException;
import org.headway.project.CsvTableReader.HeaderRule;
import org.headway.project.CsvTableReader.Heading;
import org.headway.project.CsvTableReader.Limit;
import org.headway.project.CsvTableReader.Options;
import org.headway.project.CsvTableReader.Row;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The shared CSV table reader: byte-order mark, units in brackets, comments and blank lines, the
 * number rule with located errors, the column and line caps. Sources are named beside each check.
 */
class CsvTableReaderTest {

    private static CsvTableReader reader(String text, Options options) throws IOException {
        return new CsvTableReader(new StringReader(text), options);
    }

    private static List<Heading> header(String text, HeaderRule rule) throws IOException {
        try (CsvTableReader r = reader(text, Options.of("t.csv").withHeader(rule))) {
            return r.header();
        }
    }

    @Test
    void aQuotedHeaderCellWithALineBreakIsSplitLikeAnyOther() throws IOException {
        // A quoted field may hold a line break (RFC 4180 section 2.6); spreadsheets write one when a
        // heading is wrapped in its cell. The name keeps the break; the unit is still found.
        for (HeaderRule rule : HeaderRule.values()) {
            List<Heading> h = header("\"pressure\ndrop [kPa]\",flow [L/s]\n1,2\n", rule);
            assertEquals("pressure\ndrop", h.get(0).name(), rule.name());
            assertEquals("kPa", h.get(0).unit(), rule.name());
            assertEquals("flow", h.get(1).name(), rule.name());
        }
    }

    @Test
    void aByteOrderMarkIsNotPartOfTheFirstName() throws IOException {
        // U+FEFF at the start of a UTF-8 text is a signature, not content (The Unicode Standard,
        // "Byte Order Mark" FAQ and the chapter on specials; from memory). Spreadsheets write it in
        // front of "CSV UTF-8" files.
        for (HeaderRule rule : HeaderRule.values()) {
            List<Heading> h = header("\uFEFFflow [L/s],dp [kPa]\n1,2\n", rule);
            assertEquals("flow", h.get(0).name(), rule.name());
            assertEquals("L/s", h.get(0).unit(), rule.name());
            assertEquals("\uFEFFflow [L/s]", h.get(0).text(), "the cell as read keeps the mark: " + rule);
        }
        // Dropped by the line cap's reader, the mark never reaches the CSV parser: a quoted first
        // cell is then read as quoted (RFC 4180 section 2.5: a field may be enclosed in quotes).
        Options dropping =
                Options.of("t.csv").withLimit(Limit.lines(100, "too long").droppingMark(null));
        try (CsvTableReader r = reader("\uFEFF\"flow [L/s]\",dp [kPa]\n1,2\n", dropping)) {
            Heading first = r.header().get(0);
            assertEquals("flow [L/s]", first.text());
            assertEquals("flow", first.name());
        }
    }

    @Test
    void theUnitIsTheTextInBrackets() throws IOException {
        // Heading style "quantity [unit]": common practice, no source.
        List<Heading> h = header("diameter [mm], Re , dp [ kPa ],f [-]\n1,2,3,4\n", HeaderRule.BRACKETS);
        assertEquals(
                List.of("diameter", "Re", "dp", "f"),
                h.stream().map(Heading::name).toList());
        assertEquals(
                List.of("mm", "", "kPa", "-"), h.stream().map(Heading::unit).toList());
        // A unit counts for the rig data only when the brackets close the cell; the fit tables take
        // the text from the first '[' to the last ']'.
        assertEquals(
                new Heading("x [m] y", "", "x [m] y"),
                header("x [m] y\n", HeaderRule.TRAILING_BRACKETS).get(0));
        assertEquals(
                new Heading("x", "m", "x [m] y"),
                header("x [m] y\n", HeaderRule.BRACKETS).get(0));
        assertEquals(
                new Heading("T", "degC", "T [degC]"),
                header("T [degC]\n", HeaderRule.TRAILING_BRACKETS).get(0));
    }

    @Test
    void commentsAndBlankLinesAreSkippedAndLinesAreThoseOfTheFile() throws IOException {
        // '#' comment lines and ignored empty lines: Apache Commons CSV, CSVFormat.Builder
        // setCommentMarker / setIgnoreEmptyLines (reference library). Line numbers counted by hand.
        String text = "# rig A, invented run\nflow [L/s],dp [kPa]\n\n# valve half open\n0.5,3.0\n\r\n0.6,4.0\n";
        try (CsvTableReader r = reader(text, Options.of("t.csv"))) {
            assertEquals(2, r.header().size());
            assertEquals(2, r.headerLine());
            Row first = r.next();
            assertEquals(5, first.line());
            assertEquals(0.5, first.number(0, CsvTableReader.NOT_A_NUMBER));
            Row second = r.next();
            assertEquals(7, second.line());
            assertEquals("4.0", second.text(1));
            assertNull(r.next());
        }
        // CR LF, LF and a lone CR each end one line (RFC 4180 section 2.1 for CRLF; LF and CR:
        // common practice, no source).
        try (CsvTableReader r = reader("a\r\n1\r2\n3\n", Options.of("t.csv"))) {
            r.header();
            List<Long> lines = new ArrayList<>();
            for (Row row = r.next(); row != null; row = r.next()) {
                lines.add(row.line());
            }
            assertEquals(List.of(2L, 3L, 4L), lines);
        }
        try (CsvTableReader r = reader("# only a comment\n\n", Options.of("t.csv"))) {
            assertNull(r.header(), "no record at all: the caller words the empty file");
        }
    }

    @Test
    void aMalformedNumberIsLocatedByFileLineAndColumn() throws IOException {
        // Java's Double.parseDouble would take a type suffix and a hexadecimal float (JLS 17,
        // section 3.10.2, FloatTypeSuffix and HexadecimalFloatingPointLiteral); the plain decimal
        // rule refuses them, and so does a decimal comma.
        String text = "flow [L/s],dp [kPa]\n0.5,3.0\n0.6,1028f\n0.7,0x1p3\n0.8,\"1,5\"\n";
        try (CsvTableReader r = reader(text, Options.of("data.csv"))) {
            r.header();
            assertEquals(3.0, r.next().number(1, CsvTableReader.NOT_A_NUMBER));
            Row suffix = r.next();
            InputException e = assertThrows(InputException.class, () -> suffix.number(1, CsvTableReader.NOT_A_NUMBER));
            assertEquals("data.csv line 3, column dp: '1028f' is not a number", e.getMessage());
            Row hex = r.next();
            e = assertThrows(InputException.class, () -> hex.number(1, CsvTableReader.NOT_FINITE));
            assertEquals("data.csv line 4, column dp: '0x1p3' is not a finite number", e.getMessage());
            Row comma = r.next();
            e = assertThrows(InputException.class, () -> comma.number(1, CsvTableReader.NOT_A_NUMBER));
            assertEquals("data.csv line 5, column dp: '1,5' is not a number", e.getMessage());
        }
        // 1e400 exceeds the largest finite binary64 value, about 1.797e308 (IEEE 754-2019, table 3.5).
        try (CsvTableReader r = reader("x\n1e400\n1e308\n", Options.of("big.csv"))) {
            r.header();
            Row over = r.next();
            assertEquals(Double.POSITIVE_INFINITY, over.number(0, CsvTableReader.NOT_A_NUMBER));
            InputException e =
                    assertThrows(InputException.class, () -> over.finiteNumber(0, CsvTableReader.NOT_A_NUMBER));
            assertEquals("big.csv line 2, column x: '1e400' is not a finite number", e.getMessage());
            assertEquals(1e308, r.next().finiteNumber(0, CsvTableReader.NOT_A_NUMBER));
        }
    }

    @Test
    void theColumnCountIsCapped() throws IOException {
        // A cap on the width read: common practice, no source.
        Options three = Options.of("t.csv").withMaxColumns(3);
        try (CsvTableReader r = reader("a,b,c\n1,2,3\n", three)) {
            assertEquals(3, r.header().size());
        }
        try (CsvTableReader r = reader("# comment\na,b,c,d\n1,2,3,4\n", three)) {
            InputException e = assertThrows(InputException.class, r::header);
            assertEquals("t.csv line 2: the header names 4 columns; at most 3 are read", e.getMessage());
        }
        // "Each line should contain the same number of fields throughout the file" (RFC 4180,
        // section 2.4): a row of another length is refused with its line.
        try (CsvTableReader r = reader("a,b\n1,2\n1,2,3\n", Options.of("t.csv"))) {
            r.header();
            r.next();
            InputException e = assertThrows(InputException.class, r::next);
            assertEquals("t.csv line 3: has 3 values but the header names 2 columns", e.getMessage());
        }
    }

    /** Reads a whole table; the caps act on the parser's read-ahead, so a refusal may come early. */
    private static int rows(String text, Options options) throws IOException {
        try (CsvTableReader r = reader(text, options)) {
            r.header();
            int rows = 0;
            while (r.next() != null) {
                rows++;
            }
            return rows;
        }
    }

    @Test
    void anOverLongLineIsRefusedWithItsLine() throws IOException {
        // A cap on line length so one line cannot fill memory: common practice, no source.
        Options ten = Options.of("t.csv").withLimit(Limit.lines(10, "line is longer than 10 characters"));
        assertEquals(2, rows("a,b\r\n1,2\n" + "1".repeat(4) + ",12345\n", ten), "10 characters pass");
        InputException e =
                assertThrows(InputException.class, () -> rows("a,b\r\n1,2\n" + "1".repeat(5) + ",12345\n", ten));
        assertEquals("t.csv line 3: line is longer than 10 characters", e.getMessage());
        // A record's quoted line breaks do not reset the record cap (RFC 4180 section 2.6: a quoted
        // field may hold line breaks), while each of its lines stays under the line cap.
        Options record =
                Options.of("t.csv").withLimit(Limit.lines(100, "line too long").withRecords(20_000, "record too long"));
        assertEquals(1, rows("a,b\n1,\"" + "xxxxxxxxx\n".repeat(100) + "\"\n", record));
        e = assertThrows(InputException.class, () -> rows("a,b\n1,\"" + "xxxxxxxxx\n".repeat(3_000) + "\"\n", record));
        assertEquals("record too long", e.problem());
    }

    @Test
    void bytesThatAreNotUtf8AreLocatedInTheFile(@TempDir Path dir) throws IOException {
        // 0xFF never occurs in UTF-8 (RFC 3629, section 1).
        Path file = dir.resolve("bad.csv");
        Files.write(file, new byte[] {'a', '\n', '1', '\n', (byte) 0xFF, '\n'});
        Options options =
                Options.of("bad.csv").withLimit(Limit.lines(100, "too long").droppingMark(file));
        try (CsvTableReader r = CsvTableReader.open(file, options)) {
            InputException e = assertThrows(InputException.class, () -> {
                r.header();
                r.next();
                r.next();
            });
            assertEquals(org.headway.caution.TextFiles.notUtf8(file, "bad.csv").getMessage(), e.getMessage());
        }
        InputException missing = assertThrows(
                InputException.class, () -> CsvTableReader.open(dir.resolve("none.csv"), Options.of("none.csv")));
        assertEquals("none.csv: file not found", missing.getMessage());
    }

    @Test
    void theReaderClosesItsSource() throws IOException {
        boolean[] closed = {false};
        Reader source = new StringReader("a\n1\n") {
            @Override
            public void close() {
                closed[0] = true;
            }
        };
        new CsvTableReader(source, Options.of("t.csv")).close();
        assertTrue(closed[0]);
    }
}
