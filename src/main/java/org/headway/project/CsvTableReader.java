package org.headway.project;

import java.io.FilterReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.headway.caution.InputException;
import org.headway.caution.TextFiles;
import org.headway.units.Decimals;

/**
 * Reads a CSV table of ours — a header row naming the columns, with an optional unit in brackets
 * ({@code diameter [mm]}), then data rows — one record at a time, for the fit table ({@code
 * headway fit}), the desktop fit table and the rig data stream.
 *
 * <p>It owns what those three share: the format (spaces around a cell ignored, {@code #} starts a
 * comment line, empty lines skipped), an optional cap on the length of a line and of a record, the
 * byte-order mark, the split of a header cell into name and unit, a cap on the number of columns,
 * the row length, the number rule ({@link Decimals#parseDecimal}) and the located messages ({@code
 * file line N, column c: 'x' is not a number}). The callers keep what differs: whether the table is
 * streamed or held, which cells are numbers, and how a failure of the underlying reader is worded
 * (its {@link IOException} and {@link java.io.UncheckedIOException} reach the caller as they are).
 */
public final class CsvTableReader implements AutoCloseable {

    /** The CSV dialect of every table read here. */
    public static final CSVFormat FORMAT = CSVFormat.DEFAULT
            .builder()
            .setIgnoreSurroundingSpaces(true)
            .setCommentMarker('#')
            .setIgnoreEmptyLines(true)
            .get();

    /** Problem text of a cell that does not follow the number rule. */
    public static final String NOT_A_NUMBER = "is not a number";

    /** Problem text of a cell that is not a finite number (it overflows a double, or is not one). */
    public static final String NOT_FINITE = "is not a finite number";

    /**
     * How a header cell splits into a name and a unit. The three rules agree on every ordinary cell
     * ({@code flow [L/s]}, {@code Re}, a byte-order mark before the first name); they differ on odd
     * ones (text after the brackets, a mark followed by spaces), where each keeps what its reader
     * has always done.
     */
    public enum HeaderRule {
        /**
         * A leading byte-order mark dropped, then the name is the text before the first {@code [},
         * trimmed, and the unit the text from there to the last {@code ]}, trimmed (desktop table).
         */
        BRACKETS,
        /**
         * As {@link #BRACKETS}, but the name is trimmed before a leading byte-order mark is dropped
         * from it ({@code headway fit}, whose reader has already dropped the file's own mark).
         */
        BRACKETS_MARK_AFTER_TRIM,
        /**
         * Only a bracketed unit that closes the cell counts: {@code dp [kPa]}; otherwise the whole
         * cell, spaces trimmed, is the name; a leading byte-order mark is then dropped from the name
         * (rig data).
         */
        TRAILING_BRACKETS
    }

    private static final Pattern TRAILING_UNIT = Pattern.compile("^\\s*(.*?)\\s*(?:\\[(.*)\\])?\\s*$", Pattern.DOTALL);

    /**
     * One header cell.
     *
     * @param name the column's name, used to select it and in messages
     * @param unit the text in the brackets, empty when none
     * @param text the cell as read
     */
    public record Heading(String name, String unit, String text) {

        /** Splits a header cell by a rule. */
        public static Heading of(String cell, HeaderRule rule) {
            switch (rule) {
                case BRACKETS -> {
                    String text = dropMark(cell);
                    return new Heading(beforeBracket(text).trim(), bracketed(text), cell);
                }
                case BRACKETS_MARK_AFTER_TRIM -> {
                    return new Heading(dropMark(beforeBracket(cell).trim()), bracketed(cell), cell);
                }
                default -> {
                    Matcher m = TRAILING_UNIT.matcher(cell);
                    m.matches();
                    String unit = m.group(2) == null ? "" : m.group(2).strip();
                    return new Heading(dropMark(m.group(1)), unit, cell);
                }
            }
        }

        private static String beforeBracket(String text) {
            int open = text.indexOf('[');
            return open >= 0 ? text.substring(0, open) : text;
        }

        private static String bracketed(String text) {
            int open = text.indexOf('[');
            int close = text.lastIndexOf(']');
            return open >= 0 && close > open ? text.substring(open + 1, close).trim() : "";
        }

        private static String dropMark(String text) {
            return text.startsWith("\uFEFF") ? text.substring(1) : text;
        }
    }

    /**
     * What a table file may hold.
     *
     * @param file how messages name the file
     * @param header how a header cell splits into name and unit
     * @param maxColumns most columns the header may name
     * @param lines caps on line and record length, or null for none
     */
    public record Options(String file, HeaderRule header, int maxColumns, Limit lines) {

