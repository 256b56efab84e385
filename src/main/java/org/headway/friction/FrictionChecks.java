package org.headway.friction;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/** Input checks and cautions shared by every correlation. */
final class FrictionChecks {

    /**
     * Largest ε/D the usual friction chart covers (ratio). Moody's 1944 chart ends its roughness
     * curves at ε/D = 0.05 (from memory).
     */
    static final double CHART_MAX_RELATIVE_ROUGHNESS = 0.05;

    static final String CHART_BASIS =
            "L. F. Moody, Friction factors for pipe flow, Trans. ASME 66 (1944) 671–684: the chart's curves end"
                    + " at ε/D = 0.05 (from memory)";

    private FrictionChecks() {}

    /** Rejects values no correlation can take. */
    static void requireValid(double reynolds, double relativeRoughness) {
        if (!(reynolds > 0) || reynolds == Double.POSITIVE_INFINITY) {
            InputException.requirePositive("reynolds", reynolds);
        }
        if (!(relativeRoughness >= 0 && relativeRoughness < 1)) {
            InputException.requireNonNegative("relative roughness", relativeRoughness);
            throw new InputException(
                    "relative roughness",
                    "must be less than 1 (ε/D ≥ 1 means the roughness fills the bore), got " + relativeRoughness);
        }
    }

    /** Throws if a formula pushed outside its range gave no usable value, rather than letting it out. */
    static double requireUsable(String displayName, double frictionFactor, double reynolds, double relativeRoughness) {
        if (frictionFactor > 0 && frictionFactor < Double.POSITIVE_INFINITY) {
            return frictionFactor;
        }
        throw new InputException(
                "reynolds",
                displayName + " gives no finite positive friction factor at Re = " + reynolds + ", ε/D = "
                        + relativeRoughness + " (far outside its validity range)");
    }

    /** The result of an explicit formula: no iterations, the standard cautions. */
    static FrictionResult explicitResult(
            FrictionCorrelation correlation, double reynolds, double relativeRoughness, double frictionFactor) {
        return new FrictionResult(
                frictionFactor,
                reynolds,
                relativeRoughness,
                FlowRegimes.of(reynolds),
                correlation.id(),
                0,
                cautions(correlation, reynolds, relativeRoughness));
    }

    /** The cautions every correlation attaches: validity range, transitional flow, chart range. */
    static List<Caution> cautions(FrictionCorrelation correlation, double reynolds, double relativeRoughness) {
        List<Caution> cautions = new ArrayList<>(3);
        ValidityRange range = correlation.validity();
        if (!range.contains(reynolds, relativeRoughness)) {
            cautions.add(outsideValidity(correlation.displayName(), range, reynolds, relativeRoughness));
        }
        if (FlowRegimes.of(reynolds) == FlowRegime.TRANSITIONAL) {
            cautions.add(transitional(reynolds));
        }
        if (relativeRoughness > CHART_MAX_RELATIVE_ROUGHNESS) {
            cautions.add(beyondChart(relativeRoughness));
        }
        return cautions;
    }

    static Caution outsideValidity(String displayName, ValidityRange range, double reynolds, double relativeRoughness) {
        return Caution.warning(
                "outside-validity-range",
                "Re = " + format(reynolds) + ", ε/D = " + format(relativeRoughness)
                        + " is outside the validity range of "
                        + displayName + " (" + format(range.minReynolds()) + " ≤ Re ≤ " + format(range.maxReynolds())
                        + ", " + format(range.minRelativeRoughness()) + " ≤ ε/D ≤ "
                        + format(range.maxRelativeRoughness()) + "); the value is computed but less certain",
                range.basis());
    }

    static Caution transitional(double reynolds) {
        return transitional(reynolds, "");
    }

    static Caution transitional(double reynolds, String detail) {
        return Caution.warning(
                "transitional-flow",
                "Re = " + format(reynolds) + " is in the transitional range (" + format(FlowRegimes.LAMINAR_LIMIT)
                        + " ≤ Re < " + format(FlowRegimes.TURBULENT_LIMIT)
                        + "): the flow may switch between laminar and turbulent, so the friction factor is"
                        + " uncertain" + detail,
                FlowRegimes.BASIS);
    }

    static Caution beyondChart(double relativeRoughness) {
        return Caution.warning(
                "roughness-beyond-chart",
                "ε/D = " + format(relativeRoughness) + " is beyond the usual chart range (ε/D ≤ "
                        + format(CHART_MAX_RELATIVE_ROUGHNESS)
                        + "); correlations are extrapolated there",
                CHART_BASIS);
    }

    /** Six significant digits, plain where short, for messages a person reads. */
    static String format(double value) {
        if (!Double.isFinite(value)) {
            return String.valueOf(value);
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal rounded = new BigDecimal(value).round(new MathContext(6)).stripTrailingZeros();
        double magnitude = Math.abs(value);
        if (magnitude >= 1e-4 && magnitude < 1e7) {
            return rounded.toPlainString();
        }
        return rounded.toString().replace("E+", "e").replace("E", "e");
    }
}
