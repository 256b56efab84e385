package org.headway.fitting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.headway.caution.InputException;

/**
 * Turns a {@link FitForm} and the {@link Observations} into the {@link FitPlan} that {@link
 * LeastSquaresFitter} solves: parameter names that do not clash with the columns, the model text,
 * and the design matrix of a linear form or the starting values of a nonlinear one. One visitor
 * method per form, so a new form cannot be left without a plan. Refuses data that do not suit the
 * form (wrong number of columns, values a logarithm or power cannot take).
 */
final class FitPlanner implements FitForm.Visitor<FitPlan> {

    private final Observations data;
    private final List<String> vars;
    private final double[][] x;
    private final int n;
    private final double[] ones;

    private FitPlanner(Observations data) {
        this.data = data;
        this.vars = data.variableNames();
        this.x = data.columns();
        this.n = data.size();
        this.ones = new double[n];
        Arrays.fill(ones, 1.0);
    }

    /**
     * @param data the observations
     * @param form the model form (a power form in log space is planned as the nonlinear one; the
     *     fitter solves that variant apart)
     * @return what to solve
     * @throws InputException if the data do not suit the form
     */
    static FitPlan plan(Observations data, FitForm form) {
        return form.accept(new FitPlanner(data));
    }

    @Override
    public FitPlan userExpression(FitForm.UserExpression user) {
        List<String> names = List.copyOf(user.start().keySet());
        double[] start =
                user.start().values().stream().mapToDouble(Double::doubleValue).toArray();
        return new FitPlan(names, user.expression(), null, start, true);
    }

    @Override
    public FitPlan constant(FitForm.Constant form) {
        String a = unique("a", vars);
        return new FitPlan(List.of(a), a, new double[][] {ones}, null, true);
    }

    @Override
    public FitPlan linear(FitForm.Linear form) {
        return linear(form, true);
    }

    @Override
    public FitPlan throughOrigin(FitForm.ThroughOrigin form) {
        return linear(form, false);
    }

    /** y = a + Σ bᵢxᵢ with the intercept, Σ bᵢxᵢ without. */
    private FitPlan linear(FitForm form, boolean intercept) {
        requireColumns(vars, 1, Integer.MAX_VALUE, form);
        List<String> names = new ArrayList<>();
        List<double[]> design = new ArrayList<>();
        StringBuilder text = new StringBuilder();
        if (intercept) {
            names.add(unique("a", vars));
            design.add(ones);
            text.append(names.get(0));
        }
        for (int v = 0; v < vars.size(); v++) {
            String b = unique(vars.size() == 1 ? "b" : "b" + (v + 1), vars);
            names.add(b);
            design.add(x[v]);
            text.append(text.length() == 0 ? "" : " + ").append(b).append('*').append(vars.get(v));
        }
        return new FitPlan(names, text.toString(), design.toArray(new double[0][]), null, intercept);
    }

    @Override
    public FitPlan logarithmic(FitForm.Logarithmic form) {
        requireColumns(vars, 1, 1, form);
        requirePositive(vars.get(0), x[0], "the logarithm needs positive values");
        double[] lx = new double[n];
        for (int i = 0; i < n; i++) {
            lx[i] = Math.log(x[0][i]);
        }
        String a = unique("a", vars);
        String b = unique("b", vars);
        return new FitPlan(
                List.of(a, b), a + " + " + b + "*ln(" + vars.get(0) + ")", new double[][] {ones, lx}, null, true);
    }

    @Override
    public FitPlan polynomial(FitForm.Polynomial poly) {
        requireColumns(vars, 1, 1, poly);
        List<String> names = new ArrayList<>();
        double[][] design = new double[poly.degree() + 1][];
        StringBuilder text = new StringBuilder();
        for (int d = 0; d <= poly.degree(); d++) {
            String c = unique("c" + d, vars);
            names.add(c);
            double[] col = new double[n];
            for (int i = 0; i < n; i++) {
                col[i] = d == 0 ? 1.0 : Math.pow(x[0][i], d);
            }
            design[d] = col;
            text.append(d == 0 ? c : " + " + c + "*" + vars.get(0) + (d == 1 ? "" : "^" + d));
        }
        return new FitPlan(names, text.toString(), design, null, true);
    }

