package org.headway.correlation;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.fitting.Expression;
import org.headway.fitting.FitResult;
import org.headway.fitting.FittedParameter;
import org.headway.fitting.VariableRange;

/**
 * A correlation the user fitted to their own data: the model text, the fitted parameter values,
 * the range of data it was fitted over, and its fit statistics.
 *
 * <p>Its validity range is the fitted data range of each variable; {@link #rangeCautions} flags
 * extrapolation. Citation: "fitted by the user to their data".
 */
public final class FittedCorrelation {

    /** The citation every fitted correlation carries. */
    public static final String CITATION = "fitted by the user to their data";

    private final String responseName;
    private final String formDescription;
    private final String expressionText;
    private final List<String> variableNames;
    private final List<FittedParameter> parameters;
    private final List<VariableRange> variableRanges;
    private final FitStatistics statistics;
    private final Expression expression;
    private final double[] parameterValues;

    /**
     * @param responseName name of the fitted response
     * @param formDescription the form in words
     * @param expressionText the model as {@link Expression} text over variable and parameter names
     * @param variableNames the model's inputs, in the order {@link #evaluate} takes them
     * @param parameters fitted parameters
     * @param variableRanges fitted data range of each input, same order
     * @param statistics fit statistics
     * @throws InputException if the expression does not parse with these names or ranges mismatch
     */
    public FittedCorrelation(
            String responseName,
            String formDescription,
            String expressionText,
            List<String> variableNames,
            List<FittedParameter> parameters,
            List<VariableRange> variableRanges,
            FitStatistics statistics) {
        this.responseName = Objects.requireNonNull(responseName, "responseName");
        this.formDescription = Objects.requireNonNull(formDescription, "formDescription");
        this.expressionText = Objects.requireNonNull(expressionText, "expressionText");
        this.variableNames = List.copyOf(variableNames);
        this.parameters = List.copyOf(parameters);
        this.variableRanges = List.copyOf(variableRanges);
        this.statistics = Objects.requireNonNull(statistics, "statistics");
        if (this.variableRanges.size() != this.variableNames.size()) {
            throw new InputException(
                    "variables",
                    "need one data range per variable " + variableNames + ", got " + variableRanges.size());
        }
        for (int v = 0; v < this.variableNames.size(); v++) {
            VariableRange r = this.variableRanges.get(v);
            if (!Double.isFinite(r.min()) || !Double.isFinite(r.max()) || r.min() > r.max()) {
                throw new InputException(
                        "variables[" + v + "]", "range of " + r.name() + " must be finite with min ≤ max, got " + r);
            }
        }
        List<String> names = new ArrayList<>();
        this.parameterValues = new double[this.parameters.size()];
        for (int k = 0; k < this.parameters.size(); k++) {
            FittedParameter p = this.parameters.get(k);
            names.add(p.name());
            parameterValues[k] = InputException.requireFinite("parameters." + p.name(), p.value());
        }
        this.expression = Expression.parse(expressionText, this.variableNames, names);
    }

    /**
     * The correlation of a finished fit: it can be evaluated, saved and used in a pipe run.
     *
     * @param fit a finished fit
     * @return its correlation
     */
    public static FittedCorrelation of(FitResult fit) {
        return new FittedCorrelation(
                fit.responseName(),
                fit.formDescription(),
                fit.modelExpression(),
                fit.variableNames(),
                fit.parameters(),
                fit.variableRanges(),
                new FitStatistics(
                        fit.residualSumOfSquares(),
                        fit.residualStandardDeviation(),
                        fit.rSquared(),
                        fit.adjustedRSquared(),
                        fit.degreesOfFreedom(),
                        fit.pointCount()));
    }

    /**
     * Evaluates the correlation. Does not check the range; see {@link #rangeCautions}.
     *
     * @param inputs one value per variable, in {@link #variableNames()} order (units of the fitted
     *     data)
     * @return the value (units of the fitted response); non-finite if the model is undefined there
     * @throws InputException if the number of inputs is wrong or an input is not finite
     */
    public double evaluate(double... inputs) {
        if (inputs.length != variableNames.size()) {
            throw new InputException(
                    "inputs",
                    "this correlation takes " + variableNames + " (" + variableNames.size() + " values), got "
                            + inputs.length);
        }
        for (int v = 0; v < inputs.length; v++) {
            InputException.requireFinite(variableNames.get(v), inputs[v]);
        }
        return expression.evaluate(inputs, parameterValues);
    }

    /**
     * Cautions for inputs outside the fitted data range (extrapolation).
     *
     * @param inputs one value per variable, in {@link #variableNames()} order
     * @return one warning per input outside its range; empty inside the range
     */
    public List<Caution> rangeCautions(double... inputs) {
        List<Caution> out = new ArrayList<>();
        for (int v = 0; v < Math.min(inputs.length, variableRanges.size()); v++) {
            VariableRange r = variableRanges.get(v);
            if (!r.contains(inputs[v])) {
                out.add(Caution.warning(
                        "fitted-correlation-extrapolated",
                        String.format(
                                Locale.ROOT,
                                "%s = %s is outside the range %s to %s that the correlation for %s was fitted"
                                        + " over; the value is an extrapolation",
                                r.name(),
                                org.headway.caution.Figures.significant(inputs[v]),
                                org.headway.caution.Figures.significant(r.min()),
                                org.headway.caution.Figures.significant(r.max()),
                                responseName),
                        CITATION));
            }
        }
        return out;
    }

    /** Name of the fitted response. */
    public String responseName() {
        return responseName;
    }

    /** The form in words. */
    public String formDescription() {
        return formDescription;
    }

    /** The model as expression text. */
    public String expressionText() {
        return expressionText;
    }

    /** The inputs, in evaluation order. */
    public List<String> variableNames() {
        return variableNames;
    }

    /** Fitted parameters. */
    public List<FittedParameter> parameters() {
        return parameters;
    }

    /** Fitted data range of each input. */
    public List<VariableRange> variableRanges() {
        return variableRanges;
    }

    /** Fit statistics. */
    public FitStatistics statistics() {
        return statistics;
    }

    /** "fitted by the user to their data". */
    public String citation() {
        return CITATION;
    }

    /** The equation with parameter values substituted, for a review sheet. */
    public String equation() {
        String text = responseName + " = " + expressionText;
        StringBuilder s = new StringBuilder(text).append("  with ");
        for (int k = 0; k < parameters.size(); k++) {
            s.append(k == 0 ? "" : ", ")
                    .append(parameters.get(k).name())
                    .append(" = ")
                    .append(String.format(Locale.ROOT, "%.6g", parameters.get(k).value()));
        }
        return s.toString();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof FittedCorrelation f
                && f.responseName.equals(responseName)
                && f.formDescription.equals(formDescription)
                && f.expressionText.equals(expressionText)
                && f.variableNames.equals(variableNames)
                && f.parameters.equals(parameters)
                && f.variableRanges.equals(variableRanges)
                && f.statistics.equals(statistics);
    }

    @Override
    public int hashCode() {
        return Objects.hash(responseName, expressionText, variableNames, parameters, variableRanges);
    }

    @Override
    public String toString() {
        return "FittedCorrelation[" + equation() + "]";
    }
}
