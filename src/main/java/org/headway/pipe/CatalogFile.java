package org.headway.pipe;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.headway.caution.InputException;

/**
 * One catalog CSV file read into rows that remember their line numbers, with typed accessors whose
 * errors name the file, line, column and value.
 *
 * <p>Layout: {@code #} comment lines (one of them {@code # source: …}), then a header row, then one
 * record per line. Records are parsed one physical line at a time so that every error can name its
 * line; quoted values must therefore not span lines.
 */
final class CatalogFile {

    /** Non-finite values the file may hold: a row with one is reported, not refused as unreadable. */
    private static final java.util.Set<String> NON_FINITE =
            java.util.Set.of("NaN", "+NaN", "-NaN", "Infinity", "+Infinity", "-Infinity");

    /** A data row with its 1-based physical line number. */
    record Row(int line, Map<String, String> cells) {}

    private static final CSVFormat FORMAT = CSVFormat.DEFAULT
            .builder()
            .setTrim(true)
            .setIgnoreSurroundingSpaces(true)
            .get();

    /**
     * A decimal number as people write it, or NaN/Infinity (refused later with their own message).
     * Java's own parser would also take hexadecimal ("0x1p3") and type suffixes ("2f", "1d").
     */
    private final String label;

    private final String source;
    private final List<Row> rows;

    private CatalogFile(String label, String source, List<Row> rows) {
        this.label = label;
        this.source = source;
        this.rows = rows;
    }

    /**
     * Parses a catalog file.
     *
     * @param label file name as it should appear in error messages
     * @param text whole file content
     * @param columns columns the header must hold, in any order, and no others
     */
    static CatalogFile parse(String label, String text, List<String> columns) {
        return parse(label, text, columns, List.of());
    }

    /**
     * Parses a catalog file whose header may also hold some known optional columns (a newer
     * column such as {@code hw_c} must not break a user's older file).
     *
     * @param label file name as it should appear in error messages
     * @param text whole file content
     * @param columns columns the header must hold, in any order
     * @param optionalColumns columns the header may also hold
     */
    static CatalogFile parse(String label, String text, List<String> columns, List<String> optionalColumns) {
        String[] lines = text.split("\r?\n", -1);
        String source = null;
        List<String> header = null;
        int headerLine = 0;
        List<Row> rows = new ArrayList<>();
        for (int i = 0; i < lines.length; i++) {
            int lineNumber = i + 1;
            String line = lines[i].strip();
            if (i == 0 && line.startsWith("\uFEFF")) {
                line = line.substring(1);
            }
            if (line.isEmpty()) {
                continue;
            }
            if (line.startsWith("#")) {
                String comment = line.substring(1).strip();
                if (comment.regionMatches(true, 0, "source:", 0, 7) && header == null) {
                    source = comment.substring(7).strip();
                }
                continue;
            }
            List<String> fields = fields(label, lineNumber, line);
            if (header == null) {
                header = fields;
                headerLine = lineNumber;
                checkHeader(label, lineNumber, header, columns, optionalColumns);
                continue;
            }
            if (fields.size() != header.size()) {
                throw new InputException(
                        label + " line " + lineNumber,
                        "expected " + header.size() + " values (" + String.join(",", header) + "), found "
                                + fields.size() + ": " + line);
            }
            Map<String, String> cells = new LinkedHashMap<>();
            for (int c = 0; c < header.size(); c++) {
                cells.put(header.get(c), fields.get(c));
            }
            rows.add(new Row(lineNumber, Collections.unmodifiableMap(cells)));
        }
        if (header == null) {
            throw new InputException(label, "no header row; expected columns " + String.join(",", columns));
        }
        if (source == null || source.isEmpty()) {
            throw new InputException(
                    label + " line " + headerLine,
                    "the comment block above the header must name the data's source in a line '# source: …'");
        }
        return new CatalogFile(label, source, List.copyOf(rows));
    }

