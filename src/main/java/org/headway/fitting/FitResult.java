package org.headway.fitting;

import java.util.List;
import org.headway.caution.Caution;

/**
 * Outcome of one least-squares fit.
 *
 * @param formId id of the fitted form ({@code power}, {@code expression}, …)
 * @param formDescription the form in words with its equation
 * @param responseName name of the response column
 * @param variableNames names of the explanatory columns, in model order
 * @param modelExpression the model as an {@link Expression} text over the column and parameter names
 * @param parameters fitted parameters with standard errors and 95 % confidence intervals
 * @param residualSumOfSquares Σ wᵢ(yᵢ − ŷᵢ)² (units of y squared)
 * @param residualStandardDeviation √(RSS/ν) (units of y)
 * @param rSquared 1 − RSS/TSS (ratio); TSS about the weighted mean, or about zero for a form
 *     without intercept
 * @param adjustedRSquared R² adjusted for the number of parameters (ratio)
 * @param degreesOfFreedom ν = points − parameters
 * @param pointCount number of points
 * @param iterations optimizer iterations (0 for a direct QR solution), including polishing steps
 * @param converged whether the solver met its convergence test
 * @param stopReason how the solver ended, in words
 * @param residuals yᵢ − ŷᵢ per point, unweighted (units of y)
 * @param variableRanges data range of each explanatory column
 * @param responseRange data range of the response
 * @param informationCriterion corrected Akaike criterion AICc = n ln(RSS/n) + 2k + 2k(k+1)/(n−k−1),
 *     k = parameters + 1 (Hurvich and Tsai 1989); lower is better among fits of the same data
 * @param cautions what a reviewer should know about this fit
 */
public record FitResult(
        String formId,
        String formDescription,
        String responseName,
        List<String> variableNames,
        String modelExpression,
        List<FittedParameter> parameters,
        double residualSumOfSquares,
        double residualStandardDeviation,
        double rSquared,
        double adjustedRSquared,
        int degreesOfFreedom,
        int pointCount,
        int iterations,
        boolean converged,
        String stopReason,
        double[] residuals,
        List<VariableRange> variableRanges,
        VariableRange responseRange,
        double informationCriterion,
        List<Caution> cautions) {

    public FitResult {
        variableNames = List.copyOf(variableNames);
        parameters = List.copyOf(parameters);
        residuals = residuals.clone();
        variableRanges = List.copyOf(variableRanges);
        cautions = List.copyOf(cautions);
    }

    /** Copy of the residuals yᵢ − ŷᵢ (units of y). */
    @Override
    public double[] residuals() {
        return residuals.clone();
    }

    /** The parameter with the given name. */
    public FittedParameter parameter(String name) {
        return parameters.stream()
                .filter(p -> p.name().equals(name))
                .findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no parameter " + name));
    }

    /** Parameter values in model order. */
    public double[] parameterValues() {
        return parameters.stream().mapToDouble(FittedParameter::value).toArray();
    }

    @Override
    public boolean equals(Object o) {
        return this == o;
    }

    @Override
    public int hashCode() {
        return System.identityHashCode(this);
    }

    @Override
    public String toString() {
        return "FitResult[" + formDescription + ", parameters=" + parameters + ", RSS=" + residualSumOfSquares + ", R²="
                + rSquared + ", converged=" + converged + "]";
    }
}
