package org.headway.rig;

import java.util.List;
import java.util.Objects;
import org.headway.caution.InputException;
import org.headway.friction.FrictionCorrelation;

/**
 * The test section a rig data set was measured on, in SI.
 *
 * @param name a label for reports, e.g. the file name
 * @param innerDiameter bore D of the test section (m), positive
 * @param tapSpacing length L between the pressure taps (m), positive
 * @param roughnessEstimate the user's roughness estimate ε (m), ≥ 0, used for ε/D and the comparison
 * @param comparison the friction correlation the measured f is compared with
 * @param fluidDescription where the fluid properties come from, in words (e.g. "water (IAPWS) at
 *     each point's temperature")
 * @param uncertainty the standard uncertainty of every input
 * @param carriedColumns names of the extra data columns carried through to the output
 */
public record RigDescription(
        String name,
        double innerDiameter,
        double tapSpacing,
        double roughnessEstimate,
        FrictionCorrelation comparison,
        String fluidDescription,
        RigUncertainty uncertainty,
        List<String> carriedColumns) {

    public RigDescription {
        Objects.requireNonNull(name, "name");
        InputException.requirePositive("inner diameter", innerDiameter);
        InputException.requirePositive("tap spacing", tapSpacing);
        InputException.requireNonNegative("roughness", roughnessEstimate);
        if (roughnessEstimate >= innerDiameter) {
            throw new InputException(
                    "roughness",
                    "must be smaller than the inner diameter " + innerDiameter + " m, got " + roughnessEstimate + " m");
        }
        Objects.requireNonNull(comparison, "comparison");
        Objects.requireNonNull(fluidDescription, "fluidDescription");
        Objects.requireNonNull(uncertainty, "uncertainty");
        carriedColumns = List.copyOf(carriedColumns);
    }

    /** ε/D of the roughness estimate (ratio). */
    public double relativeRoughness() {
        return roughnessEstimate / innerDiameter;
    }

    /**
     * The same rig with the names of the carried data columns.
     *
     * @param names column names as written in the data header
     * @return a copy
     */
    public RigDescription withCarriedColumns(List<String> names) {
        return new RigDescription(
                name, innerDiameter, tapSpacing, roughnessEstimate, comparison, fluidDescription, uncertainty, names);
    }
}
