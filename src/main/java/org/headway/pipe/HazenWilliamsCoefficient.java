package org.headway.pipe;

import org.headway.caution.InputException;

/**
 * A Hazen–Williams roughness coefficient C for a pipe material, with where it comes from.
 *
 * @param value C (the method's own empirical units; larger is smoother), between {@link #MIN} and
 *     {@link #MAX}
 * @param source publication or note the value comes from
 */
public record HazenWilliamsCoefficient(double value, String source) {

    /** Smallest C accepted: badly tuberculated old mains are quoted near 40 (common practice, no source). */
    public static final double MIN = 20;

    /** Largest C accepted: the smoothest plastics are quoted near 150–160 (common practice, no source). */
    public static final double MAX = 170;

    public HazenWilliamsCoefficient {
        InputException.requireFinite("Hazen–Williams C", value);
        if (value < MIN || value > MAX) {
            throw new InputException(
                    "Hazen–Williams C",
                    "value " + value + " is outside " + MIN + "–" + MAX + "; published values lie within it");
        }
        source = source == null ? "" : source;
    }
}
