package org.headway.network;

import org.headway.network.sparse.NotPositiveDefiniteException;
import org.headway.network.sparse.NumericCholesky;
import org.headway.network.sparse.SparsePattern;
import org.headway.network.sparse.SymbolicCholesky;

/**
 * The head equations' solver for networks of any size: the pattern, its approximate-minimum-degree
 * ordering and the symbolic factor are computed once per topology; every Newton iteration
 * refactors L D Lᵀ in the same storage and solves.
 */
final class SparseSpdSolver implements SpdSolver {

    private final SymbolicCholesky symbolic;
    private NumericCholesky numeric;

    SparseSpdSolver(int n, int[] a, int[] b) {
        symbolic = SymbolicCholesky.analyse(SparsePattern.fromEdges(n, a, b));
    }

    @Override
    public double[] solve(double[] diagonal, double[] offDiagonal, double[] rhs) {
        try {
            // Link conductances 1/g span many decades (a zero-length pipe next to a throttled valve), so
            // only a pivot that is not positive is refused.
            numeric = numeric == null
                    ? symbolic.factor(diagonal, offDiagonal, 0.0)
                    : numeric.refactor(diagonal, offDiagonal, 0.0);
        } catch (NotPositiveDefiniteException e) {
            throw new IllegalStateException("matrix not positive definite at row " + e.row(), e);
        }
        return numeric.solve(rhs);
    }

    @Override
    public long factorNonZeros() {
        return symbolic.nonZerosInL();
    }
}
