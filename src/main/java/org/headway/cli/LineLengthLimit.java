package org.headway.cli;

import java.io.FilterReader;
import java.io.IOException;
import java.io.Reader;
import org.headway.caution.InputException;

/**
 * A reader that refuses a physical line longer than a limit, so that a CSV reader fed a file with
 * no line breaks (a binary dump, a runaway quote) stops with a located error instead of growing one
 * record until memory runs out. CR, LF and CRLF all end a line.
 */
final class LineLengthLimit extends FilterReader {

    /** Longest line a CSV file of ours may have (characters); a data row is a few hundred. */
    static final int MAX_LINE_LENGTH = 1_000_000;

    private final String label;
    private final int limit;
    private long line = 1;
    private int column;
    private boolean afterCarriageReturn;

    /**
     * @param in the underlying reader
     * @param label how errors name the source, e.g. {@code --input points.csv}
     * @param limit longest line accepted (characters)
     */
    LineLengthLimit(Reader in, String label, int limit) {
        super(in);
        this.label = label;
        this.limit = limit;
    }

    @Override
    public int read() throws IOException {
        int c = super.read();
        if (c >= 0) {
            count((char) c);
        }
        return c;
    }

    @Override
    public int read(char[] buffer, int offset, int length) throws IOException {
        int n = super.read(buffer, offset, length);
        for (int i = 0; i < n; i++) {
            count(buffer[offset + i]);
        }
        return n;
    }

    private void count(char c) {
        if (c == '\n') {
            if (!afterCarriageReturn) {
                line++;
            }
            column = 0;
            afterCarriageReturn = false;
        } else if (c == '\r') {
            line++;
            column = 0;
            afterCarriageReturn = true;
        } else {
            afterCarriageReturn = false;
            if (++column > limit) {
                throw new InputException(
                        label + " line " + line,
                        "line is longer than " + limit + " characters; is this a CSV file with one record per line?");
            }
        }
    }
}
