package org.headway.network.sparse;

import java.util.Arrays;

/**
 * The numeric factor P A Pᵀ = L D Lᵀ (L unit lower triangular, D diagonal; the Cholesky factor is
 * L D^½) of a symmetric positive-definite matrix on the pattern of a {@link SymbolicCholesky}, and
 * solves with it.
 *
 * <p>The factorization is the up-looking (row-by-row) method: row k of L solves the triangular
 * system L₀..ₖ₋₁ y = A(0..k−1, k) over the row's pattern, which is the set of tree nodes reached
 * from A's entries of row k, visited in a topological order of the elimination tree; then L(k, j) =
 * yⱼ / dⱼ and dₖ = aₖₖ − Σ L(k, j) yⱼ (Davis, <i>Direct Methods for Sparse Linear Systems</i>, SIAM
 * 2006, §§4.1–4.2, 4.8). Square roots are not needed, and the pivot dₖ is tested directly.
 *
 * <p>{@link #refactor} writes new values into the same arrays (one factor per Newton iteration,
 * no allocation). A factor is not thread-safe: {@link #refactor} and {@link #solveInPlace} use its
 * work arrays; {@link #solve} allocates its own and may run concurrently with other solves.
 */
public final class NumericCholesky {

    /**
     * Default relative pivot tolerance: a pivot dₖ must exceed this × the largest diagonal entry of
     * A. Pivots of a well-posed network matrix stay far above it even for conductances spread over
     * ten decades; a network part with no fixed head gives a pivot of rounding size.
     */
    public static final double DEFAULT_RELATIVE_PIVOT_TOLERANCE = 1e-14;

    private final SymbolicCholesky symbolic;
    private final int n;
    private final double[] lx;
    private final double[] d;
    private final double[] y;
    private final double[] work;
    private final int[] stack;
    private final int[] flag;
    private final int[] next;
    private boolean valid;

    NumericCholesky(SymbolicCholesky symbolic) {
        this.symbolic = symbolic;
        this.n = symbolic.size();
        this.lx = new double[symbolic.rowIndex().length];
        this.d = new double[n];
        this.y = new double[n];
        this.work = new double[n];
        this.stack = new int[n];
        this.flag = new int[n];
        this.next = new int[n];
    }

    /**
     * Factors new values on the same pattern into this factor's arrays, with the default pivot
     * tolerance. On failure this factor is left unusable until a later refactor succeeds.
     *
     * @param diagonal A[i][i] for every original row i (length n)
     * @param offDiagonal A[a][b] = A[b][a] for each edge of the pattern's list, in its order;
     *     repeated pairs are summed
     * @return this factor
     * @throws NotPositiveDefiniteException naming the first row whose pivot is not above the
     *     tolerance × the largest diagonal entry
     * @throws IllegalArgumentException when a length is wrong or a value is not finite
     */
    public NumericCholesky refactor(double[] diagonal, double[] offDiagonal) {
        return refactor(diagonal, offDiagonal, DEFAULT_RELATIVE_PIVOT_TOLERANCE);
    }

    /**
     * As {@link #refactor(double[], double[])} with a chosen tolerance.
     *
     * @param relativePivotTolerance a pivot must exceed this × max A[i][i]; in [0, 1)
     */
    public NumericCholesky refactor(double[] diagonal, double[] offDiagonal, double relativePivotTolerance) {
        if (!(relativePivotTolerance >= 0 && relativePivotTolerance < 1)) {
            throw new IllegalArgumentException(
                    "relative pivot tolerance must be in [0, 1), got " + relativePivotTolerance);
        }
        check(diagonal, n, "diagonal");
        check(offDiagonal, symbolic.edgeCount(), "off-diagonal value");
        valid = false;
        double maxDiagonal = 0;
        for (double a : diagonal) {
            maxDiagonal = Math.max(maxDiagonal, a);
        }
        double threshold = relativePivotTolerance * maxDiagonal;

        int[] perm = symbolic.perm();
        int[] parent = symbolic.parent();
        int[] cp = symbolic.columnPointer();
        int[] ri = symbolic.rowIndex();
        int[] rowEdgeStart = symbolic.rowEdgeStart();
        int[] rowEdge = symbolic.rowEdge();
        int[] rowEdgeLower = symbolic.rowEdgeLower();
        double[] lx = this.lx;
        double[] d = this.d;
        double[] y = this.y;
        int[] stack = this.stack;
        int[] flag = this.flag;
        int[] next = this.next;
        Arrays.fill(flag, -1);
        System.arraycopy(cp, 0, next, 0, n);

        for (int k = 0; k < n; k++) {
            // Scatter A(0..k−1, k) into y and collect the pattern of row k of L in stack[top..n),
            // each tree path pushed so that descendants come before ancestors.
            int top = n;
            flag[k] = k;
            for (int t = rowEdgeStart[k]; t < rowEdgeStart[k + 1]; t++) {
                int j = rowEdgeLower[t];
                y[j] += offDiagonal[rowEdge[t]];
                int len = 0;
                while (flag[j] != k) {
                    stack[len++] = j;
                    flag[j] = k;
                    j = parent[j];
                }
                while (len > 0) {
                    stack[--top] = stack[--len];
                }
            }
            double dk = diagonal[perm[k]];
            for (int t = top; t < n; t++) {
                int j = stack[t];
                double yj = y[j];
                y[j] = 0;
                int end = next[j];
                for (int q = cp[j]; q < end; q++) {
                    y[ri[q]] -= lx[q] * yj;
                }
                double lkj = yj / d[j];
                dk -= lkj * yj;
                lx[end] = lkj; // ri[end] == k: rows of each column are filled in ascending order
                next[j] = end + 1;
            }
            if (!(dk > threshold)) {
                throw new NotPositiveDefiniteException(perm[k], k, n, dk, threshold);
            }
            d[k] = dk;
        }
        valid = true;
        return this;
    }

