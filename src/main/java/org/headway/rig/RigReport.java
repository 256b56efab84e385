package org.headway.rig;

import java.util.List;
import org.headway.caution.Caution;

/**
 * Result of analysing a rig data set.
 *
 * @param description the rig
 * @param summary one-pass summary over all points
 * @param points per-point results kept in memory (the first {@code keptLimit} points)
 * @param allPointsKept whether {@code points} holds every point
 * @param roughness the effective roughness fitted to the turbulent points
 * @param cautions what a reviewer should know about the data set
 */
public record RigReport(
        RigDescription description,
        RigSummary summary,
        List<RigPointResult> points,
        boolean allPointsKept,
        EffectiveRoughness roughness,
        List<Caution> cautions) {

    public RigReport {
        points = List.copyOf(points);
        cautions = List.copyOf(cautions);
    }
}
