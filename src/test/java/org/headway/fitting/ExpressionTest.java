package org.headway.fitting;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The expression parser, its evaluation and its exact parameter derivatives. */
class ExpressionTest {

    /** Agreement of exact derivatives with hand-derived ones: rounding only. */
    static final double EXACT = 1e-14;
    /** Central differences with step h ≈ 1e-6 carry truncation error O(h²) plus rounding ε/h. */
    static final double FINITE_DIFFERENCE = 1e-7;

    private static double[] gradient(Expression e, double[] x, double[] p) {
        double[][] cols = new double[x.length][];
        for (int v = 0; v < x.length; v++) {
            cols[v] = new double[] {x[v]};
        }
        double[][] jac = new double[1][p.length];
        e.evaluate(cols, p, new double[1], jac);
        return jac[0];
    }

    /**
     * Many points are evaluated in blocks of {@link Expression#BLOCK}: every value and derivative
     * must be the very double the same expression gives for that point alone (same operations in
     * the same order, so equal bit for bit), across block edges and a short last block.
     */
    @Test
    void manyPointsInBlocksEqualEachPointAlone() {
        Expression e =
                Expression.parse("a*exp(-b*x)/(1 + c*y^2) - sqrt(x + 3)*c", List.of("x", "y"), List.of("a", "b", "c"));
        int n = 2 * Expression.BLOCK + 37;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 0.001 * i;
            y[i] = Math.sin(i);
        }
        double[] p = {2.5, 1.3, 0.4};
        double[] values = new double[n];
        double[][] gradient = e.evaluateColumns(new double[][] {x, y}, p, values, true);
        for (int i = 0; i < n; i++) {
            double[] one = new double[1];
            double[][] g = e.evaluateColumns(new double[][] {{x[i]}, {y[i]}}, p, one, true);
            assertEquals(one[0], values[i], 0.0, "value at point " + i);
            for (int k = 0; k < 3; k++) {
                assertEquals(g[k][0], gradient[k][i], 0.0, "derivative " + k + " at point " + i);
            }
        }
    }

    @Test
    void derivativesOfDecayingExponentialMatchHandDerivatives() {
        // f = a·exp(−b x) + c ⇒ ∂f/∂a = exp(−b x), ∂f/∂b = −a x exp(−b x), ∂f/∂c = 1 (derived by hand)
        Expression e = Expression.parse("a*exp(-b*x) + c", List.of("x"), List.of("a", "b", "c"));
        double a = 2.5, b = 0.7, c = -1.25, x = 1.9;
        double[] g = gradient(e, new double[] {x}, new double[] {a, b, c});
        assertEquals(Math.exp(-b * x), g[0], EXACT);
        assertEquals(-a * x * Math.exp(-b * x), g[1], EXACT);
        assertEquals(1.0, g[2], 0.0);
        assertEquals(a * Math.exp(-b * x) + c, e.evaluate(new double[] {x}, new double[] {a, b, c}), EXACT);
    }

    @Test
    void derivativesOfPowerLawMatchHandDerivatives() {
        // f = a·x^b ⇒ ∂f/∂a = x^b, ∂f/∂b = a x^b ln x (derived by hand)
        Expression e = Expression.parse("a*x^b", List.of("x"), List.of("a", "b"));
        double a = 0.316, b = -0.25, x = 4.0e4;
        double[] g = gradient(e, new double[] {x}, new double[] {a, b});
        assertEquals(Math.pow(x, b), g[0], EXACT);
        assertEquals(a * Math.pow(x, b) * Math.log(x), g[1], EXACT * Math.abs(g[1]));
    }

    @Test
    void derivativeOfFixedPowerOfNegativeBaseIsDefined() {
        // f = (a x)² at x < 0 ⇒ ∂f/∂a = 2 a x², defined although ln(a x) is not
        Expression e = Expression.parse("(a*x)^2", List.of("x"), List.of("a"));
        double[] g = gradient(e, new double[] {-3.0}, new double[] {1.5});
        assertEquals(2 * 1.5 * 9.0, g[0], EXACT);
    }

    @ParameterizedTest
    @CsvSource(
            delimiter = ';',
            value = {
                "sqrt(a)*sin(b*x)/log10(c + x); 0.8",
                "atan(a*x) + cos(b)*tan(c*x); 0.3",
                "abs(a - x)*ln(b + x)^c; 1.7",
                "exp(-(x - a)^2/b^2)*c + log(c*x); 2.2",
                "a/(1 + b*x + c*x**2) - pi*b; 0.45",
                "(a + b*x)^(c/2); 1.3"
            })
    void exactDerivativesAgreeWithCentralDifferences(String text, double x) {
        Expression e = Expression.parse(text, List.of("x"), List.of("a", "b", "c"));
        double[] p = {1.3, 0.9, 2.1};
        double[] g = gradient(e, new double[] {x}, p);
        for (int k = 0; k < p.length; k++) {
            double h = 1e-6 * Math.max(1.0, Math.abs(p[k]));
            double[] up = p.clone();
            double[] down = p.clone();
            up[k] += h;
            down[k] -= h;
            double fd = (e.evaluate(new double[] {x}, up) - e.evaluate(new double[] {x}, down)) / (2 * h);
            assertEquals(fd, g[k], FINITE_DIFFERENCE * Math.max(1.0, Math.abs(fd)), text + " ∂/∂p" + k);
        }
    }

    @ParameterizedTest
    @CsvSource(
            delimiter = ';',
            value = {
                "-2^2; -4", // power binds tighter than unary minus
                "2^3^2; 512", // right-associative
                "2**3; 8",
                ".5 + 1e-3*2; 0.502",
                "10/4/5; 0.5",
                "1 - 2 - 3; -4",
                "log(exp(1.5)); 1.5",
                "ln(1); 0",
                "log10(1000); 3",
                "2*pi; 6.283185307179586",
                "sqrt(16) + abs(-3); 7",
                "-(-(3)); 3",
                "+4 - +1; 3"
            })
    void arithmeticFollowsTheDocumentedGrammar(String text, double expected) {
        Expression e = Expression.parse(text, List.of(), List.of());
        assertEquals(expected, e.evaluate(new double[0], new double[0]), 1e-15 * Math.max(1, Math.abs(expected)));
    }

    @Test
    void vectorisedAndPointwiseEvaluationAgree() {
        Expression e = Expression.parse("a*exp(-b*t) + c*u", List.of("t", "u"), List.of("a", "b", "c"));
        double[] t = {0.0, 0.5, 1.0, 7.0};
        double[] u = {1.0, -2.0, 3.5, 0.25};
        double[] p = {3.0, 0.4, -0.5};
        double[] values = new double[4];
        e.evaluate(new double[][] {t, u}, p, values, null);
        for (int i = 0; i < 4; i++) {
            assertEquals(e.evaluate(new double[] {t[i], u[i]}, p), values[i], 0.0);
        }
    }

    @Test
    void reportsWhichParametersAreUsed() {
        Expression e = Expression.parse("a*x + 0*b", List.of("x"), List.of("a", "b", "c"));
        assertTrue(e.dependsOn("a"));
        assertTrue(e.dependsOn("b"));
        assertFalse(e.dependsOn("c"));
    }

    @ParameterizedTest
    @CsvSource(
            delimiter = ';',
            value = {
                "a*(x + ; expression column 7; the end of the expression",
                "a*x) ; expression column 4; ')'",
                "a*q ; expression column 3; unknown name 'q'",
                "sqrt x ; expression column 1; must be followed by '('",
                "a*x $ 2 ; expression column 5; unexpected character '$'",
                "foo(x) ; expression column 1; unknown function 'foo'",
                "a x ; expression column 3; 'x'",
                "(a*x ; expression column 5; to close the '(' at column 1"
            })
    void parseErrorsNameColumnAndToken(String text, String where, String problem) {
        InputException e = assertThrows(InputException.class, () -> Expression.parse(text, List.of("x"), List.of("a")));
        assertEquals(where, e.where());
        assertTrue(e.problem().contains(problem), e.getMessage());
    }

    @Test
    void aNameCannotBeBothColumnAndParameter() {
        InputException e =
                assertThrows(InputException.class, () -> Expression.parse("a*x", List.of("x", "a"), List.of("a")));
        assertTrue(e.getMessage().contains("'a' is both a data column and a parameter"), e.getMessage());
    }

    @Test
    void emptyExpressionIsRejected() {
        InputException e = assertThrows(InputException.class, () -> Expression.parse("  ", List.of("x"), List.of()));
        assertTrue(e.getMessage().contains("is empty"), e.getMessage());
    }
}
