package org.headway.network.sparse;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import java.util.stream.Stream;
import org.headway.network.sparse.SparseTestMatrices.Graph;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

class MinimumDegreeOrderingTest {

    static Stream<Arguments> randomGraphs() {
        Stream.Builder<Arguments> s = Stream.builder();
        int[] sizes = {1, 2, 3, 4, 5, 7, 10, 16, 31, 64, 100, 173, 300, 1000, 5000};
        double[] perRow = {0.0, 0.5, 1.5, 3.0, 8.0};
        long seed = 1;
        for (int n : sizes) {
            for (double d : perRow) {
                s.add(Arguments.of(n, d, seed++));
            }
        }
        return s.build();
    }

    @ParameterizedTest(name = "n={0}, {1} edges per row, seed {2}")
    @MethodSource("randomGraphs")
    void orderIsAPermutation(int n, double perRow, long seed) {
        Graph g = SparseTestMatrices.randomGraph(n, perRow, new Random(seed));
        SparsePattern p = g.pattern();
        // Definition of a permutation of 0..n−1: every index exactly once.
        assertTrue(SparseTestMatrices.isPermutation(MinimumDegreeOrdering.order(p), n), "aggressive");
        assertTrue(SparseTestMatrices.isPermutation(MinimumDegreeOrdering.order(p, false), n), "plain absorption");
    }

    @Test
    void denseRowsAndCliquesGiveAPermutation() {
        // A star of 2000 leaves (its centre is dense, > 10√n neighbours) plus a clique of 40 rows and
        // random extra edges: the dense-row and supervariable paths.
        Random random = new Random(7);
        int n = 2100;
        int m = 2000 + 40 * 39 / 2 + 300;
        int[] a = new int[m];
        int[] b = new int[m];
        int e = 0;
        for (int i = 1; i <= 2000; i++) {
            a[e] = 0;
            b[e++] = i;
        }
        for (int i = 2001; i < 2041; i++) {
            for (int j = i + 1; j < 2041; j++) {
                a[e] = i;
                b[e++] = j;
            }
        }
        while (e < m) {
            int i = random.nextInt(n);
            int j = random.nextInt(n);
            if (i != j) {
                a[e] = i;
                b[e++] = j;
            }
        }
        SparsePattern p = SparsePattern.fromEdges(n, a, b);
        int[] perm = MinimumDegreeOrdering.order(p);
        assertTrue(SparseTestMatrices.isPermutation(perm, n));
        // The centre (2000 neighbours > max(16, 10√2100 ≈ 458)) is dense, so it is ordered last.
        assertEquals(0, perm[n - 1]);
    }

