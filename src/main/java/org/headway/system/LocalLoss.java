package org.headway.system;

import java.util.Locale;
import org.headway.caution.InputException;

/**
 * The open-position loss of a valve that is not sized by a curve of its own — a check valve, an
 * isolation valve: h = c Q |Q|, from a loss coefficient K referred to a bore (c = K/(2 g A²)) or
 * from a flow coefficient K_v (c as in {@link FlowCoefficientValve}).
 *
 * @param resistance c (m per (m³/s)²), ≥ 0
 * @param description how it was given, in words
 */
public record LocalLoss(double resistance, String description) {

    /** No loss (an isolation valve fully open, when no figure is given). */
    public static final LocalLoss NONE = new LocalLoss(0.0, "no loss given (taken as zero)");

    public LocalLoss {
        InputException.requireNonNegative("resistance", resistance);
        description = description == null ? "" : description;
    }

    /**
     * @param lossCoefficient K (ratio), ≥ 0
     * @param diameter bore whose velocity K is referred to (m), positive
     */
    public static LocalLoss ofLossCoefficient(double lossCoefficient, double diameter) {
        InputException.requireNonNegative("loss coefficient", lossCoefficient);
        InputException.requirePositive("diameter", diameter);
        double area = Math.PI * diameter * diameter / 4.0;
        return new LocalLoss(
                lossCoefficient / (2.0 * Gravity.STANDARD * area * area),
                String.format(Locale.ROOT, "K %.4g referred to a %.4g mm bore", lossCoefficient, diameter * 1000.0));
    }

    /** @param valve the valve whose flow coefficient gives the loss */
    public static LocalLoss ofFlowCoefficient(FlowCoefficientValve valve) {
        return new LocalLoss(valve.resistance(), valve.givenAs() + " (IEC 60534-2-1)");
    }

    double headLoss(double flow) {
        return resistance * flow * Math.abs(flow);
    }

    double slope(double flow) {
        return 2.0 * resistance * Math.abs(flow);
    }
}
