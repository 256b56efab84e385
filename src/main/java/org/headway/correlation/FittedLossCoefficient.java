package org.headway.correlation;

import java.util.List;
import java.util.Locale;
import org.headway.caution.InputException;

/**
 * A component loss coefficient K the user fitted against Reynolds number, for a fitting or
 * component whose K they measured.
 *
 * <p>Validity range: the fitted Reynolds-number range; outside it the value is computed and flagged
 * as an extrapolation. K &lt; 0 or a non-finite value is rejected. Citation: "fitted by the user to
 * their data".
 */
public final class FittedLossCoefficient {

    private final String id;
    private final FittedCorrelation fit;

    /**
     * @param id stable id, e.g. {@code strainer-k}
     * @param fit a correlation whose one input is Reynolds number and whose response is K
     * @throws InputException if the fit takes other inputs
     */
    public FittedLossCoefficient(String id, FittedCorrelation fit) {
        if (id == null || id.isBlank()) {
            throw new InputException("id", "a fitted loss coefficient needs an id");
        }
        if (fit.variableNames().size() != 1) {
            throw new InputException(
                    "fitted loss coefficient " + id,
                    "K is fitted against Reynolds number only, but this fit takes " + fit.variableNames());
        }
        this.id = id;
        this.fit = fit;
    }

    /** Stable id. */
    public String id() {
        return id;
    }

    /** The wrapped fit. */
    public FittedCorrelation fit() {
        return fit;
    }

    /**
     * Evaluates K.
     *
     * @param reynolds Reynolds number in the pipe (ratio), positive
     * @return K (ratio) with extrapolation cautions
     * @throws InputException if Re is not positive or the fit yields K &lt; 0 or a non-finite value
     */
    public LossCoefficientEstimate evaluate(double reynolds) {
        InputException.requirePositive("Reynolds number", reynolds);
        double k = fit.evaluate(reynolds);
        if (!Double.isFinite(k) || k < 0) {
            throw new InputException(
                    "fitted loss coefficient " + id,
                    String.format(
                            Locale.ROOT,
                            "the fit %s produced an unusable loss coefficient K = %s at Re = %.6g; K must be finite and"
                                    + " not negative",
                            fit.equation(),
                            k,
                            reynolds));
        }
        return new LossCoefficientEstimate(k, reynolds, fit.rangeCautions(reynolds));
    }

    /**
     * K at one Reynolds number.
     *
     * @param lossCoefficient K (ratio)
     * @param reynolds Reynolds number (ratio)
     * @param cautions extrapolation cautions
     */
    public record LossCoefficientEstimate(
            double lossCoefficient, double reynolds, List<org.headway.caution.Caution> cautions) {
        public LossCoefficientEstimate {
            cautions = List.copyOf(cautions);
        }
    }
}
