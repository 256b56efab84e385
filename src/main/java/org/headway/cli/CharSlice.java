package org.headway.cli;

/**
 * A reusable view of characters in an array, so that fields read into a block can be checked and
 * parsed without a string per field. Not thread-safe: one per worker.
 */
final class CharSlice implements CharSequence {

    private char[] chars;
    private int offset;
    private int length;

    /** Points the view at {@code chars[offset, offset + length)}; returns this. */
    CharSlice set(char[] chars, int offset, int length) {
        this.chars = chars;
        this.offset = offset;
        this.length = length;
        return this;
    }

    char[] array() {
        return chars;
    }

    int offset() {
        return offset;
    }

    @Override
    public int length() {
        return length;
    }

    @Override
    public char charAt(int index) {
        if (index < 0 || index >= length) {
            throw new IndexOutOfBoundsException(index);
        }
        return chars[offset + index];
    }

    @Override
    public CharSequence subSequence(int start, int end) {
        return toString().subSequence(start, end);
    }

    @Override
    public String toString() {
        return new String(chars, offset, length);
    }
}
