package org.headway.rig;

import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;
import org.headway.caution.InputException;

/**
 * One measured rig point, in SI.
 *
 * @param line where the point came from, e.g. its line in the data file (for messages), ≥ 1
 * @param flow volumetric flow Q (m³/s), positive
 * @param pressureDrop frictional pressure drop Δp between the taps (Pa), positive
 * @param temperature fluid temperature (K) when measured or stated, else empty
 * @param fluid fluid properties at this point
 * @param carried further columns of the data row, passed through as written
 */
public record RigPoint(
        long line,
        double flow,
        double pressureDrop,
        OptionalDouble temperature,
        RigFluidProperties fluid,
        List<String> carried) {

    public RigPoint {
        Objects.requireNonNull(temperature, "temperature");
        Objects.requireNonNull(fluid, "fluid");
        carried = List.copyOf(carried);
        if (!(flow > 0) || flow == Double.POSITIVE_INFINITY) {
            throw new InputException(
                    "point at line " + line + ", flow", "must be finite and greater than zero, got " + flow);
        }
        if (!(pressureDrop > 0) || pressureDrop == Double.POSITIVE_INFINITY) {
            throw new InputException(
                    "point at line " + line + ", pressure drop",
                    "must be finite and greater than zero, got " + pressureDrop);
        }
        if (temperature.isPresent() && !(temperature.getAsDouble() > 0 && Double.isFinite(temperature.getAsDouble()))) {
            throw new InputException(
                    "point at line " + line + ", temperature",
                    "must be finite and above 0 K, got " + temperature.getAsDouble());
        }
    }
}
