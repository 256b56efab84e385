package org.headway.fitting;

/**
 * Householder QR factorisation of a tall matrix, for least squares without the normal equations.
 *
 * <p>Columns are scaled to about unit Euclidean norm (by powers of two) before factoring (the solution is unscaled on the
 * way out), which removes the conditioning that comes only from the units of the columns. Accuracy:
 * backward stable; the forward error of a least-squares solution is of order ε·κ + ε·κ²·‖r‖/(‖A‖‖x‖)
 * with κ the condition number of the scaled matrix (Golub and Van Loan, Matrix Computations, 4th
 * ed., §5.3.7). Dot products are accumulated with fused multiply-add.
 */
final class HouseholderQr {

    private final int rows;
    private final int cols;
    /** Column-major factor: below the diagonal the Householder vectors, above it R. */
    private final double[][] factor;

    private final double[] rDiagonal;
    private final double[] columnScale;
    /** The column-scaled matrix, kept for residuals in iterative refinement. */
    private final double[][] scaled;

    /**
     * @param columns the matrix by columns, {@code columns[j][i]}; not modified
     */
    HouseholderQr(double[][] columns) {
        this.cols = columns.length;
        this.rows = columns[0].length;
        this.factor = new double[cols][];
        this.rDiagonal = new double[cols];
        this.columnScale = new double[cols];
        this.scaled = new double[cols][];
        for (int j = 0; j < cols; j++) {
            double norm = norm(columns[j], 0);
            // A power of two, so that scaling is exact and the scaled problem is the user's problem.
            columnScale[j] = norm == 0.0 ? 1.0 : Math.scalb(1.0, Math.getExponent(norm));
            double[] c = new double[rows];
            for (int i = 0; i < rows; i++) {
                c[i] = columns[j][i] / columnScale[j];
            }
            factor[j] = c;
            scaled[j] = c.clone();
        }
        for (int k = 0; k < cols; k++) {
            double[] v = factor[k];
            double nrm = norm(v, k);
            if (nrm != 0.0) {
                if (v[k] < 0) {
                    nrm = -nrm;
                }
                for (int i = k; i < rows; i++) {
                    v[i] /= nrm;
                }
                v[k] += 1.0;
                for (int j = k + 1; j < cols; j++) {
                    double[] c = factor[j];
                    double s = 0.0;
                    for (int i = k; i < rows; i++) {
                        s = Math.fma(v[i], c[i], s);
                    }
                    s = -s / v[k];
                    for (int i = k; i < rows; i++) {
                        c[i] = Math.fma(s, v[i], c[i]);
                    }
                }
            }
            rDiagonal[k] = -nrm;
        }
    }

    private double norm(double[] v, int from) {
        double scale = 0.0;
        for (int i = from; i < v.length; i++) {
            scale = Math.max(scale, Math.abs(v[i]));
        }
        if (scale == 0.0) {
            return 0.0;
        }
        double sum = 0.0;
        for (int i = from; i < v.length; i++) {
            double t = v[i] / scale;
            sum = Math.fma(t, t, sum);
        }
        return scale * Math.sqrt(sum);
    }

    /** Number of columns. */
    int columns() {
        return cols;
    }

    /**
     * Ratio of the smallest to the largest |Rₖₖ| of the column-scaled matrix: a cheap lower-bound
     * indicator of rank deficiency (exact singular values come from {@link #scaledR()}).
     */
    double diagonalRatio() {
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0.0;
        for (double d : rDiagonal) {
            lo = Math.min(lo, Math.abs(d));
            hi = Math.max(hi, Math.abs(d));
        }
        return hi == 0.0 ? 0.0 : lo / hi;
    }

    /** R of the column-scaled matrix, cols × cols. */
    double[][] scaledR() {
        double[][] r = new double[cols][cols];
        for (int k = 0; k < cols; k++) {
            r[k][k] = rDiagonal[k];
            for (int j = k + 1; j < cols; j++) {
                r[k][j] = factor[j][k];
            }
        }
        return r;
    }

    /** The scale each column was divided by. */
    double[] columnScale() {
        return columnScale.clone();
    }

    /**
     * Least-squares solution of A x ≈ b.
     *
     * @param rhs right-hand side b, length rows; not modified
     * @return x minimising ‖A x − b‖₂
     */
    double[] solve(double[] rhs) {
        double[] b = rhs.clone();
        for (int k = 0; k < cols; k++) {
            double[] v = factor[k];
            if (v[k] == 0.0) {
                continue;
            }
            double s = 0.0;
            for (int i = k; i < rows; i++) {
                s = Math.fma(v[i], b[i], s);
            }
            s = -s / v[k];
            for (int i = k; i < rows; i++) {
                b[i] = Math.fma(s, v[i], b[i]);
            }
        }
        double[] x = new double[cols];
        for (int k = cols - 1; k >= 0; k--) {
            double s = b[k];
            for (int j = k + 1; j < cols; j++) {
                s = Math.fma(-factor[j][k], x[j], s);
            }
            x[k] = s / rDiagonal[k];
        }
        for (int k = 0; k < cols; k++) {
            x[k] /= columnScale[k];
        }
        return x;
    }

