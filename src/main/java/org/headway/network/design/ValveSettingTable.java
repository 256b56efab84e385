package org.headway.network.design;

import java.util.Arrays;
import java.util.Locale;
import java.util.OptionalDouble;
import org.headway.caution.InputException;

/**
 * A balancing valve's flow coefficient against its setting, as a maker tabulates it (turns,
 * positions), read back the other way: the setting that gives a Kv, by linear interpolation between
 * neighbouring rows. The interpolation is only as fine as the table; a maker's table is itself a
 * measured, nominal curve, which is why settings are checked by measurement at commissioning
 * (common practice, no source).
 *
 * @param valve the valve id or name (model) the table is for; empty for a table applied to every
 *     balanced valve without a table of its own
 * @param settings settings in rising order (the maker's scale, no unit)
 * @param flowCoefficients K_v at each setting (m³/h at 1 bar), rising with the setting
 * @param source where the rows came from, for messages (file and lines)
 */
public record ValveSettingTable(String valve, double[] settings, double[] flowCoefficients, String source) {

    public ValveSettingTable {
        valve = valve == null ? "" : valve.strip();
        source = source == null ? "valve settings" : source;
        if (settings == null || flowCoefficients == null || settings.length != flowCoefficients.length) {
            throw new InputException(source, "settings and Kv values must pair up");
        }
        if (settings.length < 2) {
            throw new InputException(
                    source,
                    "the table" + forValve(valve) + " needs at least two rows of setting and kv to interpolate"
                            + " between, got " + settings.length);
        }
        settings = settings.clone();
        flowCoefficients = flowCoefficients.clone();
        for (int i = 0; i < settings.length; i++) {
            InputException.requireFinite(source + " setting", settings[i]);
            InputException.requirePositive(source + " kv", flowCoefficients[i]);
            if (i > 0 && !(settings[i] > settings[i - 1])) {
                throw new InputException(
                        source,
                        String.format(
                                Locale.ROOT,
                                "settings%s must rise from row to row; %s follows %s",
                                forValve(valve),
                                num(settings[i]),
                                num(settings[i - 1])));
            }
            if (i > 0 && !(flowCoefficients[i] > flowCoefficients[i - 1])) {
                throw new InputException(
                        source,
                        String.format(
                                Locale.ROOT,
                                "kv%s must rise with the setting; at setting %s it is %s, not above %s at %s",
                                forValve(valve),
                                num(settings[i]),
                                num(flowCoefficients[i]),
                                num(flowCoefficients[i - 1]),
                                num(settings[i - 1])));
            }
        }
    }

    private static String forValve(String valve) {
        return valve == null || valve.isEmpty() ? "" : " of valve " + valve;
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }

    /** Smallest K_v in the table (m³/h at 1 bar). */
    public double minimumFlowCoefficient() {
        return flowCoefficients[0];
    }

    /** Largest K_v in the table (m³/h at 1 bar). */
    public double maximumFlowCoefficient() {
        return flowCoefficients[flowCoefficients.length - 1];
    }

    /**
     * The setting that gives a flow coefficient, interpolated linearly between the two rows around
     * it; empty when K_v lies outside the table (no extrapolation).
     *
     * @param flowCoefficient K_v (m³/h at 1 bar)
     * @return the setting, on the table's scale
     */
    public OptionalDouble settingFor(double flowCoefficient) {
        if (!(flowCoefficient >= minimumFlowCoefficient() && flowCoefficient <= maximumFlowCoefficient())) {
            return OptionalDouble.empty();
        }
        int i = Arrays.binarySearch(flowCoefficients, flowCoefficient);
        if (i >= 0) {
            return OptionalDouble.of(settings[i]);
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double t = (flowCoefficient - flowCoefficients[lo]) / (flowCoefficients[hi] - flowCoefficients[lo]);
        return OptionalDouble.of(settings[lo] + t * (settings[hi] - settings[lo]));
    }

    /** Whether this is the table for every valve without one of its own. */
    public boolean appliesToAll() {
        return valve.isEmpty();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ValveSettingTable t
                && valve.equals(t.valve)
                && Arrays.equals(settings, t.settings)
                && Arrays.equals(flowCoefficients, t.flowCoefficients);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * valve.hashCode() + Arrays.hashCode(settings)) + Arrays.hashCode(flowCoefficients);
    }

    @Override
    public String toString() {
        return "ValveSettingTable[" + (valve.isEmpty() ? "all valves" : valve) + ", " + settings.length + " rows]";
    }

    /** The settings (a copy). */
    @Override
    public double[] settings() {
        return settings.clone();
    }

    /** The flow coefficients (a copy). */
    @Override
    public double[] flowCoefficients() {
        return flowCoefficients.clone();
    }
}
