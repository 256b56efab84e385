package org.headway.system;

import java.util.OptionalDouble;
import org.headway.caution.InputException;
import org.headway.pipe.Fitting;

/**
 * A number of identical fittings in a segment.
 *
 * @param fitting the fitting and its loss-coefficient method
 * @param count how many (≥ 1)
 */
public record FittingUse(Fitting fitting, int count) {

    public FittingUse {
        if (fitting == null) {
            throw new InputException("fitting", "missing");
        }
        if (count < 1) {
            throw new InputException("count", "must be at least 1, got " + count);
        }
    }

    /**
     * @param nominalDiameter nominal diameter of the pipe (m), empty when unknown
     * @return the same count of the fitting bound to that nominal size
     */
    public FittingUse atNominalSize(OptionalDouble nominalDiameter) {
        return new FittingUse(fitting.atNominalSize(nominalDiameter), count);
    }
}
