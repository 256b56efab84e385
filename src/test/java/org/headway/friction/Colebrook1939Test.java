package org.headway.friction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.ValueSource;

/** Reference points and limits of the Colebrook–White solve. */
class Colebrook1939Test {

    /**
     * The solver's stated accuracy. The reference values carry 17 significant digits from a 60-digit
     * computation (SOURCE.md), so they resolve differences far below this.
     */
    private static final double SPOT_TOLERANCE = 1e-14;

    private final Colebrook1939 solver = Colebrook1939.solver();

    // Source: colebrook-spot-values.csv, mpmath 1.3 at 60 digits (see SOURCE.md beside it).
    @ParameterizedTest(name = "Re={0}, ε/D={1}")
    @CsvFileSource(resources = "colebrook-spot-values.csv", numLinesToSkip = 5)
    void matchesSixtyDigitReferenceValues(double reynolds, double relativeRoughness, double expected) {
        double hot = solver.frictionFactor(reynolds, relativeRoughness);
        assertEquals(expected, hot, SPOT_TOLERANCE * expected);
        FrictionResult result = solver.evaluate(reynolds, relativeRoughness);
        assertEquals(expected, result.frictionFactor(), SPOT_TOLERANCE * expected);
        assertTrue(result.iterations() >= 1 && result.iterations() <= 5, "iterations " + result.iterations());
    }

    @ParameterizedTest(name = "Re={0}")
    @ValueSource(doubles = {1e6, 1e7, 1e8, 1e9, 1e10})
    void smoothLimitSitsJustAbovePrandtlKarman(double reynolds) {
        // Prandtl's smooth-pipe law 1/√f = 2 log₁₀(Re √f) − 0.8 (Prandtl 1935, fitted to Nikuradse's
        // data; from memory). Colebrook–White at ε/D = 0 is the same law with the constant 2 log₁₀ 2.51 =
        // 0.79934 instead of 0.8, so with h(x) = x − 2 log₁₀(Re/x), h' = 1 + (2/ln 10)/x, the two roots
        // differ by δ/h'(ξ), δ = 0.8 − 2 log₁₀ 2.51, ξ between them. That pins the gap on both sides.
        double colebrook = 1 / Math.sqrt(solver.frictionFactor(reynolds, 0.0));
        double prandtl = 8.0;
        for (int i = 0; i < 200; i++) {
            prandtl = 2 * Math.log10(reynolds / prandtl) - 0.8;
        }
        double delta = 0.8 - 2 * Math.log10(2.51);
        double c = 2 / Math.log(10);
        double gap = colebrook - prandtl;
        assertTrue(gap > delta / (1 + c / prandtl) - 1e-12, "gap " + gap);
        assertTrue(gap < delta / (1 + c / colebrook) + 1e-12, "gap " + gap);
    }

    @ParameterizedTest(name = "ε/D={0}")
    @ValueSource(doubles = {1e-4, 1e-3, 1e-2, 5e-2})
    void fullyRoughLimitIsVonKarman(double relativeRoughness) {
        // Fully rough law 1/√f = −2 log₁₀(ε/(3.7 D)) (von Kármán's rough-pipe law as written by
        // Colebrook 1939; from memory). At Re = 1e14 the viscous term 2.51 x/Re is a relative
        // t = 2.51 x·3.7/(Re ε/D) of the rough term, so the roots differ by at most (2/ln 10)·t.
        double reynolds = 1e14;
        double rough = -2 * Math.log10(relativeRoughness / 3.7);
        double colebrook = 1 / Math.sqrt(solver.frictionFactor(reynolds, relativeRoughness));
        double t = 2.51 * rough * 3.7 / (reynolds * relativeRoughness);
        assertTrue(colebrook <= rough, "the viscous term can only lower 1/√f");
        assertEquals(rough, colebrook, 2 / Math.log(10) * t + 4 * Math.ulp(rough));
    }

    @Test
    void reportsIterationsAndResidual() {
        ColebrookSolution solution = solver.solve(1e5, 1e-4);
        assertTrue(solution.iterations() >= 1 && solution.iterations() <= 5);
        assertTrue(solution.relativeResidual() <= Colebrook1939.DEFAULT_TOLERANCE);
    }

    @Test
    void tooSmallBudgetIsAConvergenceErrorWithItsResidual() {
        ConvergenceException e = assertThrows(
                ConvergenceException.class, () -> solver.withMaxIterations(1).frictionFactor(1e5, 1e-4));
        assertEquals(1, e.iterations());
        assertTrue(e.residual() > Colebrook1939.DEFAULT_TOLERANCE);
        assertTrue(
                e.getMessage()
                        .startsWith("Colebrook–White solve at Re = 100000.0, ε/D = 1.0E-4 did not converge:"
                                + " relative residual "),
                e.getMessage());
        assertTrue(e.getMessage().endsWith(" after 1 iterations, tolerance 1.0E-14"), e.getMessage());
        assertThrows(
                ConvergenceException.class, () -> solver.withMaxIterations(1).evaluate(1e5, 1e-4));
    }

