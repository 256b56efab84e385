package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.headway.report.SafeText;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Cells echoed from the user's file into a CSV are neutralised against spreadsheet formula injection
 * (a leading =, +, -, @, tab or carriage return makes a spreadsheet evaluate the cell: OWASP, "CSV
 * Injection"), while plain numbers are kept so that the output reads back as the input.
 */
class FormulaInjectionTest {

    @TempDir
    Path dir;

    @Test
    void echoedCellsKeepNumbersAndQuoteFormulas() {
        assertEquals("-3", SafeText.echoedCell("-3"));
        assertEquals("+1.5e-3", SafeText.echoedCell("+1.5e-3"));
        assertEquals("-.5", SafeText.echoedCell("-.5"));
        assertEquals("'-2+3", SafeText.echoedCell("-2+3"));
        assertEquals("'=1+2", SafeText.echoedCell("=1+2"));
        assertEquals("'@SUM(A1)", SafeText.echoedCell("@SUM(A1)"));
        assertEquals("'+x", SafeText.echoedCell("+x"));
        assertEquals("'\tx", SafeText.echoedCell("\tx"));
        assertEquals("plain", SafeText.echoedCell("plain"));
    }

    @Test
    void frictionBatchEchoesTheUsersCellsNeutralised() throws Exception {
        Path in = dir.resolve("in.csv");
        Files.writeString(in, "re,relative_roughness,note,=HYPERLINK(\"x\")\n1e5,1e-4,=1+2,-3\n");
        CliRun r = CliRun.of("friction", "--input", in.toString());
        assertEquals(0, r.exitCode(), r.err());
        List<CSVRecord> rows =
                CSVFormat.DEFAULT.parse(new StringReader(r.out())).getRecords();
        assertEquals("'=HYPERLINK(\"x\")", rows.get(0).get(3));
        assertEquals("'=1+2", rows.get(1).get(2));
        assertEquals("-3", rows.get(1).get(3), "a negative number stays a number");
        assertEquals("1e5", rows.get(1).get(0));
        for (CSVRecord row : rows) {
            for (String cell : row) {
                assertFalse(!cell.isEmpty() && "=+@".indexOf(cell.charAt(0)) >= 0, "unneutralised cell " + cell);
            }
        }
        assertTrue(rows.get(1).get(4).startsWith("0.0185"));
    }
}
