package org.headway.fitting;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.exception.ConvergenceException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.exception.TooManyIterationsException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.apache.commons.math3.util.Pair;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * Least-squares fitting of a {@link FitForm} to {@link Observations}: a thin adapter over Commons
 * Math.
 *
 * <p>Method. Forms linear in their parameters are solved by Householder QR of the column-scaled,
 * √w-weighted design matrix followed by iterative refinement on the augmented system with residuals
 * accumulated in doubled precision — never the normal equations. Nonlinear forms use the Commons Math Levenberg–Marquardt optimizer (a MINPACK
 * translation with its own parameter scaling) with exact Jacobians from {@link Expression}, tight
 * cost, parameter and orthogonality tolerances, and then a Gauss–Newton polishing pass from the
 * Levenberg–Marquardt result that accepts only steps that lower the residual sum of squares.
 * Standard errors are σ·√diag((JᵀJ)⁻¹) with J the weighted Jacobian at the solution, formed from
 * the singular values of R in J = QR (never by inverting JᵀJ); confidence intervals use Student's
 * t with ν = n − p. For nonlinear models these are the usual linearised (asymptotic) values.
 *
 * <p>Accuracy, as tested: NIST StRD nonlinear sets reach LRE ≥ 7 in every certified parameter
 * from both starting points, linear sets LRE ≥ 9 (see {@code docs-fit.md} for the table).
 *
 * <p>Immutable; {@link #withTolerance} and {@link #withMaxIterations} return new fitters.
 */
public final class LeastSquaresFitter {

    /** Relative tolerance on cost, parameters and orthogonality for Levenberg–Marquardt. */
    public static final double DEFAULT_TOLERANCE = 1e-14;
    /** Iteration budget of Levenberg–Marquardt. */
    public static final int DEFAULT_MAX_ITERATIONS = 10_000;
    /**
     * Largest iteration budget accepted: a fit that has not converged in a million
     * Levenberg–Marquardt steps will not, and the evaluation budget (four per step) stays an int.
     */
    public static final int MAX_ITERATIONS_LIMIT = 1_000_000;
    /** Gauss–Newton polishing steps after Levenberg–Marquardt. */
    static final int POLISHING_STEPS = 20;
    /** Steps of iterative refinement after the QR solution of a linear form. */
    static final int REFINEMENT_STEPS = 3;
    /** Each kept polishing step must be at most this fraction of the previous one. */
    static final double CONTRACTION = 0.9;
    /** Relative rise in cost a polishing step may show and still count as rounding. */
    static final double COST_ROUNDING = 1e-12;
    /** Smallest singular value ratio of the scaled Jacobian below which parameters are not separable. */
    static final double RANK_TOLERANCE = 1e-14;
    /** Singular value ratio below which standard errors are flagged as poorly determined. */
    static final double ILL_CONDITIONED = 1e-9;

    private static final String BASIS_ASYMPTOTIC =
            "Bates, D. M. and Watts, D. G. (1988), Nonlinear Regression Analysis and Its Applications, Wiley,"
                    + " ch. 2 (from memory)";

    private final double tolerance;
    private final int maxIterations;

    /** A fitter with the default tolerance and iteration budget. */
    public LeastSquaresFitter() {
        this(DEFAULT_TOLERANCE, DEFAULT_MAX_ITERATIONS);
    }

    private LeastSquaresFitter(double tolerance, int maxIterations) {
        this.tolerance = tolerance;
        this.maxIterations = maxIterations;
    }

    /**
     * @param relativeTolerance relative tolerance (ratio) for Levenberg–Marquardt, at least 1e-16
     * @return a fitter with that tolerance
     */
    public LeastSquaresFitter withTolerance(double relativeTolerance) {
        if (!(relativeTolerance >= 1e-16) || !(relativeTolerance < 1)) {
            throw new InputException("tolerance", "must be between 1e-16 and 1, got " + relativeTolerance);
        }
        return new LeastSquaresFitter(relativeTolerance, maxIterations);
    }

    /**
     * @param iterations iteration budget, positive
     * @return a fitter with that budget
     */
    public LeastSquaresFitter withMaxIterations(int iterations) {
        if (iterations < 1) {
            throw new InputException("max iterations", "must be positive, got " + iterations);
        }
        if (iterations > MAX_ITERATIONS_LIMIT) {
            throw new InputException(
                    "max iterations", "at most " + MAX_ITERATIONS_LIMIT + " are allowed, got " + iterations);
        }
        return new LeastSquaresFitter(tolerance, iterations);
    }

    /** The relative tolerance (ratio). */
    public double tolerance() {
        return tolerance;
    }

    /** The iteration budget. */
    public int maxIterations() {
        return maxIterations;
    }

    /**
     * Fits one form.
     *
     * @param data the observations
     * @param form the model form
     * @return parameters, statistics and cautions; {@code converged} false (with a serious caution)
     *     if the iteration budget ran out
     * @throws InputException if the data do not suit the form (e.g. x ≤ 0 for a power law), there
     *     are not more points than parameters, the parameters cannot be separated by the data, or
     *     the model is undefined at the starting values
     */
    public FitResult fit(Observations data, FitForm form) {
        if (form instanceof FitForm.Power power && power.logSpace()) {
            return fitPowerInLogSpace(data, form);
        }
        FitPlan plan = FitPlanner.plan(data, form);
        checkCount(data, plan.parameterNames().size());
        if (plan.design() != null) {
            return fitLinear(data, form, plan);
        }
        return fitNonlinear(data, form, plan);
    }

    /**
     * Fits several forms to the same data and ranks them by the corrected Akaike criterion (lowest
     * first). Forms that do not suit the data are listed with the reason instead.
     *
     * @param data the observations
     * @param forms forms to compare
     * @return the ranking
     */
    public FitComparison compare(Observations data, List<FitForm> forms) {
        List<FitResult> fits = new ArrayList<>();
        Map<String, String> skipped = new LinkedHashMap<>();
        for (FitForm form : forms) {
            try {
                fits.add(fit(data, form));
            } catch (InputException e) {
                skipped.put(form.id(), e.getMessage());
            }
        }
        fits.sort(Comparator.comparingDouble(FitResult::informationCriterion));
        return new FitComparison(fits, skipped);
    }

    private static void checkCount(Observations data, int parameters) {
        if (data.size() <= parameters) {
            throw new InputException(
                    "data",
                    "a fit of " + parameters + " parameter(s) needs more points than parameters; got " + data.size()
                            + " point(s)");
        }
    }

    // ---------------------------------------------------------------- linear

    private FitResult fitLinear(Observations data, FitForm form, FitPlan plan) {
        double[] y = data.response();
        double[] sw = rootWeights(data);
        int n = y.length;
        int p = plan.design().length;
        double[][] a = new double[p][n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = y[i] * sw[i];
            for (int k = 0; k < p; k++) {
                a[k][i] = plan.design()[k][i] * sw[i];
            }
        }
        HouseholderQr qr = new HouseholderQr(a);
        Covariance cov = covariance(qr, plan.parameterNames());
        double[] coefficients = qr.solveRefined(b, REFINEMENT_STEPS);
        double[] predicted = new double[n];
        for (int i = 0; i < n; i++) {
            double s = 0.0;
            for (int k = 0; k < p; k++) {
                s = Math.fma(plan.design()[k][i], coefficients[k], s);
            }
            predicted[i] = s;
        }
        return finish(
                data,
                form,
                plan,
                coefficients,
                predicted,
                cov,
                0,
                true,
                "direct least-squares solution by Householder QR",
                List.of());
    }

    // ---------------------------------------------------------------- power in log space

    private FitResult fitPowerInLogSpace(Observations data, FitForm form) {
        List<String> vars = data.variableNames();
        FitPlanner.requireColumns(vars, 1, 1, form);
        double[] x = data.column(0);
        double[] y = data.response();
        FitPlanner.requirePositive(vars.get(0), x, "a power law x^b needs positive x");
        FitPlanner.requirePositive(data.responseName(), y, "a fit in log space needs positive y");
        checkCount(data, 2);
        int n = y.length;
        double[] lx = new double[n];
        double[] ly = new double[n];
        for (int i = 0; i < n; i++) {
            lx[i] = Math.log(x[i]);
            ly[i] = Math.log(y[i]);
        }
        Observations logData = new Observations(
                "ln " + data.responseName(), ly, List.of("ln_" + vars.get(0)), new double[][] {lx}, data.weights());
        FitResult logFit = fit(logData, new FitForm.Linear());
        FittedParameter lnA = logFit.parameters().get(0);
        FittedParameter slope = logFit.parameters().get(1);
        double a = Math.exp(lnA.value());
        String aName = FitPlanner.unique("a", vars);
        String bName = FitPlanner.unique("b", vars);
        double t = tQuantile(logFit.degreesOfFreedom());
        List<FittedParameter> parameters = List.of(
                new FittedParameter(
                        aName,
                        a,
                        a * lnA.standardError(),
                        Math.exp(lnA.value() - t * lnA.standardError()),
                        Math.exp(lnA.value() + t * lnA.standardError())),
                new FittedParameter(bName, slope.value(), slope.standardError(), slope.ci95Low(), slope.ci95High()));
        double[] predicted = new double[n];
        double smearing = 0.0;
        double[] logResiduals = logFit.residuals();
        for (int i = 0; i < n; i++) {
            predicted[i] = a * Math.pow(x[i], slope.value());
            smearing += Math.exp(logResiduals[i]);
        }
        smearing /= n;
        double s = logFit.residualStandardDeviation();
        Caution bias = Caution.warning(
                "log-space-retransformation",
                String.format(
                        Locale.ROOT,
                        "fitted as ln y = ln a + b ln x: a·x^b then estimates the median of y, not its mean. If the"
                                + " scatter is log-normal the mean is higher by exp(s²/2) = %.6g (s = %.4g, residual"
                                + " SD in log space); the smearing factor of these data is %.6g. The standard error"
                                + " of a is by the delta method and its interval is exp of the interval of ln a."
                                + " Fit the power form without log space to avoid this bias.",
                        Math.exp(s * s / 2),
                        s,
                        smearing),
                "Duan, N. (1983), Smearing estimate: a nonparametric retransformation method, J. Am. Stat. Assoc."
                        + " 78(383), 605–610 (from memory)");
        FitPlan plan = new FitPlan(List.of(aName, bName), aName + "*" + vars.get(0) + "^" + bName, null, null, true);
        Covariance none = new Covariance(null, 1.0, List.of());
        List<Caution> extra = new ArrayList<>(logFit.cautions());
        extra.add(bias);
        FitResult original = finish(
                data,
                form,
                plan,
                new double[] {a, slope.value()},
                predicted,
                none,
                0,
                true,
                "direct least-squares solution in log space by Householder QR",
                extra);
        return new FitResult(
                original.formId(),
                original.formDescription(),
                original.responseName(),
                original.variableNames(),
                original.modelExpression(),
                parameters,
                original.residualSumOfSquares(),
                original.residualStandardDeviation(),
                original.rSquared(),
                original.adjustedRSquared(),
                original.degreesOfFreedom(),
                original.pointCount(),
                original.iterations(),
                original.converged(),
                original.stopReason(),
                original.residuals(),
                original.variableRanges(),
                original.responseRange(),
                original.informationCriterion(),
                original.cautions());
    }

    // ---------------------------------------------------------------- nonlinear

    /** The weighted model seen by the optimizer; remembers the best point it has evaluated. */
    private static final class TrackedModel implements MultivariateJacobianFunction {
        private final Expression expression;
        private final double[][] columns;
        private final double[] rootWeights;
        private final double[] target;
        private final int p;
        double bestCost = Double.POSITIVE_INFINITY;
        double[] bestPoint;
        int evaluations;

        TrackedModel(Expression expression, double[][] columns, double[] rootWeights, double[] target) {
            this.expression = expression;
            this.columns = columns;
            this.rootWeights = rootWeights;
            this.target = target;
            this.p = expression.parameters().size();
        }

        /**
         * Weighted values and Jacobian by columns; the first point where the model is not finite
         * is returned in {@code bad[0]} (−1 if none).
         *
         * @return the weighted residual sum of squares
         */
        double evaluate(double[] point, double[] values, double[][][] jacobianOut, int[] bad) {
            // The fit asks again for points it has just seen (the start, the best point before
            // polishing, the polished point for the covariance): answered from the last and the
            // best evaluation. Callers only read what they get.
            Evaluation known = last != null && java.util.Arrays.equals(point, last.point)
                    ? last
                    : best != null && java.util.Arrays.equals(point, best.point) ? best : null;
            if (known != null) {
                System.arraycopy(known.values, 0, values, 0, values.length);
                jacobianOut[0] = known.jacobian;
                bad[0] = known.bad;
                return known.cost;
            }
            double cost = computed(point, values, jacobianOut, bad);
            last = new Evaluation(point.clone(), values.clone(), jacobianOut[0], bad[0], cost);
            if (bad[0] < 0 && bestPoint != null && java.util.Arrays.equals(bestPoint, point)) {
                best = last;
            }
            return cost;
        }

        /** An evaluation kept for asking again. */
        private record Evaluation(double[] point, double[] values, double[][] jacobian, int bad, double cost) {}

        private Evaluation last;
        private Evaluation best;

        private double computed(double[] point, double[] values, double[][][] jacobianOut, int[] bad) {
            evaluations++;
            double[][] jac = expression.evaluateColumns(columns, point, values, true);
            int n = values.length;
            bad[0] = -1;
            boolean[] undefined = null;
            for (int i = 0; i < n; i++) {
                if (!Double.isFinite(values[i])) {
                    undefined = mark(undefined, n, i, bad);
                }
            }
            for (int k = 0; k < p; k++) {
                double[] column = jac[k];
                for (int i = 0; i < n; i++) {
                    if (!Double.isFinite(column[i])) {
                        undefined = mark(undefined, n, i, bad);
                    }
                    column[i] *= rootWeights[i];
                }
            }
            // A point where the model is undefined gets a large finite residual, so that the
            // optimizer rejects the step that led there instead of propagating NaN.
            double penalty = 1e100 / Math.sqrt(n);
            double cost = 0.0;
            for (int i = 0; i < n; i++) {
                if (undefined != null && undefined[i]) {
                    values[i] = target[i] + penalty;
                    for (int k = 0; k < p; k++) {
                        jac[k][i] = 0.0;
                    }
                } else {
                    values[i] *= rootWeights[i];
                }
                double r = target[i] - values[i];
                cost = Math.fma(r, r, cost);
            }
            if (bad[0] < 0 && cost < bestCost) {
                bestCost = cost;
                bestPoint = point.clone();
            }
            jacobianOut[0] = jac;
            return cost;
        }

        private static boolean[] mark(boolean[] undefined, int n, int i, int[] bad) {
            boolean[] u = undefined == null ? new boolean[n] : undefined;
            u[i] = true;
            if (bad[0] < 0 || i < bad[0]) {
                bad[0] = i;
            }
            return u;
        }

        @Override
        public Pair<RealVector, RealMatrix> value(RealVector point) {
            int n = target.length;
            double[] values = new double[n];
            double[][][] jac = new double[1][][];
            evaluate(point.toArray(), values, jac, new int[1]);
            double[][] rows = new double[n][p];
            for (int k = 0; k < p; k++) {
                double[] column = jac[0][k];
                for (int i = 0; i < n; i++) {
                    rows[i][k] = column[i];
                }
            }
            return new Pair<>(new ArrayRealVector(values, false), new Array2DRowRealMatrix(rows, false));
        }
    }

    private FitResult fitNonlinear(Observations data, FitForm form, FitPlan plan) {
        Expression expression = Expression.parse(plan.expression(), data.variableNames(), plan.parameterNames());
        for (String name : plan.parameterNames()) {
            if (!expression.dependsOn(name)) {
                throw new InputException(
                        "start", "parameter '" + name + "' does not appear in the expression " + plan.expression());
            }
        }
        double[] y = data.response();
        double[] sw = rootWeights(data);
        int n = y.length;
        int p = plan.parameterNames().size();
        double[] target = new double[n];
        for (int i = 0; i < n; i++) {
            target[i] = y[i] * sw[i];
        }
        double[][] columns = data.columns();
        TrackedModel model = new TrackedModel(expression, columns, sw, target);
        int[] bad = new int[1];
        model.evaluate(plan.start(), new double[n], new double[1][][], bad);
        if (bad[0] >= 0) {
            throw new InputException(
                    "start",
                    "the model " + plan.expression()
                            + " or its derivative is not a finite number at the starting values "
                            + startText(plan) + " for point " + (bad[0] + 1) + pointText(data, bad[0])
                            + "; choose other starting values");
        }
        boolean converged;
        String stop;
        int iterations;
        Damped damped = damped(model, plan.start(), Math.min(maxIterations, DAMPED_BUDGET), tolerance);
        if (damped != null && damped.degenerate()) {
            // A parameter lost its influence on the way (e.g. an exponent run off to where exp(−b x)
            // is 0): a stationary point of no use. MINPACK's method goes from the start again, and
            // the better of the two points found is kept (the model remembers it).
            Minpack outcome = minpack(model, plan.start(), target, tolerance, maxIterations);
            converged = outcome.converged();
            iterations = damped.iterations() + outcome.iterations();
            stop = "Levenberg–Marquardt on the normal equations stopped where a parameter had lost its influence;"
                    + " then MINPACK's Levenberg–Marquardt from the start: " + outcome.stop();
        } else if (damped != null) {
            converged = true;
            iterations = damped.iterations();
            stop = damped.stop();
        } else {
            int spent = Math.min(maxIterations, DAMPED_BUDGET);
            Minpack outcome = minpack(model, plan.start(), target, tolerance, maxIterations);
            converged = outcome.converged();
            iterations = spent + outcome.iterations();
            stop = "Levenberg–Marquardt on the normal equations did not settle in " + spent
                    + " iterations; then MINPACK's Levenberg–Marquardt from the start: " + outcome.stop();
        }
        Polished polishing = polish(model, model.bestPoint, n, p);
        double[] point = polishing.point();
        int polished = polishing.accepted();
        if (polished > 0) {
            stop += "; then " + polished + " Gauss–Newton polishing step(s)";
        }
        double[][][] jac = new double[1][][];
        model.evaluate(point, new double[n], jac, bad);
        // The polishing's last factorisation, where it was made at the final point, is the one needed.
        Covariance cov = covariance(
                polishing.factorisedAtPoint() != null ? polishing.factorisedAtPoint() : new HouseholderQr(jac[0]),
                plan.parameterNames());
        double[] predicted = new double[n];
        expression.evaluate(columns, point, predicted, null);
        List<Caution> extra = new ArrayList<>();
        extra.add(Caution.note(
                "linearised-uncertainty",
                "standard errors and confidence intervals of a nonlinear model are linearised at the solution"
                        + " (asymptotic); they can be optimistic when the model is strongly curved over the"
                        + " uncertainty region",
                BASIS_ASYMPTOTIC));
        if (!converged) {
            extra.add(Caution.serious(
                    "fit-not-converged",
                    "the fit did not converge within " + maxIterations + " iterations; the parameters shown are the"
                            + " best point reached (weighted RSS " + model.bestCost + "). Try other starting values.",
                    "common practice, no source"));
        }
        return finish(data, form, plan, point, predicted, cov, iterations + polished, converged, stop, extra);
    }

    /**
     * MINPACK's Levenberg–Marquardt (Moré 1978, as ported in Commons Math) from {@code start}: the
     * fallback where the damped normal-equation iterations do not settle.
     *
     * @return whether it converged, its iterations and how it stopped
     */
    private static Minpack minpack(
            TrackedModel model, double[] start, double[] target, double tolerance, int maxIterations) {
        LeastSquaresProblem problem = new LeastSquaresBuilder()
                .start(start)
                .model(model)
                .target(target)
                .lazyEvaluation(false)
                .maxIterations(maxIterations)
                .maxEvaluations(maxIterations * 4)
                .build();
        LevenbergMarquardtOptimizer optimizer = new LevenbergMarquardtOptimizer()
                .withCostRelativeTolerance(tolerance)
                .withParameterRelativeTolerance(tolerance)
                .withOrthoTolerance(tolerance);
        try {
            LeastSquaresOptimizer.Optimum optimum = optimizer.optimize(problem);
            return new Minpack(true, optimum.getIterations(), "met its relative tolerance " + tolerance);
        } catch (TooManyEvaluationsException | TooManyIterationsException e) {
            return new Minpack(false, maxIterations, "used its whole budget of " + maxIterations + " iterations");
        } catch (ConvergenceException e) {
            // MINPACK's "tolerance too small": no further reduction possible in double precision.
            return new Minpack(
                    true,
                    model.evaluations,
                    "stopped: no further reduction of the residual possible in double precision");
        }
    }

    /** Relative step below which damped iterations in Gauss–Newton's regime hand over to polishing. */
    static final double HANDOVER = 1e-5;

    /**
     * Relative step below which a rejected step is taken as rounding (the cost of so small a step is
     * decided by the last digits of the sums): the polishing takes over.
     */
    static final double ROUNDING_STEP = 1e-10;

    /** How MINPACK's method ended. */
    private record Minpack(boolean converged, int iterations, String stop) {}

    /** Iterations the damped normal-equation method may take before MINPACK's takes over. */
    static final int DAMPED_BUDGET = 500;

    /**
     * How the damped iterations ended; {@code degenerate} where a column of J fell below 10⁻¹² of
     * its largest size on the way (a parameter no longer moves the model).
     */
    private record Damped(int iterations, String stop, boolean degenerate) {}

    private static boolean degenerate(double[][] a, double[] scale) {
        for (int k = 0; k < scale.length; k++) {
            if (!(a[k][k] > 1e-24 * scale[k])) {
                return true;
            }
        }
        return false;
    }

    /**
     * Levenberg–Marquardt on the normal equations (Madsen, Nielsen and Tingleff 2004, "Methods for
     * non-linear least squares problems", 2nd ed., DTU, Algorithm 3.16, with Marquardt's (1963)
     * scaling of the damping by the diagonal of JᵀJ and Nielsen's (1999) update of the damping).
     * One pass over the points per iteration forms JᵀJ and Jᵀr (p × p), so no n × p matrix is
     * copied or factorised; the accuracy lost to the normal equations (cond(J)²) is recovered by the
     * Householder polishing that follows, which works on J itself.
     *
     * @return how it ended, or null where it did not settle within {@code budget} iterations (the
     *     caller then runs MINPACK's method from the start); the best point is in the model
     */
    private static Damped damped(TrackedModel model, double[] start, int budget, double tolerance) {
        int n = model.target.length;
        int p = model.p;
        double[] x = start.clone();
        double[] values = new double[n];
        double[][][] jac = new double[1][][];
        int[] bad = new int[1];
        double cost = model.evaluate(x, values, jac, bad);
        if (bad[0] >= 0) {
            return null;
        }
        double[][] a = new double[p][p];
        double[] g = new double[p];
        double rNorm = normalEquations(model.target, values, jac[0], a, g);
        double[] scale = new double[p];
        double mu = 1e-3;
        double nu = 2.0;
        double previousStep = Double.POSITIVE_INFINITY;
        double[] trialValues = new double[n];
        for (int iteration = 1; iteration <= budget; iteration++) {
            for (int k = 0; k < p; k++) {
                scale[k] = Math.max(scale[k], a[k][k]);
            }
            // Orthogonality of r to the columns of J: the gradient test, scale-free (MINPACK's gtol).
            double orthogonality = 0.0;
            for (int k = 0; k < p; k++) {
                double column = Math.sqrt(a[k][k]);
                if (column > 0.0 && rNorm > 0.0) {
                    orthogonality = Math.max(orthogonality, Math.abs(g[k]) / (column * rNorm));
                }
            }
            if (rNorm == 0.0 || orthogonality <= tolerance) {
                return new Damped(
                        iteration - 1,
                        "Levenberg–Marquardt met its relative tolerance " + tolerance
                                + " (residuals orthogonal to the Jacobian)",
                        degenerate(a, scale));
            }
            double[] h = dampedStep(a, g, scale, mu);
            if (h == null) {
                mu *= nu;
                nu *= 2.0;
                if (!(mu < 1e300)) {
                    return null;
                }
                continue;
            }
            double stepNorm = 0.0;
            double xNorm = 0.0;
            for (int k = 0; k < p; k++) {
                double sk = Math.sqrt(scale[k]);
                stepNorm = Math.hypot(stepNorm, sk * h[k]);
                xNorm = Math.hypot(xNorm, sk * x[k]);
            }
            double[] trial = x.clone();
            for (int k = 0; k < p; k++) {
                trial[k] += h[k];
            }
            double[][][] trialJac = new double[1][][];
            double trialCost = model.evaluate(trial, trialValues, trialJac, bad);
            // Predicted reduction of the cost ½‖r‖² by the linear model: ½ hᵀ(μ D h + g).
            double predicted = 0.0;
            for (int k = 0; k < p; k++) {
                predicted += h[k] * (mu * scale[k] * h[k] + g[k]);
            }
            double rho = bad[0] >= 0 ? -1.0 : (cost - trialCost) / predicted;
            if (rho > 0.0) {
                double reduction = (cost - trialCost) / cost;
                x = trial;
                double[] swap = values;
                values = trialValues;
                trialValues = swap;
                cost = trialCost;
                rNorm = normalEquations(model.target, values, trialJac[0], a, g);
                double t = 2.0 * rho - 1.0;
                mu *= Math.max(1.0 / 3.0, 1.0 - t * t * t);
                nu = 2.0;
                if (stepNorm <= tolerance * xNorm) {
                    return new Damped(
                            iteration,
                            "Levenberg–Marquardt met its relative tolerance " + tolerance + " (step)",
                            degenerate(a, scale));
                }
                boolean contracting = stepNorm <= 1e-2 * previousStep;
                previousStep = stepNorm;
                if (rho > 0.75 && rho < 1.25 && mu < 1e-3 && contracting && stepNorm <= HANDOVER * xNorm) {
                    // The linear model predicts the cost well, the damping has gone and the steps
                    // shrink a hundredfold at a time: Gauss–Newton's quadratic regime, where the Householder polishing
                    // that follows converges faster and to
                    // more digits than further normal-equation steps.
                    return new Damped(
                            iteration,
                            "Levenberg–Marquardt reached the Gauss–Newton regime (step below " + HANDOVER
                                    + " relative)",
                            degenerate(a, scale));
                }
                if (reduction <= tolerance && rho <= 2.0 && stepNorm <= 1e-8 * xNorm) {
                    return new Damped(
                            iteration,
                            "Levenberg–Marquardt met its relative tolerance " + tolerance + " (cost)",
                            degenerate(a, scale));
                }
            } else {
                if (stepNorm <= Math.max(tolerance, ROUNDING_STEP) * xNorm) {
                    // Even a step this small no longer lowers the cost: rounding has the last word.
                    return new Damped(
                            iteration,
                            "Levenberg–Marquardt stopped: no further reduction of the residual possible in double"
                                    + " precision",
                            degenerate(a, scale));
                }
                mu *= nu;
                nu *= 2.0;
                if (!(mu < 1e300)) {
                    return null;
                }
            }
        }
        return null;
    }

    /** Forms JᵀJ and Jᵀr for r = target − values; returns ‖r‖. */
    private static double normalEquations(double[] target, double[] values, double[][] jac, double[][] a, double[] g) {
        int n = target.length;
        int p = jac.length;
        for (int k = 0; k < p; k++) {
            java.util.Arrays.fill(a[k], 0.0);
        }
        java.util.Arrays.fill(g, 0.0);
        double rr = 0.0;
        if (p == 3) {
            // The usual size, unrolled: one pass with the sums in registers.
            double[] j0 = jac[0];
            double[] j1 = jac[1];
            double[] j2 = jac[2];
            double a00 = 0, a01 = 0, a02 = 0, a11 = 0, a12 = 0, a22 = 0, g0 = 0, g1 = 0, g2 = 0;
            for (int i = 0; i < n; i++) {
                double r = target[i] - values[i];
                double u = j0[i];
                double v = j1[i];
                double w = j2[i];
                a00 = Math.fma(u, u, a00);
                a01 = Math.fma(u, v, a01);
                a02 = Math.fma(u, w, a02);
                a11 = Math.fma(v, v, a11);
                a12 = Math.fma(v, w, a12);
                a22 = Math.fma(w, w, a22);
                g0 = Math.fma(u, r, g0);
                g1 = Math.fma(v, r, g1);
                g2 = Math.fma(w, r, g2);
                rr = Math.fma(r, r, rr);
            }
            a[0][0] = a00;
            a[0][1] = a01;
            a[0][2] = a02;
            a[1][1] = a11;
            a[1][2] = a12;
            a[2][2] = a22;
            g[0] = g0;
            g[1] = g1;
            g[2] = g2;
        } else {
            for (int i = 0; i < n; i++) {
                double r = target[i] - values[i];
                rr = Math.fma(r, r, rr);
                for (int k = 0; k < p; k++) {
                    double jk = jac[k][i];
                    g[k] = Math.fma(jk, r, g[k]);
                    for (int m = k; m < p; m++) {
                        a[k][m] = Math.fma(jk, jac[m][i], a[k][m]);
                    }
                }
            }
        }
        for (int k = 0; k < p; k++) {
            for (int m = 0; m < k; m++) {
                a[k][m] = a[m][k];
            }
        }
        return Math.sqrt(rr);
    }

    /** Solves (A + μ D) h = g by Cholesky; null where the damped matrix is not positive definite. */
    private static double[] dampedStep(double[][] a, double[] g, double[] scale, double mu) {
        int p = g.length;
        double[][] l = new double[p][p];
        for (int i = 0; i < p; i++) {
            for (int j = 0; j <= i; j++) {
                double sum = a[i][j] + (i == j ? mu * Math.max(scale[i], Double.MIN_NORMAL) : 0.0);
                for (int k = 0; k < j; k++) {
                    sum -= l[i][k] * l[j][k];
                }
                if (i == j) {
                    if (!(sum > 0.0) || !Double.isFinite(sum)) {
                        return null;
                    }
                    l[i][i] = Math.sqrt(sum);
                } else {
                    l[i][j] = sum / l[j][j];
                }
            }
        }
        double[] h = new double[p];
        for (int i = 0; i < p; i++) {
            double sum = g[i];
            for (int k = 0; k < i; k++) {
                sum -= l[i][k] * h[k];
            }
            h[i] = sum / l[i][i];
        }
        for (int i = p - 1; i >= 0; i--) {
            double sum = h[i];
            for (int k = i + 1; k < p; k++) {
                sum -= l[k][i] * h[k];
            }
            h[i] = sum / l[i][i];
        }
        for (double v : h) {
            if (!Double.isFinite(v)) {
                return null;
            }
        }
        return h;
    }

    /**
     * Gauss–Newton steps from the Levenberg–Marquardt result. Near the minimum the change in cost
     * drowns in rounding while the steps still carry digits, so a step is kept while the steps
     * contract (each at most {@link #CONTRACTION} of the previous one, the signature of Gauss–Newton's
     * local convergence) and the cost does not rise beyond rounding.
     *
     * @return the polished point and the number of steps kept
     */
    /** The polished point, the steps kept, and the factorisation of J at the point if one was made. */
    private record Polished(double[] point, int accepted, HouseholderQr factorisedAtPoint) {}

    private static Polished polish(TrackedModel model, double[] from, int n, int p) {
        int accepted = 0;
        double[] point = from.clone();
        HouseholderQr atPoint = null;
        double[] values = new double[n];
        double[][][] jac = new double[1][][];
        int[] bad = new int[1];
        double cost = model.evaluate(point, values, jac, bad);
        double previousStep = Double.POSITIVE_INFINITY;
        for (int step = 0; step < POLISHING_STEPS; step++) {
            double[] r = new double[n];
            for (int i = 0; i < n; i++) {
                r[i] = model.target[i] - values[i];
            }
            HouseholderQr qr = new HouseholderQr(jac[0]);
            atPoint = qr;
            if (!(qr.diagonalRatio() > 0.0)) {
                break;
            }
            // The step is added to the parameters: digits of it below their rounding do not matter.
            double[] negligible = new double[p];
            for (int k = 0; k < p; k++) {
                negligible[k] = 0x1p-53 * Math.abs(point[k]);
            }
            double[] delta = qr.solveRefined(r, REFINEMENT_STEPS, negligible);
            double relativeStep = 0.0;
            double[] trial = point.clone();
            for (int k = 0; k < p; k++) {
                trial[k] += delta[k];
                relativeStep = Math.max(relativeStep, Math.abs(delta[k]) / Math.max(Math.abs(point[k]), 1e-300));
            }
            if (!(relativeStep <= CONTRACTION * previousStep) || relativeStep == 0.0) {
                break;
            }
            double[] trialValues = new double[n];
            double[][][] trialJac = new double[1][][];
            double trialCost = model.evaluate(trial, trialValues, trialJac, bad);
            if (bad[0] >= 0 || !(trialCost <= cost * (1.0 + COST_ROUNDING))) {
                break;
            }
            accepted++;
            point = trial;
            atPoint = null;
            values = trialValues;
            jac = trialJac;
            cost = trialCost;
            previousStep = relativeStep;
            if (relativeStep < 1e-16) {
                break;
            }
        }
        return new Polished(point, accepted, atPoint);
    }

    private static String startText(FitPlan plan) {
        StringBuilder s = new StringBuilder();
        for (int k = 0; k < plan.parameterNames().size(); k++) {
            s.append(k == 0 ? "" : ", ")
                    .append(plan.parameterNames().get(k))
                    .append('=')
                    .append(plan.start()[k]);
        }
        return s.toString();
    }

    private static String pointText(Observations data, int i) {
        StringBuilder s = new StringBuilder(" (");
        List<String> vars = data.variableNames();
        for (int v = 0; v < vars.size(); v++) {
            s.append(v == 0 ? "" : ", ").append(vars.get(v)).append('=').append(data.column(v)[i]);
        }
        return s.append(')').toString();
    }

    // ---------------------------------------------------------------- statistics

    /** (JᵀJ)⁻¹ of the weighted Jacobian, and its conditioning. */
    private record Covariance(double[][] unscaled, double singularValueRatio, List<Caution> cautions) {}

    private static Covariance covariance(HouseholderQr qr, List<String> names) {
        int p = qr.columns();
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(qr.scaledR()));
        double[] s = svd.getSingularValues();
        double ratio = s[p - 1] / s[0];
        if (!(ratio > RANK_TOLERANCE)) {
            throw new InputException(
                    "data",
                    String.format(
                            Locale.ROOT,
                            "the parameters %s cannot be determined separately from these data (smallest to largest"
                                    + " singular value of the scaled Jacobian %.3g); remove a redundant column or"
                                    + " parameter, or add data that separate them",
                            names,
                            ratio));
        }
        double[][] v = svd.getV().getData();
        double[] scale = qr.columnScale();
        double[][] cov = new double[p][p];
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < p; j++) {
                double sum = 0.0;
                for (int k = 0; k < p; k++) {
                    sum += v[i][k] * v[j][k] / (s[k] * s[k]);
                }
                cov[i][j] = sum / (scale[i] * scale[j]);
            }
        }
        List<Caution> cautions = new ArrayList<>();
        if (ratio < ILL_CONDITIONED) {
            cautions.add(Caution.warning(
                    "ill-conditioned-fit",
                    String.format(
                            Locale.ROOT,
                            "the parameters are nearly interchangeable in these data (singular value ratio %.3g of"
                                    + " the scaled Jacobian); their standard errors are large and correlated",
                            ratio),
                    "common practice, no source"));
        }
        return new Covariance(cov, ratio, cautions);
    }

    private static double[] rootWeights(Observations data) {
        double[] w = data.weights();
        double[] sw = new double[data.size()];
        for (int i = 0; i < sw.length; i++) {
            sw[i] = w == null ? 1.0 : Math.sqrt(w[i]);
        }
        return sw;
    }

    private static double tQuantile(int dof) {
        return new TDistribution(null, dof).inverseCumulativeProbability(0.975);
    }

    private FitResult finish(
            Observations data,
            FitForm form,
            FitPlan plan,
            double[] coefficients,
            double[] predicted,
            Covariance cov,
            int iterations,
            boolean converged,
            String stop,
            List<Caution> extra) {
        double[] y = data.response();
        double[] w = data.weights();
        int n = y.length;
        int p = coefficients.length;
        int dof = n - p;
        double[] residuals = new double[n];
        double rss = 0.0;
        double sumW = 0.0;
        double sumWy = 0.0;
        for (int i = 0; i < n; i++) {
            double wi = w == null ? 1.0 : w[i];
            residuals[i] = y[i] - predicted[i];
            rss = Math.fma(wi * residuals[i], residuals[i], rss);
            sumW += wi;
            sumWy += wi * y[i];
        }
        double centre = plan.centred() ? sumWy / sumW : 0.0;
        double tss = 0.0;
        for (int i = 0; i < n; i++) {
            double wi = w == null ? 1.0 : w[i];
            double d = y[i] - centre;
            tss = Math.fma(wi * d, d, tss);
        }
        List<Caution> cautions = new ArrayList<>(extra);
        double r2;
        if (tss > 0) {
            r2 = 1.0 - rss / tss;
        } else {
            r2 = 0.0;
            cautions.add(Caution.note(
                    "constant-response",
                    "every response value is the same, so R² is not defined and is reported as 0",
                    "common practice, no source"));
        }
        double adjusted = 1.0 - (1.0 - r2) * (n - (plan.centred() ? 1 : 0)) / dof;
        double sigma = Math.sqrt(rss / dof);
        double t = tQuantile(dof);
        List<FittedParameter> parameters = new ArrayList<>();
        for (int k = 0; k < p; k++) {
            double se = cov.unscaled == null ? 0.0 : sigma * Math.sqrt(cov.unscaled[k][k]);
            parameters.add(new FittedParameter(
                    plan.parameterNames().get(k),
                    coefficients[k],
                    se,
                    coefficients[k] - t * se,
                    coefficients[k] + t * se));
        }
        cautions.addAll(cov.cautions);
        if (dof < 3) {
            cautions.add(Caution.warning(
                    "few-degrees-of-freedom",
                    "only " + dof + " degree(s) of freedom remain after fitting " + p + " parameter(s) to " + n
                            + " points; the uncertainty estimates are weak",
                    "common practice, no source"));
        }
        if (!plan.centred()) {
            cautions.add(Caution.note(
                    "uncentred-r-squared",
                    "the model has no intercept, so R² is the uncentred 1 − RSS/Σy², not comparable with R² of a"
                            + " model with intercept",
                    "common practice, no source"));
        }
        int k = p + 1;
        double aic = n * Math.log(Math.max(rss / n, Double.MIN_NORMAL)) + 2.0 * k;
        if (n - k - 1 > 0) {
            aic += 2.0 * k * (k + 1) / (n - k - 1);
        }
        return new FitResult(
                form.id(),
                form.description(),
                data.responseName(),
                data.variableNames(),
                plan.expression(),
                parameters,
                rss,
                sigma,
                r2,
                adjusted,
                dof,
                n,
                iterations,
                converged,
                stop,
                residuals,
                data.variableRanges(),
                data.responseRange(),
                aic,
                cautions);
    }
}
