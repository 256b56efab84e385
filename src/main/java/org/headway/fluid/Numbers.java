package org.headway.fluid;

import java.math.BigDecimal;
import java.math.MathContext;
import org.headway.caution.InputException;

/** Plain number text for messages: the fluid package does not depend on the units package. */
final class Numbers {

    private static final MathContext SIX_DIGITS = new MathContext(6);

    private Numbers() {}

    /** Six significant digits, trailing zeros dropped, locale-independent. */
    static String g(double value) {
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal rounded = new BigDecimal(value).round(SIX_DIGITS).stripTrailingZeros();
        double magnitude = Math.abs(value);
        return magnitude >= 1e-4 && magnitude < 1e9 ? rounded.toPlainString() : rounded.toString();
    }

    /** A temperature in K with its Celsius value, e.g. "300 K (26.85 °C)". */
    static String kelvin(double temperature) {
        return g(temperature) + " K (" + g(temperature - 273.15) + " °C)";
    }

    /** A pressure in Pa, e.g. "2339.2 Pa". */
    static String pascal(double pressure) {
        return g(pressure) + " Pa";
    }

    /** Rejects NaN and infinities, naming the field. */
    static void requireFinite(String field, double value) {
        InputException.requireFinite(field, value);
    }
}
