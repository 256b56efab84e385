package org.headway.system;

import java.util.Objects;
import org.headway.fluid.FluidState;
import org.headway.friction.FrictionCorrelation;

/**
 * What every element of a system shares when its law is evaluated: the fluid at its state and the
 * system's default friction method (a pipe may override it).
 *
 * @param fluid fluid properties (one state for the system)
 * @param friction default Darcy friction-factor method for pipes
 */
public record FlowContext(FluidState fluid, FrictionCorrelation friction) {

    public FlowContext {
        Objects.requireNonNull(fluid, "fluid");
        Objects.requireNonNull(friction, "friction");
    }
}
