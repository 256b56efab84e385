package org.headway.rig;

import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Summary of a rig data set, computed in one pass.
 *
 * @param pointCount points analysed
 * @param laminarCount points with Re &lt; 2300
 * @param transitionalCount points with 2300 ≤ Re &lt; 4000
 * @param turbulentCount points with Re ≥ 4000
 * @param comparison id of the comparison correlation
 * @param comparedCount laminar and turbulent points inside the comparison correlation's validity
 *     range; the deviation statistics are over these (transitional points are never compared: no
 *     correlation describes intermittent flow)
 * @param outsideValidityCount laminar and turbulent points evaluated by the correlation outside its
 *     validity range (not in the statistics)
 * @param notEvaluatedCount points where the correlation gives no value
 * @param meanDeviation mean of f/f_ref − 1 (ratio); empty when no point was compared
 * @param rmsDeviation root mean square of f/f_ref − 1 (ratio); empty when no point was compared
 * @param maxDeviation the deviation of largest magnitude, with its sign (ratio); empty when none
 * @param maxDeviationLine line of the point with the largest deviation, 0 when none
 * @param significantDeviationCount compared points whose |deviation| exceeds the expanded
 *     uncertainty of their measured f (0 when no uncertainty is stated)
 * @param minReynolds smallest Re (ratio)
 * @param maxReynolds largest Re (ratio)
 * @param meanFrictionExpandedUncertainty mean of U(f)/f over all points (ratio)
 * @param maxFrictionExpandedUncertainty largest U(f)/f (ratio)
 * @param meanReynoldsExpandedUncertainty mean of U(Re)/Re (ratio)
 * @param maxReynoldsExpandedUncertainty largest U(Re)/Re (ratio)
 * @param dominantFrictionSource the input with the largest mean share of the variance of f; empty
 *     when no uncertainty is stated
 * @param frictionVarianceShares mean share of the variance of f per input (ratio, summing to 1 when
 *     any uncertainty is stated)
 */
public record RigSummary(
        long pointCount,
        long laminarCount,
        long transitionalCount,
        long turbulentCount,
        String comparison,
        long comparedCount,
        long outsideValidityCount,
        long notEvaluatedCount,
        OptionalDouble meanDeviation,
        OptionalDouble rmsDeviation,
        OptionalDouble maxDeviation,
        long maxDeviationLine,
        long significantDeviationCount,
        double minReynolds,
        double maxReynolds,
        double meanFrictionExpandedUncertainty,
        double maxFrictionExpandedUncertainty,
        double meanReynoldsExpandedUncertainty,
        double maxReynoldsExpandedUncertainty,
        Optional<UncertaintySource> dominantFrictionSource,
        Map<UncertaintySource, Double> frictionVarianceShares) {

    public RigSummary {
        // In the sources' declared order, so that every output lists them the same way each run.
        java.util.EnumMap<UncertaintySource, Double> ordered = new java.util.EnumMap<>(UncertaintySource.class);
        ordered.putAll(frictionVarianceShares);
        frictionVarianceShares = java.util.Collections.unmodifiableMap(ordered);
    }
}
