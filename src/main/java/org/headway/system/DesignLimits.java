package org.headway.system;

import org.headway.caution.InputException;

/**
 * Limits a run is checked and sized against. Each limit may be absent ({@code
 * Double.POSITIVE_INFINITY} for a maximum, 0 for a minimum).
 *
 * @param minimumVelocity lowest velocity before a caution (m/s)
 * @param maximumVelocity highest velocity before a caution, and the sizing limit (m/s)
 * @param maximumFrictionLossPer100m sizing limit on friction loss per 100 m of pipe (m per 100 m)
 * @param headBudget sizing limit on the total head the pump must supply (m)
 * @param npshMargin margin NPSH available must exceed NPSH required by, or by which it must exceed
 *     zero when the pump's NPSH required is unknown (m)
 */
public record DesignLimits(
        double minimumVelocity,
        double maximumVelocity,
        double maximumFrictionLossPer100m,
        double headBudget,
        double npshMargin) {

    /**
     * The usual design range for liquids in pumped systems, 0.6–3.0 m/s (common practice, no
     * source; many owners and codes set their own), no sizing limits, and a 1.0 m NPSH margin
     * (common practice, no source — pump makers and standards ask for 0.5–1.5 m or a ratio).
     */
    public static final DesignLimits USUAL =
            new DesignLimits(0.6, 3.0, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, 1.0);

    /** Basis string of the default limits. */
    public static final String USUAL_BASIS = "common practice, no source";

    public DesignLimits {
        InputException.requireNonNegative("minimum velocity", minimumVelocity);
        if (Double.isNaN(maximumVelocity) || maximumVelocity <= 0) {
            throw new InputException("maximum velocity", "must be greater than zero, got " + maximumVelocity);
        }
        if (minimumVelocity >= maximumVelocity) {
            throw new InputException(
                    "minimum velocity",
                    "must be below the maximum velocity " + maximumVelocity + " m/s, got " + minimumVelocity);
        }
        if (Double.isNaN(maximumFrictionLossPer100m) || maximumFrictionLossPer100m <= 0) {
            throw new InputException(
                    "maximum friction loss per 100 m", "must be greater than zero, got " + maximumFrictionLossPer100m);
        }
        if (Double.isNaN(headBudget) || headBudget <= 0) {
            throw new InputException("head budget", "must be greater than zero, got " + headBudget);
        }
        InputException.requireNonNegative("NPSH margin", npshMargin);
    }

    /** A copy with other sizing limits. */
    public DesignLimits withSizing(double maxVelocity, double maxLossPer100m, double budget) {
        return new DesignLimits(
                Math.min(minimumVelocity, maxVelocity / 2), maxVelocity, maxLossPer100m, budget, npshMargin);
    }
}
