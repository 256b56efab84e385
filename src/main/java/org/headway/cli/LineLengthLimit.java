package org.headway.cli;

import java.io.FilterReader;
import java.io.IOException;
import java.io.Reader;
import org.headway.caution.InputException;

/**
 * A reader that refuses a physical line longer than a limit, so that a CSV reader fed a file with
 * no line breaks (a binary dump, a runaway quote) stops with a located error instead of growing one
 * record until memory runs out. CR, LF and CRLF all end a line. A leading byte-order mark is
 * dropped, and bytes of the source that are not UTF-8 are reported with its line.
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
        this(in, label, limit, null);
    }

    /**
     * @param in the underlying reader, a strict UTF-8 decoder of {@code source}
     * @param label how errors name the source
     * @param limit longest line accepted (characters)
     * @param source the file read, so that bytes that are not UTF-8 are located in it; null if none
     */
    LineLengthLimit(Reader in, String label, int limit, java.nio.file.Path source) {
        super(in);
        this.label = label;
        this.limit = limit;
        this.source = source;
    }

    private final java.nio.file.Path source;
    private boolean started;

    private IOException located(java.nio.charset.CharacterCodingException e) {
        if (source == null) {
            return e;
        }
        throw org.headway.caution.TextFiles.notUtf8(source, label);
    }

    @Override
    public int read() throws IOException {
        int c;
        try {
            c = super.read();
            if (!started) {
                started = true;
                if (c == org.headway.caution.TextFiles.BOM) {
                    c = super.read();
                }
            }
        } catch (java.nio.charset.CharacterCodingException e) {
            throw located(e);
        }
        if (c >= 0) {
            count((char) c);
        }
        return c;
    }

    @Override
    public int read(char[] buffer, int offset, int length) throws IOException {
        int n;
        try {
            n = super.read(buffer, offset, length);
        } catch (java.nio.charset.CharacterCodingException e) {
            throw located(e);
        }
        if (!started && n > 0) {
            // A spreadsheet's "CSV UTF-8" starts with a byte-order mark: it is not part of the header.
            started = true;
            if (buffer[offset] == org.headway.caution.TextFiles.BOM) {
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