        /** No caps, header rule {@link HeaderRule#BRACKETS}. */
        public static Options of(String file) {
            return new Options(file, HeaderRule.BRACKETS, Integer.MAX_VALUE, null);
        }

        public Options withHeader(HeaderRule rule) {
            return new Options(file, rule, maxColumns, lines);
        }

        public Options withMaxColumns(int max) {
            return new Options(file, header, max, lines);
        }

        public Options withLimit(Limit limit) {
            return new Options(file, header, maxColumns, limit);
        }
    }

    /**
     * Caps on physical lines and records, so that a file without line breaks (a binary dump, a
     * runaway quote) stops with a located error instead of filling the heap.
     *
     * @param maxLineChars longest physical line accepted (characters)
     * @param lineTooLong the problem stated when a line is longer
     * @param maxRecordChars longest record accepted, quoted line breaks included (characters)
     * @param recordTooLong the problem stated when a record is longer
     * @param dropMark whether a leading byte-order mark is dropped before the CSV parser sees it
     * @param source the file decoded, so that bytes that are not UTF-8 are located in it; null if none
     */
    public record Limit(
            int maxLineChars,
            String lineTooLong,
            long maxRecordChars,
            String recordTooLong,
            boolean dropMark,
            Path source) {

        /** A cap on lines only; the byte-order mark is left in. */
        public static Limit lines(int maxLineChars, String lineTooLong) {
            return new Limit(maxLineChars, lineTooLong, Long.MAX_VALUE, "", false, null);
        }

        /** The same with a cap on records. */
        public Limit withRecords(long max, String tooLong) {
            return new Limit(maxLineChars, lineTooLong, max, tooLong, dropMark, source);
        }

        /** The same, dropping a leading byte-order mark and locating bytes of {@code file} that are not UTF-8. */
        public Limit droppingMark(Path file) {
            return new Limit(maxLineChars, lineTooLong, maxRecordChars, recordTooLong, true, file);
        }

        /** Wraps a reader; {@code label} names the source in messages. */
        public Reader wrap(Reader in, String label) {
            return new LimitedReader(in, label, this);
        }
    }

    private final Options options;
    private final LimitedReader limited;
    private final CSVParser parser;
    private final Iterator<CSVRecord> records;
    private List<Heading> headings;
    private long headerLine;

