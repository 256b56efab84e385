package org.headway.friction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.SplittableRandom;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The physical checks every friction correlation must pass. A subclass names the correlation, the
 * range it is checked over and its accuracy band against the Colebrook–White equation.
 */
abstract class FrictionCorrelationContract {

    /** The correlation under test. */
    abstract FrictionCorrelation correlation();

    /** Lowest Re of the range the band and the shape checks cover. */
    abstract double minReynolds();

    /** Highest Re of that range. */
    abstract double maxReynolds();

    /** Highest ε/D of that range (0 for smooth-pipe laws). */
    abstract double maxRelativeRoughness();

    /** Lowest positive ε/D of that range; 0 points are checked in addition. */
    double minPositiveRelativeRoughness() {
        return 1e-6;
    }

    /** Whether the range includes smooth pipes (ε/D = 0). */
    boolean includesSmooth() {
        return true;
    }

    /** Whether f depends on ε/D at all. */
    boolean dependsOnRoughness() {
        return true;
    }

    /** Whether f falls with Re at ε/D = 0 over the range (every law does, in laminar or smooth turbulent flow). */
    boolean fallsWithReynolds() {
        return true;
    }

    /** Largest relative difference from the reference over the range, with its source in the subclass. */
    abstract double band();

    /** The reference the band is measured against: by default the Colebrook–White equation. */
    double reference(double reynolds, double relativeRoughness) {
        return ColebrookReference.frictionFactor(reynolds, relativeRoughness);
    }

    private double[] reynoldsGrid(int n) {
        double[] grid = new double[n];
        double lo = Math.log10(minReynolds());
        double hi = Math.log10(maxReynolds());
        for (int i = 0; i < n; i++) {
            grid[i] = Math.min(maxReynolds(), Math.pow(10, lo + (hi - lo) * i / (n - 1)));
        }
        return grid;
    }

    private double[] roughnessGrid(int n) {
        if (maxRelativeRoughness() == 0) {
            return new double[] {0.0};
        }
        if (!includesSmooth()) {
            double[] full = roughnessGridWithSmooth(n);
            return java.util.Arrays.copyOfRange(full, 1, full.length);
        }
        return roughnessGridWithSmooth(n);
    }

    private double[] roughnessGridWithSmooth(int n) {
        double[] grid = new double[n + 1];
        double lo = Math.log10(minPositiveRelativeRoughness());
        double hi = Math.log10(maxRelativeRoughness());
        for (int i = 0; i < n; i++) {
            grid[i + 1] = Math.min(maxRelativeRoughness(), Math.pow(10, lo + (hi - lo) * i / (n - 1)));
        }
        return grid;
    }

    @Test
    void positiveAndFiniteOverItsRange() {
        // A friction factor is a positive finite ratio by definition (Darcy–Weisbach).
        for (double re : reynoldsGrid(60)) {
            for (double rr : roughnessGrid(20)) {
                double f = correlation().frictionFactor(re, rr);
                assertTrue(f > 0 && Double.isFinite(f), () -> "f = " + f + " at Re " + re + ", ε/D " + rr);
            }
        }
    }

    @Test
    void fallsWithReynoldsAtItsSmoothestRoughness() {
        // Moody (1944) chart: at fixed ε/D, f falls monotonically with Re in laminar and turbulent flow (from memory).
        if (!fallsWithReynolds()) {
            return;
        }
        double smoothest = roughnessGrid(20)[0];
        double previous = Double.POSITIVE_INFINITY;
        for (double re : reynoldsGrid(200)) {
            double f = correlation().frictionFactor(re, smoothest);
            assertTrue(f < previous, "f must fall with Re at ε/D = " + smoothest + ", Re = " + re);
            previous = f;
        }
    }

    /**
     * Far below its range too, a pipe's head loss h ∝ f V² ∝ f Re² must rise with its flow, or a network
     * with a nearly still pipe has no unique solution and the solver cannot converge (the Darcy–Weisbach
     * loss rises with flow for any physical friction law; common practice, no source). Checked from
     * Re 1 (Colebrook–White is refused below it) to the bottom of the range at the smoothest, a middle and the roughest ε/D.
     */
    @Test
    void headLossRisesWithFlowFarBelowItsRange() {
        double[] roughness = {roughnessGrid(20)[0], 1e-4, maxRelativeRoughness()};
        for (double rr : roughness) {
            double previous = 0;
            for (int i = 0; i <= 400; i++) {
                double re = Math.pow(Math.max(minReynolds(), 10), i / 400.0);
                double loss = correlation().frictionFactor(re, rr) * re * re;
                assertTrue(loss > previous, correlation().id() + ": f·Re² must rise at ε/D = " + rr + ", Re = " + re);
                previous = loss;
            }
        }
    }

    @Test
    void risesWithRoughnessOrIgnoresIt() {
        // Moody (1944) chart: at fixed Re, f rises with ε/D (from memory). Smooth-pipe and laminar laws
        // do not take ε/D and must return the same value.
        for (double re : reynoldsGrid(30)) {
            double previous = -1;
            double smooth = correlation().frictionFactor(re, roughnessGrid(40)[0]);
            for (double rr : roughnessGrid(40)) {
                double f = correlation().frictionFactor(re, rr);
                if (dependsOnRoughness()) {
                    assertTrue(f >= previous, "f must not fall with ε/D at Re " + re + ", ε/D " + rr);
                } else {
                    assertEquals(smooth, f, 0.0, "f must not depend on ε/D");
                }
                previous = f;
            }
        }
    }

