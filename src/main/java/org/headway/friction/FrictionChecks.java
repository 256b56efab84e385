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

    /**
     * Below this Reynolds number the explicit approximations of Colebrook–White (Swamee–Jain, Haaland,
     * Serghides, Goudar–Sonnad) are not evaluated: the argument of their logarithm tends to 1 near Re 7–12, where f has
     * a pole (Swamee–Jain, Haaland) or the nested logarithms fail (Serghides near Re 12, Goudar–Sonnad below Re 3), so a pipe's head loss
     * would stop rising with its flow and a network with a nearly still pipe cannot converge. Below it f
     * is held at its value here: the loss stays continuous and rising (∝ Q²). The choice of 100 is ours
     * (common practice, no source): at Re 100 each formula is still smooth and monotone for every ε/D it
     * takes, and any Re below 2,000 is far outside their validity ranges, which the caution says.
     */
    public static final double EXPLICIT_FLOOR_REYNOLDS = 100;

    /** The Reynolds number an explicit approximation is evaluated at (see {@link #EXPLICIT_FLOOR_REYNOLDS}). */
    static double explicitReynolds(double reynolds) {
        return Math.max(reynolds, EXPLICIT_FLOOR_REYNOLDS);
    }

    /** The note for a value held at the floor, or none above it. */
    static List<Caution> heldBelowFloor(String displayName, double reynolds) {
        if (!(reynolds < EXPLICIT_FLOOR_REYNOLDS)) {
            return List.of();
        }
        return List.of(Caution.warning(
                "friction-held-below-floor",
                String.format(
                        java.util.Locale.ROOT,
                        "Re = %s: %s is not evaluated below Re %.0f (its logarithm breaks down near Re 10); f is"
                                + " held at its Re %.0f value; for nearly still or laminar flow choose auto",
                        org.headway.caution.Figures.significant(reynolds),
                        displayName,
                        EXPLICIT_FLOOR_REYNOLDS,
                        EXPLICIT_FLOOR_REYNOLDS),
                "explicit approximation held below Re 100 (common practice, no source)"));
    }

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

    /**
     * The result of an explicit approximation held below {@link #EXPLICIT_FLOOR_REYNOLDS}: the standard
     * cautions and, below the floor, the note that says so.
     */
    static FrictionResult heldExplicitResult(
            FrictionCorrelation correlation, double reynolds, double relativeRoughness, double frictionFactor) {
        FrictionResult r = explicitResult(correlation, reynolds, relativeRoughness, frictionFactor);
        List<Caution> held = heldBelowFloor(correlation.displayName(), reynolds);
        if (held.isEmpty()) {
            return r;
        }
        List<Caution> all = new java.util.ArrayList<>(r.cautions());
        all.addAll(held);
        return new FrictionResult(
                r.frictionFactor(), r.reynolds(), r.relativeRoughness(), r.regime(), r.method(), r.iterations(), all);
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

    private static final MathContext SIX_DIGITS = new MathContext(6);

    /** 10⁰ … 10²², each exactly representable as a double. */
    private static final double[] POWERS_OF_TEN = new double[23];

    static {
        double p = 1;
        for (int i = 0; i < POWERS_OF_TEN.length; i++) {
            POWERS_OF_TEN[i] = p;
            p *= 10;
        }
    }

    /**
     * Six significant digits, trailing zeros dropped, for messages a person reads: plain from about
     * 10⁻⁶ to below 10⁷ ({@code 0.0000015}, {@code 2300}, {@code 0.000123457}), otherwise {@code 1.5e-7},
     * {@code 2e7} — the spelling of {@link BigDecimal#toString} with {@code E+} written {@code e}.
     * The digits are those of the value rounded half up to six significant digits; a network of 10⁵
     * pipes formats several numbers per caution, so this works on a long rather than a big decimal
     * (which {@link #formatExactly} keeps as the reference the tests hold it to).
     */
    static String format(double value) {
        if (!Double.isFinite(value)) {
            return String.valueOf(value);
        }
        if (value == 0) {
            return "0";
        }
        double a = Math.abs(value);
        int e = (int) Math.floor(Math.log10(a));
        long m = sixDigits(a, e);
        if (m >= 1_000_000) {
            e++;
            m = sixDigits(a, e);
        } else if (m < 100_000) {
            e--;
            m = sixDigits(a, e);
        }
        if (m < 100_000 || m >= 1_000_000) {
            return formatExactly(value);
        }
        String digits = Long.toString(m);
        int length = digits.length();
        while (length > 1 && digits.charAt(length - 1) == '0') {
            length--;
        }
        StringBuilder out = new StringBuilder(16);
        if (value < 0) {
            out.append('-');
        }
        if (a < 1e7 && e >= -6) {
            if (e >= 0) {
                for (int i = 0; i <= e; i++) {
                    out.append(i < length ? digits.charAt(i) : '0');
                }
                if (length > e + 1) {
                    out.append('.').append(digits, e + 1, length);
                }
            } else {
                out.append("0.");
                for (int i = -1; i > e; i--) {
                    out.append('0');
                }
                out.append(digits, 0, length);
            }
        } else {
            out.append(digits.charAt(0));
            if (length > 1) {
                out.append('.').append(digits, 1, length);
            }
            out.append('e').append(e);
        }
        return out.toString();
    }

    /** a / 10^(e − 5) rounded half up, or −1 when the power is beyond the exact table. */
    private static long sixDigits(double a, int e) {
        int k = e - 5;
        if (k > 22 || k < -22) {
            return -1;
        }
        double scaled = k >= 0 ? a / POWERS_OF_TEN[k] : a * POWERS_OF_TEN[-k];
        return (long) Math.floor(scaled + 0.5);
    }

    /** {@link #format} by big-decimal arithmetic on the value's shortest decimal spelling. */
    static String formatExactly(double value) {
        if (!Double.isFinite(value)) {
            return String.valueOf(value);
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal rounded = BigDecimal.valueOf(value).round(SIX_DIGITS).stripTrailingZeros();
        double magnitude = Math.abs(value);
        if (magnitude >= 1e-4 && magnitude < 1e7) {
            return rounded.toPlainString();
        }
        return rounded.toString().replace("E+", "e").replace("E", "e");
    }
}
