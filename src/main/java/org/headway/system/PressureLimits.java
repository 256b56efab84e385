package org.headway.system;

import org.headway.caution.InputException;

/**
 * Gauge-pressure limits every point of a system is checked against, each optional: a minimum
 * service pressure (water supply), a maximum working pressure (pipe class, equipment rating).
 *
 * @param minimumGauge lowest gauge pressure before a warning (Pa); −∞ when not set
 * @param maximumGauge highest gauge pressure before a warning (Pa); +∞ when not set
 */
public record PressureLimits(double minimumGauge, double maximumGauge) {

    /** No limits. */
    public static final PressureLimits NONE = new PressureLimits(Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);

    public PressureLimits {
        if (Double.isNaN(minimumGauge) || Double.isNaN(maximumGauge)) {
            throw new InputException("pressure limits", "must be numbers");
        }
        if (minimumGauge >= maximumGauge) {
            throw new InputException(
                    "pressure limits",
                    "the minimum " + minimumGauge + " Pa must be below the maximum " + maximumGauge + " Pa");
        }
    }

    /** Whether any limit is set. */
    public boolean isSet() {
        return minimumGauge != Double.NEGATIVE_INFINITY || maximumGauge != Double.POSITIVE_INFINITY;
    }
}
