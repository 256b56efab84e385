package org.headway.fitting;

/**
 * Smallest and largest value of one variable in the fitted data.
 *
 * @param name column name
 * @param min smallest value (units of the column)
 * @param max largest value (units of the column)
 */
public record VariableRange(String name, double min, double max) {

    static VariableRange of(String name, double[] values) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        return new VariableRange(name, lo, hi);
    }

    /** Whether a value lies inside the range (bounds inclusive). */
    public boolean contains(double value) {
        return value >= min && value <= max;
    }
}
