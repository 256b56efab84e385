package org.headway.units;

import java.util.Objects;

/**
 * A pressure as typed, in pascals, with what it is measured from: a gauge reading ({@code 3 barg},
 * {@code 45 psig}, {@code 250 kPa(g)}) is above the local atmosphere, an absolute one ({@code 1.2
 * bara}, {@code 14.7 psia}, {@code 80 kPa(a)}) above vacuum, and a plain {@code kPa}, {@code bar}
 * or {@code psi} says neither, so it takes the convention of the field it was typed into.
 *
 * @param pascals the number converted to Pa, without any atmosphere added or taken away
 * @param reference what the reading is measured from
 */
public record PressureReading(double pascals, Reference reference) {

    /** What a pressure reading is measured from. */
    public enum Reference {
        /** Above the local atmosphere: {@code barg}, {@code psig}, {@code kPa(g)}. */
        GAUGE,
        /** Above vacuum: {@code bara}, {@code psia}, {@code kPa(a)}. */
        ABSOLUTE,
        /** Not said: plain {@code Pa}, {@code kPa}, {@code bar}, {@code psi}, {@code mH2O}. */
        UNSPECIFIED
    }

    public PressureReading {
        Objects.requireNonNull(reference, "reference");
    }

    /**
     * The reading as a gauge pressure, for a field whose convention is gauge.
     *
     * @param barometric the site's barometric (absolute) pressure (Pa)
     * @return Pa above the atmosphere: a gauge or unspecified reading as it is, an absolute one less
     *     the barometric pressure
     */
    public double asGauge(double barometric) {
        return reference == Reference.ABSOLUTE ? pascals - barometric : pascals;
    }

    /**
     * The reading as an absolute pressure, for a field whose convention is absolute.
     *
     * @param barometric the site's barometric (absolute) pressure (Pa)
     * @return Pa above vacuum: an absolute or unspecified reading as it is, a gauge one plus the
     *     barometric pressure
     */
    public double asAbsolute(double barometric) {
        return reference == Reference.GAUGE ? pascals + barometric : pascals;
    }
}
