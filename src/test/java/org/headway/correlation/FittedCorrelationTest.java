package org.headway.correlation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.headway.caution.InputException;
import org.headway.fitting.FitForm;
import org.headway.fitting.FitResult;
import org.headway.fitting.FittedParameter;
import org.headway.fitting.LeastSquaresFitter;
import org.headway.fitting.Observations;
import org.headway.fitting.VariableRange;
import org.headway.friction.FlowRegime;
import org.headway.friction.FrictionResult;
import org.junit.jupiter.api.Test;

/** Fitted correlations as values, as a friction method and as a loss coefficient. */
class FittedCorrelationTest {

    /** Blasius (1913), smooth pipes: f = 0.3164 Re^−0.25 for 4000 ≤ Re ≤ 10⁵ (from memory). */
    private static FittedCorrelation blasiusFit() {
        int n = 25;
        double[] re = new double[n];
        double[] f = new double[n];
        for (int i = 0; i < n; i++) {
            re[i] = 4000 * Math.pow(25.0, i / (n - 1.0));
            f[i] = 0.3164 * Math.pow(re[i], -0.25);
        }
        FitResult fit =
                new LeastSquaresFitter().fit(Observations.of("f", f, List.of("Re"), re), new FitForm.Power(false));
        return FittedCorrelation.of(fit);
    }

    @Test
    void evaluatesTheFittedFormAndKeepsTheFitRange() {
        FittedCorrelation c = blasiusFit();
        assertEquals(0.3164 * Math.pow(2e4, -0.25), c.evaluate(2e4), 1e-12);
        assertEquals(4000, c.variableRanges().get(0).min(), 1e-9);
        assertEquals(1e5, c.variableRanges().get(0).max(), 1e-6);
        assertEquals("fitted by the user to their data", c.citation());
        assertTrue(c.rangeCautions(5e4).isEmpty());
        assertEquals(
                "fitted-correlation-extrapolated", c.rangeCautions(2e5).get(0).code());
        assertTrue(
                c.rangeCautions(2e5).get(0).message().contains("Re = 200000"),
                c.rangeCautions(2e5).toString());
    }

    @Test
    void rangeFiguresCarrySixSignificantDigitsWithoutTrailingZeros() {
        // Six significant digits as %.6g rounds them (java.util.Formatter), trailing zeros dropped so
        // that a range reads 4000 to 90000, not 4000.00 to 90000.0 (common practice, no source).
        assertEquals("4000", org.headway.caution.Figures.significant(4000));
        assertEquals("90000", org.headway.caution.Figures.significant(90_000));
        assertEquals("90760.8", org.headway.caution.Figures.significant(90_760.8));
        assertEquals("1.2e+06", org.headway.caution.Figures.significant(1.2e6));
        assertEquals("0.00015", org.headway.caution.Figures.significant(1.5e-4));
        assertEquals("1.23457e-05", org.headway.caution.Figures.significant(1.234567e-5));
        assertEquals("-2.5", org.headway.caution.Figures.significant(-2.5));
        assertEquals("0", org.headway.caution.Figures.significant(0));
    }

    @Test
    void actsAsAFrictionCorrelationWithExtrapolationCaution() {
        FittedFrictionCorrelation friction = new FittedFrictionCorrelation("rig-fit", blasiusFit());
        FrictionResult inside = friction.evaluate(3e4, 0.0);
        assertEquals(0.3164 * Math.pow(3e4, -0.25), inside.frictionFactor(), 1e-12);
        assertEquals(FlowRegime.TURBULENT, inside.regime());
        assertTrue(inside.cautions().isEmpty());
        FrictionResult outside = friction.evaluate(1e6, 0.0);
        assertEquals(1, outside.cautions().size());
        assertTrue(friction.validity().contains(5e4, 0.0));
        FrictionResult rough = friction.evaluate(3e4, 1e-3);
        assertTrue(rough.cautions().stream().anyMatch(c -> c.code().equals("fitted-correlation-ignores-roughness")));
    }

