package org.headway.cli;

import java.util.Locale;
import org.headway.caution.InputException;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;

/** Small shared helpers for commands: option values with units, unit systems, text cells. */
final class CliSupport {

    private CliSupport() {}

    static UnitSystem unitSystem(String text) {
        return switch (text.toLowerCase(Locale.ROOT)) {
            case "si", "metric" -> UnitSystem.SI;
            case "us", "us-customary", "imperial" -> UnitSystem.US_CUSTOMARY;
            default -> throw new InputException("--units", "expected si or us, got \"" + text + "\"");
        };
    }

    static double parse(String text, QuantityKind kind, String option) {
        return Quantities.parse(text, kind, option);
    }

    /** Parses {@code QMIN:QMAX:N} into {min, max, n} in SI. */
    static double[] curveRange(String text) {
        String[] parts = text.split(":");
        if (parts.length != 3) {
            throw new InputException(
                    "--curve", "expected QMIN:QMAX:N such as \"0 L/s:20 L/s:11\", got \"" + text + "\"");
        }
        double min = Quantities.parse(parts[0].strip(), QuantityKind.VOLUMETRIC_FLOW, "--curve QMIN");
        double max = Quantities.parse(parts[1].strip(), QuantityKind.VOLUMETRIC_FLOW, "--curve QMAX");
        int n;
        try {
            n = Integer.parseInt(parts[2].strip());
        } catch (NumberFormatException e) {
            throw new InputException("--curve N", "expected a whole number of points, got \"" + parts[2] + "\"");
        }
        return new double[] {min, max, n};
    }
}
