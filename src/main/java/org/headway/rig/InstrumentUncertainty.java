package org.headway.rig;

import org.headway.caution.InputException;

/**
 * The standard uncertainty (one standard deviation, coverage factor k = 1) of one measured or given
 * quantity, stated as an absolute value, a fraction of the value, or both combined in quadrature.
 *
 * <p>A tolerance quoted by a maker as ±a with no distribution is, by the usual GUM practice, a
 * rectangular distribution of standard uncertainty a/√3 (JCGM 100:2008, 4.3.7); the caller converts
 * such a tolerance before it gets here.
 *
 * @param absolute standard uncertainty in the quantity's SI unit (m, Pa, K, m³/s, kg/m³, Pa·s), ≥ 0
 * @param relative standard uncertainty as a fraction of the value (ratio, 0.01 = 1 %), ≥ 0
 */
public record InstrumentUncertainty(double absolute, double relative) {

    /** No uncertainty stated. */
    public static final InstrumentUncertainty NONE = new InstrumentUncertainty(0.0, 0.0);

    public InstrumentUncertainty {
        InputException.requireNonNegative("absolute uncertainty", absolute);
        InputException.requireNonNegative("relative uncertainty", relative);
    }

    /**
     * @param value standard uncertainty in the quantity's SI unit, ≥ 0
     * @return an absolute uncertainty
     */
    public static InstrumentUncertainty absolute(double value) {
        return new InstrumentUncertainty(value, 0.0);
    }

    /**
     * @param fraction standard uncertainty as a fraction of the value (ratio), ≥ 0
     * @return a relative uncertainty
     */
    public static InstrumentUncertainty relative(double fraction) {
        return new InstrumentUncertainty(0.0, fraction);
    }

    /**
     * @param value the quantity's value (SI unit)
     * @return the standard uncertainty as a fraction of |value| (ratio); 0 when nothing is stated
     */
    public double relativeAt(double value) {
        double magnitude = Math.abs(value);
        if (absolute == 0.0) {
            return relative;
        }
        return Math.hypot(absolute / magnitude, relative);
    }

    /** Whether any uncertainty is stated. */
    public boolean isStated() {
        return absolute > 0 || relative > 0;
    }
}
