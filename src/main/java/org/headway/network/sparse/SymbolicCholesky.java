package org.headway.network.sparse;

import java.util.Arrays;

/**
 * The symbolic analysis of a sparse symmetric matrix for a given elimination order: the
 * elimination tree, the column counts, the supernodes and the full pattern of the Cholesky factor L
 * of P A Pᵀ = L Lᵀ. Computed once per network topology; {@link #factor} then runs once per Newton
 * iteration with new values on the same pattern.
 *
 * <p>Algorithms, written from their published descriptions (Davis, <i>Direct Methods for Sparse
 * Linear Systems</i>, SIAM 2006, ch. 4 and §9.1; George &amp; Liu 1981, ch. 5):
 *
 * <ul>
 *   <li>the elimination tree by Liu's algorithm with path compression of a virtual forest of
 *       ancestors (J. W. H. Liu, "A compact row storage scheme for Cholesky factors using
 *       elimination trees", ACM TOMS 12(2), 1986), parent(j) = min{ i &gt; j : L(i, j) ≠ 0 };
 *   <li>the pattern of row k of L is the union of the tree paths from each j with A(k, j) ≠ 0, j
 *       &lt; k, up towards k (the "row subtree"); one walk over all rows gives the column counts, a
 *       second the row indices, in ascending order, of the first column of each supernode;
 *   <li>supernodes: maximal runs of columns j, j+1, … with parent(j) = j+1 and count(j) =
 *       count(j+1) + 1, which share one row structure (Liu, Ng &amp; Peyton, "On finding
 *       supernodes for sparse matrix computations", SIAM J. Matrix Anal. Appl. 14(1), 1993), so
 *       each is stored once as a dense block and factored with dense kernels.
 * </ul>
 *
 * <p>Indices inside this class are in the permuted order (row k of P A Pᵀ is original row {@code
 * perm[k]}); every public input and output is in the original numbering unless it says otherwise.
 * Immutable and safe to share between threads; each {@link NumericCholesky} has its own values.
 */
public final class SymbolicCholesky {

    private final int n;
    private final int edgeCount;
    private final int distinctPairs;
    private final int[] perm;
    private final int[] inversePerm;
    private final int[] parent;
    private final int[] count;
    private final long belowDiagonal;
    /** Supernode s holds columns superFirst[s] .. superFirst[s+1] − 1. */
    private final int[] superFirst;
    /** Column → its supernode. */
    private final int[] columnSuper;
    /** Rows of supernode s (its own columns first, then the rows below), ascending. */
    private final int[] superRowStart;

    private final int[] superRows;
    /** Offset of supernode s's dense column-major block (rows × width) in the value array. */
    private final int[] superValueStart;
    /** Edges grouped by the earlier (permuted) of their two rows: column j holds colEdge[colEdgeStart[j]..). */
    private final int[] colEdgeStart;

    private final int[] colEdge;
    /** For each entry of colEdge, the later (permuted) row of that edge. */
    private final int[] colEdgeUpper;

    private SymbolicCholesky(Builder b) {
        this.n = b.n;
        this.edgeCount = b.edgeCount;
        this.distinctPairs = b.distinctPairs;
        this.perm = b.perm;
        this.inversePerm = b.inversePerm;
        this.parent = b.parent;
        this.count = b.count;
        this.belowDiagonal = b.belowDiagonal;
        this.superFirst = b.superFirst;
        this.columnSuper = b.columnSuper;
        this.superRowStart = b.superRowStart;
        this.superRows = b.superRows;
        this.superValueStart = b.superValueStart;
        this.colEdgeStart = b.colEdgeStart;
        this.colEdge = b.colEdge;
        this.colEdgeUpper = b.colEdgeUpper;
    }

    /** The fields of a symbolic factor while it is computed. */
    private static final class Builder {
        int n;
        int edgeCount;
        int distinctPairs;
        int[] perm;
        int[] inversePerm;
        int[] parent;
        int[] count;
        long belowDiagonal;
        int[] superFirst;
        int[] columnSuper;
        int[] superRowStart;
        int[] superRows;
        int[] superValueStart;
        int[] colEdgeStart;
        int[] colEdge;
        int[] colEdgeUpper;
    }

    /**
     * Analyses {@code pattern} in the approximate minimum degree order of {@link
     * MinimumDegreeOrdering#order(SparsePattern)}.
     */
    public static SymbolicCholesky analyse(SparsePattern pattern) {
        return analyse(pattern, MinimumDegreeOrdering.order(pattern));
    }

