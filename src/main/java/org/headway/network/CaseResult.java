package org.headway.network;

import java.util.ArrayList;
import java.util.List;
import org.headway.caution.Caution;

/**
 * One solved case of a study: the network with the case's demands, its solve, its pumps' duties and
 * its index circuit.
 *
 * @param name the case's name ({@value NetworkStudy#BASE_CASE} for the network's own demands)
 * @param network the network with this case's demands
 * @param result the solve
 * @param pumps the pumps' operating points and NPSH checks
 * @param circuit the terminal paths and the index circuit
 */
public record CaseResult(
        String name, Network network, NetworkResult result, PumpDuty.Duties pumps, IndexCircuit circuit) {

    /** The solve's cautions with the pumps' and the index circuit's, the standing review caution last. */
    public List<Caution> cautions() {
        List<Caution> all = new ArrayList<>(result.cautions());
        boolean review = all.remove(Caution.GENERAL_REVIEW);
        all.addAll(pumps.cautions());
        all.addAll(circuit.cautions());
        if (review) {
            all.add(Caution.GENERAL_REVIEW);
        }
        return all;
    }
}
