package org.headway.system;

import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;
import org.headway.caution.Caution;

/**
 * An element's place on a solved run: its result, the grade lines and the pressures at its ends
 * (and at a pipe's high point).
 *
 * @param id element id
 * @param kind element kind
 * @param name element name
 * @param result the element's law at the run's flow
 * @param inletElevation inlet elevation above the run inlet (m)
 * @param outletElevation outlet elevation above the run inlet (m)
 * @param inletEnergyGrade energy grade at the inlet (m above the run inlet)
 * @param outletEnergyGrade energy grade at the outlet (m)
 * @param inletHydraulicGrade hydraulic grade at the inlet (m)
 * @param outletHydraulicGrade hydraulic grade at the outlet (m)
 * @param inletPressure gauge pressure at the inlet, ρ g (HGL − z) (Pa)
 * @param outletPressure gauge pressure at the outlet (Pa)
 * @param highPointPressure gauge pressure at a pipe's high point (Pa), when one is given
 * @param cautions pressure cautions for this element (vapour pressure, limits), each naming it
 */
public record ElementProfile(
        String id,
        String kind,
        String name,
        ElementResult result,
        double inletElevation,
        double outletElevation,
        double inletEnergyGrade,
        double outletEnergyGrade,
        double inletHydraulicGrade,
        double outletHydraulicGrade,
        double inletPressure,
        double outletPressure,
        OptionalDouble highPointPressure,
        List<Caution> cautions) {

    public ElementProfile {
        Objects.requireNonNull(result, "result");
        cautions = List.copyOf(cautions);
    }

    /** Lowest gauge pressure along the element as far as it is known: ends and high point (Pa). */
    public double lowestPressure() {
        double low = Math.min(inletPressure, outletPressure);
        return highPointPressure.isPresent() ? Math.min(low, highPointPressure.getAsDouble()) : low;
    }

    /** Highest gauge pressure at the ends (Pa). */
    public double highestPressure() {
        return Math.max(inletPressure, outletPressure);
    }
}
