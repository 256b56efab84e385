package org.headway.fitting;

import org.headway.fitting.Instruction.Op;

/**
 * The loops of each operation of a compiled {@link Expression}, value and tangents: each runs once
 * over all points of a block. Shared by the evaluator and by constant folding in the syntax tree, so
 * a folded constant is the very double evaluation would give.
 */
final class Operations {
    private Operations() {}

    static void apply(Instruction in, double[][] val, double[][][] grad, double[] v, double[][] g, int n) {
        double[] a = val[in.left()];
        double[] b = in.right() >= 0 ? val[in.right()] : null;
        double[][] ga = grad[in.left()];
        double[][] gb = in.right() >= 0 ? grad[in.right()] : null;
        switch (in.op()) {
            case ADD, SUBTRACT -> {
                double sign = in.op() == Op.ADD ? 1.0 : -1.0;
                for (int j = 0; j < n; j++) {
                    v[j] = a[j] + sign * b[j];
                }
                if (g != null) {
                    for (int k = 0; k < g.length; k++) {
                        double[] da = ga == null ? null : ga[k];
                        double[] db = gb == null ? null : gb[k];
                        if (da == null && db == null) {
                            continue;
                        }
                        double[] d = new double[n];
                        for (int j = 0; j < n; j++) {
                            d[j] = (da == null ? 0.0 : da[j]) + sign * (db == null ? 0.0 : db[j]);
                        }
                        g[k] = d;
                    }
                }
            }
            case MULTIPLY -> {
                for (int j = 0; j < n; j++) {
                    v[j] = a[j] * b[j];
                }
                if (g != null) {
                    for (int k = 0; k < g.length; k++) {
                        double[] da = ga == null ? null : ga[k];
                        double[] db = gb == null ? null : gb[k];
                        if (da == null && db == null) {
                            continue;
                        }
                        double[] d = new double[n];
                        if (db == null) {
                            for (int j = 0; j < n; j++) {
                                d[j] = da[j] * b[j];
                            }
                        } else if (da == null) {
                            for (int j = 0; j < n; j++) {
                                d[j] = a[j] * db[j];
                            }
                        } else {
                            for (int j = 0; j < n; j++) {
                                d[j] = da[j] * b[j] + a[j] * db[j];
                            }
                        }
                        g[k] = d;
                    }
                }
            }
            case DIVIDE -> {
                for (int j = 0; j < n; j++) {
                    v[j] = a[j] / b[j];
                }
                if (g != null) {
                    // d(a/b) = (da − (a/b)·db) / b
                    for (int k = 0; k < g.length; k++) {
                        double[] da = ga == null ? null : ga[k];
                        double[] db = gb == null ? null : gb[k];
                        if (da == null && db == null) {
                            continue;
                        }
                        double[] d = new double[n];
                        for (int j = 0; j < n; j++) {
                            double num = (da == null ? 0.0 : da[j]) - (db == null ? 0.0 : v[j] * db[j]);
                            d[j] = num / b[j];
                        }
                        g[k] = d;
                    }
                }
            }
            case POWER -> power(a, b, ga, gb, v, g, n);
            case NEGATE -> {
                for (int j = 0; j < n; j++) {
                    v[j] = -a[j];
                }
                if (g != null) {
                    for (int k = 0; k < g.length; k++) {
                        if (ga[k] != null) {
                            double[] d = new double[n];
                            for (int j = 0; j < n; j++) {
                                d[j] = -ga[k][j];
                            }
                            g[k] = d;
                        }
                    }
                }
            }
            default -> unary(in.op(), a, ga, v, g, n);
        }
    }

