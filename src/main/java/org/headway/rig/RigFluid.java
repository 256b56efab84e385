package org.headway.rig;

import org.headway.caution.InputException;
import org.headway.fluid.Fluid;
import org.headway.fluid.FluidState;

/**
 * How a rig's fluid properties are found: a fluid model at a temperature (fixed, or each point's
 * own), or constant properties given with the rig.
 *
 * @param model the fluid model, or {@code null} for constant properties
 * @param fixedTemperature the temperature every point is at (K), or {@code null} when the points
 *     carry their own (or the properties are constant)
 * @param pressure absolute pressure the model is evaluated at (Pa)
 * @param density constant ρ (kg/m³), or {@code null} with a model
 * @param viscosity constant μ (Pa·s), or {@code null} with a model
 */
public record RigFluid(Fluid model, Double fixedTemperature, double pressure, Double density, Double viscosity) {

    /** Temperature step of the central difference for dρ/dT and dμ/dT (K). */
    public static final double SLOPE_STEP = 0.05;

    /** The properties of constant-property fluid; only for {@code model() == null}. */
    public RigFluidProperties constantProperties() {
        return RigFluidProperties.constant(density, viscosity, pressure);
    }

    /**
     * Properties at a temperature with central-difference slopes (error O(h²), h = {@link
     * #SLOPE_STEP}); a one-sided difference where one neighbour lies outside the fluid model (e.g.
     * within 0.05 K of freezing). Only for a fluid with a model.
     *
     * @param temperature temperature (K)
     * @return the state with its slopes; the state's cautions are the model's
     * @throws InputException if the model refuses the state (not located; the caller adds where)
     */
    public RigFluidProperties propertiesAt(double temperature) {
        FluidState state = model.state(temperature, pressure);
        FluidState above = neighbour(temperature + SLOPE_STEP);
        FluidState below = neighbour(temperature - SLOPE_STEP);
        FluidState high = above == null ? state : above;
        FluidState low = below == null ? state : below;
        double step = (above == null ? 0 : SLOPE_STEP) + (below == null ? 0 : SLOPE_STEP);
        double densitySlope = step == 0 ? 0.0 : (high.density() - low.density()) / step;
        double viscositySlope = step == 0 ? 0.0 : (high.dynamicViscosity() - low.dynamicViscosity()) / step;
        return new RigFluidProperties(state, densitySlope, viscositySlope);
    }

    private FluidState neighbour(double temperature) {
        try {
            return model.state(temperature, pressure);
        } catch (InputException e) {
            return null;
        }
    }
}
