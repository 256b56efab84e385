package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import java.util.SplittableRandom;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;

/** The network CSV's record writer read back by Apache Commons CSV (a reference library): same cells. */
class CsvRowTest {

    @Test
    void everyRecordReadsBackCellForCell() throws IOException {
        String alphabet = "ab1,\" \n\r\t;é'=";
        SplittableRandom random = new SplittableRandom(5);
        for (int i = 0; i < 20_000; i++) {
            String[] cells = new String[random.nextInt(1, 5)];
            for (int c = 0; c < cells.length; c++) {
                StringBuilder b = new StringBuilder();
                int len = random.nextInt(0, 6);
                for (int k = 0; k < len; k++) {
                    b.append(alphabet.charAt(random.nextInt(alphabet.length())));
                }
                cells[c] = b.toString();
            }
            if (cells.length == 1 && cells[0].isEmpty()) {
                continue; // an empty record is a blank line, which readers skip
            }
            StringBuilder out = new StringBuilder();
            NetworkOutput.row(out, cells);
            try (CSVParser p = CSVFormat.DEFAULT.parse(new StringReader(out.toString()))) {
                List<CSVRecord> records = p.getRecords();
                assertEquals(1, records.size(), out::toString);
                assertEquals(List.of(cells), records.get(0).toList(), out::toString);
            }
        }
    }
}
