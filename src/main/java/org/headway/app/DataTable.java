package org.headway.app;

import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.headway.caution.InputException;

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
        CSVFormat csv = CSVFormat.DEFAULT
                .builder()
                .setIgnoreSurroundingSpaces(true)
                .setCommentMarker('#')
                .setIgnoreEmptyLines(true)
                .get();
        List<String> names = new ArrayList<>();
        List<String> units = new ArrayList<>();
        List<double[]> values = new ArrayList<>();
        int rows = 0;
        String where = file.getFileName() == null
                ? file.toString()
                : file.getFileName().toString();
        try (Reader reader = Files.newBufferedReader(file, StandardCharsets.UTF_8);
                CSVParser parser = csv.parse(reader)) {
            boolean header = true;
            for (CSVRecord record : parser) {
                long line = parser.getCurrentLineNumber();
                if (header) {
                    for (String h : record) {
                        String text = h.startsWith("\uFEFF") ? h.substring(1) : h;
                        int open = text.indexOf('[');
                        int close = text.lastIndexOf(']');
                        String name = (open >= 0 ? text.substring(0, open) : text).trim();
                        String unit = open >= 0 && close > open
                                ? text.substring(open + 1, close).trim()
                                : "";
                        if (name.isEmpty()) {
                            throw new InputException(
                                    where + " line " + line, "column " + (names.size() + 1) + " has no name");
                        }
                        names.add(name);
                        units.add(unit);
                        values.add(new double[64]);
                    }
                    header = false;
                    continue;
                }
                if (record.size() != names.size()) {
                    throw new InputException(
                            where + " line " + line,
                            "has " + record.size() + " values but the header names " + names.size() + " columns");
                }
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
                for (int c = 0; c < record.size(); c++) {
                    String cell = record.get(c);
                    double v;
                    try {
                        v = org.headway.units.Decimals.parseDecimal(cell);
                    } catch (NumberFormatException e) {
                        throw new InputException(
                                where + " line " + line + ", column " + names.get(c), "'" + cell + "' is not a number");
                    }
                    if (!Double.isFinite(v)) {
                        throw new InputException(
                                where + " line " + line + ", column " + names.get(c),
                                "'" + cell + "' is not a finite number");
                    }
                    values.get(c)[rows] = v;
                }
                rows++;
            }
        } catch (NoSuchFileException e) {
            throw new InputException(where, "file not found");
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