    /**
     * Least-squares solution refined on the augmented system [I A; Aᵀ 0][r; x] = [b; 0], with the
     * residuals of both equations accumulated in doubled precision (Björck, Å. (1967), Iterative
     * refinement of linear least squares solutions I, BIT 7, 257–278, from memory). This removes
     * the ε·κ²·‖r‖ term that limits plain QR when the residual is large.
     *
     * @param rhs right-hand side b; not modified
     * @param steps most refinement steps (fewer when the correction falls below rounding)
     * @return x minimising ‖A x − b‖₂
     */
    double[] solveRefined(double[] rhs, int steps) {
        return solveRefined(rhs, steps, null);
    }

    /**
     * As {@link #solveRefined(double[], int)}, stopping as soon as every correction is below the
     * given absolute size (e.g. rounding of the quantity x is added to).
     *
     * @param rhs right-hand side b; not modified
     * @param steps most refinement steps
     * @param negligible per component, a correction size that no longer matters, or null
     * @return x minimising ‖A x − b‖₂
     */
    double[] solveRefined(double[] rhs, int steps, double[] negligible) {
        double[] x = solveScaled(rhs.clone());
        double[] r = residual(rhs, new double[rows], x);
        for (int step = 0; step < steps; step++) {
            double[] f = residual(rhs, r, x);
            double[] g = new double[cols];
            for (int k = 0; k < cols; k++) {
                g[k] = -dot2(scaled[k], r);
            }
            double[] h = solveRTransposed(g);
            applyQTransposed(f);
            double[] rhsX = new double[cols];
            for (int k = 0; k < cols; k++) {
                rhsX[k] = f[k] - h[k];
            }
            double[] dx = solveR(rhsX);
            double[] dr = f;
            System.arraycopy(h, 0, dr, 0, cols);
            applyQ(dr);
            boolean negligibleChange = true;
            for (int k = 0; k < cols; k++) {
                x[k] += dx[k];
                double limit = negligible == null
                        ? 0x1p-52 * Math.abs(x[k])
                        : Math.max(negligible[k] * columnScale[k], 0x1p-52 * Math.abs(x[k]));
                negligibleChange &= Math.abs(dx[k]) <= limit;
            }
            for (int i = 0; i < rows; i++) {
                r[i] += dr[i];
            }
            // Converged to working precision (or to what the caller needs): further steps cannot matter.
            if (negligibleChange) {
                break;
            }
        }
        for (int k = 0; k < cols; k++) {
            x[k] /= columnScale[k];
        }
        return x;
    }

    /**
     * b − r − A x for every row, accumulated as if in doubled precision (error-free products and
     * sums, compensation added at the end), column by column so the loops stream through memory.
     */
    private double[] residual(double[] b, double[] r, double[] x) {
        double[] sum = new double[rows];
        double[] compensation = new double[rows];
        for (int i = 0; i < rows; i++) {
            double t = b[i] - r[i];
            double z = t - b[i];
            compensation[i] = (b[i] - (t - z)) + (-r[i] - z);
            sum[i] = t;
        }
        for (int k = 0; k < cols; k++) {
            double[] a = scaled[k];
            double xk = -x[k];
            for (int i = 0; i < rows; i++) {
                double product = a[i] * xk;
                double productError = Math.fma(a[i], xk, -product);
                double t = sum[i] + product;
                double z = t - sum[i];
                compensation[i] += productError + (sum[i] - (t - z)) + (product - z);
                sum[i] = t;
            }
        }
        for (int i = 0; i < rows; i++) {
            sum[i] += compensation[i];
        }
        return sum;
    }

    private double[] solveScaled(double[] b) {
        applyQTransposed(b);
        return solveR(b);
    }

    private void applyQTransposed(double[] b) {
        for (int k = 0; k < cols; k++) {
            reflect(k, b);
        }
    }

    private void applyQ(double[] b) {
        for (int k = cols - 1; k >= 0; k--) {
            reflect(k, b);
        }
    }

    private void reflect(int k, double[] b) {
        double[] v = factor[k];
        if (v[k] == 0.0) {
            return;
        }
        double s = 0.0;
        for (int i = k; i < rows; i++) {
            s = Math.fma(v[i], b[i], s);
        }
        s = -s / v[k];
        for (int i = k; i < rows; i++) {
            b[i] = Math.fma(s, v[i], b[i]);
        }
    }

    /** Solves R x = b using the first cols entries of b. */
    private double[] solveR(double[] b) {
        double[] x = new double[cols];
        for (int k = cols - 1; k >= 0; k--) {
            double s = b[k];
            for (int j = k + 1; j < cols; j++) {
                s = Math.fma(-factor[j][k], x[j], s);
            }
            x[k] = s / rDiagonal[k];
        }
        return x;
    }

    /** Solves Rᵀ h = g. */
    private double[] solveRTransposed(double[] g) {
        double[] h = new double[cols];
        for (int k = 0; k < cols; k++) {
            double s = g[k];
            for (int j = 0; j < k; j++) {
                s = Math.fma(-factor[k][j], h[j], s);
            }
            h[k] = s / rDiagonal[k];
        }
        return h;
    }

    /**
     * Dot product as if accumulated in twice the working precision (Ogita, Rump and Oishi (2005),
     * Accurate sum and dot product, SIAM J. Sci. Comput. 26(6), algorithm Dot2, from memory).
     */
    static double dot2(double[] a, double[] b) {
        double sum = 0.0;
        double compensation = 0.0;
        for (int i = 0; i < a.length; i++) {
            double product = a[i] * b[i];
            double productError = Math.fma(a[i], b[i], -product);
            double t = sum + product;
            double z = t - sum;
            double sumError = (sum - (t - z)) + (product - z);
            sum = t;
            compensation += productError + sumError;
        }
        return sum + compensation;
    }
}
