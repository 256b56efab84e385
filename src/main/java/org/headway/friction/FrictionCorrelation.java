package org.headway.friction;

/**
 * A Darcy friction-factor correlation for full circular pipes: f as a function of Reynolds number
 * and relative roughness ε/D.
 *
 * <p>Implementations reject invalid input (Re ≤ 0, NaN, ε/D &lt; 0 or ≥ 1) with {@link
 * org.headway.caution.InputException}, and compute but flag with a caution any point outside their
 * stated validity range. They never return NaN.
 */
public interface FrictionCorrelation {

    /** Stable id used on the command line and in project files, e.g. {@code colebrook}. */
    String id();

    /** Name with author and year, e.g. "Colebrook–White (1939)". */
    String displayName();

    /** Full citation of the source. */
    String citation();

    /** The equation in plain Unicode, as it is printed on a review sheet. */
    String equation();

    /** Range the source states the correlation holds over. */
    ValidityRange validity();

    /**
     * Evaluates the friction factor.
     *
     * @param reynolds Reynolds number (ratio), finite and positive
     * @param relativeRoughness ε/D (ratio), 0 ≤ ε/D &lt; 1
     * @return the friction factor with regime, method, iterations and cautions
     */
    FrictionResult evaluate(double reynolds, double relativeRoughness);

    /**
     * The friction factor alone, for loops that evaluate many points (system curves). The value of
     * {@code evaluate(reynolds, relativeRoughness).frictionFactor()} to within the method's stated
     * accuracy (an iterative method may take a different, equally accurate route to it);
     * implementations override it to skip building the result and its cautions.
     *
     * @param reynolds Reynolds number (ratio), finite and positive
     * @param relativeRoughness ε/D (ratio), 0 ≤ ε/D &lt; 1
     * @return the Darcy friction factor (ratio)
     */
    default double frictionFactor(double reynolds, double relativeRoughness) {
        return evaluate(reynolds, relativeRoughness).frictionFactor();
    }

    /**
     * Slope of the friction factor with Reynolds number, df/dRe, at fixed ε/D. Used for the exact
     * derivative of a pipe's head loss with flow (network solvers). The default is a fourth-order
     * centred difference with step 10⁻⁴ Re (truncation about 10⁻¹⁶, round-off about 10⁻¹² relative);
     * correlations with a closed form override it.
     *
     * @param reynolds Reynolds number (ratio), finite and positive
     * @param relativeRoughness ε/D (ratio), 0 ≤ ε/D &lt; 1
     * @return df/dRe (per unit Reynolds number)
     */
    default double frictionFactorSlope(double reynolds, double relativeRoughness) {
        double h = 1e-4 * reynolds;
        return (-frictionFactor(reynolds + 2 * h, relativeRoughness)
                        + 8 * frictionFactor(reynolds + h, relativeRoughness)
                        - 8 * frictionFactor(reynolds - h, relativeRoughness)
                        + frictionFactor(reynolds - 2 * h, relativeRoughness))
                / (12 * h);
    }

    /**
     * Whether the method follows the laminar law f = 64/Re at small Reynolds numbers, so that a
     * pipe's head loss is proportional to flow as the flow tends to zero (and its slope there is
     * the Hagen–Poiseuille value). Turbulent-only methods return false: their loss tends to zero
     * with a zero slope.
     */
    default boolean laminarAtLowReynolds() {
        return false;
    }
}
