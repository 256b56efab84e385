package org.headway.fitting;

import java.util.List;

/**
 * What {@link LeastSquaresFitter} solves for one form: a design matrix (a form linear in its
 * parameters, solved by QR) or an expression with starting values (Levenberg–Marquardt).
 *
 * @param parameterNames the parameters, in the order they are reported
 * @param expression the model as an {@link Expression} text over the data columns
 * @param design one column per parameter for a linear form, else null
 * @param start starting values for a nonlinear form, else null
 * @param centred whether R² is the centred one (false for a form without an intercept)
 */
record FitPlan(List<String> parameterNames, String expression, double[][] design, double[] start, boolean centred) {}
