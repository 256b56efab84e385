package org.headway.caution;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Reads the user's text files as UTF-8, strictly: a file in another encoding (a spreadsheet's
 * Windows-1252 CSV, a UTF-16 export) is refused with the file, line and byte that give it away,
 * never read as replacement characters; a leading UTF-8 byte-order mark is dropped.
 */
public final class TextFiles {

    private TextFiles() {}

    /** UTF-8 byte-order mark as a character. */
    public static final char BOM = '\uFEFF';

    /**
     * The file's text.
     *
     * @param file the file
     * @param maxBytes largest size accepted (bytes)
     * @param what the end of the size message, e.g. "a rig file is a few kilobytes"
     * @throws InputException naming the file: not found, unreadable, too large, not UTF-8
     */
    public static String read(Path file, long maxBytes, String what) {
        byte[] bytes;
        try {
            if (Files.size(file) > maxBytes) {
                throw new InputException(file.toString(), "file is larger than " + sizeText(maxBytes) + "; " + what);
            }
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new InputException(file.toString(), "file not found");
        } catch (AccessDeniedException e) {
            throw new InputException(file.toString(), "cannot be read: permission denied");
        } catch (IOException e) {
            throw new InputException(file.toString(), "cannot be read: " + e.getMessage());
        }
        return decode(bytes, file.toString());
    }

    /**
     * A strict UTF-8 reader of a file whose decoding error is the located {@link InputException} of
     * {@link #notUtf8(Path, String)}; a leading byte-order mark is the caller's to drop.
     *
     * @param file the file
     * @param label how errors name it
     */
    public static java.io.Reader reader(Path file, String label) throws IOException {
        return new java.io.FilterReader(Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            @Override
            public int read() throws IOException {
                try {
                    return super.read();
                } catch (java.nio.charset.CharacterCodingException e) {
                    throw notUtf8(file, label);
                }
            }

            @Override
            public int read(char[] buffer, int offset, int length) throws IOException {
                try {
                    return super.read(buffer, offset, length);
                } catch (java.nio.charset.CharacterCodingException e) {
                    throw notUtf8(file, label);
                }
            }
        };
    }

    /** The text of a stream read whole (a bundled resource), strictly as UTF-8. */
    public static String read(InputStream in, String label) throws IOException {
        return decode(in.readAllBytes(), label);
    }

    /**
     * Decodes bytes as UTF-8.
     *
     * @param bytes the content
     * @param label how errors name the source
     * @throws InputException for UTF-16/UTF-32 or bytes that are not UTF-8, with line and byte
     */
    public static String decode(byte[] bytes, String label) {
        String foreign = foreignEncoding(bytes);
        if (foreign != null) {
            throw new InputException(
                    label, "is " + foreign + " text; save it as UTF-8 (a spreadsheet's \"CSV UTF-8\")");
        }
        CharsetDecoder decoder = StandardCharsets.UTF_8
                .newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        // Checked strictly in chunks, then decoded by the String constructor: a whole-file char buffer
        // would take twice the file's size again (200 MB for a 10⁶-junction link list).
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(8192);
        while (true) {
            CoderResult result = decoder.decode(in, out, true);
            if (result.isError()) {
                throw notUtf8(bytes, in.position(), label);
            }
            out.clear();
            if (result.isUnderflow()) {
                break;
            }
        }
        String text = new String(bytes, StandardCharsets.UTF_8);
        return !text.isEmpty() && text.charAt(0) == BOM ? text.substring(1) : text;
    }

    /**
     * The error for a file a strict UTF-8 reader failed on part-way (a streamed CSV): the file is read
     * again to find the line and byte.
     *
     * @param file the file
     * @param label how the error names it
     */
    public static InputException notUtf8(Path file, String label) {
        try {
            byte[] bytes = Files.readAllBytes(file);
            String foreign = foreignEncoding(bytes);
            if (foreign != null) {
                return new InputException(
                        label, "is " + foreign + " text; save it as UTF-8 (a spreadsheet's \"CSV UTF-8\")");
            }
            CharsetDecoder decoder = StandardCharsets.UTF_8
                    .newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT);
            ByteBuffer in = ByteBuffer.wrap(bytes);
            CharBuffer out = CharBuffer.allocate(Math.min(bytes.length, 1 << 16));
            while (true) {
                CoderResult r = decoder.decode(in, out, true);
                if (r.isError()) {
                    return notUtf8(bytes, in.position(), label);
                }
                if (r.isOverflow()) {
                    out.clear();
                    continue;
                }
                break;
            }
        } catch (IOException | OutOfMemoryError e) {
            // Fall through to the plain message.
        }
        return new InputException(label, "is not UTF-8 text; save it as UTF-8 (a spreadsheet's \"CSV UTF-8\")");
    }

    private static InputException notUtf8(byte[] bytes, int offset, String label) {
        long line = 1;
        for (int i = 0; i < offset; i++) {
            if (bytes[i] == '\n') {
                line++;
            }
        }
        return new InputException(
                label + " line " + line,
                String.format(
                        Locale.ROOT,
                        "is not UTF-8 text: byte 0x%02X (at byte %d of the file) is not valid UTF-8; the file was"
                                + " probably saved as Windows-1252 or Latin-1: save it as UTF-8 (a spreadsheet's"
                                + " \"CSV UTF-8\")",
                        bytes[offset] & 0xFF,
                        offset + 1));
    }

    /** "UTF-16" or "UTF-32" when the bytes say so by a byte-order mark or by NULs, else null. */
    static String foreignEncoding(byte[] b) {
        if (b.length >= 4
                && ((b[0] == 0 && b[1] == 0 && (b[2] & 0xFF) == 0xFE && (b[3] & 0xFF) == 0xFF)
                        || ((b[0] & 0xFF) == 0xFF && (b[1] & 0xFF) == 0xFE && b[2] == 0 && b[3] == 0))) {
            return "UTF-32";
        }
        if (b.length >= 2
                && (((b[0] & 0xFF) == 0xFE && (b[1] & 0xFF) == 0xFF)
                        || ((b[0] & 0xFF) == 0xFF && (b[1] & 0xFF) == 0xFE))) {
            return "UTF-16";
        }
        // Without a mark, UTF-16 of ASCII text has a NUL in every other byte; no text file of ours has one.
        int n = Math.min(b.length, 512);
        int nuls = 0;
        for (int i = 0; i < n; i++) {
            if (b[i] == 0) {
                nuls++;
            }
        }
        if (n >= 4 && nuls * 4 >= n) {
            return "UTF-16 (no byte-order mark)";
        }
        return null;
    }

    private static String sizeText(long bytes) {
        return bytes >= (1 << 20) ? (bytes >> 20) + " MB" : (bytes >> 10) + " KB";
    }
}
