package org.headway.network.sparse;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;

/** Test matrices: an edge list with values, and its dense form assembled independently. */
final class SparseTestMatrices {

    private SparseTestMatrices() {}

    /** n rows, edges (a[k], b[k]) with values off[k], diagonal diag. */
    record Problem(int n, int[] a, int[] b, double[] diag, double[] off) {

        SparsePattern pattern() {
            return SparsePattern.fromEdges(n, a, b);
        }

        /** The dense matrix, every edge value added to both of its entries (repeats summed). */
        RealMatrix dense() {
            double[][] m = new double[n][n];
            for (int i = 0; i < n; i++) {
                m[i][i] = diag[i];
            }
            for (int k = 0; k < a.length; k++) {
                m[a[k]][b[k]] += off[k];
                m[b[k]][a[k]] += off[k];
            }
            return new Array2DRowRealMatrix(m, false);
        }

        /** A x computed from the edge list (no dense matrix). */
        double[] multiply(double[] x) {
            double[] y = new double[n];
            for (int i = 0; i < n; i++) {
                y[i] = diag[i] * x[i];
            }
            for (int k = 0; k < a.length; k++) {
                y[a[k]] += off[k] * x[b[k]];
                y[b[k]] += off[k] * x[a[k]];
            }
            return y;
        }
    }

    /** Edge list of an undirected graph. */
    record Graph(int n, int[] a, int[] b) {

        SparsePattern pattern() {
            return SparsePattern.fromEdges(n, a, b);
        }
    }

    /**
     * A random graph with about {@code perRow} × n edges between random distinct rows, then about a
     * tenth of them repeated, reversed, so that the pattern has to merge repeats.
     */
    static Graph randomGraph(int n, double perRow, Random random) {
        if (n < 2) {
            return new Graph(n, new int[0], new int[0]);
        }
        int m = (int) Math.round(perRow * n);
        int repeats = m / 10;
        int[] a = new int[m + repeats];
        int[] b = new int[m + repeats];
        for (int k = 0; k < m; k++) {
            int i = random.nextInt(n);
            int j = random.nextInt(n - 1);
            if (j >= i) {
                j++;
            }
            a[k] = i;
            b[k] = j;
        }
        for (int k = 0; k < repeats; k++) {
            int src = random.nextInt(m);
            a[m + k] = b[src];
            b[m + k] = a[src];
        }
        return new Graph(n, a, b);
    }

    /** The k × k five-point grid, rows numbered row-major. */
    static Graph grid(int k) {
        int n = k * k;
        int m = 2 * k * (k - 1);
        int[] a = new int[m];
        int[] b = new int[m];
        int e = 0;
        for (int r = 0; r < k; r++) {
            for (int c = 0; c < k; c++) {
                int i = r * k + c;
                if (c + 1 < k) {
                    a[e] = i;
                    b[e++] = i + 1;
                }
                if (r + 1 < k) {
                    a[e] = i;
                    b[e++] = i + k;
                }
            }
        }
        return new Graph(n, a, b);
    }

    /** A random tree on n nodes (each node joins a random earlier one), labels shuffled. */
    static Graph randomTree(int n, Random random) {
        int[] label = shuffled(n, random);
        int m = Math.max(0, n - 1);
        int[] a = new int[m];
        int[] b = new int[m];
        for (int i = 1; i < n; i++) {
            a[i - 1] = label[i];
            b[i - 1] = label[random.nextInt(i)];
        }
        return new Graph(n, a, b);
    }

    static int[] shuffled(int n, Random random) {
        int[] p = identity(n);
        for (int i = n - 1; i > 0; i--) {
            int j = random.nextInt(i + 1);
            int t = p[i];
            p[i] = p[j];
            p[j] = t;
        }
        return p;
    }

    static int[] identity(int n) {
        int[] p = new int[n];
        for (int i = 0; i < n; i++) {
            p[i] = i;
        }
        return p;
    }

    static int[] reversed(int n) {
        int[] p = new int[n];
        for (int i = 0; i < n; i++) {
            p[i] = n - 1 - i;
        }
        return p;
    }

    /**
     * Values for a graph making an SPD matrix: conductances g in [0.1, 2] give off-diagonal −g (or
     * +g for about one edge in five, to leave the M-matrix class), the diagonal is Σ|g| plus a shift
     * in [shiftLow, 1]. Strict diagonal dominance with a positive diagonal makes it SPD (Gershgorin).
     */
    static Problem spd(Graph g, double shiftLow, Random random) {
        int n = g.n();
        double[] off = new double[g.a().length];
        double[] diag = new double[n];
        for (int k = 0; k < off.length; k++) {
            double c = 0.1 + 1.9 * random.nextDouble();
            off[k] = random.nextInt(5) == 0 ? c : -c;
            diag[g.a()[k]] += c;
            diag[g.b()[k]] += c;
        }
        for (int i = 0; i < n; i++) {
            diag[i] += shiftLow + (1 - shiftLow) * random.nextDouble();
        }
        return new Problem(n, g.a(), g.b(), diag, off);
    }

    /** Unit-conductance Laplacian of a graph with no shift (singular when connected). */
    static Problem laplacian(Graph g) {
        double[] off = new double[g.a().length];
        double[] diag = new double[g.n()];
        for (int k = 0; k < off.length; k++) {
            off[k] = -1;
            diag[g.a()[k]] += 1;
            diag[g.b()[k]] += 1;
        }
        return new Problem(g.n(), g.a(), g.b(), diag, off);
    }

    static double norm(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x * x;
        }
        return Math.sqrt(s);
    }

    static double distance(double[] u, double[] v) {
        double s = 0;
        for (int i = 0; i < u.length; i++) {
            double d = u[i] - v[i];
            s += d * d;
        }
        return Math.sqrt(s);
    }

    static double[] randomVector(int n, Random random) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = random.nextGaussian();
        }
        return v;
    }

    /** True when p holds each of 0..n−1 exactly once. */
    static boolean isPermutation(int[] p, int n) {
        if (p.length != n) {
            return false;
        }
        boolean[] seen = new boolean[n];
        for (int v : p) {
            if (v < 0 || v >= n || seen[v]) {
                return false;
            }
            seen[v] = true;
        }
        return true;
    }

    /**
     * The pattern of L below the diagonal by the elimination game on a dense boolean matrix (Parter
     * 1961; Rose 1972; George &amp; Liu 1981 §5.1): eliminating node k joins all of its later
     * neighbours. Returns lower[i][j] for i &gt; j, permuted numbering.
     */
    static boolean[][] eliminationGame(SparsePattern pattern, int[] perm) {
        int n = pattern.size();
        int[] pinv = new int[n];
        for (int k = 0; k < n; k++) {
            pinv[perm[k]] = k;
        }
        boolean[][] adj = new boolean[n][n];
        for (int i = 0; i < n; i++) {
            for (int j : pattern.neighbours(i)) {
                adj[pinv[i]][pinv[j]] = true;
            }
        }
        for (int k = 0; k < n; k++) {
            for (int i = k + 1; i < n; i++) {
                if (!adj[i][k]) {
                    continue;
                }
                for (int j = k + 1; j < n; j++) {
                    if (adj[j][k] && i != j) {
                        adj[i][j] = true;
                    }
                }
            }
        }
        boolean[][] lower = new boolean[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < i; j++) {
                lower[i][j] = adj[i][j];
            }
        }
        return lower;
    }
}
