package org.headway.fluid;

import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.Caution;

/**
 * A liquid with the same density and viscosity at every state, as the user gave them.
 *
 * @param id the user's name for it
 * @param density ρ (kg/m³)
 * @param dynamicViscosity μ (Pa·s)
 */
record ConstantFluid(String id, double density, double dynamicViscosity) implements Fluid {

    @Override
    public String displayName() {
        return id + " (constant properties)";
    }

    @Override
    public FluidState state(double temperature, double pressure) {
        Numbers.requireFinite("temperature", temperature);
        Numbers.requireFinite("pressure", pressure);
        String source = "user-given constant";
        return new FluidState(
                id,
                temperature,
                pressure,
                density,
                dynamicViscosity,
                dynamicViscosity / density,
                OptionalDouble.empty(),
                source,
                source,
                "",
                List.of(Caution.note(
                        "constant-properties",
                        id + ": density and viscosity are taken as constant; temperature and pressure do not change"
                                + " them",
                        "user input")));
    }
}
