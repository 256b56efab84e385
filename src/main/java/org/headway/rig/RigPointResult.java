package org.headway.rig;

import java.util.List;
import java.util.OptionalDouble;
import org.headway.friction.FlowRegime;

/**
 * What one rig point says about the pipe.
 *
 * @param line where the point came from (its line in the data file)
 * @param flow volumetric flow Q (m³/s)
 * @param pressureDrop measured pressure drop Δp (Pa)
 * @param temperature fluid temperature (K), empty if not given
 * @param density ρ (kg/m³)
 * @param dynamicViscosity μ (Pa·s)
 * @param velocity mean velocity V = 4Q/(πD²) (m/s)
 * @param reynolds Re = ρVD/μ (ratio)
 * @param frictionFactor measured Darcy f = 2ΔpD/(ρV²L) (ratio)
 * @param relativeRoughness ε/D of the roughness estimate (ratio)
 * @param regime flow regime by Re
 * @param referenceFrictionFactor f of the comparison correlation at (Re, ε/D) (ratio); empty where
 *     it cannot be evaluated
 * @param deviation f/f_ref − 1 (ratio, 0.02 = 2 %); empty where there is no reference
 * @param insideValidity whether (Re, ε/D) lies inside the comparison correlation's validity range
 * @param uncertainty propagated uncertainty of Re and f
 * @param carried extra data columns as written
 */
public record RigPointResult(
        long line,
        double flow,
        double pressureDrop,
        OptionalDouble temperature,
        double density,
        double dynamicViscosity,
        double velocity,
        double reynolds,
        double frictionFactor,
        double relativeRoughness,
        FlowRegime regime,
        OptionalDouble referenceFrictionFactor,
        OptionalDouble deviation,
        boolean insideValidity,
        PointUncertainty uncertainty,
        List<String> carried) {

    public RigPointResult {
        carried = List.copyOf(carried);
    }
}