    /**
     * Analyses {@code pattern} in the given elimination order.
     *
     * @param pattern symmetric pattern
     * @param perm elimination order, {@code perm[k]} = original row eliminated k-th (new → old)
     * @return the symbolic factor
     * @throws IllegalArgumentException when perm is not a permutation of 0..n−1
     * @throws IllegalStateException when the factor would not fit in one Java array
     */
    public static SymbolicCholesky analyse(SparsePattern pattern, int[] perm) {
        int n = pattern.size();
        if (perm == null || perm.length != n) {
            throw new IllegalArgumentException("permutation must have " + n + " entries, got "
                    + (perm == null ? "null" : String.valueOf(perm.length)));
        }
        int[] p = perm.clone();
        int[] pinv = MinimumDegreeOrdering.inverse(p);
        int[] rowStart = pattern.rowStartArray();
        int[] adj = pattern.adjacencyArray();

        // Elimination tree (Liu 1986): for each k, climb from every earlier neighbour j through the
        // compressed ancestor links; the root reached gets parent k.
        int[] parent = new int[n];
        int[] ancestor = new int[n];
        for (int k = 0; k < n; k++) {
            parent[k] = -1;
            ancestor[k] = -1;
            int row = p[k];
            for (int q = rowStart[row]; q < rowStart[row + 1]; q++) {
                int i = pinv[adj[q]];
                while (i != -1 && i < k) {
                    int up = ancestor[i];
                    ancestor[i] = k;
                    if (up == -1) {
                        parent[i] = k;
                    }
                    i = up;
                }
            }
        }

        // Column counts by row subtrees: L(k, i) ≠ 0 for every i met climbing from j to k.
        int[] count = new int[n];
        int[] mark = ancestor; // reuse
        Arrays.fill(mark, -1);
        long total = 0;
        for (int k = 0; k < n; k++) {
            mark[k] = k;
            int row = p[k];
            for (int q = rowStart[row]; q < rowStart[row + 1]; q++) {
                int i = pinv[adj[q]];
                if (i > k) {
                    continue;
                }
                while (mark[i] != k) {
                    mark[i] = k;
                    count[i]++;
                    total++;
                    i = parent[i];
                }
            }
        }

        // Supernodes: column j+1 joins j's when its structure is j's less row j+1.
        int[] columnSuper = new int[n];
        int[] firstTmp = new int[n + 1];
        int ns = 0;
        for (int j = 0; j < n; j++) {
            if (j == 0 || !(parent[j - 1] == j && count[j - 1] == count[j] + 1)) {
                firstTmp[ns++] = j;
            }
            columnSuper[j] = ns - 1;
        }
        firstTmp[ns] = n;
        int[] superFirst = Arrays.copyOf(firstTmp, ns + 1);
        int[] superRowStart = new int[ns + 1];
        int[] superValueStart = new int[ns + 1];
        long values = 0;
        for (int s = 0; s < ns; s++) {
            int rows = count[superFirst[s]] + 1;
            int width = superFirst[s + 1] - superFirst[s];
            superRowStart[s + 1] = superRowStart[s] + rows;
            values += (long) rows * width;
            if (values > Integer.MAX_VALUE - 16) {
                throw new IllegalStateException("the factor would hold more than " + (Integer.MAX_VALUE - 16)
                        + " values (" + total + " below the diagonal); use a better ordering");
            }
            superValueStart[s + 1] = (int) values;
        }
        // Rows of each supernode: its first column, then that column's pattern (second walk).
        int[] superRows = new int[superRowStart[ns]];
        int[] slot = new int[n];
        Arrays.fill(slot, -1);
        for (int s = 0; s < ns; s++) {
            superRows[superRowStart[s]] = superFirst[s];
            slot[superFirst[s]] = superRowStart[s] + 1;
        }
        Arrays.fill(mark, -1);
        for (int k = 0; k < n; k++) {
            mark[k] = k;
            int row = p[k];
            for (int q = rowStart[row]; q < rowStart[row + 1]; q++) {
                int i = pinv[adj[q]];
                if (i > k) {
                    continue;
                }
                while (mark[i] != k) {
                    mark[i] = k;
                    if (slot[i] >= 0) {
                        superRows[slot[i]++] = k;
                    }
                    i = parent[i];
                }
            }
        }

        // Value map: every given edge, filed under the earlier of its two permuted rows.
        int[] ea = pattern.edgeAArray();
        int[] eb = pattern.edgeBArray();
        int m = ea.length;
        int[] colEdgeStart = new int[n + 1];
        for (int e = 0; e < m; e++) {
            colEdgeStart[Math.min(pinv[ea[e]], pinv[eb[e]]) + 1]++;
        }
        for (int k = 0; k < n; k++) {
            colEdgeStart[k + 1] += colEdgeStart[k];
        }
        int[] next = Arrays.copyOf(colEdgeStart, n);
        int[] colEdge = new int[m];
        int[] colEdgeUpper = new int[m];
        for (int e = 0; e < m; e++) {
            int a = pinv[ea[e]];
            int b = pinv[eb[e]];
            int s = next[Math.min(a, b)]++;
            colEdge[s] = e;
            colEdgeUpper[s] = Math.max(a, b);
        }
        Builder b = new Builder();
        b.n = n;
        b.edgeCount = m;
        b.distinctPairs = pattern.distinctPairs();
        b.perm = p;
        b.inversePerm = pinv;
        b.parent = parent;
        b.count = count;
        b.belowDiagonal = total;
        b.superFirst = superFirst;
        b.columnSuper = columnSuper;
        b.superRowStart = superRowStart;
        b.superRows = superRows;
        b.superValueStart = superValueStart;
        b.colEdgeStart = colEdgeStart;
        b.colEdge = colEdge;
        b.colEdgeUpper = colEdgeUpper;
        return new SymbolicCholesky(b);
    }

