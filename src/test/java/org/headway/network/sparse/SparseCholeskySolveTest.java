package org.headway.network.sparse;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import java.util.stream.Stream;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.headway.network.sparse.SparseTestMatrices.Graph;
import org.headway.network.sparse.SparseTestMatrices.Problem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

class SparseCholeskySolveTest {

    static Stream<Arguments> randomProblems() {
        Stream.Builder<Arguments> s = Stream.builder();
        long seed = 1000;
        for (int n = 1; n <= 300; n += n < 20 ? 1 : (n < 100 ? 7 : 25)) {
            for (double perRow : new double[] {0.7, 2.0, 5.0}) {
                s.add(Arguments.of(n, perRow, seed++));
            }
        }
        s.add(Arguments.of(300, 3.0, seed));
        return s.build();
    }

    /**
     * Random sparse SPD matrices (random Laplacian-like pattern with repeats, positive shift) solved
     * in the minimum-degree order, the natural order and a random order, against Commons Math's
     * dense Cholesky (org.apache.commons.math3.linear.CholeskyDecomposition) to 1e-10 relative, with
     * the residual ‖Ax − b‖/‖b‖ from Commons Math's dense product below 1e-12, and ln det A against
     * the dense factor's determinant.
     */
    @ParameterizedTest(name = "n={0}, {1} edges per row, seed {2}")
    @MethodSource("randomProblems")
    void matchesDenseCholesky(int n, double perRow, long seed) {
        Random random = new Random(seed);
        Problem pr = SparseTestMatrices.spd(SparseTestMatrices.randomGraph(n, perRow, random), 0.1, random);
        RealMatrix dense = pr.dense();
        CholeskyDecomposition reference = new CholeskyDecomposition(dense);
        double[] b = SparseTestMatrices.randomVector(n, random);
        double[] expected = reference.getSolver().solve(new ArrayRealVector(b)).toArray();
        SparsePattern p = pr.pattern();
        int[][] orders = {
            MinimumDegreeOrdering.order(p), SparseTestMatrices.identity(n), SparseTestMatrices.shuffled(n, random)
        };
        for (int[] perm : orders) {
            NumericCholesky f = SymbolicCholesky.analyse(p, perm).factor(pr.diag(), pr.off());
            double[] x = f.solve(b);
            double err = SparseTestMatrices.distance(x, expected) / SparseTestMatrices.norm(expected);
            assertTrue(err < 1e-10, "relative difference from dense Cholesky " + err);
            double[] ax = dense.operate(x);
            double res = SparseTestMatrices.distance(ax, b) / SparseTestMatrices.norm(b);
            assertTrue(res < 1e-12, "relative residual " + res);
            double logDet = Math.log(reference.getDeterminant());
            assertEquals(logDet, f.logDeterminant(), 1e-10 * Math.max(1, Math.abs(logDet)));
        }
    }

    /**
     * A grounded grid, the shape of a looped pipe network: a unit-conductance 20 × 20 grid Laplacian
     * with only its corner tied to a fixed head (diagonal + 1), so far worse conditioned than the
     * random cases. Checked against Commons Math's dense Cholesky and by residual.
     */
    @Test
    void groundedGridMatchesDenseCholesky() {
        Graph g = SparseTestMatrices.grid(20);
        Problem lap = SparseTestMatrices.laplacian(g);
        double[] diag = lap.diag().clone();
        diag[0] += 1;
        Problem pr = new Problem(lap.n(), lap.a(), lap.b(), diag, lap.off());
        double[] b = SparseTestMatrices.randomVector(pr.n(), new Random(5));
        double[] expected = new CholeskyDecomposition(pr.dense())
                .getSolver()
                .solve(new ArrayRealVector(b))
                .toArray();
        double[] x = SymbolicCholesky.analyse(pr.pattern())
                .factor(pr.diag(), pr.off())
                .solve(b);
        assertTrue(SparseTestMatrices.distance(x, expected) / SparseTestMatrices.norm(expected) < 1e-10);
        assertTrue(SparseTestMatrices.distance(pr.multiply(x), b) / SparseTestMatrices.norm(b) < 1e-12);
    }

