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
}
