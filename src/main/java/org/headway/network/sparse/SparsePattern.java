package org.headway.network.sparse;

import java.util.Arrays;

/**
 * The symmetric nonzero pattern of an n × n matrix, built from the list of its off-diagonal pairs.
 *
 * <p>Each edge {@code k} names one off-diagonal pair {@code (rowA[k], rowB[k])}; it stands for both
 * entries {@code A[a][b]} and {@code A[b][a]}. The diagonal is always present and is not listed.
 * Repeated pairs (parallel pipes, or the same pair given in both orientations) are merged in the
 * pattern, while the edge list is kept as given: {@link SymbolicCholesky#factor} takes one value
 * per edge, in the order given here, and sums the values of repeated pairs.
 *
 * <p>Storage is compressed rows of the full symmetric adjacency (both triangles, no diagonal),
 * each row sorted ascending. Immutable; the input arrays are copied.
 */
public final class SparsePattern {

    private final int n;
    private final int[] edgeA;
    private final int[] edgeB;
    private final int[] rowStart;
    private final int[] adjacency;

    private SparsePattern(int n, int[] edgeA, int[] edgeB, int[] rowStart, int[] adjacency) {
        this.n = n;
        this.edgeA = edgeA;
        this.edgeB = edgeB;
        this.rowStart = rowStart;
        this.adjacency = adjacency;
    }

    /**
     * Builds the pattern of an n × n symmetric matrix.
     *
     * @param n number of rows (and columns), at least 0
     * @param rowA first row of each off-diagonal pair
     * @param rowB second row of each off-diagonal pair, same length as {@code rowA}
     * @return the merged symmetric pattern
     * @throws IllegalArgumentException when n is negative, the arrays differ in length, a row is
     *     outside [0, n) or a pair joins a row to itself (the diagonal is given separately)
     */
    public static SparsePattern fromEdges(int n, int[] rowA, int[] rowB) {
        if (n < 0) {
            throw new IllegalArgumentException("matrix size must be at least 0, got " + n);
        }
        if (rowA == null || rowB == null) {
            throw new IllegalArgumentException("edge arrays must not be null");
        }
        if (rowA.length != rowB.length) {
            throw new IllegalArgumentException(
                    "edge arrays differ in length: rowA has " + rowA.length + " entries, rowB has " + rowB.length);
        }
        int m = rowA.length;
        int[] a = rowA.clone();
        int[] b = rowB.clone();
        int[] count = new int[n + 1];
        for (int k = 0; k < m; k++) {
            int i = a[k];
            int j = b[k];
            if (i < 0 || i >= n || j < 0 || j >= n) {
                throw new IllegalArgumentException(
                        "edge " + k + " joins rows " + i + " and " + j + ", outside 0.." + (n - 1));
            }
            if (i == j) {
                throw new IllegalArgumentException("edge " + k + " joins row " + i
                        + " to itself; the diagonal is given separately, not as an edge");
            }
            count[i]++;
            count[j]++;
        }
        // Full (both triangles) adjacency with repeats, then sort and merge each row in place.
        int[] start = new int[n + 1];
        for (int i = 0; i < n; i++) {
            start[i + 1] = start[i] + count[i];
        }
        int[] next = Arrays.copyOf(start, n);
        int[] raw = new int[start[n]];
        for (int k = 0; k < m; k++) {
            raw[next[a[k]]++] = b[k];
            raw[next[b[k]]++] = a[k];
        }
        int[] rowStart = new int[n + 1];
        int out = 0;
        for (int i = 0; i < n; i++) {
            int from = start[i];
            int to = start[i + 1];
            Arrays.sort(raw, from, to);
            rowStart[i] = out;
            int last = -1;
            for (int q = from; q < to; q++) {
                int j = raw[q];
                if (j != last) {
                    raw[out++] = j;
                    last = j;
                }
            }
        }
        rowStart[n] = out;
        return new SparsePattern(n, a, b, rowStart, Arrays.copyOf(raw, out));
    }

    /** Number of rows (and columns). */
    public int size() {
        return n;
    }

    /** Number of edges as given, repeats included: the length of the value array to factor. */
    public int edgeCount() {
        return edgeA.length;
    }

    /** Number of distinct off-diagonal pairs {i, j}, i ≠ j (each counted once, not twice). */
    public int distinctPairs() {
        return adjacency.length / 2;
    }

    /** Number of distinct off-diagonal neighbours of row i. */
    public int degree(int i) {
        return rowStart[i + 1] - rowStart[i];
    }

    /** The distinct off-diagonal neighbours of row i, ascending (a copy). */
    public int[] neighbours(int i) {
        return Arrays.copyOfRange(adjacency, rowStart[i], rowStart[i + 1]);
    }

    /** First row of edge k as given. */
    public int edgeRowA(int k) {
        return edgeA[k];
    }

    /** Second row of edge k as given. */
    public int edgeRowB(int k) {
        return edgeB[k];
    }

    // Package-private views for the ordering and the factorization (not copied; never modified).

    int[] rowStartArray() {
        return rowStart;
    }

    int[] adjacencyArray() {
        return adjacency;
    }

    int[] edgeAArray() {
        return edgeA;
    }

    int[] edgeBArray() {
        return edgeB;
    }
}
