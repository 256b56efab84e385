package org.headway.system;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.headway.fluid.FluidState;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionMethods;

/** Small runs built directly in SI for the engine tests. */
final class RunFixtures {

    private RunFixtures() {}

    /** A liquid with given properties and a vapour pressure. */
    static FluidState liquid(double density, double viscosity, double vapourPressure) {
        return new FluidState(
                "test liquid",
                293.15,
                101_325,
                density,
                viscosity,
                viscosity / density,
                OptionalDouble.of(vapourPressure),
                "test",
                "test",
                "test",
                List.of());
    }

    static FrictionCorrelation method(String id) {
        return FrictionMethods.byId(id);
    }

    static PipeRun run(FluidState fluid, String method, List<Segment> segments) {
        return PipeRun.of(
                "test",
                fluid,
                method(method),
                segments,
                EndCondition.OPEN_AT_PIPE_END,
                EndCondition.OPEN_AT_PIPE_END,
                Optional.empty(),
                0,
                SiteAtmosphere.SEA_LEVEL_PRESSURE,
                0.01,
                0.0,
                DesignLimits.USUAL);
    }

    static Segment pipe(String name, double length, double diameter, double roughness) {
        return Segment.builder(name).length(length).bore(diameter, roughness).build();
    }
}
