package org.headway.cli;

import java.util.Arrays;

/**
 * Text built directly as UTF-8 bytes (the batch's output is nearly all ASCII, one byte a character),
 * saving the string and the encoder pass a {@link StringBuilder} would need before writing. Encodes
 * as {@link String#getBytes(java.nio.charset.Charset)} with UTF-8 does, a lone surrogate as {@code ?}.
 */
final class Utf8Text {

    private byte[] bytes;
    private int length;

    Utf8Text(int capacity) {
        bytes = new byte[Math.max(16, capacity)];
    }

    int length() {
        return length;
    }

    /** Empties the text, keeping its capacity. */
    void clear() {
        length = 0;
    }

    /** The bytes written so far (a copy). */
    byte[] toByteArray() {
        return Arrays.copyOf(bytes, length);
    }

    /** Writes the bytes so far to {@code out}. */
    void writeTo(java.io.OutputStream out) throws java.io.IOException {
        out.write(bytes, 0, length);
    }

    /** Appends {@code count} characters of {@code chars} from {@code offset}. */
    Utf8Text append(char[] chars, int offset, int count) {
        ensure(count);
        int end = offset + count;
        for (int i = offset; i < end; i++) {
            char c = chars[i];
            if (c >= 0x80) {
                // Rare in a data file: the rest goes the general way.
                return append(java.nio.CharBuffer.wrap(chars, i, end - i));
            }
            bytes[length++] = (byte) c;
        }
        return this;
    }

    private void ensure(int more) {
        if (length + more > bytes.length) {
            bytes = Arrays.copyOf(bytes, Math.max(bytes.length * 2, length + more));
        }
    }

    Utf8Text append(char c) {
        if (c < 0x80) {
            ensure(1);
            bytes[length++] = (byte) c;
            return this;
        }
        return appendNonAscii(c, (char) 0, false);
    }

    Utf8Text append(CharSequence text) {
        if (text instanceof CharSlice slice) {
            return append(slice.array(), slice.offset(), slice.length());
        }
        int n = text.length();
        ensure(n);
        for (int i = 0; i < n; i++) {
            char c = text.charAt(i);
            if (c < 0x80) {
                bytes[length++] = (byte) c;
            } else if (Character.isHighSurrogate(c) && i + 1 < n && Character.isLowSurrogate(text.charAt(i + 1))) {
                appendNonAscii(c, text.charAt(++i), true);
                ensure(n - i);
            } else {
                appendNonAscii(c, (char) 0, false);
                ensure(n - i);
            }
        }
        return this;
    }

    private Utf8Text appendNonAscii(char c, char low, boolean pair) {
        ensure(4);
        if (pair) {
            int cp = Character.toCodePoint(c, low);
            bytes[length++] = (byte) (0xF0 | (cp >> 18));
            bytes[length++] = (byte) (0x80 | ((cp >> 12) & 0x3F));
            bytes[length++] = (byte) (0x80 | ((cp >> 6) & 0x3F));
            bytes[length++] = (byte) (0x80 | (cp & 0x3F));
        } else if (Character.isSurrogate(c)) {
            bytes[length++] = '?';
        } else if (c < 0x800) {
            bytes[length++] = (byte) (0xC0 | (c >> 6));
            bytes[length++] = (byte) (0x80 | (c & 0x3F));
        } else {
            bytes[length++] = (byte) (0xE0 | (c >> 12));
            bytes[length++] = (byte) (0x80 | ((c >> 6) & 0x3F));
            bytes[length++] = (byte) (0x80 | (c & 0x3F));
        }
        return this;
    }
}
