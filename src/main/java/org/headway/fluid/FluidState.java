package org.headway.fluid;

import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.Caution;

/**
 * Properties of a liquid at one temperature and pressure, with where each came from.
 *
 * @param fluid id of the fluid, e.g. {@code water}
 * @param temperature temperature (K)
 * @param pressure absolute pressure (Pa)
 * @param density density ρ (kg/m³)
 * @param dynamicViscosity dynamic viscosity μ (Pa·s)
 * @param kinematicViscosity kinematic viscosity ν = μ/ρ (m²/s)
 * @param vapourPressure saturation vapour pressure (Pa), empty where the model gives none
 * @param densitySource source of the density value
 * @param viscositySource source of the viscosity value
 * @param vapourPressureSource source of the vapour pressure, empty string if none
 * @param cautions e.g. near the edge of the property model's range
 * @param temperatureGiven false for a fluid of the engineer's own given by density and viscosity
 *     without a temperature: {@code temperature} is then only the 20 °C that temperature-dependent
 *     checks assume, and is not shown as an input
 */
public record FluidState(
        String fluid,
        double temperature,
        double pressure,
        double density,
        double dynamicViscosity,
        double kinematicViscosity,
        OptionalDouble vapourPressure,
        String densitySource,
        String viscositySource,
        String vapourPressureSource,
        List<Caution> cautions,
        boolean temperatureGiven) {

    public FluidState {
        cautions = List.copyOf(cautions);
    }

    /** A state at a temperature that was given (every property model's state). */
    public FluidState(
            String fluid,
            double temperature,
            double pressure,
            double density,
            double dynamicViscosity,
            double kinematicViscosity,
            OptionalDouble vapourPressure,
            String densitySource,
            String viscositySource,
            String vapourPressureSource,
            List<Caution> cautions) {
        this(
                fluid,
                temperature,
                pressure,
                density,
                dynamicViscosity,
                kinematicViscosity,
                vapourPressure,
                densitySource,
                viscositySource,
                vapourPressureSource,
                cautions,
                true);
    }
}
