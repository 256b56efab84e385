package org.headway.system;

import java.util.List;
import org.headway.caution.Caution;
import org.headway.friction.FlowRegime;

/**
 * A pipe's hydraulics at one flow magnitude.
 *
 * @param velocity mean velocity Q/A (m/s)
 * @param reynolds Reynolds number ρVD/μ (ratio)
 * @param frictionFactor Darcy friction factor (ratio); by Hazen–Williams the equivalent
 *     h_f D/(L V²/2g); 0 at zero flow
 * @param frictionMethod id of the method used
 * @param frictionIterations iterations of the friction solve (0 for explicit)
 * @param regime flow regime
 * @param majorHeadLoss friction loss (m)
 * @param totalLossCoefficient ΣK of fittings plus the explicit K (ratio)
 * @param minorHeadLoss ΣK V²/2g (m)
 * @param velocityHead V²/2g (m)
 * @param cautions cautions of the friction method and fittings, each naming the pipe
 */
public record PipeFlow(
        double velocity,
        double reynolds,
        double frictionFactor,
        String frictionMethod,
        int frictionIterations,
        FlowRegime regime,
        double majorHeadLoss,
        double totalLossCoefficient,
        double minorHeadLoss,
        double velocityHead,
        List<Caution> cautions) {

    public PipeFlow {
        cautions = List.copyOf(cautions);
    }

    /** Friction plus fitting loss (m). */
    public double headLoss() {
        return majorHeadLoss + minorHeadLoss;
    }
}