    /**
     * A large grounded grid (150 × 150) has supernodes big enough that an update is split between two
     * cores: the split factor must equal the in-order one entry for entry (each entry's sum is formed
     * in the same order), and the solve must have a residual at rounding level.
     */
    @Test
    void splitUpdatesGiveTheInOrderFactorExactly() {
        Graph g = SparseTestMatrices.grid(150);
        Problem pr = SparseTestMatrices.spd(g, 0.0, new Random(11));
        SymbolicCholesky s = SymbolicCholesky.analyse(pr.pattern());
        NumericCholesky inOrder = new NumericCholesky(s);
        inOrder.parallelUpdateWork = Long.MAX_VALUE;
        inOrder.refactor(pr.diag(), pr.off());
        assertEquals(0, inOrder.splitUpdates);
        NumericCholesky split = new NumericCholesky(s);
        split.refactor(pr.diag(), pr.off());
        assertTrue(split.splitUpdates > 0, "no update was large enough to split");
        double[] b = SparseTestMatrices.randomVector(pr.n(), new Random(12));
        double[] x1 = inOrder.solve(b);
        double[] x2 = split.solve(b);
        assertArrayEquals(x1, x2, 0.0);
        assertEquals(inOrder.logDeterminant(), split.logDeterminant(), 0.0);
        assertTrue(SparseTestMatrices.distance(pr.multiply(x2), b) / SparseTestMatrices.norm(b) < 1e-12);
    }

    /**
     * Newton-style reuse: one symbolic factor, new values each round into the same numeric factor;
     * every round against Commons Math's dense Cholesky. Also solveInPlace gives solve's answer.
     */
    @Test
    void refactorReusesTheFactorWithNewValues() {
        Random random = new Random(77);
        Graph g = SparseTestMatrices.randomGraph(150, 2.5, random);
        SymbolicCholesky s = SymbolicCholesky.analyse(g.pattern());
        NumericCholesky f = null;
        for (int round = 0; round < 4; round++) {
            Problem pr = SparseTestMatrices.spd(g, 0.1, random);
            f = f == null ? s.factor(pr.diag(), pr.off()) : f.refactor(pr.diag(), pr.off());
            double[] b = SparseTestMatrices.randomVector(150, random);
            double[] expected = new CholeskyDecomposition(pr.dense())
                    .getSolver()
                    .solve(new ArrayRealVector(b))
                    .toArray();
            double[] x = f.solve(b);
            assertTrue(SparseTestMatrices.distance(x, expected) / SparseTestMatrices.norm(expected) < 1e-10);
            double[] inPlace = b.clone();
            f.solveInPlace(inPlace);
            assertArrayEquals(x, inPlace, 0.0);
        }
    }

    /** Repeated edges sum: two edges 0–1 of −1 and −2 act as one of −3 (hand-solved 2 × 2). */
    @Test
    void repeatedEdgesSumTheirValues() {
        SparsePattern p = SparsePattern.fromEdges(2, new int[] {0, 1}, new int[] {1, 0});
        NumericCholesky f = SymbolicCholesky.analyse(p).factor(new double[] {4, 4}, new double[] {-1, -2});
        // [[4, −3], [−3, 4]] x = [1, 0]  ⇒  x = [4/7, 3/7] (Cramer's rule, det = 7).
        double[] x = f.solve(new double[] {1, 0});
        assertEquals(4.0 / 7, x[0], 1e-15);
        assertEquals(3.0 / 7, x[1], 1e-15);
    }

    @Test
    void indefiniteTwoByTwoIsRefusedAtTheSecondPivot() {
        // [[1, 2], [2, 1]] has eigenvalues 3 and −1. First pivot 1, second 1 − 2²/1 = −3 (by hand).
        SparsePattern p = SparsePattern.fromEdges(2, new int[] {0}, new int[] {1});
        SymbolicCholesky s = SymbolicCholesky.analyse(p);
        NotPositiveDefiniteException e =
                assertThrows(NotPositiveDefiniteException.class, () -> s.factor(new double[] {1, 1}, new double[] {2}));
        int second = s.permutation()[1];
        assertEquals(second, e.row());
        assertEquals(1, e.step());
        assertEquals(-3.0, e.pivot(), 1e-15);
        assertEquals(
                "matrix is not positive definite: the pivot of row " + second + " (eliminated 2 of 2) is -3.00000,"
                        + " not above 1.00e-14",
                e.getMessage());
    }

