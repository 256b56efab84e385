package org.headway.friction;

/**
 * An iterative solve that did not reach its tolerance within its iteration budget. Not bad input:
 * the input was valid, the solver's settings (tolerance, iteration budget) could not be met.
 */
public final class ConvergenceException extends RuntimeException {

    private final int iterations;
    private final double residual;

    /**
     * @param what what was being solved, with its inputs
     * @param iterations iterations spent
     * @param residual relative residual of the last iterate (ratio)
     * @param tolerance the relative residual that was asked for (ratio)
     */
    public ConvergenceException(String what, int iterations, double residual, double tolerance) {
        super(what + " did not converge: relative residual " + residual + " after " + iterations
                + " iterations, tolerance " + tolerance);
        this.iterations = iterations;
        this.residual = residual;
    }

    /** Iterations spent before giving up. */
    public int iterations() {
        return iterations;
    }

    /** Relative residual of the last iterate (ratio). */
    public double residual() {
        return residual;
    }
}
