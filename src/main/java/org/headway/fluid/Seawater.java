package org.headway.fluid;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * Seawater of a given salinity by {@link Sharqawy2010}: density, viscosity and vapour pressure at
 * atmospheric pressure, the density not corrected for pressure.
 *
 * <p>Outside a correlation's validity range (0-180 °C; salinity up to 160 g/kg for density, 150 g/kg
 * for viscosity) the value is computed with a caution. Refused: salinity below 0 or at least 1000
 * g/kg, temperature below the estimated freezing point, pressure below the vapour pressure.
 */
public final class Seawater implements Fluid {

    /** The fluid id; {@code seawater:40} selects 40 g/kg. */
    public static final String ID = "seawater";
    /** Standard ocean salinity (g/kg). */
    public static final double DEFAULT_SALINITY = 35.0;
    /**
     * Freezing-point depression per unit salinity (K per g/kg), about −1.9 °C at 35 g/kg: common
     * practice, no source; used only to refuse frozen states.
     */
    public static final double FREEZING_DEPRESSION = 0.054;
    /** Above this pressure the density's pressure neglect is flagged (Pa). */
    public static final double PRESSURE_NOTE_LIMIT = 1.0e6;

    private static final String SOURCE =
            "Sharqawy, Lienhard & Zubair 2010, Desalination and Water Treatment 16:354-380";
    private static final String BASIS = "Sharqawy et al. 2010 validity ranges";

    private final double salinity;

    /**
     * @param salinity absolute salinity S (g/kg), 0 ≤ S &lt; 1000
     */
    public Seawater(double salinity) {
        Numbers.requireFinite("salinity", salinity);
        if (salinity < 0 || salinity >= 1000) {
            throw new InputException(
                    "salinity", "must be from 0 to below 1000 g/kg, got " + Numbers.g(salinity) + " g/kg");
        }
        this.salinity = salinity;
    }

    /** Seawater at the standard ocean salinity of 35 g/kg. */
    public Seawater() {
        this(DEFAULT_SALINITY);
    }

    /** Salinity S (g/kg). */
    public double salinity() {
        return salinity;
    }

    @Override
    public String id() {
        return salinity == DEFAULT_SALINITY ? ID : ID + ":" + Numbers.g(salinity);
    }

    @Override
    public String displayName() {
        return "Seawater, " + Numbers.g(salinity) + " g/kg (Sharqawy et al. 2010)";
    }

    /**
     * @param temperature T (K)
     * @param pressure absolute p (Pa), at least the vapour pressure
     */
    @Override
    public FluidState state(double temperature, double pressure) {
        Numbers.requireFinite("temperature", temperature);
        Numbers.requireFinite("pressure", pressure);
        double celsius = temperature - 273.15;
        double freezing = -FREEZING_DEPRESSION * salinity;
        if (celsius < freezing) {
            throw new InputException(
                    "temperature",
                    "seawater of " + Numbers.g(salinity) + " g/kg freezes near " + Numbers.g(freezing) + " °C; got "
                            + Numbers.kelvin(temperature));
        }
        if (pressure <= 0) {
            throw new InputException("pressure", "absolute pressure must be above 0, got " + Numbers.pascal(pressure));
        }
        double vapourPressure = Sharqawy2010.vapourPressure(temperature, salinity);
        if (pressure < vapourPressure) {
            throw new InputException(
                    "pressure",
                    "seawater boils at " + Numbers.kelvin(temperature) + ": pressure " + Numbers.pascal(pressure)
                            + " is below the vapour pressure " + Numbers.pascal(vapourPressure));
        }
        List<Caution> cautions = new ArrayList<>(2);
        if (celsius < Sharqawy2010.MIN_CELSIUS || celsius > Sharqawy2010.MAX_CELSIUS) {
            cautions.add(Caution.warning(
                    "outside-correlation-range",
                    "seawater at " + Numbers.g(celsius) + " °C is outside the correlations' 0-180 °C range; values"
                            + " are extrapolated",
                    BASIS));
        }
        if (salinity > Sharqawy2010.MAX_SALINITY_VISCOSITY) {
            cautions.add(Caution.warning(
                    "outside-correlation-range",
                    "salinity " + Numbers.g(salinity) + " g/kg is above the viscosity correlation's 150 g/kg"
                            + (salinity > Sharqawy2010.MAX_SALINITY_DENSITY
                                    ? " and the density correlation's 160 g/kg"
                                    : "")
                            + "; values are extrapolated",
                    BASIS));
        }
        if (pressure > PRESSURE_NOTE_LIMIT) {
            cautions.add(Caution.note(
                    "pressure-not-modelled",
                    "density is for atmospheric pressure; at " + Numbers.pascal(pressure)
                            + " compression adds roughly 0.045 % per MPa",
                    "common practice, no source"));
        }
        double density = Sharqawy2010.density(celsius, salinity);
        double viscosity = Sharqawy2010.viscosity(celsius, salinity);
        // Far beyond 180 °C the polynomials turn negative or overflow: an error, never a NaN.
        if (!(density > 0)
                || !(viscosity > 0)
                || !Double.isFinite(density)
                || !Double.isFinite(viscosity)
                || !Double.isFinite(vapourPressure)) {
            throw new InputException(
                    "temperature",
                    "seawater at " + Numbers.kelvin(temperature) + " is so far outside the correlations' 0-180 °C"
                            + " range that they give no usable property");
        }
        return new FluidState(
                id(),
                temperature,
                pressure,
                density,
                viscosity,
                viscosity / density,
                OptionalDouble.of(vapourPressure),
                SOURCE + ", density Eq. (8)",
                SOURCE + ", viscosity Eqs. (22)-(23)",
                SOURCE + ", vapour pressure Eqs. (28)-(29)",
                cautions);
    }
}