    @Test
    void solverIsImmutable() {
        Colebrook1939 loose = solver.withTolerance(1e-6).withMaxIterations(7);
        assertEquals(1e-6, loose.tolerance());
        assertEquals(7, loose.maxIterations());
        assertEquals(Colebrook1939.DEFAULT_TOLERANCE, solver.tolerance());
        assertEquals(Colebrook1939.DEFAULT_MAX_ITERATIONS, solver.maxIterations());
        // Looser tolerance, still close: the last Newton correction makes it far better than 1e-6.
        assertEquals(solver.frictionFactor(1e5, 1e-4), loose.frictionFactor(1e5, 1e-4), 1e-8);
    }

    @Test
    void rejectsBadSettingsNamingThem() {
        assertEquals(
                "tolerance: must be greater than zero, got 0.0",
                assertThrows(InputException.class, () -> solver.withTolerance(0))
                        .getMessage());
        assertEquals(
                "max iterations: must be at least 1, got 0",
                assertThrows(InputException.class, () -> solver.withMaxIterations(0))
                        .getMessage());
    }

    @Test
    void rejectsReynoldsBelowTheSolvableFloor() {
        InputException e = assertThrows(InputException.class, () -> solver.frictionFactor(0.5, 0.0));
        assertEquals(
                "reynolds: the Colebrook–White equation is solved only for Re ≥ 1.0 (it is a turbulent-flow"
                        + " equation; use the laminar or auto method), got 0.5",
                e.getMessage());
    }

    @Test
    void convergesAcrossAndBeyondTheEngineeringDomain() {
        // Residual check at every point of a dense grid, Re 2000..1e10 and ε/D 0..0.1, then up to just below 1.
        double[] roughness = {0, 1e-8, 1e-6, 1e-4, 1e-2, 0.05, 0.1, 0.3, 0.6, 0.9, Math.nextDown(1.0)};
        for (double rr : roughness) {
            for (double exponent = Math.log10(2000); exponent <= 10; exponent += 0.01) {
                double re = Math.pow(10, exponent);
                ColebrookSolution s = solver.solve(re, rr);
                double x = 1 / Math.sqrt(s.frictionFactor());
                double residual = x + 2 * Math.log10(rr / 3.7 + 2.51 * x / re);
                assertTrue(Math.abs(residual) <= 1e-14 * x, "residual " + residual + " at Re " + re + ", ε/D " + rr);
                assertTrue(s.iterations() <= 6, "iterations " + s.iterations() + " at Re " + re + ", ε/D " + rr);
            }
        }
    }

    @Test
    void hotPathMatchesTheResidualCheckedSolveOverItsWholeBand() {
        // The hot path's fixed schedule is trusted only because this grid covers its band:
        // Re 1e3..1e15 in steps of 0.002 decades, ε/D from 0 to just below 1.
        double[] roughness = {
            0, 1e-9, 1e-7, 1e-6, 1e-5, 1e-4, 1e-3, 3e-3, 1e-2, 3e-2, 5e-2, 0.1, 0.3, 0.6, 0.9, Math.nextDown(1.0)
        };
        for (double rr : roughness) {
            for (double exponent = 3; exponent <= 15; exponent += 0.002) {
                double re = Math.pow(10, exponent);
                double scheduled = Colebrook1939.scheduledInverseRoot(re, rr / 3.7, 2.51 / re);
                assertTrue(scheduled > 0, "the schedule's entry check failed at Re " + re + ", ε/D " + rr);
                double hot = solver.frictionFactor(re, rr);
                double checked = solver.solve(re, rr).frictionFactor();
                assertEquals(checked, hot, 1e-14 * checked, "Re " + re + ", ε/D " + rr);
                double x = 1 / Math.sqrt(hot);
                double residual = x + 2 * Math.log10(rr / 3.7 + 2.51 * x / re);
                assertTrue(Math.abs(residual) <= 1e-14 * x, "residual " + residual + " at Re " + re + ", ε/D " + rr);
            }
        }
    }

    @Test
    void crudeLogarithmMeetsItsStatedError() {
        // Against java.lang.Math.log (IEEE-accurate to 1 ulp): stated absolute error at most 0.06,
        // reached near mantissa 1/ln 2 where ln m − ln 2 (m − 1) peaks at 0.0597.
        double worst = 0;
        for (double v = 1e-300; v < 1e300; v *= 1.0137) {
            worst = Math.max(worst, Math.abs(Math.log(v) - Colebrook1939.crudeLn(v)));
        }
        assertTrue(worst <= 0.06 && worst > 0.059, "worst " + worst);
    }

    @Test
    void cautionsOutsideTheChart() {
        FrictionResult transitional = solver.evaluate(3000, 1e-4);
        assertTrue(transitional.cautions().stream().anyMatch(c -> c.code().equals("transitional-flow")));
        assertTrue(
                transitional.cautions().stream()
                        .anyMatch(c -> c.code().equals("outside-validity-range")
                                && c.message()
                                        .equals(
                                                "Re = 3000, ε/D = 0.0001 is outside the validity range of Colebrook–White"
                                                        + " (1939) (4000 ≤ Re ≤ 1e8, 0 ≤ ε/D ≤ 0.05); the value is computed but"
                                                        + " less certain")),
                transitional.cautions()::toString);
        assertEquals(0, solver.evaluate(1e5, 1e-4).cautions().size());
    }
}
