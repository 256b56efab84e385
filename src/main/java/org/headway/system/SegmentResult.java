package org.headway.system;

import java.util.List;
import org.headway.caution.Caution;
import org.headway.friction.FlowRegime;

/**
 * Hydraulics of one segment at one flow.
 *
 * @param id the pipe's element id
 * @param name segment name
 * @param velocity mean velocity Q/A (m/s)
 * @param reynolds Reynolds number ρVD/μ (ratio)
 * @param relativeRoughness ε/D (ratio)
 * @param regime flow regime
 * @param frictionFactor Darcy friction factor (ratio); 0 at zero flow
 * @param frictionMethod id of the correlation used
 * @param frictionIterations iterations of the friction solve (0 for explicit)
 * @param majorHeadLoss Darcy–Weisbach loss f (L/D) V²/2g (m)
 * @param totalLossCoefficient ΣK of fittings plus the explicit K (ratio)
 * @param minorHeadLoss ΣK V²/2g (m)
 * @param velocityHead V²/2g (m)
 * @param inletElevation elevation of the inlet above the run's inlet (m)
 * @param outletElevation elevation of the outlet above the run's inlet (m)
 * @param inletEnergyGrade energy grade at the inlet, after any pump there (m)
 * @param outletEnergyGrade energy grade at the outlet (m)
 * @param inletHydraulicGrade hydraulic grade at the inlet (m)
 * @param outletHydraulicGrade hydraulic grade at the outlet (m)
 * @param cautions cautions for this segment, each naming it
 */
public record SegmentResult(
        String id,
        String name,
        double velocity,
        double reynolds,
        double relativeRoughness,
        FlowRegime regime,
        double frictionFactor,
        String frictionMethod,
        int frictionIterations,
        double majorHeadLoss,
        double totalLossCoefficient,
        double minorHeadLoss,
        double velocityHead,
        double inletElevation,
        double outletElevation,
        double inletEnergyGrade,
        double outletEnergyGrade,
        double inletHydraulicGrade,
        double outletHydraulicGrade,
        List<Caution> cautions) {

    public SegmentResult {
        cautions = List.copyOf(cautions);
    }

    /** Friction plus minor loss (m). */
    public double headLoss() {
        return majorHeadLoss + minorHeadLoss;
    }
}
