package org.headway.correlation;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.fitting.VariableRange;
import org.headway.friction.FlowRegime;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionResult;
import org.headway.friction.ValidityRange;

/**
 * A friction-factor correlation the user fitted to their own rig data, usable as the friction
 * method of a pipe run.
 *
 * <p>The wrapped {@link FittedCorrelation} takes Reynolds number, or Reynolds number and relative
 * roughness ε/D, in that order, and returns the Darcy friction factor f. Validity range: the range
 * of the fitted data; outside it the value is computed and flagged as an extrapolation. A fit that
 * yields f ≤ 0 or a non-finite value is rejected with an {@link InputException}. Citation: "fitted
 * by the user to their data".
 */
public final class FittedFrictionCorrelation implements FrictionCorrelation {

    private final String id;
    private final FittedCorrelation fit;

    /**
     * @param id stable id for command lines and project files, e.g. {@code rig-2024-fit}
     * @param fit a correlation whose inputs are (Re) or (Re, ε/D) and whose response is f
     * @throws InputException if the fit takes other inputs
     */
    public FittedFrictionCorrelation(String id, FittedCorrelation fit) {
        if (id == null || id.isBlank()) {
            throw new InputException("id", "a fitted friction correlation needs an id");
        }
        int inputs = fit.variableNames().size();
        if (inputs != 1 && inputs != 2) {
            throw new InputException(
                    "fitted correlation " + id,
                    "a friction correlation takes Reynolds number and optionally relative roughness, but this fit"
                            + " takes " + fit.variableNames());
        }
        this.id = id;
        this.fit = fit;
    }

    /** The wrapped fit. */
    public FittedCorrelation fit() {
        return fit;
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public String displayName() {
        return "Fitted correlation " + id;
    }

    @Override
    public String citation() {
        return FittedCorrelation.CITATION;
    }

    @Override
    public String equation() {
        return fit.equation();
    }

    @Override
    public ValidityRange validity() {
        VariableRange re = fit.variableRanges().get(0);
        double roughMin = 0.0;
        double roughMax = 0.0;
        if (fit.variableRanges().size() == 2) {
            roughMin = fit.variableRanges().get(1).min();
            roughMax = fit.variableRanges().get(1).max();
        }
        return new ValidityRange(re.min(), re.max(), roughMin, roughMax, "range of the data the user fitted");
    }

    @Override
    public FrictionResult evaluate(double reynolds, double relativeRoughness) {
        InputException.requirePositive("Reynolds number", reynolds);
        InputException.requireFinite("relative roughness", relativeRoughness);
        if (relativeRoughness < 0 || relativeRoughness >= 1) {
            throw new InputException("relative roughness", "must be at least 0 and below 1, got " + relativeRoughness);
        }
        double[] inputs =
                fit.variableNames().size() == 1 ? new double[] {reynolds} : new double[] {reynolds, relativeRoughness};
        double f = fit.evaluate(inputs);
        if (!Double.isFinite(f) || f <= 0) {
            throw new InputException(
                    "fitted correlation " + id,
                    String.format(
                            Locale.ROOT,
                            "the fit %s produced an unusable friction factor f = %s at Re = %.6g, ε/D = %.6g;"
                                    + " a friction factor must be positive and finite. Refit over a range that"
                                    + " covers this point or use a published correlation.",
                            fit.equation(),
                            f,
                            reynolds,
                            relativeRoughness));
        }
        List<Caution> cautions = new ArrayList<>(fit.rangeCautions(inputs));
        if (inputs.length == 1 && relativeRoughness > 0) {
            cautions.add(Caution.warning(
                    "fitted-correlation-ignores-roughness",
                    String.format(
                            Locale.ROOT,
                            "the fitted correlation %s depends on Reynolds number only; the pipe's relative roughness"
                                    + " %.3g is not taken into account",
                            id,
                            relativeRoughness),
                    FittedCorrelation.CITATION));
        }
        FlowRegime regime = org.headway.friction.FlowRegimes.of(reynolds);
        return new FrictionResult(f, reynolds, relativeRoughness, regime, id, 0, cautions);
    }
}
