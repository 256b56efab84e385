package org.headway.network.design;

import java.util.List;
import java.util.Optional;
import org.headway.caution.Caution;

/**
 * What balancing found: each balanced valve's Kv and authority, the branches that cannot reach
 * their design flow, the index valve and the source head it needs, and how the solves went.
 *
 * @param valves one entry per balanced valve (a valve link with a design flow), in link order
 * @param minimumValveDrop the least pressure drop a balancing valve is allowed at design flow (Pa)
 * @param indexValve the valve with the least spare head over its required drop (the index circuit's)
 * @param indexSpareHead that valve's head drop less its required drop (m); negative when short
 * @param source the id of the single source the network has (a supplying fixed-head node or a pump);
 *     empty when it has none or several
 * @param sourceKind {@code fixed-head} or {@code pump}, empty without a source
 * @param sourceHeadNeeded the head the source must hold (a fixed-head node: its head, m on the
 *     network's datum; a pump: the head it must add at its flow, m) for the index valve to drop
 *     exactly its required drop; NaN without a single source
 * @param largestFlowError largest |Q − Q_design| / Q_design over the balanced valves when the network
 *     is solved again with the Kv values found (ratio); NaN when a branch is short (the check does
 *     not apply) or the check solve failed
 * @param solves network solves taken
 * @param converged whether the held-flow solve converged (if not, nothing here is reliable)
 * @param cautions cautions of the balancing (the solves' own cautions are not repeated)
 */
public record BalancingResult(
        List<BalancedValve> valves,
        double minimumValveDrop,
        Optional<String> indexValve,
        double indexSpareHead,
        Optional<String> source,
        String sourceKind,
        double sourceHeadNeeded,
        double largestFlowError,
        int solves,
        boolean converged,
        List<Caution> cautions) {

    public BalancingResult {
        valves = List.copyOf(valves);
        cautions = List.copyOf(cautions);
        sourceKind = sourceKind == null ? "" : sourceKind;
    }

    /** The balanced valve with an id. */
    public Optional<BalancedValve> valve(String id) {
        return valves.stream().filter(v -> v.id().equals(id)).findFirst();
    }

    /** The valves whose branch cannot carry its design flow even with the valve fully open. */
    public List<BalancedValve> shortBranches() {
        return valves.stream().filter(v -> !v.reached()).toList();
    }

    /**
     * One balanced valve.
     *
     * @param id link id
     * @param from from-node id
     * @param to to-node id
     * @param designFlow the flow it must carry (m³/s)
     * @param fullyOpenFlowCoefficient the valve's given K_v, taken as its fully open K_v (m³/h at 1 bar)
     * @param headDrop head across the valve with every balanced valve at its design flow, H_from − H_to (m)
     * @param pressureDrop the same as a pressure, ρ g h (Pa)
     * @param flowCoefficient the K_v that drops that head at the design flow (m³/h at 1 bar); NaN when
     *     the branch is short
     * @param reached whether the valve can drop that head, i.e. the head is at least its fully open loss
     * @param extraHeadNeeded the head the branch lacks to carry its design flow with the valve fully
     *     open (m); 0 when reached
     * @param branchSupply the node where the valve's branch starts (see {@link Balancing} for "branch")
     * @param branchReturn the node where it ends
     * @param branchDifferential H_supply − H_return (m)
     * @param authority headDrop / branchDifferential (ratio); NaN when short or undefined
     * @param setting the setting from the valve's table that gives the K_v; NaN without a table or
     *     with a K_v outside it
     */
    public record BalancedValve(
            String id,
            String from,
            String to,
            double designFlow,
            double fullyOpenFlowCoefficient,
            double headDrop,
            double pressureDrop,
            double flowCoefficient,
            boolean reached,
            double extraHeadNeeded,
            String branchSupply,
            String branchReturn,
            double branchDifferential,
            double authority,
            double setting) {}
}