    /**
     * One row with a negative diagonal in an otherwise strictly diagonally dominant matrix: every
     * principal submatrix without that row is SPD (Gershgorin), so all pivots before it are positive,
     * and its own pivot is its diagonal minus a positive-semidefinite Schur term, so negative — the
     * failure is at that row whatever the order.
     */
    @ParameterizedTest(name = "bad row {0}")
    @ValueSource(ints = {0, 17, 63, 99})
    void negativeRowIsNamedWhateverTheOrder(int badRow) {
        Random random = new Random(badRow);
        Graph g = SparseTestMatrices.randomGraph(100, 3, random);
        Problem pr = SparseTestMatrices.spd(g, 0.1, random);
        double[] diag = pr.diag().clone();
        diag[badRow] = -0.5;
        SparsePattern p = g.pattern();
        int[][] orders = {
            MinimumDegreeOrdering.order(p), SparseTestMatrices.identity(100), SparseTestMatrices.reversed(100)
        };
        for (int[] perm : orders) {
            NotPositiveDefiniteException e = assertThrows(
                    NotPositiveDefiniteException.class,
                    () -> SymbolicCholesky.analyse(p, perm).factor(diag, pr.off()));
            assertEquals(badRow, e.row());
            assertTrue(e.getMessage().contains("the pivot of row " + badRow + " "), e.getMessage());
            assertTrue(e.pivot() < 0);
        }
    }

    /**
     * A unit-conductance path with no fixed head is singular. Eliminated leaf first (the minimum
     * degree order of a tree), each pivot is exactly 1 and the last exactly 0, in exact arithmetic
     * and in floating point alike (integers): refused at the last row of the order.
     */
    @Test
    void singularLaplacianIsRefusedAtItsLastPivot() {
        int n = 50;
        int[] a = new int[n - 1];
        int[] b = new int[n - 1];
        for (int i = 0; i < n - 1; i++) {
            a[i] = i;
            b[i] = i + 1;
        }
        Problem pr = SparseTestMatrices.laplacian(new Graph(n, a, b));
        SymbolicCholesky s = SymbolicCholesky.analyse(pr.pattern());
        NotPositiveDefiniteException e =
                assertThrows(NotPositiveDefiniteException.class, () -> s.factor(pr.diag(), pr.off()));
        assertEquals(s.permutation()[n - 1], e.row());
        assertEquals(0.0, e.pivot());
        // Grounding one node (diagonal + 1) makes it SPD: the same pattern then factors.
        double[] grounded = pr.diag().clone();
        grounded[0] += 1;
        assertTrue(s.factor(grounded, pr.off()).smallestPivot() > 0);
    }

    @Test
    void tinyPivotIsRefusedByTheRelativeTolerance() {
        // diag(1, 1e-20) is SPD, but its second pivot is 1e-20 ≤ 1e-14 × 1: refused by default,
        // accepted with tolerance 0 (x = b / diag exactly).
        SparsePattern p = SparsePattern.fromEdges(2, new int[0], new int[0]);
        SymbolicCholesky s = SymbolicCholesky.analyse(p);
        NotPositiveDefiniteException e = assertThrows(
                NotPositiveDefiniteException.class, () -> s.factor(new double[] {1, 1e-20}, new double[0]));
        assertEquals(1, e.row());
        assertEquals(1e-14, e.threshold());
        double[] x = s.factor(new double[] {1, 1e-20}, new double[0], 0.0).solve(new double[] {2, 3e-20});
        assertArrayEquals(new double[] {2, 3}, x, 1e-15);
    }

