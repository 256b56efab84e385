package org.headway.rig;

import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.InputException;
import org.headway.fluid.FluidState;

/**
 * Fluid properties at one rig point, with how they change with temperature so that a temperature
 * uncertainty can be carried to Re and f.
 *
 * @param state the fluid's state at the point (density ρ in kg/m³ and viscosity μ in Pa·s, both
 *     positive, with their sources and cautions)
 * @param densityTemperatureSlope dρ/dT (kg/(m³·K)), 0 for properties that do not follow temperature
 * @param viscosityTemperatureSlope dμ/dT (Pa·s/K), 0 for properties that do not follow temperature
 */
public record RigFluidProperties(FluidState state, double densityTemperatureSlope, double viscosityTemperatureSlope) {

    /** Source named for constant properties given in the rig file. */
    static final String CONSTANT_SOURCE = "constant, given in the rig file";

    /**
     * Temperature a constant-property state is recorded at (K), the 20 °C that {@link
     * FluidState#temperatureGiven()} {@code false} stands for; it changes nothing.
     */
    private static final double CONSTANT_STATE_TEMPERATURE = 293.15;

    public RigFluidProperties {
        InputException.requirePositive("density", state.density());
        InputException.requirePositive("dynamic viscosity", state.dynamicViscosity());
        InputException.requireFinite("density temperature slope", densityTemperatureSlope);
        InputException.requireFinite("viscosity temperature slope", viscosityTemperatureSlope);
    }

    /** ρ (kg/m³). */
    public double density() {
        return state.density();
    }

    /** μ (Pa·s). */
    public double dynamicViscosity() {
        return state.dynamicViscosity();
    }

    /**
     * Properties that do not change with temperature.
     *
     * @param density ρ (kg/m³)
     * @param dynamicViscosity μ (Pa·s)
     * @param pressure absolute pressure the rig states (Pa); recorded, changes nothing
     * @return properties with zero temperature slopes
     */
    public static RigFluidProperties constant(double density, double dynamicViscosity, double pressure) {
        FluidState state = new FluidState(
                "rig fluid",
                CONSTANT_STATE_TEMPERATURE,
                pressure,
                density,
                dynamicViscosity,
                dynamicViscosity / density,
                OptionalDouble.empty(),
                CONSTANT_SOURCE,
                CONSTANT_SOURCE,
                "",
                List.of(),
                false);
        return new RigFluidProperties(state, 0.0, 0.0);
    }
}
