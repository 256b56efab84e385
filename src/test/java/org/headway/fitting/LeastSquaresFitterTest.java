package org.headway.fitting;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;

/** Built-in forms, statistics and error handling of the fitter. */
class LeastSquaresFitterTest {

    /** Exact data are recovered to rounding level. */
    static final double RECOVERED = 1e-10;

    private final LeastSquaresFitter fitter = new LeastSquaresFitter();

    @Test
    void constantFormIsTheMeanWithItsStandardError() {
        // Mean 5, sample SD √(32/7), SE = SD/√8 (definition of the standard error of the mean;
        // common practice, no source). t(0.975, 7) = 2.364624 (Student t table, from memory).
        double[] y = {2, 4, 4, 4, 5, 5, 7, 9};
        FitResult fit = fitter.fit(Observations.of("y", y, List.of()), new FitForm.Constant());
        FittedParameter a = fit.parameters().get(0);
        assertEquals(5.0, a.value(), 1e-15);
        assertEquals(Math.sqrt(32.0 / 7.0) / Math.sqrt(8.0), a.standardError(), 1e-14);
        assertEquals(5.0 - 2.364624 * a.standardError(), a.ci95Low(), 1e-6);
        assertEquals(7, fit.degreesOfFreedom());
        assertEquals(0.0, fit.rSquared(), 1e-15);
    }

    @Test
    void weightedConstantIsTheWeightedMean() {
        double[] y = {1.0, 2.0, 4.0};
        double[] w = {1.0, 2.0, 5.0};
        FitResult fit = fitter.fit(new Observations("y", y, List.of(), new double[0][], w), new FitForm.Constant());
        assertEquals((1.0 + 4.0 + 20.0) / 8.0, fit.parameters().get(0).value(), 1e-15);
    }

    @Test
    void linearFitOfExactLineHasZeroResidualsAndUnitRSquared() {
        double[] x = {1, 2, 3, 4, 5};
        double[] y = {3.5, 5.5, 7.5, 9.5, 11.5};
        FitResult fit = fitter.fit(Observations.of("y", y, List.of("x"), x), new FitForm.Linear());
        assertEquals(1.5, fit.parameter("a").value(), RECOVERED);
        assertEquals(2.0, fit.parameter("b").value(), RECOVERED);
        assertEquals(1.0, fit.rSquared(), RECOVERED);
        assertEquals("a + b*x", fit.modelExpression());
    }

    @Test
    void nonlinearFormsRecoverExactParameters() {
        double[] x = new double[20];
        double[] power = new double[20];
        double[] exponential = new double[20];
        double[] logarithmic = new double[20];
        double[] cubic = new double[20];
        for (int i = 0; i < 20; i++) {
            x[i] = 0.5 + i * 0.37;
            power[i] = 3.0 * Math.pow(x[i], 0.55);
            exponential[i] = 2.0 * Math.exp(-0.31 * x[i]);
            logarithmic[i] = 1.0 - 0.4 * Math.log(x[i]);
            cubic[i] = 1 - 2 * x[i] + 0.5 * x[i] * x[i] - 0.01 * x[i] * x[i] * x[i];
        }
        FitResult p = fitter.fit(Observations.of("y", power, List.of("x"), x), new FitForm.Power(false));
        assertEquals(3.0, p.parameter("a").value(), RECOVERED);
        assertEquals(0.55, p.parameter("b").value(), RECOVERED);
        FitResult e = fitter.fit(Observations.of("y", exponential, List.of("x"), x), new FitForm.Exponential());
        assertEquals(2.0, e.parameter("a").value(), RECOVERED);
        assertEquals(-0.31, e.parameter("b").value(), RECOVERED);
        FitResult l = fitter.fit(Observations.of("y", logarithmic, List.of("x"), x), new FitForm.Logarithmic());
        assertEquals(-0.4, l.parameter("b").value(), RECOVERED);
        FitResult c = fitter.fit(Observations.of("y", cubic, List.of("x"), x), new FitForm.Polynomial(3));
        assertEquals(-0.01, c.parameter("c3").value(), RECOVERED);
        assertEquals("c0 + c1*x + c2*x^2 + c3*x^3", c.modelExpression());
    }