    private static void check(double[] values, int expected, String what) {
        if (values == null || values.length != expected) {
            throw new IllegalArgumentException(what + "s: expected " + expected + ", got "
                    + (values == null ? "null" : String.valueOf(values.length)));
        }
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new IllegalArgumentException(what + " " + i + " is " + values[i] + ", must be finite");
            }
        }
    }

    /**
     * Solves A x = b.
     *
     * @param b right-hand side in the original numbering (length n, not modified)
     * @return x in the original numbering
     */
    public double[] solve(double[] b) {
        double[] x = b.clone();
        solve(x, new double[n]);
        return x;
    }

    /**
     * Solves A x = b, overwriting b with x. Uses this factor's work array: not thread-safe.
     *
     * @param b right-hand side on entry, solution on return (original numbering, length n)
     */
    public void solveInPlace(double[] b) {
        solve(b, work);
    }

    private void solve(double[] b, double[] z) {
        if (!valid) {
            throw new IllegalStateException("no valid factor: the last factorization failed");
        }
        if (b == null || b.length != n) {
            throw new IllegalArgumentException("right-hand side must have " + n + " entries, got "
                    + (b == null ? "null" : String.valueOf(b.length)));
        }
        int[] perm = symbolic.perm();
        int[] cp = symbolic.columnPointer();
        int[] ri = symbolic.rowIndex();
        for (int k = 0; k < n; k++) {
            z[k] = b[perm[k]];
        }
        // L z = P b, column by column.
        for (int j = 0; j < n; j++) {
            double zj = z[j];
            if (zj != 0) {
                for (int q = cp[j]; q < cp[j + 1]; q++) {
                    z[ri[q]] -= lx[q] * zj;
                }
            }
        }
        for (int j = 0; j < n; j++) {
            z[j] /= d[j];
        }
        // Lᵀ z = D⁻¹ z, row j of Lᵀ being column j of L.
        for (int j = n - 1; j >= 0; j--) {
            double s = z[j];
            for (int q = cp[j]; q < cp[j + 1]; q++) {
                s -= lx[q] * z[ri[q]];
            }
            z[j] = s;
        }
        for (int k = 0; k < n; k++) {
            b[perm[k]] = z[k];
        }
    }

    /** The symbolic factor this numeric factor lives on. */
    public SymbolicCholesky symbolic() {
        return symbolic;
    }

    /** Entries of L with its diagonal: see {@link SymbolicCholesky#nonZerosInL()}. */
    public long nonZerosInL() {
        return symbolic.nonZerosInL();
    }

    /** ln det A = Σ ln dₖ. */
    public double logDeterminant() {
        requireValid();
        double s = 0;
        for (int k = 0; k < n; k++) {
            s += Math.log(d[k]);
        }
        return s;
    }

    /** The smallest pivot dₖ (+∞ when n = 0). */
    public double smallestPivot() {
        requireValid();
        double m = Double.POSITIVE_INFINITY;
        for (int k = 0; k < n; k++) {
            m = Math.min(m, d[k]);
        }
        return m;
    }

    private void requireValid() {
        if (!valid) {
            throw new IllegalStateException("no valid factor: the last factorization failed");
        }
    }
}