    @Test
    void withinItsBandOfTheReference() {
        double worst = 0;
        for (double re : reynoldsGrid(80)) {
            for (double rr : roughnessGrid(30)) {
                double error = Math.abs(correlation().frictionFactor(re, rr) / reference(re, rr) - 1);
                worst = Math.max(worst, error);
            }
        }
        assertTrue(worst <= band(), "largest relative difference " + worst + " exceeds the band " + band());
    }

    @Test
    void evaluateAgreesWithTheHotPathAndNamesItself() {
        FrictionCorrelation c = correlation();
        double re = Math.sqrt(minReynolds() * maxReynolds());
        double rr = maxRelativeRoughness() / 10;
        FrictionResult result = c.evaluate(re, rr);
        // Same value to 1e-14 relative: an iterative method may reach it by a different route.
        assertEquals(c.frictionFactor(re, rr), result.frictionFactor(), 1e-14 * result.frictionFactor());
        assertEquals(re, result.reynolds());
        assertEquals(rr, result.relativeRoughness());
        assertEquals(FlowRegimes.of(re), result.regime());
        assertFalse(c.citation().isBlank());
        assertFalse(c.equation().isBlank());
        assertFalse(c.validity().basis().isBlank());
    }

    @Test
    void cautionsOutsideItsValidityRange() {
        FrictionCorrelation c = correlation();
        ValidityRange range = c.validity();
        double re = range.maxReynolds() * 10;
        FrictionResult result = c.evaluate(re, 0.0);
        assertTrue(
                result.cautions().stream()
                        .anyMatch(k -> k.code().equals("outside-validity-range")
                                && k.message().contains("Re = " + FrictionChecks.format(re))),
                () -> "expected an outside-validity-range caution, got " + result.cautions());
    }

    @Test
    void cautionsBeyondTheChartRoughness() {
        FrictionResult result = correlation().evaluate(1e5, 0.08);
        assertTrue(
                result.cautions().stream()
                        .anyMatch(k -> k.code().equals("roughness-beyond-chart")
                                && k.message().contains("0.08")),
                () -> "got " + result.cautions());
    }

    @ParameterizedTest(name = "Re={0}, ε/D={1}")
    @CsvSource({
        "0, 0.001, 'reynolds: must be greater than zero, got 0.0'",
        "-3, 0.001, 'reynolds: must be greater than zero, got -3.0'",
        "NaN, 0.001, 'reynolds: must be a finite number, got NaN'",
        "Infinity, 0.001, 'reynolds: must be a finite number, got Infinity'",
        "1e5, -0.001, 'relative roughness: must not be negative, got -0.001'",
        "1e5, NaN, 'relative roughness: must be a finite number, got NaN'",
        "1e5, 1.0, 'relative roughness: must be less than 1 (ε/D ≥ 1 means the roughness fills the bore), got 1.0'",
    })
    void rejectsBadInputNamingTheField(double reynolds, double relativeRoughness, String message) {
        InputException e =
                assertThrows(InputException.class, () -> correlation().evaluate(reynolds, relativeRoughness));
        assertEquals(message, e.getMessage());
        InputException hot =
                assertThrows(InputException.class, () -> correlation().frictionFactor(reynolds, relativeRoughness));
        assertEquals(message, hot.getMessage());
    }

    @Test
    @Timeout(60) // guards against a hang only; not a performance check
    void randomSweepAcrossAndBeyondTheDomainNeverLeaksNaN() {
        SplittableRandom random = new SplittableRandom(20261201L);
        int values = 0;
        for (int i = 0; i < 100_000; i++) {
            double re = randomReynolds(random);
            double rr = randomRoughness(random);
            try {
                FrictionResult result = correlation().evaluate(re, rr);
                double f = result.frictionFactor();
                if (!(f > 0 && Double.isFinite(f))) {
                    fail("f = " + f + " at Re " + re + ", ε/D " + rr);
                }
                values++;
            } catch (InputException expected) {
                assertFalse(expected.getMessage().isBlank());
            }
        }
        assertTrue(values > 50_000, "most sweep points are valid input, got " + values);
    }

    private static double randomReynolds(SplittableRandom random) {
        double pick = random.nextDouble();
        if (pick < 0.01) {
            double[] special = {0.0, -1.0, Double.NaN, Double.POSITIVE_INFINITY, Double.MIN_VALUE, Double.MAX_VALUE};
            return special[random.nextInt(special.length)];
        }
        if (pick < 0.2) {
            return Math.pow(10, random.nextDouble(-320, 308)); // far beyond any physical range
        }
        return Math.pow(10, random.nextDouble(Math.log10(2000), 10)); // the engineering domain and beyond
    }

    private static double randomRoughness(SplittableRandom random) {
        double pick = random.nextDouble();
        if (pick < 0.01) {
            double[] special = {-1e-3, Double.NaN, 1.0, 2.0, Double.POSITIVE_INFINITY, Math.nextDown(1.0)};
            return special[random.nextInt(special.length)];
        }
        if (pick < 0.15) {
            return 0.0;
        }
        if (pick < 0.3) {
            return random.nextDouble(0.1, 1.0); // beyond the chart, up to just below 1
        }
        return Math.pow(10, random.nextDouble(-8, -1));
    }
}