    @Override
    public FitPlan power(FitForm.Power form) {
        requireColumns(vars, 1, 1, form);
        requirePositive(vars.get(0), x[0], "a power law x^b needs positive x");
        String a = unique("a", vars);
        String b = unique("b", vars);
        return new FitPlan(List.of(a, b), a + "*" + vars.get(0) + "^" + b, null, logLinearStart(1.0), true);
    }

    @Override
    public FitPlan powerProduct(FitForm.PowerProduct form) {
        requireColumns(vars, 1, Integer.MAX_VALUE, form);
        List<String> names = new ArrayList<>();
        String c = unique("C", vars);
        names.add(c);
        StringBuilder text = new StringBuilder(c);
        for (int v = 0; v < vars.size(); v++) {
            requirePositive(vars.get(v), x[v], "a power product needs positive values");
            String e = unique("n_" + vars.get(v), vars);
            names.add(e);
            text.append('*').append(vars.get(v)).append('^').append(e);
        }
        return new FitPlan(names, text.toString(), null, logLinearStart(1.0), true);
    }

    @Override
    public FitPlan exponential(FitForm.Exponential form) {
        requireColumns(vars, 1, 1, form);
        String a = unique("a", vars);
        String b = unique("b", vars);
        return new FitPlan(
                List.of(a, b), a + "*exp(" + b + "*" + vars.get(0) + ")", null, exponentialStart(x[0]), true);
    }

    static String unique(String name, List<String> taken) {
        String candidate = name;
        while (taken.contains(candidate)) {
            candidate = candidate + "_";
        }
        return candidate;
    }

    static void requireColumns(List<String> vars, int min, int max, FitForm form) {
        if (vars.size() < min || vars.size() > max) {
            String expected = min == max ? "exactly " + min : "at least " + min;
            throw new InputException(
                    "x columns",
                    "the " + form.id() + " form needs " + expected + " explanatory column(s), got " + vars.size() + " "
                            + vars);
        }
    }

    static void requirePositive(String name, double[] values, String why) {
        for (int i = 0; i < values.length; i++) {
            if (!(values[i] > 0)) {
                throw new InputException(name + ", point " + (i + 1), why + "; got " + values[i]);
            }
        }
    }

    /** Start for y = C·Π xᵢ^nᵢ from the linear fit of ln|y| on ln xᵢ (or C = mean, nᵢ = defaultExponent). */
    private double[] logLinearStart(double defaultExponent) {
        double[] y = data.response();
        double sign = y[0] < 0 ? -1.0 : 1.0;
        boolean usable = true;
        for (double v : y) {
            usable &= sign * v > 0;
        }
        double[] start = new double[x.length + 1];
        if (!usable || n <= x.length + 1) {
            start[0] = mean(y);
            Arrays.fill(start, 1, start.length, defaultExponent);
            return start;
        }
        double[][] design = new double[x.length + 1][n];
        double[] ly = new double[n];
        for (int i = 0; i < n; i++) {
            design[0][i] = 1.0;
            ly[i] = Math.log(sign * y[i]);
            for (int v = 0; v < x.length; v++) {
                design[v + 1][i] = Math.log(x[v][i]);
            }
        }
        double[] coefficients = new HouseholderQr(design).solve(ly);
        start[0] = sign * Math.exp(coefficients[0]);
        System.arraycopy(coefficients, 1, start, 1, x.length);
        for (double s : start) {
            if (!Double.isFinite(s)) {
                start[0] = mean(y);
                Arrays.fill(start, 1, start.length, defaultExponent);
                break;
            }
        }
        return start;
    }

    private double[] exponentialStart(double[] column) {
        double[] y = data.response();
        double sign = y[0] < 0 ? -1.0 : 1.0;
        boolean usable = true;
        for (double v : y) {
            usable &= sign * v > 0;
        }
        if (!usable || y.length < 3) {
            return new double[] {mean(y), 0.0};
        }
        double[] constant = new double[y.length];
        double[] ly = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            constant[i] = 1.0;
            ly[i] = Math.log(sign * y[i]);
        }
        double[] c = new HouseholderQr(new double[][] {constant, column}).solve(ly);
        double[] start = {sign * Math.exp(c[0]), c[1]};
        return Double.isFinite(start[0]) && Double.isFinite(start[1]) ? start : new double[] {mean(y), 0.0};
    }

    private static double mean(double[] v) {
        double s = 0;
        for (double d : v) {
            s += d;
        }
        return s / v.length;
    }
}