    /**
     * K_n: every order gives a full lower triangle, n(n+1)/2 entries with the diagonal, and every
     * column's structure is the next one's plus itself, so the factor is a single supernode of n²
     * stored values. n = 300 makes every row dense (299 > 10√300 ≈ 173): all are ordered last.
     */
    @ParameterizedTest(name = "K_{0}")
    @ValueSource(ints = {2, 12, 300})
    void completeGraphHasTheOnlyPossibleFill(int n) {
        int m = n * (n - 1) / 2;
        int[] a = new int[m];
        int[] b = new int[m];
        int e = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                a[e] = i;
                b[e++] = j;
            }
        }
        SparsePattern p = SparsePattern.fromEdges(n, a, b);
        int[] perm = MinimumDegreeOrdering.order(p);
        assertTrue(SparseTestMatrices.isPermutation(perm, n));
        SymbolicCholesky s = SymbolicCholesky.analyse(p, perm);
        assertEquals((long) n * (n + 1) / 2, s.nonZerosInL());
        assertEquals(1, s.supernodeCount());
        assertEquals((long) n * n, s.storedValues());
    }

    /**
     * A tree has a perfect elimination order (leaves first: each eliminated node has at most one
     * uneliminated neighbour, so nothing fills; Parter 1961, George &amp; Liu 1981 §5.1), and minimum
     * degree finds one because a leaf always has the least degree. So L has exactly the pattern of
     * A: n diagonal entries plus one per edge.
     */
    @ParameterizedTest(name = "random tree, n={0}")
    @ValueSource(ints = {1, 2, 3, 5, 10, 50, 300, 2000, 20000})
    void treeHasNoFill(int n) {
        Graph g = SparseTestMatrices.randomTree(n, new Random(n));
        SparsePattern p = g.pattern();
        for (boolean aggressive : new boolean[] {true, false}) {
            SymbolicCholesky s = SymbolicCholesky.analyse(p, MinimumDegreeOrdering.order(p, aggressive));
            assertEquals(0, s.fillIn(), "aggressive " + aggressive);
            assertEquals(n + Math.max(0, n - 1), s.nonZerosInL(), "aggressive " + aggressive);
        }
    }

    @Test
    void pathStarCaterpillarAndForestHaveNoFill() {
        int n = 1500;
        int[] pa = new int[n - 1];
        int[] pb = new int[n - 1];
        int[] sa = new int[n - 1];
        int[] sb = new int[n - 1];
        for (int i = 0; i < n - 1; i++) {
            pa[i] = i;
            pb[i] = i + 1; // path 0–1–…
            sa[i] = 0;
            sb[i] = i + 1; // star centred on 0 (a dense row, ordered last)
        }
        // Caterpillar: a spine of 500 with two legs on every spine node.
        int[] ca = new int[n - 1];
        int[] cb = new int[n - 1];
        int e = 0;
        for (int i = 0; i < 499; i++) {
            ca[e] = i;
            cb[e++] = i + 1;
        }
        for (int leg = 500; leg < n; leg++) {
            ca[e] = (leg - 500) / 2;
            cb[e++] = leg;
        }
        // Forest: three random trees side by side (n − 3 edges).
        Random random = new Random(3);
        int[] fa = new int[n - 3];
        int[] fb = new int[n - 3];
        e = 0;
        for (int t = 0; t < 3; t++) {
            int base = t * 500;
            for (int i = 1; i < 500; i++) {
                fa[e] = base + i;
                fb[e++] = base + random.nextInt(i);
            }
        }
        for (int[][] edges : new int[][][] {{pa, pb}, {sa, sb}, {ca, cb}, {fa, fb}}) {
            SparsePattern p = SparsePattern.fromEdges(n, edges[0], edges[1]);
            SymbolicCholesky s = SymbolicCholesky.analyse(p);
            assertEquals(0, s.fillIn());
            assertEquals(n + edges[0].length, s.nonZerosInL());
        }
    }

    /**
     * k × k grid. Natural (row-major) order fills the whole band: row i ≥ k holds the k entries i−k..i−1
     * and the first row one each, so nnz(L) = (k−1)(k²+1) + n exactly (envelope fill, George &amp; Liu
     * 1981 ch. 4). Nested dissection bounds the fill by O(n log n) for grids (George 1973; George
     * &amp; Liu 1981 ch. 8); minimum degree must stay below the generous 12 n log₂ n and far below
     * the band. Measured with this ordering: k=30: 10 209 vs 27 029 natural; k=50: 36 043 vs 125 049;
     * k=70: 82 744 vs 343 069; k=100: 196 098 vs 1 000 099 (1.2–1.5 n log₂ n).
     */
    @ParameterizedTest(name = "{0} x {0} grid")
    @ValueSource(ints = {30, 50, 70, 100})
    void gridFillFarBelowNaturalOrder(int k) {
        int n = k * k;
        SparsePattern p = SparseTestMatrices.grid(k).pattern();
        long natural =
                SymbolicCholesky.analyse(p, SparseTestMatrices.identity(n)).nonZerosInL();
        assertEquals((long) (k - 1) * (k * k + 1) + n, natural);
        long amd = SymbolicCholesky.analyse(p).nonZerosInL();
        double nLogN = n * Math.log(n) / Math.log(2);
        assertTrue(amd < 12 * nLogN, "nnz(L) " + amd + " vs 12 n log2 n = " + 12 * nLogN);
        // The band grows as n^{3/2}, minimum degree as n log n: the ratio must grow with k.
        assertTrue(natural > amd * (k / 25.0), "natural " + natural + " vs minimum degree " + amd);
    }

    @Test
    void emptyAndSingleRow() {
        assertArrayEquals(new int[0], MinimumDegreeOrdering.order(SparsePattern.fromEdges(0, new int[0], new int[0])));
        assertArrayEquals(
                new int[] {0}, MinimumDegreeOrdering.order(SparsePattern.fromEdges(1, new int[0], new int[0])));
    }

    @Test
    void inverseChecksItsInput() {
        assertArrayEquals(new int[] {2, 0, 1}, MinimumDegreeOrdering.inverse(new int[] {1, 2, 0}));
        IllegalArgumentException e =
                assertThrows(IllegalArgumentException.class, () -> MinimumDegreeOrdering.inverse(new int[] {0, 0}));
        assertEquals("not a permutation of 0..1: entry 1 is 0, repeated", e.getMessage());
    }
}