    /**
     * Factors the matrix with the given values on this pattern into new storage.
     *
     * @param diagonal A[i][i] for every original row i (length n)
     * @param offDiagonal A[a][b] = A[b][a] for each edge in the order of the pattern's edge list
     *     (length {@link SparsePattern#edgeCount()}); values of repeated pairs are summed
     * @return the numeric factor
     * @throws NotPositiveDefiniteException when a pivot is at most {@link
     *     NumericCholesky#DEFAULT_RELATIVE_PIVOT_TOLERANCE} × the largest diagonal entry
     * @throws IllegalArgumentException when a length is wrong or a value is not finite
     */
    public NumericCholesky factor(double[] diagonal, double[] offDiagonal) {
        return new NumericCholesky(this).refactor(diagonal, offDiagonal);
    }

    /**
     * As {@link #factor(double[], double[])} with a chosen pivot tolerance.
     *
     * @param relativePivotTolerance a pivot d must exceed this × max A[i][i]; in [0, 1)
     */
    public NumericCholesky factor(double[] diagonal, double[] offDiagonal, double relativePivotTolerance) {
        return new NumericCholesky(this).refactor(diagonal, offDiagonal, relativePivotTolerance);
    }

    /** Number of rows. */
    public int size() {
        return n;
    }

    /** Number of edges (values) {@link #factor} expects. */
    public int edgeCount() {
        return edgeCount;
    }

    /**
     * Entries of the Cholesky factor L (P A Pᵀ = L Lᵀ), its diagonal included: n + the entries
     * strictly below the diagonal. The matrix itself holds n + {@link SparsePattern#distinctPairs()}
     * entries in its lower triangle, so the difference is the fill.
     */
    public long nonZerosInL() {
        return n + belowDiagonal;
    }

    /** Entries of L below the diagonal that are zero in A: {@code nonZerosInL() − n − pairs}. */
    public long fillIn() {
        return nonZerosInL() - n - distinctPairs;
    }

    /**
     * Values the numeric factor stores: each supernode's rows × its width, so {@link #nonZerosInL()}
     * plus the unused upper part of each supernode's diagonal block.
     */
    public long storedValues() {
        return superValueStart[superFirst.length - 1];
    }

    /** Number of supernodes (runs of columns with one shared row structure). */
    public int supernodeCount() {
        return superFirst.length - 1;
    }

    /**
     * Floating-point operations of one numeric factorization, for benchmarks: Σⱼ cⱼ (cⱼ + 2) with
     * cⱼ the entries below the diagonal of column j — cⱼ(cⱼ + 1)/2 multiply–adds applying column j
     * to later columns, plus a division per entry and a square root.
     */
    public double factorFlops() {
        double f = 0;
        for (int j = 0; j < n; j++) {
            double c = count[j];
            f += c * (c + 2);
        }
        return f;
    }

    /** The elimination order, {@code perm[k]} = original row eliminated k-th (a copy). */
    public int[] permutation() {
        return perm.clone();
    }

    /**
     * The elimination tree in the permuted numbering: {@code parent[k]} is the first row below k
     * in column k of L, or −1 for a root (a copy).
     */
    public int[] eliminationTree() {
        return parent.clone();
    }

    /** Entries of each column of L below the diagonal, permuted numbering (a copy). */
    public int[] columnCounts() {
        return count.clone();
    }

    /**
     * The rows (permuted numbering, ascending) of the entries below the diagonal in column j of L
     * (a copy): the rows of j's supernode after j.
     */
    public int[] columnPattern(int j) {
        int s = columnSuper[j];
        int from = superRowStart[s] + (j - superFirst[s]) + 1;
        return Arrays.copyOfRange(superRows, from, superRowStart[s + 1]);
    }

    // Package-private views for NumericCholesky (never modified).

    int[] perm() {
        return perm;
    }

    int[] superFirst() {
        return superFirst;
    }

    int[] columnSuper() {
        return columnSuper;
    }

    int[] superRowStart() {
        return superRowStart;
    }

    int[] superRows() {
        return superRows;
    }

    int[] superValueStart() {
        return superValueStart;
    }

    int[] colEdgeStart() {
        return colEdgeStart;
    }

    int[] colEdge() {
        return colEdge;
    }

    int[] colEdgeUpper() {
        return colEdgeUpper;
    }
}
