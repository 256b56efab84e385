package org.headway.fluid;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * A liquid given as a table of density and viscosity against temperature (glycol solutions, user
 * tables), interpolated linearly in T: density directly, viscosity through ln μ, which follows the
 * near-exponential fall of a liquid's viscosity with temperature far better than μ itself.
 *
 * <p>Outside the table, within {@link #EXTRAPOLATION_MARGIN} of its ends, the end segment is
 * extended with a caution; further out the state is refused. Pressure is not a variable of the
 * table. No vapour pressure is given.
 */
public final class TabulatedFluid implements Fluid {

    /** How far beyond the table's ends a state is still computed, with a caution (K). */
    public static final double EXTRAPOLATION_MARGIN = 2.0;

    /**
     * One table row.
     *
     * @param temperature T (K)
     * @param density ρ (kg/m³)
     * @param dynamicViscosity μ (Pa·s)
     */
    public record Row(double temperature, double density, double dynamicViscosity) {}

    private final String id;
    private final String displayName;
    private final String source;
    private final List<Caution> standingCautions;
    private final double[] temperatures;
    private final double[] densities;
    private final double[] logViscosities;

    /**
     * @param id fluid id
     * @param displayName plain-words name
     * @param source where the table's values come from
     * @param standingCautions cautions every state carries (e.g. values recalled from memory)
     * @param rows at least two rows in strictly increasing temperature, positive values
     */
    public TabulatedFluid(
            String id, String displayName, String source, List<Caution> standingCautions, List<Row> rows) {
        this.id = Objects.requireNonNull(id, "id");
        this.displayName = Objects.requireNonNull(displayName, "displayName");
        this.source = Objects.requireNonNull(source, "source");
        this.standingCautions = List.copyOf(standingCautions);
        if (rows.size() < 2) {
            throw new InputException(id, "a fluid table needs at least two rows, got " + rows.size());
        }
        int n = rows.size();
        temperatures = new double[n];
        densities = new double[n];
        logViscosities = new double[n];
        for (int i = 0; i < n; i++) {
            Row row = rows.get(i);
            String where = id + " row " + (i + 1);
            InputException.requirePositive(where + " temperature", row.temperature());
            InputException.requirePositive(where + " density", row.density());
            InputException.requirePositive(where + " viscosity", row.dynamicViscosity());
            if (i > 0 && row.temperature() <= temperatures[i - 1]) {
                throw new InputException(
                        where + " temperature",
                        "temperatures must increase, got " + Numbers.kelvin(row.temperature()) + " after "
                                + Numbers.kelvin(temperatures[i - 1]));
            }
            temperatures[i] = row.temperature();
            densities[i] = row.density();
            logViscosities[i] = Math.log(row.dynamicViscosity());
        }
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public String displayName() {
        return displayName;
    }

    /** Lowest tabulated temperature (K). */
    public double minTemperature() {
        return temperatures[0];
    }

    /** Highest tabulated temperature (K). */
    public double maxTemperature() {
        return temperatures[temperatures.length - 1];
    }

    /**
     * @param temperature T (K), within the table or its margin
     * @param pressure absolute p (Pa), above 0; not used by the table
     */
    @Override
    public FluidState state(double temperature, double pressure) {
        Numbers.requireFinite("temperature", temperature);
        Numbers.requireFinite("pressure", pressure);
        if (pressure <= 0) {
            throw new InputException("pressure", "absolute pressure must be above 0, got " + Numbers.pascal(pressure));
        }
        double low = minTemperature();
        double high = maxTemperature();
        if (temperature < low - EXTRAPOLATION_MARGIN || temperature > high + EXTRAPOLATION_MARGIN) {
            throw new InputException(
                    "temperature",
                    displayName + " is tabulated from " + Numbers.kelvin(low) + " to " + Numbers.kelvin(high) + "; got "
                            + Numbers.kelvin(temperature));
        }
        List<Caution> cautions = new ArrayList<>(standingCautions);
        if (temperature < low || temperature > high) {
            cautions.add(Caution.warning(
                    "outside-table",
                    displayName + " at " + Numbers.kelvin(temperature) + " is beyond its table (" + Numbers.kelvin(low)
                            + " to " + Numbers.kelvin(high) + "); the end segment is extended",
                    source));
        }
        int segment = segmentOf(temperature);
        double fraction = (temperature - temperatures[segment]) / (temperatures[segment + 1] - temperatures[segment]);
        // Weighted form: at a table point it returns the tabulated value exactly, and between two
        // positive values it stays positive, where ρ₀ + f(ρ₁ − ρ₀) can cancel to zero.
        double density = (1.0 - fraction) * densities[segment] + fraction * densities[segment + 1];
        double viscosity =
                Math.exp(logViscosities[segment] + fraction * (logViscosities[segment + 1] - logViscosities[segment]));
        if (!(density > 0)) {
            throw new InputException(
                    "temperature",
                    displayName + ": extending the table to " + Numbers.kelvin(temperature)
                            + " gives no positive density");
        }
        return new FluidState(
                id,
                temperature,
                pressure,
                density,
                viscosity,
                viscosity / density,
                OptionalDouble.empty(),
                source + " (linear in T)",
                source + " (ln μ linear in T)",
                "",
                cautions);
    }

    private int segmentOf(double temperature) {
        int last = temperatures.length - 2;
        for (int i = 0; i < last; i++) {
            if (temperature < temperatures[i + 1]) {
                return i;
            }
        }
        return last;
    }
}