    @Test
    void failedFactorCannotSolveUntilRefactored() {
        SparsePattern p = SparsePattern.fromEdges(2, new int[] {0}, new int[] {1});
        SymbolicCholesky s = SymbolicCholesky.analyse(p);
        NumericCholesky f = s.factor(new double[] {2, 2}, new double[] {-1});
        assertThrows(NotPositiveDefiniteException.class, () -> f.refactor(new double[] {1, 1}, new double[] {2}));
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> f.solve(new double[] {1, 1}));
        assertEquals("no valid factor: the last factorization failed", e.getMessage());
        // [[2, −1], [−1, 2]] x = [1, 1]  ⇒  x = [1, 1] (by hand).
        assertArrayEquals(
                new double[] {1, 1},
                f.refactor(new double[] {2, 2}, new double[] {-1}).solve(new double[] {1, 1}),
                1e-15);
    }

    @Test
    void badValuesAreRefused() {
        SparsePattern p = SparsePattern.fromEdges(3, new int[] {0, 1}, new int[] {1, 2});
        SymbolicCholesky s = SymbolicCholesky.analyse(p);
        IllegalArgumentException nan = assertThrows(
                IllegalArgumentException.class, () -> s.factor(new double[] {2, Double.NaN, 2}, new double[] {-1, -1}));
        assertEquals("diagonal 1 is NaN, must be finite", nan.getMessage());
        IllegalArgumentException inf = assertThrows(
                IllegalArgumentException.class,
                () -> s.factor(new double[] {2, 2, 2}, new double[] {-1, Double.NEGATIVE_INFINITY}));
        assertEquals("off-diagonal value 1 is -Infinity, must be finite", inf.getMessage());
        IllegalArgumentException lengths =
                assertThrows(IllegalArgumentException.class, () -> s.factor(new double[] {2, 2, 2}, new double[] {-1}));
        assertEquals("off-diagonal values: expected 2, got 1", lengths.getMessage());
        assertThrows(IllegalArgumentException.class, () -> s.factor(new double[] {2, 2}, new double[] {-1, -1}));
        NumericCholesky f = s.factor(new double[] {2, 2, 2}, new double[] {-1, -1});
        assertThrows(IllegalArgumentException.class, () -> f.solve(new double[] {1, 1}));
        assertThrows(
                IllegalArgumentException.class, () -> s.factor(new double[] {2, 2, 2}, new double[] {-1, -1}, 1.0));
    }

    @Test
    void emptyMatrix() {
        SymbolicCholesky s = SymbolicCholesky.analyse(SparsePattern.fromEdges(0, new int[0], new int[0]));
        NumericCholesky f = s.factor(new double[0], new double[0]);
        assertArrayEquals(new double[0], f.solve(new double[0]));
        assertEquals(0, f.nonZerosInL());
        assertEquals(0.0, f.logDeterminant());
    }

    @Test
    void oneByOne() {
        SymbolicCholesky s = SymbolicCholesky.analyse(SparsePattern.fromEdges(1, new int[0], new int[0]));
        // 4 x = 2  ⇒  x = 0.5 exactly.
        assertArrayEquals(
                new double[] {0.5}, s.factor(new double[] {4}, new double[0]).solve(new double[] {2}), 0.0);
        NotPositiveDefiniteException zero =
                assertThrows(NotPositiveDefiniteException.class, () -> s.factor(new double[] {0}, new double[0]));
        assertEquals(0, zero.row());
        NotPositiveDefiniteException negative =
                assertThrows(NotPositiveDefiniteException.class, () -> s.factor(new double[] {-1}, new double[0]));
        assertEquals(
                "matrix is not positive definite: the pivot of row 0 (eliminated 1 of 1) is -1.00000, not above 0.00",
                negative.getMessage());
    }

    /** A tree's factor (no fill) against Commons Math's dense Cholesky. */
    @Test
    void treeSolvesLikeDenseCholesky() {
        Random random = new Random(11);
        Problem pr = SparseTestMatrices.spd(SparseTestMatrices.randomTree(200, random), 0.1, random);
        double[] b = SparseTestMatrices.randomVector(200, random);
        double[] expected = new CholeskyDecomposition(pr.dense())
                .getSolver()
                .solve(new ArrayRealVector(b))
                .toArray();
        double[] x = SymbolicCholesky.analyse(pr.pattern())
                .factor(pr.diag(), pr.off())
                .solve(b);
        assertTrue(SparseTestMatrices.distance(x, expected) / SparseTestMatrices.norm(expected) < 1e-10);
    }
}