    /**
     * Opens a file as UTF-8 (strictly: a malformed byte is an error).
     *
     * @throws InputException "file not found" when the file does not exist
     * @throws IOException when it cannot be opened otherwise
     */
    public static CsvTableReader open(Path file, Options options) throws IOException {
        Reader reader;
        try {
            reader = Files.newBufferedReader(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new InputException(options.file(), "file not found");
        }
        return new CsvTableReader(reader, options);
    }

    /**
     * Reads a table from a reader, closed with this one.
     *
     * @throws IOException when the CSV parser cannot start
     */
    public CsvTableReader(Reader reader, Options options) throws IOException {
        this.options = options;
        this.limited = options.lines() == null ? null : new LimitedReader(reader, options.file(), options.lines());
        this.parser = FORMAT.parse(limited == null ? reader : limited);
        this.records = parser.iterator();
    }

    /**
     * Reads the header row.
     *
     * @return the columns in file order, or null when the file holds no record at all
     * @throws InputException when the header names more columns than allowed
     */
    public List<Heading> header() {
        CSVRecord record = nextRecord();
        if (record == null) {
            return null;
        }
        headerLine = parser.getCurrentLineNumber();
        if (record.size() > options.maxColumns()) {
            throw new InputException(
                    options.file() + " line " + headerLine,
                    "the header names " + record.size() + " columns; at most " + options.maxColumns() + " are read");
        }
        List<Heading> list = new ArrayList<>(record.size());
        for (String cell : record) {
            list.add(Heading.of(cell, options.header()));
        }
        headings = List.copyOf(list);
        return headings;
    }

    /** Line of the header row, as the CSV parser counts it. */
    public long headerLine() {
        return headerLine;
    }

    /** Line the parser has reached: that of the last record read. */
    public long lineNumber() {
        return parser.getCurrentLineNumber();
    }

    /**
     * The next data row, after {@link #header()}.
     *
     * @return the row, or null at the end of the file
     * @throws InputException when the row does not have as many values as the header has columns
     */
    public Row next() {
        CSVRecord record = nextRecord();
        if (record == null) {
            return null;
        }
        long line = parser.getCurrentLineNumber();
        if (record.size() != headings.size()) {
            throw new InputException(
                    options.file() + " line " + line,
                    "has " + record.size() + " values but the header names " + headings.size() + " columns");
        }
        return new Row(record, line);
    }

    private CSVRecord nextRecord() {
        if (limited != null) {
            limited.startRecord();
        }
        return records.hasNext() ? records.next() : null;
    }

    @Override
    public void close() throws IOException {
        parser.close();
    }

    /** One data row, as long as the header. */
    public final class Row {
        private final CSVRecord record;
        private final long line;

        private Row(CSVRecord record, long line) {
            this.record = record;
            this.line = line;
        }

        /** Line of the row in the file. */
        public long line() {
            return line;
        }

        /** The cell of a column, as written. */
        public String text(int column) {
            return record.get(column);
        }

        /**
         * The cell by the number rule; it may overflow to an infinity.
         *
         * @param notANumber the problem stated when it does not follow the rule, e.g. {@link #NOT_A_NUMBER}
         */
        public double number(int column, String notANumber) {
            try {
                return Decimals.parseDecimal(record.get(column));
            } catch (NumberFormatException e) {
                throw problem(column, notANumber);
            }
        }

        /**
         * The cell as a finite number.
         *
         * @param notANumber the problem stated when it does not follow the number rule
         * @throws InputException stating {@link #NOT_FINITE} when it overflows a double
         */
        public double finiteNumber(int column, String notANumber) {
            double value = number(column, notANumber);
            if (!Double.isFinite(value)) {
                throw problem(column, NOT_FINITE);
            }
            return value;
        }

        /** An error located at this row and column, quoting the cell: {@code file line N, column c: 'x' problem}. */
        public InputException problem(int column, String problem) {
            return new InputException(
                    options.file() + " line " + line + ", column "
                            + headings.get(column).name(),
                    "'" + record.get(column) + "' " + problem);
        }
    }

    /**
     * Counts characters per physical line and per record and refuses to go on past the caps. CR, LF
     * and CRLF each end one line, as the CSV parser counts them.
     */
    static final class LimitedReader extends FilterReader {
        private final String label;
        private final Limit limit;
        private long line = 1;
        private long lineChars;
        private long recordChars;
        private boolean afterCarriageReturn;
        private boolean started;

        LimitedReader(Reader in, String label, Limit limit) {
            super(in);
            this.label = label;
            this.limit = limit;
            // Without a mark to drop, the first character needs no look.
            this.started = !limit.dropMark();
        }

        void startRecord() {
            recordChars = 0;
        }

        private IOException located(CharacterCodingException e) {
            if (limit.source() == null) {
                return e;
            }
            throw TextFiles.notUtf8(limit.source(), label);
        }

        @Override
        public int read() throws IOException {
            int c;
            try {
                c = super.read();
                if (!started) {
                    started = true;
                    if (c == TextFiles.BOM) {
                        c = super.read();
                    }
                }
            } catch (CharacterCodingException e) {
                throw located(e);
            }
            if (c >= 0) {
                count((char) c);
                countRecord(1);
            }
            return c;
        }

        @Override
        public int read(char[] buffer, int offset, int length) throws IOException {
            int n;
            try {
                n = super.read(buffer, offset, length);
            } catch (CharacterCodingException e) {
                throw located(e);
            }
            if (!started && n > 0) {
                // A spreadsheet's "CSV UTF-8" starts with a byte-order mark: it is not part of the header.
                started = true;
                if (buffer[offset] == TextFiles.BOM) {
                    System.arraycopy(buffer, offset + 1, buffer, offset, n - 1);
                    n--;
                    if (n == 0) {
                        return read(buffer, offset, length);
                    }
                }
            }
            for (int i = 0; i < n; i++) {
                count(buffer[offset + i]);
            }
            if (n > 0) {
                countRecord(n);
            }
            return n;
        }

        private void count(char c) {
            if (c == '\n') {
                if (!afterCarriageReturn) {
                    line++;
                }
                lineChars = 0;
                afterCarriageReturn = false;
            } else if (c == '\r') {
                line++;
                lineChars = 0;
                afterCarriageReturn = true;
            } else {
                afterCarriageReturn = false;
                if (++lineChars > limit.maxLineChars()) {
                    throw new InputException(label + " line " + line, limit.lineTooLong());
                }
            }
        }

        private void countRecord(int n) {
            recordChars += n;
            // Read-ahead of the parser's buffer counts too, so the cap is loose by one buffer.
            if (recordChars > limit.maxRecordChars()) {
                throw new InputException(label + " line " + line, limit.recordTooLong());
            }
        }
    }
}
