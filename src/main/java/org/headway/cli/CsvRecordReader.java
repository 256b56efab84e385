package org.headway.cli;

import java.io.IOException;
import java.io.Reader;
import org.headway.caution.InputException;

/**
 * A streaming reader of CSV records for the friction batch, written for speed on large files and
 * holding to the reading rules the rest of Headway's CSV input follows (comma separated; fields may
 * be quoted with {@code "}, a doubled quote standing for one; a record ends at CR, LF or CRLF outside
 * quotes; spaces around a field and around a quoted field are dropped; empty lines are skipped).
 * These are the rules of commons-csv's default format with surrounding spaces ignored, and a test
 * reads thousands of generated files with both and requires the same records.
 *
 * <p>Malformed input (a quote left open, text after a closing quote) is an {@link InputException}
 * that names the line. Not thread-safe; one reader per file.
 */
final class CsvRecordReader {

    private static final int EOF = -1;

    private final Reader in;
    private final String label;
    private final char[] buffer = new char[1 << 16];
    private int position;
    private int limit;
    private long line = 1;

    /**
     * @param in the text to read (already decoded)
     * @param label how errors name the source, e.g. {@code --input points.csv}
     */
    CsvRecordReader(Reader in, String label) {
        this.in = in;
        this.label = label;
    }

    /** The physical line the reader has reached (1-based). */
    long line() {
        return line;
    }

    private int read() throws IOException {
        if (position == limit) {
            int n = in.read(buffer, 0, buffer.length);
            if (n <= 0) {
                return EOF;
            }
            position = 0;
            limit = n;
        }
        return buffer[position++];
    }

    private int peek() throws IOException {
        if (position == limit) {
            int n = in.read(buffer, 0, buffer.length);
            if (n <= 0) {
                return EOF;
            }
            position = 0;
            limit = n;
        }
        return buffer[position];
    }

    /** Consumes the LF of a CRLF after {@code c}; counts the line. */
    private void endOfLine(int c) throws IOException {
        if (c == '\r' && peek() == '\n') {
            position++;
        }
        line++;
    }

    private static boolean isSpace(int c) {
        return c != ',' && Character.isWhitespace((char) c);
    }

    /**
     * Fields of a run of records, unquoted, end to end in one character array: the reader fills it,
     * a worker reads it, nothing per field is allocated.
     */
    static final class Block {
        char[] chars = new char[1 << 12];
        int length;
        /** Field {@code i} is {@code chars[fieldEnd[i - 1], fieldEnd[i])} ({@code [0, fieldEnd[0])} for the first). */
        int[] fieldEnd = new int[256];

        int fields;
        /** Record {@code r} holds fields {@code [recordEnd[r - 1], recordEnd[r])}. */
        int[] recordEnd = new int[64];

        int records;

        void clear() {
            length = 0;
            fields = 0;
            records = 0;
        }

        int fieldStart(int field) {
            return field == 0 ? 0 : fieldEnd[field - 1];
        }

        int firstField(int record) {
            return record == 0 ? 0 : recordEnd[record - 1];
        }

        private void ensure(int more) {
            if (length + more > chars.length) {
                chars = java.util.Arrays.copyOf(chars, Math.max(chars.length * 2, length + more));
            }
        }

        void append(char c) {
            ensure(1);
            chars[length++] = c;
        }

        void append(char[] source, int offset, int count) {
            ensure(count);
            System.arraycopy(source, offset, chars, length, count);
            length += count;
        }

        void endField() {
            if (fields == fieldEnd.length) {
                fieldEnd = java.util.Arrays.copyOf(fieldEnd, fields * 2);
            }
            fieldEnd[fields++] = length;
        }

        void endRecord() {
            if (records == recordEnd.length) {
                recordEnd = java.util.Arrays.copyOf(recordEnd, records * 2);
            }
            recordEnd[records++] = fields;
        }

        /** Drops trailing whitespace from the field begun at {@code fieldStart} (not yet ended). */
        void trimFrom(int fieldStart) {
            while (length > fieldStart && Character.isWhitespace(chars[length - 1])) {
                length--;
            }
        }
    }

    private final Block single = new Block();

    /** The next record's fields, or null at the end of the input. */
    String[] next() throws IOException {
        single.clear();
        if (!readRecord(single)) {
            return null;
        }
        String[] fields = new String[single.fields];
        for (int i = 0; i < fields.length; i++) {
            int from = single.fieldStart(i);
            fields[i] = new String(single.chars, from, single.fieldEnd[i] - from);
        }
        return fields;
    }

    /** Reads the next record into the block; false at the end of the input (nothing added). */
    boolean readRecord(Block block) throws IOException {
        int c = read();
        while (c == '\n' || c == '\r') {
            endOfLine(c);
            c = read();
        }
        if (c == EOF) {
            return false;
        }
        while (true) {
            while (c != EOF && c != '\n' && c != '\r' && isSpace(c)) {
                c = read();
            }
            if (c == ',') {
                block.endField();
                c = read();
                continue;
            }
            if (c == '\n' || c == '\r' || c == EOF) {
                if (c != EOF) {
                    endOfLine(c);
                }
                block.endField();
                block.endRecord();
                return true;
            }
            c = c == '"' ? quoted(block) : simple(block, c);
            block.endField();
            if (c == ',') {
                c = read();
                continue;
            }
            if (c == '\n' || c == '\r') {
                endOfLine(c);
            }
            block.endRecord();
            return true;
        }
    }

    /** Reads an unquoted field starting with {@code c}; returns the character that ended it. */
    private int simple(Block block, int c) throws IOException {
        int fieldStart = block.length;
        // Fast path: the field ends within the buffer (the usual case) and is copied from it at once.
        int start = position - 1;
        int i = position;
        while (i < limit) {
            char d = buffer[i];
            if (d == ',' || d == '\n' || d == '\r') {
                break;
            }
            i++;
        }
        if (i < limit) {
            block.append(buffer, start, i - start);
            block.trimFrom(fieldStart);
            position = i + 1;
            return buffer[i];
        }
        while (c != ',' && c != '\n' && c != '\r' && c != EOF) {
            block.append((char) c);
            c = read();
        }
        block.trimFrom(fieldStart);
        return c;
    }

    /** Reads a quoted field (the opening quote consumed); returns the character that ended it. */
    private int quoted(Block block) throws IOException {
        long opened = line;
        while (true) {
            int c = read();
            if (c == EOF) {
                throw new InputException(
                        label + " line " + opened,
                        "a quoted field opened on this line is not closed before the end of the file");
            }
            if (c == '"') {
                if (peek() == '"') {
                    position++;
                    block.append('"');
                    continue;
                }
                while (true) {
                    c = read();
                    if (c == ',' || c == '\n' || c == '\r' || c == EOF) {
                        return c;
                    }
                    if (!isSpace(c)) {
                        throw new InputException(
                                label + " line " + line,
                                "text after the closing quote of a field: '" + (char) c
                                        + "' (a quote inside a quoted field is written twice: \"\")");
                    }
                }
            }
            if (c == '\n') {
                line++;
            } else if (c == '\r') {
                if (peek() == '\n') {
                    position++;
                    block.append('\r');
                    c = '\n';
                }
                line++;
            }
            block.append((char) c);
        }
    }
}
