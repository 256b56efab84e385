package org.headway.rig;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.exception.NoBracketingException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.friction.Colebrook1939;
import org.headway.friction.FlowRegimes;

/**
 * Fits the equivalent sand roughness ε of the Colebrook–White equation to measured friction
 * factors by nonlinear least squares.
 *
 * <p>Model: ln fᵢ = ln f_C(Reᵢ, ε/D) + eᵢ, with f_C the Colebrook–White friction factor (see {@link
 * Colebrook1939}), over the turbulent points only (Re ≥ 4000; transitional and laminar points are not
 * described by the equation). Residuals are taken in ln f so that each point counts by its relative
 * deviation. The parameter is θ = ln(ε/D), which keeps ε positive without a bound; the Jacobian is
 * exact, by implicit differentiation of F(x, a) = x + 2 log₁₀(a + b x) = 0 with x = 1/√f,
 * a = (ε/D)/3.7, b = 2.51/Re: ∂ ln f/∂θ = (2a/x)·c/(u + c b), c = 2/ln 10, u = a + b x. The
 * estimate is found by the Commons Math Levenberg–Marquardt optimizer, started from the best of a
 * grid of 21 points over 10⁻⁸ ≤ ε/D ≤ {@value #MAX_RELATIVE_ROUGHNESS}.
 *
 * <p>Confidence interval: the profile (likelihood-ratio) interval {ε : RSS(ε) ≤ RSS_min·(1 +
 * F(0.95; 1, ν)/ν)}, ν = n − 1, the exact-F form for one parameter (D. M. Bates and D. G. Watts,
 * Nonlinear Regression Analysis and Its Applications, Wiley 1988, ch. 6 — from memory). It is found
 * by Brent's method in θ; it stays honest where the linearised interval is not, near a smooth pipe where
 * RSS flattens out as ε → 0. If RSS at ε = 0 is under the threshold the lower end is 0: the data are
 * consistent with a smooth pipe, ε is reported as undetermined with the upper end as a bound. An
 * interval spanning {@value #UNDETERMINED_DECADES} decades or more is also reported as undetermined.
 */
public final class EffectiveRoughnessFit {

    /** Top of the ε/D search range (ratio); the chart's curves end at 0.05 (common practice). */
    public static final double MAX_RELATIVE_ROUGHNESS = 0.05;
    /** Bottom of the ε/D search range (ratio); below it no rig could tell ε from zero. */
    public static final double MIN_RELATIVE_ROUGHNESS = 1e-8;
    /** An interval spanning this many decades or more does not determine ε (ratio). */
    public static final double UNDETERMINED_DECADES = 2.0;
    /** Fewest turbulent points for a fit. */
    public static final int MIN_POINTS = 3;

    private static final int GRID_STEPS = 20;
    /** Halvings of a θ bracket at most ~28 wide: 45 leave it below 1e-12, far under any interval. */
    private static final int BISECTION_STEPS = 45;
    /** Absolute accuracy of an interval end in θ = ln(ε/D) (ratio): a relative 1e-9 in ε. */
    static final double BOUNDARY_ACCURACY = 1e-9;

    private static final int BOUNDARY_EVALUATIONS = 100;

    private static final double LN_COEFFICIENT = 2.0 / Math.log(10.0);
    private static final String BASIS = "profile-likelihood interval with the F(1, ν) quantile; Bates and Watts"
            + " (1988), Nonlinear Regression Analysis and Its Applications, ch. 6 (from memory)";

    private EffectiveRoughnessFit() {}

    /**
     * Fits ε to turbulent points. Points with Re below 4000 are ignored.
     *
     * @param reynolds Re of each point (ratio)
     * @param frictionFactor measured f of each point (ratio), positive
     * @param count how many leading entries of the arrays to use
     * @param innerDiameter bore D (m)
     * @return the estimate, its interval, and whether the data determine it
     */
    public static EffectiveRoughness fit(double[] reynolds, double[] frictionFactor, int count, double innerDiameter) {
        InputException.requirePositive("inner diameter", innerDiameter);
        int n = 0;
        double[] re = new double[count];
        double[] lnF = new double[count];
        for (int i = 0; i < count; i++) {
            if (reynolds[i] >= FlowRegimes.TURBULENT_LIMIT) {
                InputException.requirePositive("friction factor", frictionFactor[i]);
                re[n] = reynolds[i];
                lnF[n] = Math.log(frictionFactor[i]);
                n++;
            }
        }
        if (n < MIN_POINTS) {
            return new EffectiveRoughness(
                    EffectiveRoughness.Status.NOT_ENOUGH_DATA,
                    OptionalDouble.empty(),
                    0.0,
                    0.0,
                    false,
                    innerDiameter,
                    n,
                    0.0,
                    0,
                    "not determined: " + n + " turbulent point" + (n == 1 ? "" : "s") + " (Re ≥ 4000); at least "
                            + MIN_POINTS + " are needed to fit the roughness",
                    List.of());
        }
        Problem problem = new Problem(java.util.Arrays.copyOf(re, n), java.util.Arrays.copyOf(lnF, n));
        return problem.solve(innerDiameter);
    }

