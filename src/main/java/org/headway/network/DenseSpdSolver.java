package org.headway.network;

/**
 * Dense Cholesky for small systems (tests and networks of a few hundred junctions): A = L Lᵀ by
 * the column-oriented algorithm of Golub &amp; Van Loan, Matrix Computations, 4th ed., 2013, Alg.
 * 4.2.1.
 */
final class DenseSpdSolver implements SpdSolver {

    private final int n;
    private final int[] a;
    private final int[] b;

    DenseSpdSolver(int n, int[] a, int[] b) {
        this.n = n;
        this.a = a.clone();
        this.b = b.clone();
    }

    @Override
    public double[] solve(double[] diagonal, double[] offDiagonal, double[] rhs) {
        double[][] m = new double[n][n];
        for (int i = 0; i < n; i++) {
            m[i][i] = diagonal[i];
        }
        for (int e = 0; e < a.length; e++) {
            m[a[e]][b[e]] += offDiagonal[e];
            m[b[e]][a[e]] += offDiagonal[e];
        }
        for (int j = 0; j < n; j++) {
            double d = m[j][j];
            for (int k = 0; k < j; k++) {
                d -= m[j][k] * m[j][k];
            }
            if (!(d > 0)) {
                throw new IllegalStateException("matrix not positive definite at row " + j);
            }
            double l = Math.sqrt(d);
            m[j][j] = l;
            for (int i = j + 1; i < n; i++) {
                double s = m[i][j];
                for (int k = 0; k < j; k++) {
                    s -= m[i][k] * m[j][k];
                }
                m[i][j] = s / l;
            }
        }
        double[] x = rhs.clone();
        for (int i = 0; i < n; i++) {
            double s = x[i];
            for (int k = 0; k < i; k++) {
                s -= m[i][k] * x[k];
            }
            x[i] = s / m[i][i];
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = x[i];
            for (int k = i + 1; k < n; k++) {
                s -= m[k][i] * x[k];
            }
            x[i] = s / m[i][i];
        }
        return x;
    }
}
