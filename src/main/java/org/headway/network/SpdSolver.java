package org.headway.network;

/**
 * Solves A x = b for the symmetric positive-definite matrices of the head equations, on a pattern
 * fixed once per network topology: n unknowns and off-diagonal pairs (a[e], b[e]).
 */
interface SpdSolver {

    /**
     * Factors A and solves.
     *
     * @param diagonal A's diagonal (n)
     * @param offDiagonal A's off-diagonal value of each pattern pair, in pattern order
     * @param rhs b (n), not changed
     * @return x
     */
    double[] solve(double[] diagonal, double[] offDiagonal, double[] rhs);

    /** Nonzeros of the factor, for benchmark reports (0 when not known). */
    default long factorNonZeros() {
        return 0;
    }
}