    private static List<String> fields(String label, int lineNumber, String line) {
        if (line.indexOf('"') < 0 && line.indexOf('\r') < 0) {
            // Without quotes or carriage returns the CSV reader would split on commas and trim;
            // doing so directly keeps loading a catalog cheap.
            List<String> cells = new ArrayList<>();
            for (String cell : line.split(",", -1)) {
                cells.add(cell.trim());
            }
            return cells;
        }
        try (CSVParser parser = CSVParser.parse(line, FORMAT)) {
            List<CSVRecord> records = parser.getRecords();
            if (records.size() != 1) {
                throw new InputException(label + " line " + lineNumber, "expected one record, found " + records.size());
            }
            return records.get(0).toList();
        } catch (IOException | UncheckedIOException e) {
            throw new InputException(
                    label + " line " + lineNumber, "not valid CSV (" + e.getMessage() + "): " + line, e);
        } catch (IllegalStateException e) {
            throw new InputException(
                    label + " line " + lineNumber, "not valid CSV (" + e.getMessage() + "): " + line, e);
        }
    }

    private static void checkHeader(
            String label, int lineNumber, List<String> header, List<String> columns, List<String> optionalColumns) {
        for (String column : columns) {
            if (!header.contains(column)) {
                throw new InputException(
                        label + " line " + lineNumber,
                        "missing column " + column + "; the header must name " + String.join(",", columns) + ", found "
                                + String.join(",", header));
            }
        }
        for (int i = 0; i < header.size(); i++) {
            String name = header.get(i);
            if (!columns.contains(name) && !optionalColumns.contains(name)) {
                throw new InputException(
                        label + " line " + lineNumber + ", column " + (i + 1),
                        "unknown column '" + name + "'; expected " + String.join(",", columns)
                                + (optionalColumns.isEmpty()
                                        ? ""
                                        : " and optionally " + String.join(",", optionalColumns)));
            }
            if (header.indexOf(name) != i) {
                throw new InputException(
                        label + " line " + lineNumber + ", column " + (i + 1), "column '" + name + "' appears twice");
            }
        }
    }

    String label() {
        return label;
    }

    String source() {
        return source;
    }

    List<Row> rows() {
        return rows;
    }

    /** Location text for a cell, e.g. {@code materials.csv line 7, column roughness_mm}. */
    String where(Row row, String column) {
        return label + " line " + row.line() + ", column " + column;
    }

    /** Location text for a row. */
    String where(Row row) {
        return label + " line " + row.line();
    }

    InputException error(Row row, String column, String problem) {
        return new InputException(where(row, column), problem);
    }

    /** A required, non-empty text cell. */
    String text(Row row, String column) {
        String value = row.cells().get(column);
        if (value == null || value.isEmpty()) {
            throw error(row, column, "must not be empty");
        }
        return value;
    }

    /** An optional text cell, empty string when blank. */
    String optionalText(Row row, String column) {
        String value = row.cells().get(column);
        return value == null ? "" : value;
    }

    boolean isBlank(Row row, String column) {
        return optionalText(row, column).isEmpty();
    }

    /** A required finite number. */
    double number(Row row, String column) {
        String value = text(row, column);
        double parsed;
        try {
            if (!org.headway.units.Decimals.isPlainDecimal(value) && !NON_FINITE.contains(value.strip())) {
                throw new NumberFormatException(value);
            }
            parsed = Double.parseDouble(value);
        } catch (NumberFormatException e) {
            throw error(row, column, "not a number: '" + value + "'");
        }
        if (!Double.isFinite(parsed)) {
            throw error(row, column, "must be a finite number, got '" + value + "'");
        }
        return parsed;
    }

    /** A required number greater than zero. */
    double positive(Row row, String column) {
        double value = number(row, column);
        if (value <= 0) {
            throw error(
                    row, column, "must be greater than zero, got " + row.cells().get(column));
        }
        return value;
    }

    /**
     * A required number from zero up to a bound.
     *
     * @param max largest value accepted
     */
    double nonNegativeAtMost(Row row, String column, double max) {
        double value = nonNegative(row, column);
        if (value > max) {
            throw error(
                    row,
                    column,
                    "must not exceed " + max + ", got " + row.cells().get(column));
        }
        return value;
    }

    /** A required number that is zero or more. */
    double nonNegative(Row row, String column) {
        double value = number(row, column);
        if (value < 0) {
            throw error(row, column, "must not be negative, got " + row.cells().get(column));
        }
        return value;
    }
}
