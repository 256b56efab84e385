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
 * costs no further logarithm. The hot path {@link #frictionFactor} runs a fixed schedule of two
 * Halley steps from a start taken with a rough logarithm (see its notes), and falls back to the same
 * loop outside 1e3 ≤ Re ≤ 1e15. Accuracy: the friction factor agrees with 60-digit reference
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

    /** Largest relative residual with which the schedule's last step is trusted (ratio). */
    static final double FAST_ENTRY_RESIDUAL = 1e-5;

    /** (2/ln 10) ln 8 + 0.8: turns (2/ln 10) ln Re into a smooth-pipe guess of 1/√f (ratio). */
    private static final double SMOOTH_GUESS_OFFSET = 2.6;

    private static final double LN2 = Math.log(2.0);

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

    /**
     * df/dRe by implicit differentiation of F(x, Re) = x + 2 log₁₀(a + b x) = 0 with x = 1/√f,
     * a = ε/(3.7 D), b = 2.51/Re: dx/dRe = −F_Re/F_x = c b x / (Re (u + c b)) with c = 2/ln 10 and
     * u = a + b x, and df/dRe = −2 x⁻³ dx/dRe = −2 c b / (x² Re (u + c b)). Exact for the solved
     * root (to the solver's 10⁻¹⁴).
     */
    @Override
    public double frictionFactorSlope(double reynolds, double relativeRoughness) {
        FrictionChecks.requireValid(reynolds, relativeRoughness);
        requireSolvable(reynolds);
        double x = inverseRoot(reynolds, relativeRoughness);
        double b = VISCOUS_COEFFICIENT / reynolds;
        double u = relativeRoughness / ROUGHNESS_DIVISOR + b * x;
        double cb = LN_COEFFICIENT * b;
        return -2.0 * cb / (x * x * reynolds * (u + cb));
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
     * fixed schedule without data-dependent branches, so that the processor can overlap successive
     * solves: a start x₀ = g(x_g) with g(x) = −(2/ln 10) ln(a + b x), a = ε/(3.7 D), b = 2.51/Re,
     * both logarithms taken by {@link #crudeLn}, from the smooth-pipe guess x_g = (2/ln 10) ln Re −
     * 2.6 (Prandtl's law x = 2 log₁₀(Re/x) − 0.8 with x ≈ 8 on the right); one Halley step; then the
     * residual r there is checked and one last Halley step taken. If |r| ≤ {@link
     * #FAST_ENTRY_RESIDUAL}·x the last step's error is below 5e-16 absolute: Halley's error is
     * K e³ with |K| ≤ (2/ln 10)²q⁴/4 + (2/ln 10) q³/3 ≤ 0.48/x³ (q = b/(a + b x) ≤ 1/x, x ≥ 1). If
     * not, the general bracketed loop takes over; over the whole band and 0 ≤ ε/D &lt; 1 it never has
     * to (tested). Outside the band, or with a budget or tolerance the schedule cannot honour, the
     * general loop of {@link #solve} runs without bookkeeping.
     */
    private double inverseRoot(double reynolds, double relativeRoughness) {
        double a = relativeRoughness / ROUGHNESS_DIVISOR;
        double b = VISCOUS_COEFFICIENT / reynolds;
        if (fastSchedule && reynolds >= FAST_MIN_REYNOLDS && reynolds <= FAST_MAX_REYNOLDS) {
            double x = scheduledInverseRoot(reynolds, a, b);
            if (x == x) {
                return x;
            }
        }
        return generalInverseRoot(reynolds, relativeRoughness, a, b);
    }

    /** The fixed schedule of {@link #inverseRoot}; NaN when its entry check fails. */
    static double scheduledInverseRoot(double reynolds, double a, double b) {
        double cb = LN_COEFFICIENT * b;
        double guess = Math.max(1.0, LN_COEFFICIENT * crudeLn(reynolds) - SMOOTH_GUESS_OFFSET);
        double x = -LN_COEFFICIENT * crudeLn(a + b * guess);
        double u = a + b * x;
        double residual = x + LN_COEFFICIENT * Math.log(u);
        double w = u + cb;
        // Halley's step x − 2 F F'/(2 F'² − F F'') with F' = w/u and F'' = −cb·b/u², multiplied by u².
        x -= 2.0 * residual * u * w / (2.0 * w * w + residual * cb * b);
        u = a + b * x;
        residual = x + LN_COEFFICIENT * Math.log(u);
        if (!(Math.abs(residual) <= FAST_ENTRY_RESIDUAL * x)) {
            return Double.NaN;
        }
        w = u + cb;
        return x - 2.0 * residual * u * w / (2.0 * w * w + residual * cb * b);
    }

    /**
     * A rough natural logarithm for a starting guess only: ln 2 · (exponent + mantissa − 1) for a
     * positive normal argument, the chord of ln over each octave; absolute error at most 0.06
     * (largest at mantissa 1/ln 2). Zero or subnormal arguments give a large negative value, never
     * NaN.
     */
    static double crudeLn(double value) {
        long bits = Double.doubleToRawLongBits(value);
        int exponent = (int) ((bits >>> 52) & 0x7ff) - 1023;
        double mantissa = Double.longBitsToDouble((bits & 0x000F_FFFF_FFFF_FFFFL) | 0x3FF0_0000_0000_0000L);
        return LN2 * (exponent + (mantissa - 1.0));
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