    private static void power(double[] a, double[] b, double[][] ga, double[][] gb, double[] v, double[][] g, int n) {
        for (int j = 0; j < n; j++) {
            v[j] = Math.pow(a[j], b[j]);
        }
        if (g == null) {
            return;
        }
        // d(a^b) = b·a^(b−1)·da + a^b·ln(a)·db ; the first form also holds for a ≤ 0 when b is fixed.
        double[] base = null;
        double[] logTerm = null;
        for (int k = 0; k < g.length; k++) {
            double[] da = ga == null ? null : ga[k];
            double[] db = gb == null ? null : gb[k];
            if (da == null && db == null) {
                continue;
            }
            if (da != null && base == null) {
                base = new double[n];
                for (int j = 0; j < n; j++) {
                    base[j] = b[j] == 0.0 ? 0.0 : b[j] * Math.pow(a[j], b[j] - 1.0);
                }
            }
            if (db != null && logTerm == null) {
                logTerm = new double[n];
                for (int j = 0; j < n; j++) {
                    logTerm[j] = v[j] == 0.0 ? 0.0 : v[j] * Math.log(a[j]);
                }
            }
            double[] d = new double[n];
            for (int j = 0; j < n; j++) {
                d[j] = (da == null ? 0.0 : base[j] * da[j]) + (db == null ? 0.0 : logTerm[j] * db[j]);
            }
            g[k] = d;
        }
    }

    private static void unary(Op op, double[] a, double[][] ga, double[] v, double[][] g, int n) {
        double[] slope = g == null ? null : new double[n];
        switch (op) {
            case EXP -> {
                for (int j = 0; j < n; j++) {
                    v[j] = Math.exp(a[j]);
                }
                if (slope != null) {
                    System.arraycopy(v, 0, slope, 0, n);
                }
            }
            case LOG -> {
                for (int j = 0; j < n; j++) {
                    v[j] = Math.log(a[j]);
                }
                if (slope != null) {
                    for (int j = 0; j < n; j++) {
                        slope[j] = 1.0 / a[j];
                    }
                }
            }
            case LOG10 -> {
                for (int j = 0; j < n; j++) {
                    v[j] = Math.log10(a[j]);
                }
                if (slope != null) {
                    double ln10 = Math.log(10.0);
                    for (int j = 0; j < n; j++) {
                        slope[j] = 1.0 / (a[j] * ln10);
                    }
                }
            }
            case SQRT -> {
                for (int j = 0; j < n; j++) {
                    v[j] = Math.sqrt(a[j]);
                }
                if (slope != null) {
                    for (int j = 0; j < n; j++) {
                        slope[j] = 0.5 / v[j];
                    }
                }
            }
            case SIN -> {
                for (int j = 0; j < n; j++) {
                    v[j] = Math.sin(a[j]);
                }
                if (slope != null) {
                    for (int j = 0; j < n; j++) {
                        slope[j] = Math.cos(a[j]);
                    }
                }
            }
            case COS -> {
                for (int j = 0; j < n; j++) {
                    v[j] = Math.cos(a[j]);
                }
                if (slope != null) {
                    for (int j = 0; j < n; j++) {
                        slope[j] = -Math.sin(a[j]);
                    }
                }
            }
            case TAN -> {
                for (int j = 0; j < n; j++) {
                    v[j] = Math.tan(a[j]);
                }
                if (slope != null) {
                    for (int j = 0; j < n; j++) {
                        slope[j] = 1.0 + v[j] * v[j];
                    }
                }
            }
            case ATAN -> {
                for (int j = 0; j < n; j++) {
                    v[j] = Math.atan(a[j]);
                }
                if (slope != null) {
                    for (int j = 0; j < n; j++) {
                        slope[j] = 1.0 / (1.0 + a[j] * a[j]);
                    }
                }
            }
            case ABS -> {
                for (int j = 0; j < n; j++) {
                    v[j] = Math.abs(a[j]);
                }
                if (slope != null) {
                    for (int j = 0; j < n; j++) {
                        slope[j] = Math.signum(a[j]);
                    }
                }
            }
            default -> throw new IllegalStateException("not a function: " + op);
        }
        if (g != null) {
            for (int k = 0; k < g.length; k++) {
                if (ga[k] != null) {
                    double[] d = new double[n];
                    for (int j = 0; j < n; j++) {
                        d[j] = slope[j] * ga[k][j];
                    }
                    g[k] = d;
                }
            }
        }
    }
}
