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

    /** The shortest decimal text that reads back as {@code value}, in {@link Double#toString}'s layout. */
    public static String format(double value) {
        return NumberOutput.toString(value, true);
    }
}
