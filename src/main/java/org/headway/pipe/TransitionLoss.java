package org.headway.pipe;

import java.util.Objects;
import org.headway.caution.InputException;

/**
 * Loss coefficient of a diameter change, with the velocity it is referred to.
 *
 * <p>The head loss is h = K V²/(2 g) with V the mean velocity in {@code referredTo}.
 *
 * @param lossCoefficient K (ratio)
 * @param referredTo section whose velocity K is referred to
 * @param upstreamDiameter inner diameter before the change (m)
 * @param downstreamDiameter inner diameter after the change (m)
 * @param basis formula and its source
 */
public record TransitionLoss(
        double lossCoefficient,
        ReferenceSection referredTo,
        double upstreamDiameter,
        double downstreamDiameter,
        String basis) {

    public TransitionLoss {
        InputException.requireNonNegative("lossCoefficient", lossCoefficient);
        Objects.requireNonNull(referredTo, "referredTo");
        InputException.requirePositive("upstreamDiameter", upstreamDiameter);
        InputException.requirePositive("downstreamDiameter", downstreamDiameter);
        Objects.requireNonNull(basis, "basis");
    }

    /**
     * The same loss expressed against the velocity of another section: K_t = K (d_t/d_ref)⁴, which
     * keeps K V² and so the head loss unchanged for incompressible flow.
     *
     * @param section section whose velocity the result is referred to
     * @return K (ratio) referred to {@code section}
     */
    public double lossCoefficientReferredTo(ReferenceSection section) {
        if (section == referredTo) {
            return lossCoefficient;
        }
        double reference = diameterOf(referredTo);
        double target = diameterOf(section);
        double ratio = target / reference;
        return lossCoefficient * ratio * ratio * ratio * ratio;
    }

    private double diameterOf(ReferenceSection section) {
        return section == ReferenceSection.UPSTREAM ? upstreamDiameter : downstreamDiameter;
    }
}
