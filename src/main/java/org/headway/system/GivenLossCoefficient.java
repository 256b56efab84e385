package org.headway.system;

import org.headway.caution.InputException;
import org.headway.pipe.Fitting;

/**
 * A fitting whose K the engineer gave explicitly (to reproduce a hand calculation or a maker's
 * figure), in place of the catalog's method.
 *
 * @param id the fitting id it stands for
 * @param k loss coefficient (ratio), ≥ 0
 * @param replaces description of the catalog item it overrides, or empty
 */
public record GivenLossCoefficient(String id, double k, String replaces) implements Fitting {

    public GivenLossCoefficient {
        InputException.requireNonNegative("loss coefficient", k);
    }

    @Override
    public String description() {
        return replaces.isEmpty() ? id : replaces;
    }

    @Override
    public String method() {
        return "fixed K (given in project)";
    }

    @Override
    public String source() {
        return "given by the engineer";
    }

    @Override
    public double lossCoefficient(double reynolds, double innerDiameter) {
        return k;
    }
}
