package org.headway.fluid;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * A mineral hydraulic oil: kinematic viscosity by {@link AstmD341} through the viscosities at 40 °C
 * and 100 °C, density by a linear thermal expansion ρ = ρ₁₅ [1 − α (t − 15 °C)].
 *
 * <p>The built-in {@link #isoVg46()} is a generic ISO VG 46 oil: ν₄₀ = 46 mm²/s is the grade's
 * mid-point (ISO 3448 viscosity grades), ν₁₀₀ = 6.8 mm²/s (viscosity index about 100), ρ₁₅ = 870
 * kg/m³ and α = 6.5·10⁻⁴ 1/K are typical of supplier data sheets: from memory, no single source.
 * A real oil's data sheet should replace them for design.
 *
 * <p>Range: 0-100 °C without caution; −20-0 °C and 100-150 °C with a caution (extrapolated);
 * refused outside. Pressure effects on viscosity are not modelled.
 */
public final class MineralOil implements Fluid {

    /** Coldest state computed (K): near typical pour points. */
    public static final double MIN_TEMPERATURE = 253.15;
    /** Hottest state computed (K). */
    public static final double MAX_TEMPERATURE = 423.15;
    /** Lower end of the range without caution (K). */
    public static final double RANGE_LOW = 273.15;
    /** Upper end of the range without caution (K). */
    public static final double RANGE_HIGH = 373.15;
    /** Above this absolute pressure the unmodelled rise of viscosity with pressure is flagged (Pa). */
    public static final double PRESSURE_NOTE_LIMIT = 2.0e6;

    private final String id;
    private final String displayName;
    private final AstmD341 viscosityLine;
    private final double density15;
    private final double expansion;
    private final String source;

    /**
     * @param id fluid id
     * @param displayName plain-words name
     * @param viscosity40 kinematic viscosity at 40 °C (m²/s)
     * @param viscosity100 kinematic viscosity at 100 °C (m²/s)
     * @param density15 density at 15 °C (kg/m³)
     * @param expansion linear thermal expansion coefficient α (1/K)
     * @param source where the four numbers come from
     */
    public MineralOil(
            String id,
            String displayName,
            double viscosity40,
            double viscosity100,
            double density15,
            double expansion,
            String source) {
        this.id = id;
        this.displayName = displayName;
        this.viscosityLine = AstmD341.through(313.15, viscosity40, 373.15, viscosity100);
        this.density15 = InputException.requirePositive("density at 15 °C", density15);
        this.expansion = InputException.requireNonNegative("expansion coefficient", expansion);
        this.source = source;
    }

    /** Generic ISO VG 46 mineral hydraulic oil, id {@code hydraulic-oil-vg46}. */
    public static MineralOil isoVg46() {
        return new MineralOil(
                "hydraulic-oil-vg46",
                "Mineral hydraulic oil ISO VG 46 (generic)",
                46e-6,
                6.8e-6,
                870.0,
                6.5e-4,
                "generic ISO VG 46: 46 mm²/s at 40 °C (ISO 3448 mid-point), 6.8 mm²/s at 100 °C, 870 kg/m³ at 15 °C,"
                        + " α = 6.5e-4 1/K (typical data-sheet values, from memory)");
    }

    /** The ASTM D341 line of this oil. */
    public AstmD341 viscosityLine() {
        return viscosityLine;
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public String displayName() {
        return displayName;
    }

    /**
     * @param temperature T (K), 253.15 to 423.15
     * @param pressure absolute p (Pa), above 0
     */
    @Override
    public FluidState state(double temperature, double pressure) {
        Numbers.requireFinite("temperature", temperature);
        Numbers.requireFinite("pressure", pressure);
        if (temperature < MIN_TEMPERATURE || temperature > MAX_TEMPERATURE) {
            throw new InputException(
                    "temperature",
                    displayName + " is modelled from " + Numbers.kelvin(MIN_TEMPERATURE) + " to "
                            + Numbers.kelvin(MAX_TEMPERATURE) + "; got " + Numbers.kelvin(temperature));
        }
        if (pressure <= 0) {
            throw new InputException("pressure", "absolute pressure must be above 0, got " + Numbers.pascal(pressure));
        }
        List<Caution> cautions = new ArrayList<>(3);
        cautions.add(Caution.note(
                "generic-data",
                displayName + ": typical values, not a particular product; use its data sheet",
                source));
        if (temperature < RANGE_LOW || temperature > RANGE_HIGH) {
            cautions.add(Caution.warning(
                    "outside-correlation-range",
                    "oil at " + Numbers.kelvin(temperature)
                            + " is outside 0-100 °C; the ASTM D341 line is extrapolated from 40 °C and 100 °C",
                    "ASTM D341"));
        }
        double kinematic = viscosityLine.kinematicViscosity(temperature);
        if (kinematic < AstmD341.MIN_VISCOSITY_CST * 1e-6) {
            cautions.add(Caution.warning(
                    "outside-correlation-range",
                    "kinematic viscosity " + Numbers.g(kinematic * 1e6)
                            + " mm²/s is below the 2 mm²/s limit of the two-constant ASTM D341 form",
                    "ASTM D341"));
        }
        if (pressure > PRESSURE_NOTE_LIMIT) {
            cautions.add(Caution.note(
                    "pressure-not-modelled",
                    "viscosity is for atmospheric pressure; a mineral oil's viscosity rises roughly 2 % per MPa",
                    "common practice, no source"));
        }
        double density = density15 * (1 - expansion * (temperature - 288.15));
        return new FluidState(
                id,
                temperature,
                pressure,
                density,
                kinematic * density,
                kinematic,
                OptionalDouble.empty(),
                "linear thermal expansion from 15 °C (common practice, no source); " + source,
                "ASTM D341 (Walther) line through 40 °C and 100 °C; " + source,
                "",
                cautions);
    }
}