    /** The least-squares problem in θ = ln(ε/D). */
    private static final class Problem {
        private final double[] reynolds;
        private final double[] lnFriction;
        private final Colebrook1939 colebrook = Colebrook1939.solver();

        Problem(double[] reynolds, double[] lnFriction) {
            this.reynolds = reynolds;
            this.lnFriction = lnFriction;
        }

        int size() {
            return reynolds.length;
        }

        /** Residual sum of squares at a relative roughness (ε/D ≥ 0). */
        double rss(double relativeRoughness) {
            double sum = 0;
            for (int i = 0; i < reynolds.length; i++) {
                double r = lnFriction[i] - Math.log(colebrook.frictionFactor(reynolds[i], relativeRoughness));
                sum += r * r;
            }
            return sum;
        }

        double rssAtTheta(double theta) {
            return rss(Math.exp(theta));
        }

        EffectiveRoughness solve(double diameter) {
            int n = size();
            int dof = n - 1;
            double thetaMin = Math.log(MIN_RELATIVE_ROUGHNESS);
            double thetaMax = Math.log(MAX_RELATIVE_ROUGHNESS);
            // Grid start: LM on a single parameter can stall on the flat smooth-pipe side.
            double bestTheta = thetaMin;
            double bestRss = Double.POSITIVE_INFINITY;
            for (int k = 0; k <= GRID_STEPS; k++) {
                double theta = thetaMin + (thetaMax - thetaMin) * k / GRID_STEPS;
                double s = rssAtTheta(theta);
                if (s < bestRss) {
                    bestRss = s;
                    bestTheta = theta;
                }
            }
            double thetaHat = bestTheta;
            int iterations = 0;
            MultivariateJacobianFunction model = this::valueAndJacobian;
            LeastSquaresBuilder builder = new LeastSquaresBuilder()
                    .model(model)
                    .target(lnFriction)
                    .start(new double[] {bestTheta})
                    .parameterValidator(p -> {
                        double t = Math.max(thetaMin - 10.0, Math.min(thetaMax, p.getEntry(0)));
                        return new ArrayRealVector(new double[] {t});
                    })
                    .maxEvaluations(1000)
                    .maxIterations(200);
            try {
                LeastSquaresOptimizer.Optimum optimum = new LevenbergMarquardtOptimizer()
                        .withCostRelativeTolerance(1e-14)
                        .withParameterRelativeTolerance(1e-12)
                        .optimize(builder.build());
                double theta = optimum.getPoint().getEntry(0);
                double s = rssAtTheta(theta);
                if (s <= bestRss) {
                    thetaHat = theta;
                    bestRss = s;
                }
                iterations = optimum.getIterations();
            } catch (org.apache.commons.math3.exception.MathIllegalStateException e) {
                // The grid minimum stands; the interval below does not depend on the optimizer.
            }
            double rssSmooth = rss(0.0);
            double rssMin = Math.min(bestRss, rssSmooth);
            double quantile = new TDistribution(dof).inverseCumulativeProbability(0.975);
            double threshold = rssMin * (1.0 + quantile * quantile / dof);
            double s = Math.sqrt(rssMin / dof);

            boolean smoothConsistent = rssSmooth <= threshold;
            double low;
            if (smoothConsistent) {
                low = 0.0;
            } else {
                low = Math.exp(boundary(thetaMin - 10.0, thetaHat, threshold, true));
            }
            boolean upperOpen = rssAtTheta(thetaMax) <= threshold;
            double high = upperOpen ? MAX_RELATIVE_ROUGHNESS : Math.exp(boundary(thetaHat, thetaMax, threshold, false));
            double estimate = Math.exp(thetaHat);
            List<Caution> cautions = new ArrayList<>();
            EffectiveRoughness.Status status;
            String statement;
            if (smoothConsistent) {
                status = EffectiveRoughness.Status.UNDETERMINED;
                statement = "undetermined; the data are consistent with a smooth pipe up to ε/D ≤ " + number(high)
                        + " (95 % bound" + (upperOpen ? ", the top of the search range" : "") + ")";
            } else if (upperOpen || Math.log10(high / low) >= UNDETERMINED_DECADES) {
                status = EffectiveRoughness.Status.UNDETERMINED;
                statement =
                        "undetermined; the 95 % interval of ε/D, " + number(low) + " to " + (upperOpen ? "beyond " : "")
                                + number(high) + ", spans " + String.format(Locale.ROOT, "%.1f", Math.log10(high / low))
                                + " decades";
            } else {
                status = EffectiveRoughness.Status.DETERMINED;
                statement =
                        "ε/D = " + number(estimate) + " (95 % interval " + number(low) + " to " + number(high) + ")";
            }
            if (estimate > MAX_RELATIVE_ROUGHNESS * 0.999 && !smoothConsistent) {
                cautions.add(Caution.warning(
                        "roughness-beyond-chart",
                        "the best fit lies at the top of the search range ε/D = " + number(MAX_RELATIVE_ROUGHNESS)
                                + "; the pipe is rougher than the chart covers or the data do not follow"
                                + " the Colebrook–White form",
                        "common practice, no source"));
            }
            cautions.add(Caution.note(
                    "roughness-fit-method",
                    "ε fitted to " + n + " turbulent points by least squares in ln f; interval by the profile"
                            + " likelihood-ratio (F) method; scatter s = " + number(s) + " in ln f",
                    BASIS));
            return new EffectiveRoughness(
                    status,
                    OptionalDouble.of(smoothConsistent && rssSmooth <= bestRss ? 0.0 : estimate * diameter),
                    low * diameter,
                    high * diameter,
                    upperOpen,
                    diameter,
                    n,
                    s,
                    iterations,
                    statement,
                    cautions);
        }

