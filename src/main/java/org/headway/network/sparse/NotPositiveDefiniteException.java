package org.headway.network.sparse;

import java.util.Locale;

/**
 * Thrown by the numeric factorization when a pivot is not safely positive: the matrix is singular
 * or indefinite (for a network matrix, typically a part of the network with no fixed-head node, or
 * a negative or not-a-number conductance upstream). The row is named in the caller's numbering.
 */
public final class NotPositiveDefiniteException extends ArithmeticException {

    private final int row;
    private final int step;
    private final double pivot;
    private final double threshold;

    NotPositiveDefiniteException(int row, int step, int size, double pivot, double threshold) {
        super(String.format(
                Locale.ROOT,
                "matrix is not positive definite: the pivot of row %d (eliminated %d of %d) is %.6g,"
                        + " not above %.3g",
                row,
                step + 1,
                size,
                pivot,
                threshold));
        this.row = row;
        this.step = step;
        this.pivot = pivot;
        this.threshold = threshold;
    }

    /** The row whose pivot failed, in the original numbering. */
    public int row() {
        return row;
    }

    /** Its position in the elimination order (0 = first eliminated). */
    public int step() {
        return step;
    }

    /** The pivot found for that row: dₖ = A(k, k) − Σⱼ L(k, j)², the square of L(k, k) had it passed. */
    public double pivot() {
        return pivot;
    }

    /** The value the pivot had to exceed (tolerance × largest diagonal entry, at least 0). */
    public double threshold() {
        return threshold;
    }
}
