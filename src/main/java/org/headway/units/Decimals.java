package org.headway.units;

import com.fasterxml.jackson.core.io.NumberInput;
import com.fasterxml.jackson.core.io.NumberOutput;

/**
 * Reading and writing doubles as decimal text on the paths that handle 10⁵–10⁶ numbers (line
 * lists, batch friction, CSV results). On Java 17 {@link Double#parseDouble} and {@link
 * Double#toString} are the slow part of those paths; the JSON library Headway already ships
 * carries faster implementations of the same contracts, used here:
 *
 * <ul>
 *   <li>{@link #parse}: Werner Randelshofer's FastDoubleParser (after Lemire 2021, "Number parsing
 *       at a gigabyte per second", Software: Practice and Experience 51(8)), which accepts exactly
 *       the syntax of {@link Double#valueOf(String)} and returns the same, correctly rounded, double;
 *   <li>{@link #format}: Giulietti's Schubfach algorithm (2020, "The Schubfach way to render doubles"),
 *       the shortest decimal that reads back as the same double, in {@link Double#toString}'s
 *       layout ({@code 0.05}, {@code 5.0E-5}, {@code 1.0E7}). It is what {@code Double.toString}
 *       itself does from Java 19; Java 17's sometimes writes a digit more than needed, so the two
 *       can differ in the last digit while both read back exactly.
 * </ul>
 *
 * The tests hold both against the JDK's own on millions of values: same double parsed, exact round
 * trip formatted.
 */
public final class Decimals {

    private Decimals() {}

    /**
     * The double a decimal text stands for, as {@link Double#parseDouble} would give it.
     *
     * @throws NumberFormatException where {@code Double.parseDouble} would throw it
     */
    public static double parse(String text) {
        return NumberInput.parseDouble(text, true);
    }

    /**
     * The decimal rule of every file Headway reads: an optional sign, digits with an optional decimal
     * point (or a point and digits), and an optional exponent; surrounding spaces allowed. Refused:
     * Java's {@code f}/{@code d} suffixes, hexadecimal floats, {@code NaN}, {@code Infinity}, a
     * decimal comma, thousands separators.
     *
     * @param text the text, e.g. {@code -1.5e-3}
     * @return whether it follows the rule
     */
    public static boolean isPlainDecimal(String text) {
        return text != null && isPlainDecimal((CharSequence) text);
    }

    /** {@link #isPlainDecimal(String)} on any characters, e.g. a view of a read buffer. */
    public static boolean isPlainDecimal(CharSequence text) {
        int n = text.length();
        int i = 0;
        while (i < n && text.charAt(i) == ' ') {
            i++;
        }
        while (n > i && text.charAt(n - 1) == ' ') {
            n--;
        }
        if (i < n && (text.charAt(i) == '+' || text.charAt(i) == '-')) {
            i++;
        }
        int digits = 0;
        while (i < n && isDigit(text.charAt(i))) {
            i++;
            digits++;
        }
        if (i < n && text.charAt(i) == '.') {
            i++;
            while (i < n && isDigit(text.charAt(i))) {
                i++;
                digits++;
            }
        }
        if (digits == 0) {
            return false;
        }
        if (i < n && (text.charAt(i) == 'e' || text.charAt(i) == 'E')) {
            i++;
            if (i < n && (text.charAt(i) == '+' || text.charAt(i) == '-')) {
                i++;
            }
            int exponent = 0;
            while (i < n && isDigit(text.charAt(i))) {
                i++;
                exponent++;
            }
            if (exponent == 0) {
                return false;
            }
        }
        return i == n;
    }

    /**
     * {@link #parse(String)} on characters of an array, without making a string of them.
     *
     * @throws NumberFormatException where {@code Double.parseDouble} would throw it
     */
    public static double parse(char[] chars, int offset, int length) {
        return NumberInput.parseDouble(chars, offset, length, true);
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    /**
     * A number by the decimal rule of {@link #isPlainDecimal}.
     *
     * @throws NumberFormatException for any other text
     */
    public static double parseDecimal(String text) {
        if (!isPlainDecimal(text)) {
            throw new NumberFormatException("not a plain decimal number: \"" + text + "\"");
        }
        return parse(text.strip());
    }

    /** The shortest decimal text that reads back as {@code value}, in {@link Double#toString}'s layout. */
    public static String format(double value) {
        return NumberOutput.toString(value, true);
    }
}