    @Test
    void powerProductRecoversExponentsOfTwoGroups() {
        // Form of the Dittus–Boelter equation Nu = 0.023 Re^0.8 Pr^0.4 (Dittus and Boelter 1930,
        // from memory), evaluated exactly on a grid.
        int n = 30;
        double[] re = new double[n];
        double[] pr = new double[n];
        double[] nu = new double[n];
        for (int i = 0; i < n; i++) {
            re[i] = 1e4 * Math.pow(10, (i % 10) / 5.0);
            pr[i] = 0.7 + 2.3 * (i / 10);
            nu[i] = 0.023 * Math.pow(re[i], 0.8) * Math.pow(pr[i], 0.4);
        }
        FitResult fit = fitter.fit(Observations.of("Nu", nu, List.of("Re", "Pr"), re, pr), new FitForm.PowerProduct());
        assertEquals(0.023, fit.parameter("C").value(), 1e-12);
        assertEquals(0.8, fit.parameter("n_Re").value(), RECOVERED);
        assertEquals(0.4, fit.parameter("n_Pr").value(), RECOVERED);
        assertEquals("C*Re^n_Re*Pr^n_Pr", fit.modelExpression());
    }

    @Test
    void powerInLogSpaceStatesTheRetransformationBias() {
        Random random = new Random(7);
        int n = 40;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 1 + i;
            y[i] = 2.0 * Math.pow(x[i], 0.7) * Math.exp(0.1 * random.nextGaussian());
        }
        Observations data = Observations.of("y", y, List.of("x"), x);
        FitResult log = fitter.fit(data, new FitForm.Power(true));
        FitResult direct = fitter.fit(data, new FitForm.Power(false));
        assertTrue(log.cautions().stream().anyMatch(c -> c.code().equals("log-space-retransformation")));
        assertFalse(direct.cautions().stream().anyMatch(c -> c.code().equals("log-space-retransformation")));
        // The nonlinear fit minimises RSS in y, so no other estimate can have a smaller RSS.
        assertTrue(direct.residualSumOfSquares() <= log.residualSumOfSquares());
        FittedParameter a = log.parameter("a");
        assertTrue(a.ci95Low() < a.value() && a.value() < a.ci95High());
    }

    @Test
    void confidenceIntervalUsesStudentT() {
        // t(0.975, 10) = 2.228139 (Student t table, from memory).
        Random random = new Random(3);
        double[] x = new double[12];
        double[] y = new double[12];
        for (int i = 0; i < 12; i++) {
            x[i] = i;
            y[i] = 1 + 0.5 * i + random.nextGaussian();
        }
        FitResult fit = fitter.fit(Observations.of("y", y, List.of("x"), x), new FitForm.Linear());
        FittedParameter b = fit.parameter("b");
        assertEquals(10, fit.degreesOfFreedom());
        assertEquals(2.228139, (b.ci95High() - b.value()) / b.standardError(), 1e-6);
    }

    @Test
    void userExpressionWithWeightsMatchesScaledProblem() {
        // Weighting every point by the same factor leaves the estimates unchanged.
        double[] x = {0.5, 1, 1.5, 2, 3, 4, 6};
        double[] y = {2.9, 2.3, 1.9, 1.6, 1.3, 1.15, 1.05};
        Map<String, Double> start = new LinkedHashMap<>();
        start.put("a", 1.0);
        start.put("k", 1.0);
        start.put("c", 1.0);
        FitForm form = new FitForm.UserExpression("a*exp(-k*x) + c", start);
        FitResult plain = fitter.fit(Observations.of("y", y, List.of("x"), x), form);
        double[] w = {4, 4, 4, 4, 4, 4, 4};
        FitResult weighted = fitter.fit(new Observations("y", y, List.of("x"), new double[][] {x}, w), form);
        for (String p : List.of("a", "k", "c")) {
            assertEquals(plain.parameter(p).value(), weighted.parameter(p).value(), 1e-9);
            assertEquals(
                    plain.parameter(p).standardError(), weighted.parameter(p).standardError(), 1e-9);
        }
        assertTrue(plain.converged());
    }

    @Test
    void budgetExhaustedIsReportedNotHidden() {
        NistDataset set = NistDataset.load("nonlinear", "MGH09");
        Map<String, Double> start = new LinkedHashMap<>();
        for (int k = 0; k < 4; k++) {
            start.put("b" + (k + 1), set.starts().get(0)[k]);
        }
        FitResult fit = fitter.withMaxIterations(3)
                .fit(
                        Observations.of("y", set.y(), List.of("x"), set.x()[0]),
                        new FitForm.UserExpression(set.model(), start));
        assertFalse(fit.converged());
        assertTrue(fit.cautions().stream().anyMatch(c -> c.code().equals("fit-not-converged")));
    }

    @Test
    void compareRanksTheGeneratingFormFirstAndListsUnsuitableForms() {
        Random random = new Random(11);
        int n = 50;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = -1 + 0.1 * i;
            y[i] = 2 * Math.exp(0.8 * x[i]) + 0.02 * random.nextGaussian();
        }
        FitComparison c = fitter.compare(
                Observations.of("y", y, List.of("x"), x),
                List.of(
                        new FitForm.Linear(),
                        new FitForm.Exponential(),
                        new FitForm.Logarithmic(),
                        new FitForm.Constant()));
        assertEquals("exponential", c.ranked().get(0).formId());
        assertTrue(c.skipped().containsKey("log"), c.skipped().toString());
        for (int i = 1; i < c.ranked().size(); i++) {
            assertTrue(c.ranked().get(i - 1).informationCriterion()
                    <= c.ranked().get(i).informationCriterion());
        }
    }

    @Test
    void badDataAreRejectedNamingColumnAndPoint() {
        double[] x = {1, 2, 0, 4};
        double[] y = {1, 2, 3, 4};
        InputException e = assertThrows(
                InputException.class,
                () -> fitter.fit(Observations.of("y", y, List.of("Re"), x), new FitForm.Power(false)));
        assertEquals("Re, point 3", e.where());
        InputException nan = assertThrows(
                InputException.class, () -> Observations.of("y", new double[] {1, Double.NaN}, List.of("x"), x));
        assertTrue(nan.getMessage().contains("y, point 2"), nan.getMessage());
        InputException few = assertThrows(
                InputException.class,
                () -> fitter.fit(
                        Observations.of("y", new double[] {1, 2}, List.of("x"), new double[] {1, 2}),
                        new FitForm.Polynomial(2)));
        assertTrue(few.getMessage().contains("needs more points than parameters"), few.getMessage());
        InputException collinear = assertThrows(
                InputException.class,
                () -> fitter.fit(
                        Observations.of(
                                "y", y, List.of("u", "v"), new double[] {1, 2, 3, 5}, new double[] {2, 4, 6, 10}),
                        new FitForm.Linear()));
        assertTrue(collinear.getMessage().contains("cannot be determined separately"), collinear.getMessage());
        InputException undefined = assertThrows(
                InputException.class,
                () -> fitter.fit(
                        Observations.of("y", y, List.of("x"), new double[] {1, 2, 3, 4}),
                        new FitForm.UserExpression("a*log(x - b)", Map.of("a", 1.0, "b", 2.0))));
        assertTrue(undefined.getMessage().contains("point 1"), undefined.getMessage());
    }

    @Test
    void largeDataSetFitsWithUserExpression() {
        // 20,000 points of a·exp(−b x) + c with Gaussian noise σ = 0.01: estimates within a few
        // standard errors of the generating values (that is what the standard error states).
        Random random = new Random(42);
        int n = 20_000;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 5.0 * i / n;
            y[i] = 2.0 * Math.exp(-1.3 * x[i]) + 0.5 + 0.01 * random.nextGaussian();
        }
        Map<String, Double> start = new LinkedHashMap<>();
        start.put("a", 1.0);
        start.put("b", 1.0);
        start.put("c", 0.0);
        FitResult fit = fitter.fit(
                Observations.of("y", y, List.of("x"), x), new FitForm.UserExpression("a*exp(-b*x) + c", start));
        assertTrue(fit.converged());
        assertEquals(2.0, fit.parameter("a").value(), 5 * fit.parameter("a").standardError());
        assertEquals(1.3, fit.parameter("b").value(), 5 * fit.parameter("b").standardError());
        assertEquals(0.5, fit.parameter("c").value(), 5 * fit.parameter("c").standardError());
        assertEquals(0.01, fit.residualStandardDeviation(), 0.0005);
    }

    @Test
    void columnNamesMustBeUsableInAModel() {
        InputException e = assertThrows(
                InputException.class,
                () -> Observations.of("f", new double[] {1, 2}, List.of("eps/D"), new double[] {0.1, 0.2}));
        assertEquals("eps/D", e.where());
        assertTrue(e.problem().contains("rename the column"), e.getMessage());
        // Greek letters are letters: ε and ρ are valid names.
        assertEquals(
                List.of("ε"),
                Observations.of("f", new double[] {1, 2}, List.of("ε"), new double[] {1, 2})
                        .variableNames());
    }
}
