package org.headway.network.sparse;

import java.util.Arrays;

/**
 * The numeric Cholesky factor P A Pᵀ = L Lᵀ of a symmetric positive-definite matrix on the
 * pattern of a {@link SymbolicCholesky}, and solves with it.
 *
 * <p>The factorization is the left-looking supernodal method (Ng &amp; Peyton, "Block sparse
 * Cholesky algorithms on advanced uniprocessor computers", SIAM J. Sci. Comput. 14(5), 1993;
 * Davis, <i>Direct Methods for Sparse Linear Systems</i>, SIAM 2006, §9.1; the column form with
 * linked lists of updating columns is George &amp; Liu 1981 §5.5). Each supernode J is a dense
 * column-major block holding its rows; in column order, J gathers A's columns, subtracts the
 * update L_K L_Kᵀ of every earlier supernode K with rows in J's columns (K sits in a linked list
 * keyed by the next supernode it updates), then factors its diagonal block in place and divides
 * the rows below by it. The inner loops are dense, four target columns at a time.
 *
 * <p>The pivot of column k is dₖ = A(k, k) − Σ L(k, j)² (the pivot of L D Lᵀ, before the square
 * root) and must exceed a tolerance relative to the largest diagonal entry of A.
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
    private final double[] values;
    private final double[] work;
    /** Global row → its position in the current supernode's rows. */
    private final int[] map;
    /** Head of the list of supernodes whose next update goes to supernode s. */
    private final int[] head;

    private final int[] link;
    /** Position in supernode K's rows of the first row not yet used by an update. */
    private final int[] cursor;
    /** Update buffer: up to four columns of the largest supernode's rows. */
    private final double[] update;
    /** The second half's update buffer when one update is split between two cores. */
    private final double[] updateOther;

    /**
     * Multiply–adds (about) from which one supernode's update of another is split between two cores:
     * below it the fork costs more than it saves.
     */
    static final long PARALLEL_UPDATE_WORK = 400_000;

    /** The split threshold this factor uses (tests set it to Long.MAX_VALUE for the in-order path). */
    long parallelUpdateWork = PARALLEL_UPDATE_WORK;

    /** Updates split between two cores in the last factorization. */
    long splitUpdates;

    private boolean valid;

    NumericCholesky(SymbolicCholesky symbolic) {
        this.symbolic = symbolic;
        this.n = symbolic.size();
        int ns = symbolic.supernodeCount();
        this.values = new double[(int) symbolic.storedValues()];
        this.work = new double[n];
        this.map = new int[n];
        this.head = new int[ns];
        this.link = new int[ns];
        this.cursor = new int[ns];
        int[] rs = symbolic.superRowStart();
        int maxRows = 0;
        for (int s = 0; s < ns; s++) {
            maxRows = Math.max(maxRows, rs[s + 1] - rs[s]);
        }
        this.update = new double[4 * maxRows];
        this.updateOther = new double[4 * maxRows];
    }

    /**
     * Factors new values on the same pattern into this factor's arrays, with the default pivot
     * tolerance. On failure this factor is left unusable until a later refactor succeeds.
     *
     * @param diagonal A[i][i] for every original row i (length n)
     * @param offDiagonal A[a][b] = A[b][a] for each edge of the pattern's list, in its order;
     *     repeated pairs are summed
     * @return this factor
     * @throws NotPositiveDefiniteException naming the first row (in elimination order) whose pivot
     *     is not above the tolerance × the largest diagonal entry
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
        int[] first = symbolic.superFirst();
        int[] columnSuper = symbolic.columnSuper();
        int[] rowStart = symbolic.superRowStart();
        int[] rows = symbolic.superRows();
        int[] valueStart = symbolic.superValueStart();
        int[] colEdgeStart = symbolic.colEdgeStart();
        int[] colEdge = symbolic.colEdge();
        int[] colEdgeUpper = symbolic.colEdgeUpper();
        double[] v = values;
        int ns = first.length - 1;
        Arrays.fill(head, -1);
        splitUpdates = 0;

        for (int sj = 0; sj < ns; sj++) {
            int f = first[sj];
            int w = first[sj + 1] - f;
            int rj = rowStart[sj];
            int r = rowStart[sj + 1] - rj;
            int vj = valueStart[sj];
            Arrays.fill(v, vj, vj + r * w, 0.0);
            for (int i = 0; i < r; i++) {
                map[rows[rj + i]] = i;
            }
            // Gather A's columns f .. f+w−1 (diagonal and the entries below it).
            for (int t = 0; t < w; t++) {
                int col = f + t;
                int base = vj + t * r;
                v[base + t] = diagonal[perm[col]];
                for (int q = colEdgeStart[col]; q < colEdgeStart[col + 1]; q++) {
                    v[base + map[colEdgeUpper[q]]] += offDiagonal[colEdge[q]];
                }
            }
            // Updates from earlier supernodes with rows among J's columns.
            int sk = head[sj];
            while (sk != -1) {
                int nextK = link[sk];
                int rk = rowStart[sk];
                int rowsK = rowStart[sk + 1] - rk;
                int wK = first[sk + 1] - first[sk];
                int vk = valueStart[sk];
                int p0 = cursor[sk];
                int p1 = p0;
                int end = f + w;
                while (p1 < rowsK && rows[rk + p1] < end) {
                    p1++;
                }
                int len = rowsK - p0;
                // Work ∝ wK × Σ over the target columns b of (rowsK − b).
                long work = (long) wK * (p1 - p0) * (2L * rowsK - p0 - p1);
                if (work >= parallelUpdateWork && p1 - p0 >= 8) {
                    splitUpdates++;
                    // Split the target columns in two halves of equal work, in whole blocks of four: each
                    // half writes its own columns of J, so the two run at once and the sums are the same,
                    // term by term, as in order.
                    int mid = p0;
                    long half = work / 2;
                    long acc = 0;
                    while (mid + 4 < p1 && acc < half) {
                        int nb = Math.min(4, p1 - mid);
                        acc += (long) wK * nb * 2L * (rowsK - mid);
                        mid += nb;
                    }
                    final int sMid = mid;
                    final int sP1 = p1;
                    java.util.concurrent.ForkJoinTask<?> other = java.util.concurrent.ForkJoinTask.adapt(() ->
                                    applyUpdates(v, vk, rowsK, wK, sMid, sP1, p0, len, rk, vj, f, r, rows, updateOther))
                            .fork();
                    applyUpdates(v, vk, rowsK, wK, p0, mid, p0, len, rk, vj, f, r, rows, update);
                    other.join();
                } else {
                    applyUpdates(v, vk, rowsK, wK, p0, p1, p0, len, rk, vj, f, r, rows, update);
                }
                cursor[sk] = p1;
                if (p1 < rowsK) {
                    int s = columnSuper[rows[rk + p1]];
                    link[sk] = head[s];
                    head[s] = sk;
                }
                sk = nextK;
            }
            // Dense Cholesky of the diagonal block, left-looking in groups of four columns, each
            // group also dividing the rows below.
            for (int t0 = 0; t0 < w; t0 += 4) {
                int nb = Math.min(4, w - t0);
                subtractProducts(v, vj, r, 0, t0, t0, r, t0, nb, v, vj + t0 * r, r);
                for (int j = 0; j < nb; j++) {
                    int t = t0 + j;
                    int col = vj + t * r;
                    for (int c = t0; c < t; c++) {
                        int cc = vj + c * r;
                        double y = v[cc + t];
                        for (int a = t; a < r; a++) {
                            v[col + a] -= v[cc + a] * y;
                        }
                    }
                    double d = v[col + t];
                    if (!(d > threshold)) {
                        throw new NotPositiveDefiniteException(perm[f + t], f + t, n, d, threshold);
                    }
                    double s = Math.sqrt(d);
                    v[col + t] = s;
                    double inv = 1.0 / s;
                    for (int a = t + 1; a < r; a++) {
                        v[col + a] *= inv;
                    }
                }
            }
            cursor[sj] = w;
            if (w < r) {
                int s = columnSuper[rows[rj + w]];
                link[sj] = head[s];
                head[s] = sj;
            }
        }
        valid = true;
        return this;
    }

    /**
     * Applies supernode K's update to J's target columns rows[rk + b] for b in [b0Start, b1), four at a
     * time, through the buffer buf (4 × len).
     */
    private void applyUpdates(
            double[] v,
            int vk,
            int rowsK,
            int wK,
            int b0Start,
            int b1,
            int p0,
            int len,
            int rk,
            int vj,
            int f,
            int r,
            int[] rows,
            double[] buf) {
        for (int b0 = b0Start; b0 < b1; b0 += 4) {
            int nb = Math.min(4, b1 - b0);
            Arrays.fill(buf, 0, nb * len, 0.0);
            // buf[(a − p0) + j·len] = −Σ_c L_K(a, c) L_K(b0 + j, c), rows a ≥ b0.
            subtractProducts(v, vk, rowsK, 0, wK, b0, rowsK, b0, nb, buf, -p0, len);
            for (int j = 0; j < nb; j++) {
                int target = vj + (rows[rk + b0 + j] - f) * r;
                int u = j * len - p0;
                for (int a = b0 + j; a < rowsK; a++) {
                    v[target + map[rows[rk + a]]] += buf[u + a];
                }
            }
        }
    }

    /**
     * dst[dstBase + a + j·dstLd] −= Σ_{c ∈ [c0, c1)} X(a, c) X(b0 + j, c) for rows a ∈ [a0, a1), j
     * &lt; nb ≤ 4, with X(i, c) = v[base + i + c·ld]. dst may be v itself when the columns written
     * are not among those read.
     */
    private static void subtractProducts(
            double[] v,
            int base,
            int ld,
            int c0,
            int c1,
            int a0,
            int a1,
            int b0,
            int nb,
            double[] dst,
            int dstBase,
            int dstLd) {
        if (nb == 4) {
            int d0 = dstBase;
            int d1 = dstBase + dstLd;
            int d2 = d1 + dstLd;
            int d3 = d2 + dstLd;
            for (int c = c0; c < c1; c++) {
                int x = base + c * ld;
                double y0 = v[x + b0];
                double y1 = v[x + b0 + 1];
                double y2 = v[x + b0 + 2];
                double y3 = v[x + b0 + 3];
                for (int a = a0; a < a1; a++) {
                    double xa = v[x + a];
                    dst[d0 + a] -= xa * y0;
                    dst[d1 + a] -= xa * y1;
                    dst[d2 + a] -= xa * y2;
                    dst[d3 + a] -= xa * y3;
                }
            }
            return;
        }
        for (int j = 0; j < nb; j++) {
            int dj = dstBase + j * dstLd;
            for (int c = c0; c < c1; c++) {
                int x = base + c * ld;
                double y = v[x + b0 + j];
                for (int a = a0; a < a1; a++) {
                    dst[dj + a] -= v[x + a] * y;
                }
            }
        }
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
        requireValid();
        if (b == null || b.length != n) {
            throw new IllegalArgumentException("right-hand side must have " + n + " entries, got "
                    + (b == null ? "null" : String.valueOf(b.length)));
        }
        int[] perm = symbolic.perm();
        int[] first = symbolic.superFirst();
        int[] rowStart = symbolic.superRowStart();
        int[] rows = symbolic.superRows();
        int[] valueStart = symbolic.superValueStart();
        double[] v = values;
        int ns = first.length - 1;
        for (int k = 0; k < n; k++) {
            z[k] = b[perm[k]];
        }
        // L y = P b, supernode by supernode, column by column.
        for (int s = 0; s < ns; s++) {
            int f = first[s];
            int w = first[s + 1] - f;
            int rs = rowStart[s];
            int r = rowStart[s + 1] - rs;
            for (int t = 0; t < w; t++) {
                int col = valueStart[s] + t * r;
                double zt = z[f + t] / v[col + t];
                z[f + t] = zt;
                if (zt != 0) {
                    for (int a = t + 1; a < r; a++) {
                        z[rows[rs + a]] -= v[col + a] * zt;
                    }
                }
            }
        }
        // Lᵀ x = y, row t of Lᵀ being column t of L.
        for (int s = ns - 1; s >= 0; s--) {
            int f = first[s];
            int w = first[s + 1] - f;
            int rs = rowStart[s];
            int r = rowStart[s + 1] - rs;
            for (int t = w - 1; t >= 0; t--) {
                int col = valueStart[s] + t * r;
                double sum = z[f + t];
                for (int a = t + 1; a < r; a++) {
                    sum -= v[col + a] * z[rows[rs + a]];
                }
                z[f + t] = sum / v[col + t];
            }
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

    /** ln det A = 2 Σ ln L(k, k). */
    public double logDeterminant() {
        requireValid();
        double s = 0;
        int[] first = symbolic.superFirst();
        int[] rowStart = symbolic.superRowStart();
        int[] valueStart = symbolic.superValueStart();
        for (int sn = 0; sn + 1 < first.length; sn++) {
            int r = rowStart[sn + 1] - rowStart[sn];
            for (int t = 0; t < first[sn + 1] - first[sn]; t++) {
                s += Math.log(values[valueStart[sn] + t * r + t]);
            }
        }
        return 2 * s;
    }

    /** The smallest pivot dₖ = L(k, k)² (+∞ when n = 0). */
    public double smallestPivot() {
        requireValid();
        double m = Double.POSITIVE_INFINITY;
        int[] first = symbolic.superFirst();
        int[] rowStart = symbolic.superRowStart();
        int[] valueStart = symbolic.superValueStart();
        for (int sn = 0; sn + 1 < first.length; sn++) {
            int r = rowStart[sn + 1] - rowStart[sn];
            for (int t = 0; t < first[sn + 1] - first[sn]; t++) {
                double l = values[valueStart[sn] + t * r + t];
                m = Math.min(m, l * l);
            }
        }
        return m;
    }

    private void requireValid() {
        if (!valid) {
            throw new IllegalStateException("no valid factor: the last factorization failed");
        }
    }
}
