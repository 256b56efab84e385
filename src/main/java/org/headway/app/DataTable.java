package org.headway.app;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.headway.caution.InputException;
import org.headway.project.CsvTableReader;

/**
 * A numeric CSV table for fitting: a header row naming the columns, with an optional unit in
 * brackets after each name ({@code Re [-]}, {@code dp [kPa]}), then rows of numbers. Lines starting
 * with {@code #} are comments. The same layout {@code headway fit} reads.
 *
 * @param file the file read
 * @param columns the columns in file order
 */
public record DataTable(Path file, List<Column> columns) {

    /**
     * One column.
     *
     * @param name name before the brackets, used in models
     * @param unit the text in the brackets, empty when none
     * @param values the numbers, one per data row
     */
    public record Column(String name, String unit, double[] values) {

        /** Name with its unit as the header gave it, for lists and table headings. */
        public String label() {
            return unit.isEmpty() ? name : name + " [" + unit + "]";
        }
    }

    /**
     * A decimal number as people write it (the rule {@code headway fit} applies): Java's own parser
     * would also take hexadecimal ({@code 0x1p3}) and type suffixes ({@code 2f}), so a typo such as
     * {@code 1028f} would pass as 1028.
     */
    public DataTable {
        columns = List.copyOf(columns);
    }

    /** Number of data rows. */
    public int rows() {
        return columns.isEmpty() ? 0 : columns.get(0).values().length;
    }

    /** The column with this name, or null. */
    public Column column(String name) {
        return columns.stream().filter(c -> c.name().equals(name)).findFirst().orElse(null);
    }

    /**
     * Reads a table.
     *
     * @throws InputException naming the file, line and column of a cell that is not a number, a row
     *     of the wrong length, or a file that cannot be read
     */
    public static DataTable read(Path file) {
        return read(file, () -> false, rows -> {});
    }

    /** Rows read between looks at the cancel flag and progress reports. */
    static final int CHECK_EVERY_ROWS = 10_000;

    /**
     * Reads a table, looking every {@value #CHECK_EVERY_ROWS} rows whether to stop.
     *
     * @param cancelled asked between blocks of rows; true stops the import
     * @param progress told the number of rows read so far
     * @throws java.util.concurrent.CancellationException when cancelled
     */
    public static DataTable read(
            Path file, java.util.function.BooleanSupplier cancelled, java.util.function.IntConsumer progress) {
        List<String> names = new ArrayList<>();
        List<String> units = new ArrayList<>();
        List<double[]> values = new ArrayList<>();
        int rows = 0;
        String where = file.getFileName() == null
                ? file.toString()
                : file.getFileName().toString();
        try (CsvTableReader reader = CsvTableReader.open(file, CsvTableReader.Options.of(where))) {
            List<CsvTableReader.Heading> header = reader.header();
            if (header != null) {
                for (CsvTableReader.Heading h : header) {
                    if (h.name().isEmpty()) {
                        throw new InputException(
                                where + " line " + reader.headerLine(),
                                "column " + (names.size() + 1) + " has no name");
                    }
                    names.add(h.name());
                    units.add(h.unit());
                    values.add(new double[64]);
                }
                for (CsvTableReader.Row row = reader.next(); row != null; row = reader.next()) {
                    if (rows % CHECK_EVERY_ROWS == 0 && rows > 0) {
                        if (cancelled.getAsBoolean()) {
                            throw new java.util.concurrent.CancellationException("import cancelled");
                        }
                        progress.accept(rows);
                    }
                    if (rows == values.get(0).length) {
                        for (int c = 0; c < values.size(); c++) {
                            values.set(c, Arrays.copyOf(values.get(c), 2 * rows));
                        }
                    }
                    for (int c = 0; c < names.size(); c++) {
                        values.get(c)[rows] = row.finiteNumber(c, CsvTableReader.NOT_A_NUMBER);
                    }
                    rows++;
                }
            }
        } catch (IOException | UncheckedIOException e) {
            throw new InputException(where, "cannot be read as CSV: " + e.getMessage());
        }
        if (names.isEmpty()) {
            throw new InputException(where, "is empty; expected a header row and data rows");
        }
        if (rows == 0) {
            throw new InputException(where, "has a header but no data rows");
        }
        List<Column> columns = new ArrayList<>();
        for (int c = 0; c < names.size(); c++) {
            columns.add(new Column(names.get(c), units.get(c), Arrays.copyOf(values.get(c), rows)));
        }
        return new DataTable(file, columns);
    }
}
