package org.headway.app;

import java.util.regex.Pattern;
import org.headway.caution.InputException;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;

/**
 * Checks a quantity as typed into a field and gives the text to keep in the project. A bare
 * number is read in the unit the field shows in the chosen unit system (so "20" in a length field
 * means 20 ft when US customary units are shown) and stored with that unit written out, so the
 * project file never holds a number whose unit depends on a setting.
 */
final class QuantityText {

    private static final Pattern BARE_NUMBER = Pattern.compile("^[+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?$");

    /** What a field accepts besides the kind's dimension. */
    enum Sign {
        ANY,
        NON_NEGATIVE,
        POSITIVE
    }

    private QuantityText() {}

    /**
     * @param typed the text as typed
     * @param kind what the field holds
     * @param system unit system shown, for a bare number
     * @param where field name for messages
     * @param sign allowed sign
     * @return the text to store: the typed text stripped, with the display unit added to a bare number
     * @throws InputException naming {@code where} and the value when the text is not acceptable
     */
    static String accept(String typed, QuantityKind kind, UnitSystem system, String where, Sign sign) {
        String text = typed == null ? "" : typed.strip();
        String unit = Quantities.unitSymbol(kind, system);
        if (BARE_NUMBER.matcher(text).matches() && !unit.isEmpty()) {
            text = text + " " + unit;
        }
        double si = Quantities.parse(text, kind, where);
        switch (sign) {
            case POSITIVE -> {
                if (!(si > 0)) {
                    throw new InputException(where, "must be greater than zero, got \"" + text + "\"");
                }
            }
            case NON_NEGATIVE -> {
                if (si < 0) {
                    throw new InputException(where, "must not be negative, got \"" + text + "\"");
                }
            }
            case ANY -> {
                // Elevation changes and the like may fall as well as rise.
            }
        }
        return text;
    }

    /**
     * Checks a pressure reading as typed into a gauge field (an end pressure): gauge ({@code 3
     * barg}), absolute ({@code 1.2 bara}, converted by the project with its site's barometric
     * pressure) or plain; a bare number is read in the shown pressure unit.
     *
     * @return the text to store
     * @throws InputException naming {@code where} when the text is not a pressure
     */
    static String acceptPressureReading(String typed, UnitSystem system, String where) {
        String text = typed == null ? "" : typed.strip();
        if (BARE_NUMBER.matcher(text).matches()) {
            text = text + " " + Quantities.unitSymbol(QuantityKind.PRESSURE, system);
        }
        Quantities.parsePressure(text, where);
        return text;
    }

    /**
     * Checks a friction-loss gradient as typed ({@code 4 m per 100 m}, {@code 4 ft per 100 ft},
     * {@code 0.04 m/m}, {@code 400 Pa/m}); a bare number is read in the shown system, as m per 100 m
     * or ft per 100 ft (the same ratio), and stored with that written out.
     *
     * @return the text to store
     * @throws InputException naming {@code where} when the text is not a positive gradient
     */
    static String acceptGradient(String typed, UnitSystem system, String where) {
        String text = typed == null ? "" : typed.strip();
        if (BARE_NUMBER.matcher(text).matches()) {
            text = text + (system == UnitSystem.US_CUSTOMARY ? " ft per 100 ft" : " m per 100 m");
        }
        double value = Quantities.parseGradient(text, where).value();
        if (!(value > 0)) {
            throw new InputException(where, "must be greater than zero, got \"" + text + "\"");
        }
        return text;
    }
}
