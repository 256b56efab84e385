package org.headway.network.sparse;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class SparsePatternTest {

    @Test
    void repeatedPairsInEitherOrientationMergeButEdgesStayAsGiven() {
        // Edges by hand: 0–1 three times (once reversed), 1–2 once, 3 isolated.
        SparsePattern p = SparsePattern.fromEdges(4, new int[] {0, 1, 0, 2}, new int[] {1, 0, 1, 1});
        assertEquals(4, p.size());
        assertEquals(4, p.edgeCount());
        assertEquals(2, p.distinctPairs());
        assertArrayEquals(new int[] {1}, p.neighbours(0));
        assertArrayEquals(new int[] {0, 2}, p.neighbours(1));
        assertArrayEquals(new int[] {1}, p.neighbours(2));
        assertArrayEquals(new int[0], p.neighbours(3));
        assertEquals(1, p.edgeRowA(1));
        assertEquals(0, p.edgeRowB(1));
    }

    @Test
    void neighboursAreSortedAndSymmetric() {
        SparsePattern p = SparsePattern.fromEdges(5, new int[] {4, 4, 4, 2}, new int[] {3, 0, 2, 0});
        assertArrayEquals(new int[] {0, 2, 3}, p.neighbours(4));
        assertArrayEquals(new int[] {2, 4}, p.neighbours(0));
        for (int i = 0; i < 5; i++) {
            for (int j : p.neighbours(i)) {
                int[] back = p.neighbours(j);
                assertTrue(java.util.Arrays.binarySearch(back, i) >= 0, i + " in row " + j);
            }
        }
    }

    @Test
    void inputArraysAreCopied() {
        int[] a = {0};
        int[] b = {1};
        SparsePattern p = SparsePattern.fromEdges(2, a, b);
        a[0] = 1;
        b[0] = 0;
        assertEquals(0, p.edgeRowA(0));
    }

    @Test
    void emptyAndSingleRowPatterns() {
        SparsePattern empty = SparsePattern.fromEdges(0, new int[0], new int[0]);
        assertEquals(0, empty.size());
        assertEquals(0, empty.distinctPairs());
        SparsePattern one = SparsePattern.fromEdges(1, new int[0], new int[0]);
        assertEquals(1, one.size());
        assertEquals(0, one.degree(0));
    }

    @Test
    void badEdgesAreRefusedWithTheirIndex() {
        IllegalArgumentException self = assertThrows(
                IllegalArgumentException.class, () -> SparsePattern.fromEdges(3, new int[] {0, 2}, new int[] {1, 2}));
        assertEquals(
                "edge 1 joins row 2 to itself; the diagonal is given separately, not as an edge", self.getMessage());
        IllegalArgumentException range = assertThrows(
                IllegalArgumentException.class, () -> SparsePattern.fromEdges(3, new int[] {0}, new int[] {3}));
        assertEquals("edge 0 joins rows 0 and 3, outside 0..2", range.getMessage());
        assertThrows(IllegalArgumentException.class, () -> SparsePattern.fromEdges(3, new int[] {-1}, new int[] {0}));
        IllegalArgumentException lengths = assertThrows(
                IllegalArgumentException.class, () -> SparsePattern.fromEdges(3, new int[] {0, 1}, new int[] {1}));
        assertEquals("edge arrays differ in length: rowA has 2 entries, rowB has 1", lengths.getMessage());
        assertThrows(IllegalArgumentException.class, () -> SparsePattern.fromEdges(-1, new int[0], new int[0]));
    }
}
