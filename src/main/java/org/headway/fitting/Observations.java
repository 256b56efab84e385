package org.headway.fitting;

import java.util.Arrays;
import java.util.List;
import org.headway.caution.InputException;

/**
 * Data to fit: one response column and one or more explanatory columns, optionally weighted.
 *
 * <p>Explanatory column names must be usable in an {@link Expression} (letters, digits, underscore,
 * not starting with a digit). Values are in whatever consistent units the user's columns carry; the fit is unit-agnostic.
 * Weights w multiply squared residuals (minimising Σ wᵢ rᵢ²); use w = 1/σᵢ² for known point
 * variances.
 */
public final class Observations {

    private static final java.util.regex.Pattern IDENTIFIER =
            java.util.regex.Pattern.compile("[\\p{L}_][\\p{L}\\p{Nd}_]*");

    private final String responseName;
    private final double[] response;
    private final List<String> variableNames;
    private final double[][] columns;
    private final double[] weights;

    /**
     * @param responseName name of the response column
     * @param response response values, finite
     * @param variableNames names of the explanatory columns
     * @param columns one array per explanatory column, same length as the response, finite
     * @param weights one positive finite weight per point, or null for equal weights
     * @throws InputException naming the column and point when a value is not finite, a weight is
     *     not positive, or lengths differ
     */
    public Observations(
            String responseName, double[] response, List<String> variableNames, double[][] columns, double[] weights) {
        this.responseName = responseName;
        this.variableNames = List.copyOf(variableNames);
        if (columns.length != variableNames.size()) {
            throw new InputException("data", "got " + columns.length + " columns for names " + variableNames);
        }
        for (String name : this.variableNames) {
            if (!IDENTIFIER.matcher(name).matches()) {
                throw new InputException(
                        name,
                        "a column used in a model must be named with letters, digits and _ (not starting with a"
                                + " digit) so that the model can refer to it; rename the column");
            }
        }
        int n = response.length;
        if (n == 0) {
            throw new InputException("data", "there are no data points");
        }
        this.response = checked(responseName, response);
        this.columns = new double[columns.length][];
        for (int v = 0; v < columns.length; v++) {
            if (columns[v].length != n) {
                throw new InputException(
                        variableNames.get(v),
                        "has " + columns[v].length + " values but the response " + responseName + " has " + n);
            }
            this.columns[v] = checked(variableNames.get(v), columns[v]);
        }
        if (weights != null) {
            if (weights.length != n) {
                throw new InputException("weights", "has " + weights.length + " values for " + n + " points");
            }
            for (int i = 0; i < n; i++) {
                if (!(weights[i] > 0) || !Double.isFinite(weights[i])) {
                    throw new InputException(
                            "weights, point " + (i + 1), "a weight must be positive and finite, got " + weights[i]);
                }
            }
            this.weights = weights.clone();
        } else {
            this.weights = null;
        }
    }

    /** Unweighted observations. */
    public static Observations of(
            String responseName, double[] response, List<String> variableNames, double[]... columns) {
        return new Observations(responseName, response, variableNames, columns, null);
    }

    private static double[] checked(String name, double[] values) {
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new InputException(name + ", point " + (i + 1), "must be a finite number, got " + values[i]);
            }
        }
        return values.clone();
    }

    /** Name of the response column. */
    public String responseName() {
        return responseName;
    }

    /** Number of points. */
    public int size() {
        return response.length;
    }

    /** Names of the explanatory columns. */
    public List<String> variableNames() {
        return variableNames;
    }

    /** Copy of the response values. */
    public double[] response() {
        return response.clone();
    }

    /** Copy of one explanatory column. */
    public double[] column(int index) {
        return columns[index].clone();
    }

    /** Copy of all explanatory columns. */
    public double[][] columns() {
        double[][] copy = new double[columns.length][];
        for (int v = 0; v < columns.length; v++) {
            copy[v] = columns[v].clone();
        }
        return copy;
    }

    /** Copy of the weights, or null when unweighted. */
    public double[] weights() {
        return weights == null ? null : weights.clone();
    }

    /** Whether the points carry weights. */
    public boolean weighted() {
        return weights != null;
    }

    /** Range of each explanatory column. */
    public List<VariableRange> variableRanges() {
        VariableRange[] ranges = new VariableRange[columns.length];
        for (int v = 0; v < columns.length; v++) {
            ranges[v] = VariableRange.of(variableNames.get(v), columns[v]);
        }
        return List.of(ranges);
    }

    /** Range of the response. */
    public VariableRange responseRange() {
        return VariableRange.of(responseName, response);
    }

    @Override
    public String toString() {
        return "Observations[" + responseName + " vs " + variableNames + ", " + size() + " points, weights "
                + (weights == null ? "none" : Arrays.stream(weights).min().orElse(0) + "…") + "]";
    }
}
