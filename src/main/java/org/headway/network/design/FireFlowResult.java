package org.headway.network.design;

import java.util.List;
import org.headway.caution.Caution;

/**
 * The fire flow a junction can draw: the largest extra demand there for which every junction keeps
 * at least the residual pressure.
 *
 * @param node the junction the fire flow is drawn at
 * @param residualPressure the least gauge pressure every junction must keep (Pa)
 * @param found whether the search ended on a fire flow (false: a solve failed, or no bracket)
 * @param fireFlow the largest extra demand at the node (m³/s); 0 when even the base demands break the
 *     residual pressure; NaN when not found
 * @param limitingNode the junction whose pressure falls to the residual pressure first
 * @param residualAtLimit that junction's gauge pressure at the fire flow (Pa), at or just above the
 *     residual pressure
 * @param baseMinimumPressure the least junction pressure at the base demands (Pa)
 * @param baseLimitingNode the junction where it occurs
 * @param solves network solves taken (the base solve, the bracket and the root search)
 * @param cautions cautions of the search, the serious fire-flow caution always among them
 */
public record FireFlowResult(
        String node,
        double residualPressure,
        boolean found,
        double fireFlow,
        String limitingNode,
        double residualAtLimit,
        double baseMinimumPressure,
        String baseLimitingNode,
        int solves,
        List<Caution> cautions) {

    public FireFlowResult {
        cautions = List.copyOf(cautions);
        limitingNode = limitingNode == null ? "" : limitingNode;
        baseLimitingNode = baseLimitingNode == null ? "" : baseLimitingNode;
    }
}
