package org.headway.cli;

/**
 * Appends CSV cells and records to UTF-8 text by the rules of commons-csv's default
 * format (comma, CRLF after each record, a cell quoted only where needed, a quote inside doubled),
 * so that the fast friction batch writes the very bytes the library would. A test prints thousands
 * of generated cells both ways and requires equal text.
 */
final class CsvCells {

    private CsvCells() {}

    /**
     * Appends one cell.
     *
     * @param first true for the first cell of a record (no comma before it; empty is written {@code ""})
     */
    static void append(Utf8Text out, CharSequence cell, boolean first) {
        if (cell instanceof CharSlice slice) {
            append(out, slice, first);
            return;
        }
        if (!first) {
            out.append(',');
        }
        int length = cell.length();
        boolean quote;
        int pos = 0;
        if (length == 0) {
            quote = first;
        } else if (cell.charAt(0) <= '#') {
            quote = true;
        } else {
            quote = false;
            while (pos < length) {
                char c = cell.charAt(pos);
                if (c == '\n' || c == '\r' || c == '"' || c == ',') {
                    quote = true;
                    break;
                }
                pos++;
            }
            if (!quote && cell.charAt(length - 1) <= ' ') {
                quote = true;
            }
        }
        if (!quote) {
            out.append(cell);
            return;
        }
        out.append('"');
        int start = 0;
        for (int i = 0; i < length; i++) {
            if (cell.charAt(i) == '"') {
                out.append(cell.subSequence(start, i + 1));
                start = i;
            }
        }
        out.append(cell.subSequence(start, length));
        out.append('"');
    }

    /** {@link #append(Utf8Text, CharSequence, boolean)} on a view of an array, read directly. */
    static void append(Utf8Text out, CharSlice cell, boolean first) {
        char[] chars = cell.array();
        int offset = cell.offset();
        int length = cell.length();
        int end = offset + length;
        boolean plain = length > 0 ? chars[offset] > '#' && chars[end - 1] > ' ' : !first;
        for (int i = offset; plain && i < end; i++) {
            char c = chars[i];
            plain = c != '\n' && c != '\r' && c != '"' && c != ',';
        }
        if (!plain) {
            append(out, cell.toString(), first);
            return;
        }
        if (!first) {
            out.append(',');
        }
        out.append(chars, offset, length);
    }

    /** Ends a record. */
    static void endRecord(Utf8Text out) {
        out.append('\r').append('\n');
    }
}
