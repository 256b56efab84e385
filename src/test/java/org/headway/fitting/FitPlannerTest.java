package org.headway.fitting;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every kind of {@link FitForm} gets a plan, and each plan agrees with the form's equation. The
 * compiler already refuses a form without a visitor method; this test also fails when a form is
 * added without a case here.
 */
class FitPlannerTest {

    /** A plan's text evaluated against its design matrix or its start: rounding only. */
    static final double ROUNDING = 1e-12;

    private static final double[] X = {1, 2, 3, 4, 5, 6, 7, 8};

    /**
     * One form with data it suits.
     *
     * @param parameters how many parameters the form's equation has for one column
     * @param linear whether the form is linear in its parameters (solved by QR)
     */
    record Case(FitForm form, Observations data, int parameters, boolean linear) {
        @Override
        public String toString() {
            return form.id();
        }
    }

    /**
     * The equations are those of the {@link FitForm} class comment; the parameter counts follow
     * from them and which forms are linear in their parameters is textbook regression (common
     * practice, no source). Power and exponential data are exact, y = 2·x^0.7 and y = 1.5·exp(0.3x).
     */
    static Stream<Case> cases() {
        double[] power = Arrays.stream(X).map(x -> 2.0 * Math.pow(x, 0.7)).toArray();
        double[] exponential =
                Arrays.stream(X).map(x -> 1.5 * Math.exp(0.3 * x)).toArray();
        Observations powerData = Observations.of("y", power, List.of("x"), X);
        Observations exponentialData = Observations.of("y", exponential, List.of("x"), X);
        Map<String, Double> start = new LinkedHashMap<>();
        start.put("k", 1.0);
        start.put("m", 0.5);
        return Stream.of(
                new Case(new FitForm.Constant(), powerData, 1, true), // y = a
                new Case(new FitForm.Linear(), powerData, 2, true), // y = a + b·x
                new Case(new FitForm.ThroughOrigin(), powerData, 1, true), // y = b·x
                new Case(new FitForm.Logarithmic(), powerData, 2, true), // y = a + b·ln x
                new Case(new FitForm.Polynomial(3), powerData, 4, true), // y = c0 + … + c3·x³
                new Case(new FitForm.Power(false), powerData, 2, false), // y = a·x^b
                new Case(new FitForm.PowerProduct(), powerData, 2, false), // y = C·x^n
                new Case(new FitForm.Exponential(), exponentialData, 2, false), // y = a·exp(b·x)
                new Case(new FitForm.UserExpression("k*x^m", start), powerData, 2, false));
    }

    @Test
    void everyKindOfFormHasACase() {
        Set<Class<?>> kinds = Set.of(FitForm.class.getPermittedSubclasses());
        Set<Class<?>> covered = cases().map(c -> c.form().getClass()).collect(Collectors.toSet());
        assertEquals(kinds, covered, "add a case (and a plan) for every form");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void everyFormGetsAPlanThatAgreesWithItsEquation(Case c) {
        FitPlan plan = FitPlanner.plan(c.data(), c.form());
        assertNotNull(plan, c.form().id());
        assertEquals(
                c.parameters(),
                plan.parameterNames().size(),
                "parameters of " + c.form().id());
        Expression model = Expression.parse(plan.expression(), c.data().variableNames(), plan.parameterNames());
        for (String name : plan.parameterNames()) {
            assertTrue(model.dependsOn(name), plan.expression() + " depends on " + name);
        }
        double[] y = c.data().response();
        double[] values = new double[y.length];
        if (c.linear()) {
            // The text and the design matrix are the same model: Σ θₖ·design[k] at any θ.
            assertNull(plan.start(), "a linear form needs no start");
            assertEquals(c.parameters(), plan.design().length);
            double[] theta = new double[c.parameters()];
            for (int k = 0; k < theta.length; k++) {
                theta[k] = 0.5 + 0.75 * k;
            }
            model.evaluateColumns(c.data().columns(), theta, values, false);
            for (int i = 0; i < y.length; i++) {
                double expected = 0.0;
                for (int k = 0; k < theta.length; k++) {
                    expected += theta[k] * plan.design()[k][i];
                }
                assertEquals(
                        expected,
                        values[i],
                        ROUNDING * Math.abs(expected),
                        c.form().id() + " at point " + i);
            }
        } else if (c.form() instanceof FitForm.UserExpression user) {
            assertNull(plan.design());
            double[] given = user.start().values().stream()
                    .mapToDouble(Double::doubleValue)
                    .toArray();
            assertArrayEquals(given, plan.start(), 0.0, "the user's starting values, in order");
        } else {
            // ln y = ln a + b·ln x (or + b·x) is exact for exact data, so the log-linearised start
            // reproduces the data to rounding (identity of the logarithm; common practice, no source).
            assertNull(plan.design());
            model.evaluateColumns(c.data().columns(), plan.start(), values, false);
            for (int i = 0; i < y.length; i++) {
                assertEquals(
                        y[i], values[i], ROUNDING * Math.abs(y[i]), c.form().id() + " start at point " + i);
            }
        }
    }
}
