package org.headway.network.sparse;

import java.util.Arrays;

/**
 * The symbolic analysis of a sparse symmetric matrix for a given elimination order: the
 * elimination tree, the column counts and the full pattern of the factor L of P A Pᵀ = L D Lᵀ.
 * Computed once per network topology; {@link #factor} then runs once per Newton iteration with new
 * values on the same pattern.
 *
 * <p>Algorithms, written from their published descriptions (Davis, <i>Direct Methods for Sparse
 * Linear Systems</i>, SIAM 2006, ch. 4; George &amp; Liu 1981, ch. 5):
 *
 * <ul>
 *   <li>the elimination tree by Liu's algorithm with path compression of a virtual forest of
 *       ancestors (J. W. H. Liu, "A compact row storage scheme for Cholesky factors using
 *       elimination trees", ACM TOMS 12(2), 1986), parent(j) = min{ i &gt; j : L(i, j) ≠ 0 };
 *   <li>the pattern of row k of L is the union of the tree paths from each j with A(k, j) ≠ 0, j
 *       &lt; k, up towards k (the "row subtree"); one walk over all rows gives the column counts, a
 *       second fills the row indices of each column in ascending order. Both cost O(|L|).
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
    private final int[] columnPointer;
    private final int[] rowIndex;
    /** Edges grouped by the later (permuted) of their two rows: row k holds rowEdge[rowEdgeStart[k]..). */
    private final int[] rowEdgeStart;

    private final int[] rowEdge;
    /** For each entry of rowEdge, the earlier (permuted) row of that edge. */
    private final int[] rowEdgeLower;

    private SymbolicCholesky(
            int n,
            int edgeCount,
            int distinctPairs,
            int[] perm,
            int[] inversePerm,
            int[] parent,
            int[] columnPointer,
            int[] rowIndex,
            int[] rowEdgeStart,
            int[] rowEdge,
            int[] rowEdgeLower) {
        this.n = n;
        this.edgeCount = edgeCount;
        this.distinctPairs = distinctPairs;
        this.perm = perm;
        this.inversePerm = inversePerm;
        this.parent = parent;
        this.columnPointer = columnPointer;
        this.rowIndex = rowIndex;
        this.rowEdgeStart = rowEdgeStart;
        this.rowEdge = rowEdge;
        this.rowEdgeLower = rowEdgeLower;
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
     * @throws IllegalStateException when L would hold more than 2³¹ − 16 entries
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
        if (total > Integer.MAX_VALUE - 16) {
            throw new IllegalStateException("the factor would hold " + total
                    + " off-diagonal entries, more than one Java array can; use a better ordering");
        }
        int[] columnPointer = new int[n + 1];
        for (int j = 0; j < n; j++) {
            columnPointer[j + 1] = columnPointer[j] + count[j];
        }
        int[] rowIndex = new int[(int) total];
        int[] fill = count; // reuse as the next free slot of each column
        System.arraycopy(columnPointer, 0, fill, 0, n);
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
                    rowIndex[fill[i]++] = k;
                    i = parent[i];
                }
            }
        }

        // Value map: every given edge, filed under the later of its two permuted rows.
        int[] ea = pattern.edgeAArray();
        int[] eb = pattern.edgeBArray();
        int m = ea.length;
        int[] rowEdgeStart = new int[n + 1];
        for (int e = 0; e < m; e++) {
            rowEdgeStart[Math.max(pinv[ea[e]], pinv[eb[e]]) + 1]++;
        }
        for (int k = 0; k < n; k++) {
            rowEdgeStart[k + 1] += rowEdgeStart[k];
        }
        int[] slot = Arrays.copyOf(rowEdgeStart, n);
        int[] rowEdge = new int[m];
        int[] rowEdgeLower = new int[m];
        for (int e = 0; e < m; e++) {
            int a = pinv[ea[e]];
            int b = pinv[eb[e]];
            int s = slot[Math.max(a, b)]++;
            rowEdge[s] = e;
            rowEdgeLower[s] = Math.min(a, b);
        }
        return new SymbolicCholesky(
                n,
                m,
                pattern.distinctPairs(),
                p,
                pinv,
                parent,
                columnPointer,
                rowIndex,
                rowEdgeStart,
                rowEdge,
                rowEdgeLower);
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
        return (long) n + rowIndex.length;
    }

    /** Entries of L below the diagonal that are zero in A: {@code nonZerosInL() − n − pairs}. */
    public long fillIn() {
        return nonZerosInL() - n - distinctPairs;
    }

    /**
     * Floating-point operations of one numeric factorization, for benchmarks: Σⱼ cⱼ (cⱼ + 2) with
     * cⱼ the entries below the diagonal of column j — cⱼ(cⱼ − 1)/2 multiply–adds applying column j
     * to later rows, plus a division and a multiply–add for each of its entries.
     */
    public double factorFlops() {
        double f = 0;
        for (int j = 0; j < n; j++) {
            double c = columnPointer[j + 1] - columnPointer[j];
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
        int[] c = new int[n];
        for (int j = 0; j < n; j++) {
            c[j] = columnPointer[j + 1] - columnPointer[j];
        }
        return c;
    }

    /**
     * The rows (permuted numbering, ascending) of the entries below the diagonal in column j of L
     * (a copy).
     */
    public int[] columnPattern(int j) {
        return Arrays.copyOfRange(rowIndex, columnPointer[j], columnPointer[j + 1]);
    }

    // Package-private views for NumericCholesky (never modified).

    int[] perm() {
        return perm;
    }

    int[] inversePerm() {
        return inversePerm;
    }

    int[] parent() {
        return parent;
    }

    int[] columnPointer() {
        return columnPointer;
    }

    int[] rowIndex() {
        return rowIndex;
    }

    int[] rowEdgeStart() {
        return rowEdgeStart;
    }

    int[] rowEdge() {
        return rowEdge;
    }

    int[] rowEdgeLower() {
        return rowEdgeLower;
    }
}
