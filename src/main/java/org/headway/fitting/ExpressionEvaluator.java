package org.headway.fitting;

import java.util.Arrays;

/**
 * Runs a compiled {@link Expression} over many points: each step is one loop over a block of points
 * (values, and with derivatives one tangent per parameter the step depends on), so the cost of
 * interpretation does not grow with the number of points. Immutable; each evaluation allocates its
 * own work arrays, so one evaluator serves many threads.
 */
final class ExpressionEvaluator {

    private final Instruction[] program;
    private final int parameterCount;

    /**
     * @param program the compiled steps, the last one the expression's value
     * @param parameterCount number of parameters the expression was compiled with
     */
    ExpressionEvaluator(Instruction[] program, int parameterCount) {
        this.program = program;
        this.parameterCount = parameterCount;
    }

    /** Bit k set when the expression's value depends on parameter k. */
    long dependencies() {
        return program[program.length - 1].mask();
    }

    /**
     * As {@link Expression#evaluateColumns}, with the argument counts already checked; more than
     * {@link Expression#BLOCK} points are run a block at a time.
     */
    double[][] evaluateColumns(double[][] columns, double[] parameterValues, double[] values, boolean withGradient) {
        int n = values.length;
        int p = parameterCount;
        if (n <= Expression.BLOCK) {
            return evaluateBlock(columns, parameterValues, values, withGradient, n, p);
        }
        // Points in blocks: the program's intermediate arrays stay small and in cache, whatever n.
        double[][] out = withGradient ? new double[p][n] : null;
        double[][] blockColumns = new double[columns.length][Expression.BLOCK];
        double[] blockValues = new double[Expression.BLOCK];
        for (int start = 0; start < n; start += Expression.BLOCK) {
            int length = Math.min(Expression.BLOCK, n - start);
            double[][] view = blockColumns;
            double[] viewValues = blockValues;
            if (length < Expression.BLOCK) {
                view = new double[columns.length][length];
                viewValues = new double[length];
            }
            for (int c = 0; c < columns.length; c++) {
                System.arraycopy(columns[c], start, view[c], 0, length);
            }
            double[][] g = evaluateBlock(view, parameterValues, viewValues, withGradient, length, p);
            System.arraycopy(viewValues, 0, values, start, length);
            if (withGradient) {
                for (int k = 0; k < p; k++) {
                    System.arraycopy(g[k], 0, out[k], start, length);
                }
            }
        }
        return out;
    }

    private double[][] evaluateBlock(
            double[][] columns, double[] parameterValues, double[] values, boolean withGradient, int n, int p) {
        double[][] val = new double[program.length][];
        double[][][] grad = new double[program.length][][];
        double[] ones = null;
        for (int i = 0; i < program.length; i++) {
            Instruction in = program[i];
            double[] v;
            double[][] g = withGradient && in.mask() != 0 ? new double[p][] : null;
            switch (in.op()) {
                case CONSTANT -> {
                    v = new double[n];
                    Arrays.fill(v, in.constant());
                }
                case VARIABLE -> v = columns[in.index()];
                case PARAMETER -> {
                    v = new double[n];
                    Arrays.fill(v, parameterValues[in.index()]);
                    if (g != null) {
                        if (ones == null) {
                            ones = new double[n];
                            Arrays.fill(ones, 1.0);
                        }
                        g[in.index()] = ones;
                    }
                }
                default -> {
                    v = new double[n];
                    Operations.apply(in, val, grad, v, g, n);
                }
            }
            val[i] = v;
            grad[i] = g;
        }
        int last = program.length - 1;
        System.arraycopy(val[last], 0, values, 0, n);
        if (!withGradient) {
            return null;
        }
        double[][] out = new double[p][];
        double[][] g = grad[last];
        for (int k = 0; k < p; k++) {
            double[] column = g == null ? null : g[k];
            // Leaves share arrays (a parameter's tangent of ones, a column's values): copy those.
            out[k] = column == null ? new double[n] : column == ones ? column.clone() : column;
        }
        return out;
    }
}
