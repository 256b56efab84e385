package org.headway.project;

import java.util.ArrayList;
import java.util.List;

/**
 * Reads CSV text held in memory into records, strictly by RFC 4180 (comma separated; a field in
 * double quotes may hold commas, line breaks and doubled quotes; CR LF, LF or CR ends a record)
 * with the spreadsheet habits the line list allows: lines whose cells are all blank are skipped and
 * each field is trimmed of surrounding spaces, tabs and other control characters. A quote that is not a field's first character is kept as text; text
 * between a closing quote and the next comma, and a quoted field left open at the end, are
 * refused with the line they are on.
 *
 * <p>This replaces a general CSV library on the line-list path: a 10⁵-junction network has 3·10⁵
 * lines, and a reader that splits one string without per-field objects is several times faster.
 */
final class CsvText {

    /** A record: its fields and the line it ends on (1-based, counting physical lines). */
    record Line(long number, List<String> fields) {}

    /** Malformed CSV, with the line it was found on. */
    static final class Malformed extends RuntimeException {
        private static final long serialVersionUID = 1L;
        final long line;

        Malformed(long line, String problem) {
            super(problem);
            this.line = line;
        }
    }

    private final String text;
    private int pos;
    private long line = 1;

    private CsvText(String text) {
        this.text = text;
    }

    /**
     * Every record of the text, blank lines left out.
     *
     * @throws Malformed on text after a closing quote or a quote left open
     */
    static List<Line> records(String text) {
        CsvText reader = new CsvText(text);
        List<Line> out = new ArrayList<>();
        for (Line l = reader.next(); l != null; l = reader.next()) {
            out.add(l);
        }
        return out;
    }

    /**
     * A reader of the text's records one at a time, so that a large file's cells need not all be
     * held at once (a 10⁶-junction line list has 2·10⁷ cells).
     */
    static CsvText reader(String text) {
        return new CsvText(text);
    }

    private final List<String> fields = new ArrayList<>();

    /**
     * The next record, blank lines skipped; null at the end.
     *
     * @throws Malformed on text after a closing quote or a quote left open
     */
    Line next() {
        int n = text.length();
        while (pos < n) {
            fields.clear();
            boolean blank = true;
            while (true) {
                String field = field();
                fields.add(field);
                blank &= field.isEmpty();
                if (pos < n && text.charAt(pos) == ',') {
                    pos++;
                    continue;
                }
                break;
            }
            long number = line;
            endOfLine();
            if (!blank) {
                return new Line(number, List.copyOf(fields));
            }
        }
        return null;
    }

    /** One field, trimmed; leaves pos at the comma, the line break or the end. */
    private String field() {
        int n = text.length();
        int start = pos;
        // A quote opens a quoted cell only as the cell's first character; after a space it is text.
        if (start < n && text.charAt(start) == '"') {
            StringBuilder value = new StringBuilder();
            long openedOn = line;
            int i = start + 1;
            while (true) {
                if (i >= n) {
                    throw new Malformed(openedOn, "a quoted cell opened on this line is never closed");
                }
                char c = text.charAt(i);
                if (c == '"') {
                    if (i + 1 < n && text.charAt(i + 1) == '"') {
                        value.append('"');
                        i += 2;
                        continue;
                    }
                    i++;
                    break;
                }
                if (c == '\n' || (c == '\r' && (i + 1 >= n || text.charAt(i + 1) != '\n'))) {
                    line++;
                }
                value.append(c);
                i++;
            }
            while (i < n && isBlank(text.charAt(i))) {
                i++;
            }
            if (i < n && !isEnd(text.charAt(i))) {
                throw new Malformed(line, "text after the closing quote of a cell: \"" + snippet(i) + "\"");
            }
            pos = i;
            return value.toString().trim();
        }
        while (start < n && isBlank(text.charAt(start))) {
            start++;
        }
        int i = start;
        while (i < n && !isEnd(text.charAt(i))) {
            i++;
        }
        pos = i;
        int end = i;
        while (end > start && isBlank(text.charAt(end - 1))) {
            end--;
        }
        return text.substring(start, end);
    }

    private void endOfLine() {
        int n = text.length();
        if (pos < n && text.charAt(pos) == '\r') {
            pos++;
            if (pos < n && text.charAt(pos) == '\n') {
                pos++;
            }
            line++;
        } else if (pos < n && text.charAt(pos) == '\n') {
            pos++;
            line++;
        }
    }

    private String snippet(int from) {
        int to = from;
        while (to < text.length() && to < from + 20 && !isEnd(text.charAt(to))) {
            to++;
        }
        return text.substring(from, to);
    }

    private static boolean isEnd(char c) {
        return c == ',' || c == '\n' || c == '\r';
    }

    /** Space, tab and the other control characters a spreadsheet may leave, but not a line break. */
    private static boolean isBlank(char c) {
        return c <= ' ' && c != '\n' && c != '\r';
    }
}
