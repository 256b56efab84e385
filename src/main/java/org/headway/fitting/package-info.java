/**
 * Least-squares fitting of observations to built-in forms and user expressions: a thin adapter
 * over Commons Math (Levenberg–Marquardt with exact derivatives), Householder QR for forms linear
 * in their parameters, and the expression language with its derivatives. Depends only on
 * {@code caution}.
 */
package org.headway.fitting;
