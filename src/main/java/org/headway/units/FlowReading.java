package org.headway.units;

import java.util.Objects;
import org.headway.caution.InputException;

/**
 * A flow as typed: volumetric ({@code 12 L/s}, {@code 43 m3/h}, {@code 190 gpm}) or by mass
 * ({@code 4300 kg/h}, {@code 1.2 kg/s}, {@code 9500 lb/h}, {@code 43 t/h}). The core works in
 * volumetric flow; a mass flow needs the fluid's density at its state, which only the caller knows.
 *
 * @param value m³/s for a volumetric flow, kg/s for a mass flow
 * @param basis which of the two
 * @param text the text it was read from, for messages
 */
public record FlowReading(double value, Basis basis, String text) {

    /** Whether a flow was given by volume or by mass. */
    public enum Basis {
        /** m³/s. */
        VOLUMETRIC,
        /** kg/s. */
        MASS
    }

    public FlowReading {
        Objects.requireNonNull(basis, "basis");
        text = text == null ? "" : text;
    }

    /** Whether this is a mass flow, which needs a density to become a volumetric one. */
    public boolean isMass() {
        return basis == Basis.MASS;
    }

    /**
     * The volumetric flow.
     *
     * @param density the fluid's density at its state (kg/m³), or NaN when none is known
     * @param where the field, for the message when a mass flow meets no density
     * @return m³/s: a volumetric reading as it is, a mass flow divided by the density
     * @throws InputException for a mass flow when the density is not a positive number
     */
    public double volumetric(double density, String where) {
        if (basis == Basis.VOLUMETRIC) {
            return value;
        }
        if (!(density > 0) || !Double.isFinite(density)) {
            throw new InputException(
                    where,
                    "\"" + text + "\" is a mass flow; converting it to a volumetric flow needs the fluid's"
                            + " density, and none is known here (give the fluid, or the flow in L/s, m3/h or gpm)");
        }
        return value / density;
    }
}
