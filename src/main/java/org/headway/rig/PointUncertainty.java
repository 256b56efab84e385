package org.headway.rig;

/**
 * Uncertainty of the Reynolds number and friction factor at one rig point, from the law of
 * propagation of uncertainty (first order, inputs uncorrelated).
 *
 * @param reynoldsRelative combined standard uncertainty of Re as a fraction of Re (ratio)
 * @param frictionRelative combined standard uncertainty of f as a fraction of f (ratio)
 * @param coverageFactor k of the expanded uncertainties (ratio), 2 for about 95 % coverage
 * @param reynoldsExpanded expanded uncertainty U = k·u of Re (ratio, same scale as Re)
 * @param frictionExpanded expanded uncertainty U = k·u of f (ratio, same scale as f)
 * @param dominantFrictionSource the input with the largest share of the variance of f
 * @param dominantFrictionShare that input's share of the variance of f (ratio, 0 to 1)
 * @param dominantReynoldsSource the input with the largest share of the variance of Re
 */
public record PointUncertainty(
        double reynoldsRelative,
        double frictionRelative,
        double coverageFactor,
        double reynoldsExpanded,
        double frictionExpanded,
        UncertaintySource dominantFrictionSource,
        double dominantFrictionShare,
        UncertaintySource dominantReynoldsSource) {

    /** Expanded uncertainty of f as a fraction of f (ratio). */
    public double frictionExpandedRelative() {
        return coverageFactor * frictionRelative;
    }

    /** Expanded uncertainty of Re as a fraction of Re (ratio). */
    public double reynoldsExpandedRelative() {
        return coverageFactor * reynoldsRelative;
    }
}
