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
}
