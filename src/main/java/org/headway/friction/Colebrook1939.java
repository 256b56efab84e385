package org.headway.friction;

import java.util.List;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * The Colebrook–White equation for the Darcy friction factor in turbulent flow, solved to machine
 * precision.
 *
 * <p>Equation: 1/√f = −2 log₁₀(ε/(3.7 D) + 2.51/(Re √f)), with f the Darcy friction factor
 * (ratio), ε the equivalent sand roughness (m), D the bore (m) and Re the Reynolds number (ratio).
 *
 * <p>Validity: turbulent flow, 4000 ≤ Re ≤ 1e8 and 0 ≤ ε/D ≤ 0.05, the range of the Moody (1944)
 * chart that plots this equation (common practice). Outside it the value is computed and flagged.
 *
 * <p>Citation: C. F. Colebrook, "Turbulent flow in pipes, with particular reference to the
 * transition region between the smooth and rough pipe laws", Journal of the Institution of Civil
 * Engineers 11(4), 1939, 133–156 (the interpolation formula combining the smooth and rough laws).
 *
 * <p>Algorithm ({@link #solve}, {@link #evaluate}): Halley's method on
 * F(x) = x + 2 log₁₀(ε/(3.7 D) + 2.51 x/Re) = 0 for x = 1/√f, started from one fixed-point step from
 * x = 8, guarded by a bracket that falls back to geometric bisection, so it cannot leave the root's
 * basin. F is increasing and concave, with exactly one positive root for 0 ≤ ε/D &lt; 1. It stops
 * when |F(x)| ≤ tolerance · x and then applies the Newton correction from that last residual, which
 * costs no further logarithm. The hot path {@link #frictionFactor} runs a fixed schedule with a cheap
 * logarithm for the approach and the exact one for the last step (see its notes), and falls back to
 * the same loop outside 1e3 ≤ Re ≤ 1e15. Accuracy: the friction factor agrees with 60-digit reference
 * values to a relative 1e-14 or better on both paths (tested).
 */
public final class Colebrook1939 implements FrictionCorrelation {

    /** Coefficient in front of the logarithm (ratio). */
    public static final double LOG_COEFFICIENT = 2.0;

    /** Divisor of the relative roughness inside the logarithm (ratio). */
    public static final double ROUGHNESS_DIVISOR = 3.7;

    /** Numerator of the viscous term 2.51/(Re √f) (ratio). */
    public static final double VISCOUS_COEFFICIENT = 2.51;

    /** Default relative residual |F(x)|/x at which the solve stops (ratio). */
    public static final double DEFAULT_TOLERANCE = 1e-14;

    /** Default iteration budget; the solve takes 2–4 iterations in its validity range. */
    public static final int DEFAULT_MAX_ITERATIONS = 100;

    /**
     * Smallest Reynolds number the solver accepts (ratio). Below it the root x is so small that
     * ε/(3.7 D) + 2.51 x/Re rounds to 1 and the residual can no longer be resolved to the
     * tolerance in double precision; the turbulent equation has no meaning there anyway.
     */
    public static final double MIN_SOLVABLE_REYNOLDS = 1.0;

    /** 2/ln 10: turns the natural logarithm into the equation's 2 log₁₀. */
    private static final double LN_COEFFICIENT = LOG_COEFFICIENT / Math.log(10.0);

    /** Reynolds band of the hot path's fixed schedule (ratio); tested over all of it. */
    static final double FAST_MIN_REYNOLDS = 1e3;

    static final double FAST_MAX_REYNOLDS = 1e15;

    /** Largest relative residual with which the schedule's exact last step is trusted (ratio). */
    static final double FAST_ENTRY_RESIDUAL = 1e-6;

    private static final double LN2 = Math.log(2.0);

    private static final double SQRT2 = Math.sqrt(2.0);

    /** Start of the one fixed-point step that gives the first iterate. */
    private static final double START_INVERSE_ROOT = 8.0;

    private static final ValidityRange VALIDITY = new ValidityRange(
            FlowRegimes.TURBULENT_LIMIT,
            1e8,
            0.0,
            FrictionChecks.CHART_MAX_RELATIVE_ROUGHNESS,
            "range of the Moody (1944) chart, which plots this equation; common practice");

    private static final Colebrook1939 DEFAULT = new Colebrook1939(DEFAULT_TOLERANCE, DEFAULT_MAX_ITERATIONS);

    private final double tolerance;
    private final int maxIterations;

    /** Whether the hot path's fixed schedule meets this solver's tolerance and budget. */
    private final boolean fastSchedule;

    private Colebrook1939(double tolerance, int maxIterations) {
        this.tolerance = tolerance;
        this.maxIterations = maxIterations;
        this.fastSchedule = tolerance >= DEFAULT_TOLERANCE && maxIterations >= 3;
    }

    /** The solver with the default tolerance (1e-14) and iteration budget (100). */
    public static Colebrook1939 solver() {
        return DEFAULT;
    }

    /**
     * The same solver with another tolerance.
     *
     * @param relativeResidual relative residual |F(x)|/x at which to stop (ratio), finite and positive
     */
    public Colebrook1939 withTolerance(double relativeResidual) {
        InputException.requirePositive("tolerance", relativeResidual);
        return new Colebrook1939(relativeResidual, maxIterations);
    }

    /**
     * The same solver with another iteration budget.
     *
     * @param iterations largest number of residual evaluations, at least 1
     */
    public Colebrook1939 withMaxIterations(int iterations) {
        if (iterations < 1) {
            throw new InputException("max iterations", "must be at least 1, got " + iterations);
        }
        return new Colebrook1939(tolerance, iterations);
    }

    /** Relative residual at which the solve stops (ratio). */
    public double tolerance() {
        return tolerance;
    }

    /** Largest number of residual evaluations. */
    public int maxIterations() {
        return maxIterations;
    }

    @Override
    public String id() {
        return "colebrook";
    }

    @Override
    public String displayName() {
        return "Colebrook–White (1939)";
    }

    @Override
    public String citation() {
        return "C. F. Colebrook, Turbulent flow in pipes, with particular reference to the transition region"
                + " between the smooth and rough pipe laws, Journal of the Institution of Civil Engineers 11(4),"
                + " 1939, 133–156";
    }

    @Override
    public String equation() {
        return "1/√f = −2 log₁₀(ε/(3.7 D) + 2.51/(Re √f))";
    }

    @Override
    public ValidityRange validity() {
        return VALIDITY;
    }

    @Override
    public FrictionResult evaluate(double reynolds, double relativeRoughness) {
        ColebrookSolution solution = solve(reynolds, relativeRoughness);
        List<Caution> cautions = FrictionChecks.cautions(this, reynolds, relativeRoughness);
        return new FrictionResult(
                solution.frictionFactor(),
                reynolds,
                relativeRoughness,
                FlowRegimes.of(reynolds),
                id(),
                solution.iterations(),
                cautions);
    }

    /**
     * The friction factor alone, for hot loops (system curves): allocates nothing on success.
     *
     * @param reynolds Reynolds number (ratio), at least {@value #MIN_SOLVABLE_REYNOLDS}
     * @param relativeRoughness ε/D (ratio), 0 ≤ ε/D &lt; 1
     * @return the Darcy friction factor (ratio)
     * @throws InputException for invalid input
     * @throws ConvergenceException if the tolerance is not met within the iteration budget
     */
    @Override
    public double frictionFactor(double reynolds, double relativeRoughness) {
        FrictionChecks.requireValid(reynolds, relativeRoughness);
        requireSolvable(reynolds);
        double x = inverseRoot(reynolds, relativeRoughness);
        return FrictionChecks.requireUsable(displayName(), 1.0 / (x * x), reynolds, relativeRoughness);
    }

    private static void requireSolvable(double reynolds) {
        if (reynolds < MIN_SOLVABLE_REYNOLDS) {
            throw new InputException(
                    "reynolds",
                    "the Colebrook–White equation is solved only for Re ≥ " + MIN_SOLVABLE_REYNOLDS
                            + " (it is a turbulent-flow equation; use the laminar or auto method), got " + reynolds);
        }
    }

    /**
     * x = 1/√f without allocation. Inside {@link #FAST_MIN_REYNOLDS}..{@link #FAST_MAX_REYNOLDS} a
     * fixed schedule: the start and two Halley steps use {@link #approximateLn} (absolute error below
     * 1e-9), which brings x within a relative 2e-10 of the root (measured over the whole band, all
     * 0 ≤ ε/D &lt; 1); then one Halley step with the exact logarithm. Halley's error is cubic, so that
     * step leaves an error of order 1e-30, far below rounding. The residual at the start of the exact
     * step is checked: if it is not below {@link #FAST_ENTRY_RESIDUAL}·x the schedule did not do
     * its job and the general bracketed loop takes over. Elsewhere, or with a budget or tolerance
     * the schedule cannot honour, the general loop of {@link #solve} runs without bookkeeping.
     */
    private double inverseRoot(double reynolds, double relativeRoughness) {
        double a = relativeRoughness / ROUGHNESS_DIVISOR;
        double b = VISCOUS_COEFFICIENT / reynolds;
        if (fastSchedule && reynolds >= FAST_MIN_REYNOLDS && reynolds <= FAST_MAX_REYNOLDS) {
            double x = -LN_COEFFICIENT * approximateLn(a + b * START_INVERSE_ROOT);
            for (int step = 0; step < 2; step++) {
                double u = a + b * x;
                double residual = x + LN_COEFFICIENT * approximateLn(u);
                double q = b / u;
                double slope = 1.0 + LN_COEFFICIENT * q;
                x -= 2.0 * residual * slope / (2.0 * slope * slope + residual * LN_COEFFICIENT * q * q);
            }
            double u = a + b * x;
            double residual = x + LN_COEFFICIENT * Math.log(u);
            if (Math.abs(residual) <= FAST_ENTRY_RESIDUAL * x) {
                double q = b / u;
                double slope = 1.0 + LN_COEFFICIENT * q;
                return x - 2.0 * residual * slope / (2.0 * slope * slope + residual * LN_COEFFICIENT * q * q);
            }
        }
        return generalInverseRoot(reynolds, relativeRoughness, a, b);
    }

    /**
     * Natural logarithm to an absolute error below 1e-9 for positive normal arguments: exponent
     * from the bits, mantissa folded into [√½, √2), then ln m = 2 artanh((m − 1)/(m + 1)) by five
     * terms of its series (|t| ≤ 0.1716, first omitted term 2t¹¹/11 &lt; 7e-10). Good enough to
     * approach the root; never used for the last step.
     */
    static double approximateLn(double value) {
        long bits = Double.doubleToRawLongBits(value);
        int exponent = (int) ((bits >>> 52) & 0x7ff) - 1023;
        double mantissa = Double.longBitsToDouble((bits & 0x000F_FFFF_FFFF_FFFFL) | 0x3FF0_0000_0000_0000L);
        if (mantissa > SQRT2) {
            mantissa *= 0.5;
            exponent++;
        }
        double t = (mantissa - 1.0) / (mantissa + 1.0);
        double t2 = t * t;
        double series = 1.0 + t2 * (1.0 / 3 + t2 * (1.0 / 5 + t2 * (1.0 / 7 + t2 * (1.0 / 9))));
        return exponent * LN2 + 2.0 * t * series;
    }

    /** The loop of {@link #solve} without its bookkeeping. */
    private double generalInverseRoot(double reynolds, double relativeRoughness, double a, double b) {
        double lower = 0.0;
        double upper = Double.POSITIVE_INFINITY;
        double x = -LN_COEFFICIENT * Math.log(a + b * START_INVERSE_ROOT);
        double residual = Double.NaN;
        for (int i = 1; i <= maxIterations; i++) {
            if (!(x > lower && x < upper)) {
                x = bisect(lower, upper, a, b);
            }
            double u = a + b * x;
            residual = x + LN_COEFFICIENT * Math.log(u);
            double slope = 1.0 + LN_COEFFICIENT * b / u;
            if (Math.abs(residual) <= tolerance * x) {
                return x - residual / slope;
            }
            if (residual < 0) {
                lower = x;
            } else {
                upper = x;
            }
            double q = b / u;
            double curvature = -LN_COEFFICIENT * q * q;
            x = x - 2.0 * residual * slope / (2.0 * slope * slope - residual * curvature);
        }
        throw notConverged(reynolds, relativeRoughness, Math.abs(residual) / x);
    }

    /**
     * Solves the equation and reports how the solve ended.
     *
     * @param reynolds Reynolds number (ratio), at least {@value #MIN_SOLVABLE_REYNOLDS}
     * @param relativeRoughness ε/D (ratio), 0 ≤ ε/D &lt; 1
     * @return friction factor, residual evaluations and the relative residual met
     * @throws InputException for invalid input
     * @throws ConvergenceException if the tolerance is not met within the iteration budget
     */
    public ColebrookSolution solve(double reynolds, double relativeRoughness) {
        FrictionChecks.requireValid(reynolds, relativeRoughness);
        requireSolvable(reynolds);
        // Same loop as inverseRoot, kept separate so that the hot path carries no bookkeeping.
        double a = relativeRoughness / ROUGHNESS_DIVISOR;
        double b = VISCOUS_COEFFICIENT / reynolds;
        double lower = 0.0;
        double upper = Double.POSITIVE_INFINITY;
        double x = -LN_COEFFICIENT * Math.log(a + b * START_INVERSE_ROOT);
        double residual = Double.NaN;
        for (int i = 1; i <= maxIterations; i++) {
            if (!(x > lower && x < upper)) {
                x = bisect(lower, upper, a, b);
            }
            double u = a + b * x;
            residual = x + LN_COEFFICIENT * Math.log(u);
            double slope = 1.0 + LN_COEFFICIENT * b / u;
            if (Math.abs(residual) <= tolerance * x) {
                double root = x - residual / slope;
                double f =
                        FrictionChecks.requireUsable(displayName(), 1.0 / (root * root), reynolds, relativeRoughness);
                return new ColebrookSolution(f, i, Math.abs(residual) / x);
            }
            if (residual < 0) {
                lower = x;
            } else {
                upper = x;
            }
            double q = b / u;
            double curvature = -LN_COEFFICIENT * q * q;
            x = x - 2.0 * residual * slope / (2.0 * slope * slope - residual * curvature);
        }
        throw notConverged(reynolds, relativeRoughness, Math.abs(residual) / x);
    }

    private ConvergenceException notConverged(double reynolds, double relativeRoughness, double relativeResidual) {
        return new ConvergenceException(
                "Colebrook–White solve at Re = " + reynolds + ", ε/D = " + relativeRoughness,
                maxIterations,
                relativeResidual,
                tolerance);
    }

    /**
     * A point strictly inside the bracket. Missing ends are replaced by bounds that always hold:
     * at x₀ = min(0.3, (1 − a)/(2 b)) the logarithm is below ln((1 + a)/2) &lt; −0.45, so F(x₀) &lt; 0;
     * and the root x* = g(x*) ≤ g(x₀) because g(x) = −(2/ln 10) ln(a + b x) falls with x.
     * Geometric rather than arithmetic bisection, because the bracket can span many decades.
     */
    private static double bisect(double lower, double upper, double a, double b) {
        double safeLower = Math.min(0.3, (1.0 - a) / (2.0 * b));
        double low = Math.max(lower, safeLower);
        double high = upper;
        if (high == Double.POSITIVE_INFINITY) {
            high = -LN_COEFFICIENT * Math.log(a + b * safeLower);
        }
        if (low >= high) {
            return 0.5 * (lower + high);
        }
        return Math.sqrt(low) * Math.sqrt(high);
    }
}