        /**
         * Where RSS(θ) crosses the threshold between an inside end (RSS ≤ threshold) and an outside
         * end, by Brent's method (Commons Math) to {@value #BOUNDARY_ACCURACY} in θ; plain bisection
         * if rounding leaves the ends on one side.
         */
        private double boundary(double from, double to, double threshold, boolean lowSide) {
            double inside = lowSide ? to : from;
            double outside = lowSide ? from : to;
            try {
                return new BrentSolver(BOUNDARY_ACCURACY)
                        .solve(
                                BOUNDARY_EVALUATIONS,
                                t -> rssAtTheta(t) - threshold,
                                Math.min(inside, outside),
                                Math.max(inside, outside));
            } catch (NoBracketingException | TooManyEvaluationsException e) {
                for (int k = 0; k < BISECTION_STEPS; k++) {
                    double mid = 0.5 * (inside + outside);
                    if (rssAtTheta(mid) <= threshold) {
                        inside = mid;
                    } else {
                        outside = mid;
                    }
                }
                return inside;
            }
        }

        private Pair<RealVector, RealMatrix> valueAndJacobian(RealVector point) {
            double theta = point.getEntry(0);
            double relativeRoughness = Math.exp(theta);
            double a = relativeRoughness / Colebrook1939.ROUGHNESS_DIVISOR;
            int n = reynolds.length;
            double[] value = new double[n];
            double[][] jacobian = new double[n][1];
            for (int i = 0; i < n; i++) {
                double f = colebrook.frictionFactor(reynolds[i], relativeRoughness);
                double x = 1.0 / Math.sqrt(f);
                double b = Colebrook1939.VISCOUS_COEFFICIENT / reynolds[i];
                double u = a + b * x;
                value[i] = Math.log(f);
                jacobian[i][0] = 2.0 * a / x * LN_COEFFICIENT / (u + LN_COEFFICIENT * b);
            }
            return new Pair<>(new ArrayRealVector(value, false), new Array2DRowRealMatrix(jacobian, false));
        }
    }

    private static String number(double value) {
        return String.format(Locale.ROOT, "%.3g", value);
    }
}
