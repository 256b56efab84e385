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
            case "process", "si-process" -> UnitSystem.SI_PROCESS;
            default ->
                throw new InputException("--units", "expected si, us or process (m³/h and bar), got \"" + text + "\"");
        };
    }

    static double parse(String text, QuantityKind kind, String option) {
        return Quantities.parse(text, kind, option);
    }

    /**
     * Parses {@code QMIN:QMAX:N} into {min, max, n} in SI; a flow may be given by mass ({@code 0
     * kg/h:36000 kg/h:13}) and is then divided by the run's fluid density.
     *
     * @param density the run's fluid density at its state (kg/m³)
     */
    static double[] curveRange(String text, double density) {
        String[] parts = text.split(":");
        if (parts.length != 3) {
            throw new InputException(
                    "--curve", "expected QMIN:QMAX:N such as \"0 L/s:20 L/s:11\", got \"" + text + "\"");
        }
        requireFlowUnit(parts[0].strip(), "--curve QMIN");
        requireFlowUnit(parts[1].strip(), "--curve QMAX");
        double min = Quantities.parseFlow(parts[0].strip(), "--curve QMIN").volumetric(density, "--curve QMIN");
        double max = Quantities.parseFlow(parts[1].strip(), "--curve QMAX").volumetric(density, "--curve QMAX");
        int n;
        try {
            n = Integer.parseInt(parts[2].strip());
        } catch (NumberFormatException e) {
            throw new InputException("--curve N", "expected a whole number of points, got \"" + parts[2] + "\"");
        }
        return new double[] {min, max, n};
    }

    private static final java.util.regex.Pattern BARE_NUMBER =
            java.util.regex.Pattern.compile("[+-]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?");

    /**
     * A curve end must carry its unit: a bare "6" would be read as 6 m³/s, a thousand times what
     * was meant if the engineer thought in L/s. Zero needs none.
     */
    private static void requireFlowUnit(String text, String where) {
        if (BARE_NUMBER.matcher(text).matches() && Double.parseDouble(text) != 0) {
            throw new InputException(
                    where, "\"" + text + "\" has no unit; give the flow with its unit, e.g. \"" + text + " L/s\"");
        }
    }
}