    @Test
    void unusableFrictionFactorIsRejectedWithExplanation() {
        // A straight line through falling f crosses zero when extrapolated far enough.
        double[] re = {4000, 8000, 16000, 32000};
        double[] f = {0.040, 0.034, 0.028, 0.023};
        FittedCorrelation line = FittedCorrelation.of(
                new LeastSquaresFitter().fit(Observations.of("f", f, List.of("Re"), re), new FitForm.Linear()));
        FittedFrictionCorrelation friction = new FittedFrictionCorrelation("line", line);
        InputException e = assertThrows(InputException.class, () -> friction.evaluate(1e6, 0.0));
        assertTrue(e.getMessage().contains("unusable friction factor"), e.getMessage());
        assertTrue(e.getMessage().contains("Re = 1.00000e+06"), e.getMessage());
        assertThrows(InputException.class, () -> friction.evaluate(-5, 0.0));
    }

    @Test
    void frictionWrapperNeedsReynoldsInputs() {
        FittedCorrelation threeInputs = new FittedCorrelation(
                "f",
                "test",
                "a*x + y + z",
                List.of("x", "y", "z"),
                List.of(new FittedParameter("a", 1, 0, 1, 1)),
                List.of(new VariableRange("x", 0, 1), new VariableRange("y", 0, 1), new VariableRange("z", 0, 1)),
                new FitStatistics(0, 0, 1, 1, 1, 2));
        InputException e = assertThrows(InputException.class, () -> new FittedFrictionCorrelation("x", threeInputs));
        assertTrue(e.getMessage().contains("Reynolds number"), e.getMessage());
    }

    @Test
    void lossCoefficientAgainstReynolds() {
        // K = K∞ + K₁/Re, the shape of the first term of the 2-K method (Hooper 1981, from memory).
        double[] re = {1e3, 3e3, 1e4, 3e4, 1e5};
        double[] k = new double[re.length];
        double[] inverse = new double[re.length];
        for (int i = 0; i < re.length; i++) {
            k[i] = 0.4 + 800 / re[i];
            inverse[i] = 1 / re[i];
        }
        FitResult fit = new LeastSquaresFitter()
                .fit(
                        Observations.of("K", k, List.of("Re"), re),
                        new FitForm.UserExpression("kinf + k1/Re", java.util.Map.of("kinf", 1.0, "k1", 1.0)));
        FittedLossCoefficient loss = new FittedLossCoefficient("strainer", FittedCorrelation.of(fit));
        var estimate = loss.evaluate(2e4);
        assertEquals(0.4 + 800 / 2e4, estimate.lossCoefficient(), 1e-10);
        assertTrue(estimate.cautions().isEmpty());
        assertEquals(1, loss.evaluate(10).cautions().size());
    }

    @Test
    void twoInputFrictionFitUsesRoughness() {
        // Haaland (1983) explicit form 1/√f = −1.8 log10((ε/D/3.7)^1.11 + 6.9/Re) (from memory),
        // sampled exactly and refitted with its two coefficients free.
        int n = 40;
        double[] re = new double[n];
        double[] rr = new double[n];
        double[] f = new double[n];
        for (int i = 0; i < n; i++) {
            re[i] = 1e4 * Math.pow(10, (i % 8) / 2.0);
            rr[i] = 1e-5 * Math.pow(10, i / 8 * 0.75);
            double s = -1.8 * Math.log10(Math.pow(rr[i] / 3.7, 1.11) + 6.9 / re[i]);
            f[i] = 1 / (s * s);
        }
        FitResult fit = new LeastSquaresFitter()
                .fit(
                        Observations.of("f", f, List.of("Re", "rr"), re, rr),
                        new FitForm.UserExpression(
                                "(k*log10((rr/3.7)^1.11 + c/Re))^(-2)", java.util.Map.of("k", -2.0, "c", 5.0)));
        assertEquals(-1.8, fit.parameter("k").value(), 1e-9);
        assertEquals(6.9, fit.parameter("c").value(), 1e-7);
        FittedFrictionCorrelation friction = new FittedFrictionCorrelation("rig", FittedCorrelation.of(fit));
        FrictionResult r = friction.evaluate(1e5, 1e-4);
        double s = -1.8 * Math.log10(Math.pow(1e-4 / 3.7, 1.11) + 6.9 / 1e5);
        assertEquals(1 / (s * s), r.frictionFactor(), 1e-10);
        assertTrue(r.cautions().isEmpty(), r.cautions().toString());
        assertEquals(1, friction.evaluate(1e5, 0.5).cautions().size(), "ε/D outside the fitted range");
    }
}
