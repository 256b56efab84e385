package org.headway.network.sparse;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.headway.network.sparse.SparseTestMatrices.Graph;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class SparseSymbolicCholeskyTest {

    static Stream<Arguments> graphs() {
        Stream.Builder<Arguments> s = Stream.builder();
        long seed = 100;
        for (int n : new int[] {1, 2, 3, 6, 13, 25, 47, 80}) {
            for (double perRow : new double[] {0.3, 1.0, 2.5, 6.0}) {
                s.add(Arguments.of(n, perRow, seed++));
            }
        }
        return s.build();
    }

    /**
     * The pattern of L, its column counts and the elimination tree, against the elimination game on
     * a dense boolean matrix (George &amp; Liu 1981 §5.1) and the tree's definition parent(j) =
     * min{i &gt; j : L(i, j) ≠ 0} (Liu 1986; Davis 2006 §4.1), for the minimum-degree order, the
     * natural order and a random order.
     */
    @ParameterizedTest(name = "n={0}, {1} edges per row, seed {2}")
    @MethodSource("graphs")
    void patternMatchesTheEliminationGame(int n, double perRow, long seed) {
        Random random = new Random(seed);
        Graph g = SparseTestMatrices.randomGraph(n, perRow, random);
        SparsePattern p = g.pattern();
        List<int[]> orders = new ArrayList<>();
        orders.add(MinimumDegreeOrdering.order(p));
        orders.add(MinimumDegreeOrdering.order(p, false));
        orders.add(SparseTestMatrices.identity(n));
        orders.add(SparseTestMatrices.shuffled(n, random));
        for (int[] perm : orders) {
            SymbolicCholesky s = SymbolicCholesky.analyse(p, perm);
            boolean[][] lower = SparseTestMatrices.eliminationGame(p, perm);
            long total = n;
            int[] tree = s.eliminationTree();
            int[] counts = s.columnCounts();
            for (int j = 0; j < n; j++) {
                List<Integer> rows = new ArrayList<>();
                for (int i = j + 1; i < n; i++) {
                    if (lower[i][j]) {
                        rows.add(i);
                    }
                }
                int[] expected = rows.stream().mapToInt(Integer::intValue).toArray();
                assertArrayEquals(expected, s.columnPattern(j), "column " + j);
                assertEquals(expected.length, counts[j], "count of column " + j);
                assertEquals(expected.length == 0 ? -1 : expected[0], tree[j], "parent of " + j);
                total += expected.length;
            }
            assertEquals(total, s.nonZerosInL());
            assertEquals(total - n - p.distinctPairs(), s.fillIn());
            assertArrayEquals(perm, s.permutation());
        }
    }

    @Test
    void badPermutationsAreRefused() {
        SparsePattern p = SparsePattern.fromEdges(3, new int[] {0}, new int[] {1});
        assertThrows(IllegalArgumentException.class, () -> SymbolicCholesky.analyse(p, new int[] {0, 1}));
        IllegalArgumentException repeated =
                assertThrows(IllegalArgumentException.class, () -> SymbolicCholesky.analyse(p, new int[] {0, 2, 2}));
        assertEquals("not a permutation of 0..2: entry 2 is 2, repeated", repeated.getMessage());
        IllegalArgumentException range =
                assertThrows(IllegalArgumentException.class, () -> SymbolicCholesky.analyse(p, new int[] {0, 1, 3}));
        assertEquals("not a permutation of 0..2: entry 2 is 3", range.getMessage());
    }

    @Test
    void emptyAndSingleRow() {
        SymbolicCholesky zero = SymbolicCholesky.analyse(SparsePattern.fromEdges(0, new int[0], new int[0]));
        assertEquals(0, zero.size());
        assertEquals(0, zero.nonZerosInL());
        SymbolicCholesky one = SymbolicCholesky.analyse(SparsePattern.fromEdges(1, new int[0], new int[0]));
        assertEquals(1, one.nonZerosInL());
        assertArrayEquals(new int[] {-1}, one.eliminationTree());
    }
}
