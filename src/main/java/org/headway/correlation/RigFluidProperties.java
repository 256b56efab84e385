package org.headway.correlation;

import org.headway.caution.InputException;

/**
 * Fluid properties at one rig point, with how they change with temperature so that a temperature
 * uncertainty can be carried to Re and f.
 *
 * @param density ρ (kg/m³), positive
 * @param dynamicViscosity μ (Pa·s), positive
 * @param densityTemperatureSlope dρ/dT (kg/(m³·K)), 0 for properties that do not follow temperature
 * @param viscosityTemperatureSlope dμ/dT (Pa·s/K), 0 for properties that do not follow temperature
 */
public record RigFluidProperties(
        double density, double dynamicViscosity, double densityTemperatureSlope, double viscosityTemperatureSlope) {

    public RigFluidProperties {
        InputException.requirePositive("density", density);
        InputException.requirePositive("dynamic viscosity", dynamicViscosity);
        InputException.requireFinite("density temperature slope", densityTemperatureSlope);
        InputException.requireFinite("viscosity temperature slope", viscosityTemperatureSlope);
    }

    /**
     * Properties that do not change with temperature.
     *
     * @param density ρ (kg/m³)
     * @param dynamicViscosity μ (Pa·s)
     * @return properties with zero temperature slopes
     */
    public static RigFluidProperties constant(double density, double dynamicViscosity) {
        return new RigFluidProperties(density, dynamicViscosity, 0.0, 0.0);
    }
}
