package org.headway.units;

import java.util.Objects;
import org.headway.caution.InputException;

/**
 * A friction-loss gradient as typed: head lost per length of pipe ({@code 4 m per 100 m}, {@code
 * 4 ft per 100 ft}, {@code 4 m/100m}, {@code 0.04 m/m}) or pressure lost per length ({@code 400
 * Pa/m}, {@code 1.2 psi/100ft}). A pressure gradient becomes a head gradient only with the
 * fluid's density, which the caller knows.
 *
 * @param value metres of head per 100 m of pipe, or Pa per metre of pipe
 * @param basis which of the two
 * @param text the text it was read from, for messages
 */
public record FrictionGradient(double value, Basis basis, String text) {

    /** Whether the gradient was given as head or as pressure per length. */
    public enum Basis {
        /** m of head per 100 m of pipe (numerically the same as ft per 100 ft). */
        HEAD_PER_100_M,
        /** Pa per m of pipe. */
        PRESSURE_PER_METRE
    }

    public FrictionGradient {
        Objects.requireNonNull(basis, "basis");
        text = text == null ? "" : text;
    }

    /**
     * The gradient as head per 100 m of pipe.
     *
     * @param density fluid density (kg/m³), or NaN when none is known
     * @param gravity gravitational acceleration the run uses (m/s²)
     * @param where the field, for the message when a pressure gradient meets no density
     * @return m per 100 m: a head gradient as it is, a pressure gradient G as 100 G/(ρ g)
     * @throws InputException for a pressure gradient when the density is not a positive number
     */
    public double headPer100m(double density, double gravity, String where) {
        if (basis == Basis.HEAD_PER_100_M) {
            return value;
        }
        if (!(density > 0) || !Double.isFinite(density)) {
            throw new InputException(
                    where,
                    "\"" + text + "\" is a pressure per length; reading it as head per length needs the fluid's"
                            + " density, and none is known here (write it as a head, e.g. 4 m per 100 m)");
        }
        return 100.0 * value / (density * gravity);
    }
}
