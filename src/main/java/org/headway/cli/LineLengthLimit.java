package org.headway.cli;

import java.io.FilterReader;
import java.io.Reader;
import org.headway.project.CsvTableReader;

/**
 * A reader that refuses a physical line longer than a limit, so that a CSV reader fed a file with
 * no line breaks (a binary dump, a runaway quote) stops with a located error instead of growing one
 * record until memory runs out. CR, LF and CRLF all end a line. A leading byte-order mark is
 * dropped, and bytes of the source that are not UTF-8 are reported with its line. The counting is
 * {@link CsvTableReader.Limit}'s; this class gives it the wording of the command-line readers.
 */
final class LineLengthLimit extends FilterReader {

    /** Longest line a CSV file of ours may have (characters); a data row is a few hundred. */
    static final int MAX_LINE_LENGTH = 1_000_000;

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
        super(limit(limit, source).wrap(in, label));
    }

    /** The cap of a command-line CSV reader: lines only, the byte-order mark dropped. */
    static CsvTableReader.Limit limit(int limit, java.nio.file.Path source) {
        return CsvTableReader.Limit.lines(
                        limit,
                        "line is longer than " + limit + " characters; is this a CSV file with one record per line?")
                .droppingMark(source);
    }
}
