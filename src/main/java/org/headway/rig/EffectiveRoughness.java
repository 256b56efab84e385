package org.headway.rig;

import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.Caution;

/**
 * The equivalent sand roughness ε that makes the Colebrook–White equation fit a rig's turbulent
 * points best, with its 95 % confidence interval, or the statement that the data cannot determine it.
 *
 * @param status whether ε is determined by the data
 * @param roughness least-squares estimate of ε (m); empty when no turbulent point was measured
 * @param ci95Low lower end of the 95 % confidence interval (m), 0 when the data are consistent with a
 *     smooth pipe
 * @param ci95High upper end of the 95 % confidence interval (m); see {@code upperOpen}
 * @param upperOpen true when the data do not bound ε from above within the search range (then
 *     {@code ci95High} is the top of that range, ε/D = {@value EffectiveRoughnessFit#MAX_RELATIVE_ROUGHNESS})
 * @param innerDiameter bore D the roughness refers to (m)
 * @param pointsUsed turbulent points (Re ≥ 4000) in the fit
 * @param residualStandardDeviation s = √(RSS/(n − 1)) of ln f (ratio, ≈ relative scatter of f)
 * @param iterations Levenberg–Marquardt iterations
 * @param statement the result in plain words
 * @param cautions what a reviewer should know
 */
public record EffectiveRoughness(
        Status status,
        OptionalDouble roughness,
        double ci95Low,
        double ci95High,
        boolean upperOpen,
        double innerDiameter,
        int pointsUsed,
        double residualStandardDeviation,
        int iterations,
        String statement,
        List<Caution> cautions) {

    /** Whether the data determine the roughness. */
    public enum Status {
        /** A finite, positive interval narrower than two decades. */
        DETERMINED,
        /** The interval reaches ε = 0 or spans two decades or more. */
        UNDETERMINED,
        /** Fewer than three turbulent points. */
        NOT_ENOUGH_DATA
    }

    public EffectiveRoughness {
        cautions = List.copyOf(cautions);
    }

    /** Whether the data determine ε. */
    public boolean determined() {
        return status == Status.DETERMINED;
    }
}
