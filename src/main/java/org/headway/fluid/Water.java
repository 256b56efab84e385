package org.headway.fluid;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * Liquid water by the IAPWS formulations: density from IAPWS-IF97 Region 1 ({@link If97Region1}),
 * vapour pressure from IF97 Region 4 ({@link If97Region4}), viscosity from IAPWS 2008 ({@link
 * Iapws2008Viscosity}) evaluated at the IF97 density.
 *
 * <p>Headway's stated range is liquid water from 273.15 K to 423.15 K (0 °C to 150 °C), from the
 * vapour pressure up to 100 MPa. Below 273.15 K the water is taken as frozen and refused; at a
 * pressure below the vapour pressure it boils and is refused. Between 423.15 K and 623.15 K (the top
 * of IF97 Region 1) values are computed with a caution; above, refused. Accuracy in the stated
 * range: the IF97 and IAPWS 2008 verification values are reproduced to their 9 printed digits; the
 * formulations' own uncertainty is about 0.01 % in density and about 1 % in viscosity.
 */
public final class Water implements Fluid {

    /** The fluid id. */
    public static final String ID = "water";
    /** Lowest temperature accepted (K): IF97 Region 1 lower bound, ice at ordinary pressure below. */
    public static final double MIN_TEMPERATURE = If97Region1.MIN_TEMPERATURE;
    /** Top of Headway's stated range (K), 150 °C. */
    public static final double STATED_MAX_TEMPERATURE = 423.15;
    /** Highest temperature computed at all (K), top of IF97 Region 1. */
    public static final double MAX_TEMPERATURE = If97Region1.MAX_TEMPERATURE;
    /** Highest pressure (Pa), top of IF97 Region 1. */
    public static final double MAX_PRESSURE = If97Region1.MAX_PRESSURE;
    /** A pressure within this ratio of the vapour pressure is flagged (ratio). */
    public static final double NEAR_BOILING_RATIO = 1.10;
    /** A temperature within this margin of freezing is flagged (K). */
    public static final double NEAR_FREEZING_MARGIN = 1.0;

    static final String DENSITY_SOURCE = "IAPWS-IF97 Region 1, IAPWS R7-97(2012) Eq. (7)";
    static final String VISCOSITY_SOURCE = "IAPWS 2008 viscosity, IAPWS R12-08 Eqs. (10)-(12) with μ̄₂ = 1";
    static final String VAPOUR_PRESSURE_SOURCE = "IAPWS-IF97 Region 4, IAPWS R7-97(2012) Eq. (30)";
    private static final String BASIS = "IAPWS R7-97(2012) and R12-08; Headway's stated range 0-150 °C";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String displayName() {
        return "Water (IAPWS-IF97, IAPWS 2008 viscosity)";
    }

    /**
     * @param temperature T (K), 273.15 to 623.15, stated range up to 423.15
     * @param pressure absolute p (Pa), from the vapour pressure to 100 MPa
     */
    @Override
    public FluidState state(double temperature, double pressure) {
        Numbers.requireFinite("temperature", temperature);
        Numbers.requireFinite("pressure", pressure);
        if (temperature < MIN_TEMPERATURE) {
            throw new InputException(
                    "temperature",
                    "water freezes below " + Numbers.kelvin(MIN_TEMPERATURE) + "; got " + Numbers.kelvin(temperature));
        }
        if (temperature > MAX_TEMPERATURE) {
            throw new InputException(
                    "temperature",
                    "liquid water is modelled up to " + Numbers.kelvin(MAX_TEMPERATURE) + " (IAPWS-IF97 Region 1); got "
                            + Numbers.kelvin(temperature));
        }
        if (pressure <= 0 || pressure > MAX_PRESSURE) {
            throw new InputException(
                    "pressure",
                    "absolute pressure must be above 0 and at most " + Numbers.pascal(MAX_PRESSURE)
                            + " (IAPWS-IF97 Region 1); got " + Numbers.pascal(pressure));
        }
        double vapourPressure = If97Region4.saturationPressure(temperature);
        if (pressure < vapourPressure) {
            throw new InputException(
                    "pressure",
                    "water boils at " + Numbers.kelvin(temperature) + ": pressure " + Numbers.pascal(pressure)
                            + " is below the vapour pressure " + Numbers.pascal(vapourPressure));
        }
        List<Caution> cautions = new ArrayList<>(2);
        if (temperature < MIN_TEMPERATURE + NEAR_FREEZING_MARGIN) {
            cautions.add(Caution.warning(
                    "near-freezing",
                    "water at " + Numbers.kelvin(temperature) + " is within 1 K of freezing; ice may form",
                    BASIS));
        }
        if (temperature > STATED_MAX_TEMPERATURE) {
            cautions.add(Caution.warning(
                    "outside-stated-range",
                    "water at " + Numbers.kelvin(temperature) + " is above Headway's stated range (up to "
                            + Numbers.kelvin(STATED_MAX_TEMPERATURE) + "); IAPWS-IF97 Region 1 still applies",
                    BASIS));
        }
        if (pressure < NEAR_BOILING_RATIO * vapourPressure) {
            cautions.add(Caution.warning(
                    "near-vapour-pressure",
                    "pressure " + Numbers.pascal(pressure) + " is within 10 % of the vapour pressure "
                            + Numbers.pascal(vapourPressure) + "; the water may flash or cavitate",
                    BASIS));
        }
        double density = If97Region1.density(temperature, pressure);
        double viscosity = Iapws2008Viscosity.viscosity(temperature, density);
        return new FluidState(
                ID,
                temperature,
                pressure,
                density,
                viscosity,
                viscosity / density,
                OptionalDouble.of(vapourPressure),
                DENSITY_SOURCE,
                VISCOSITY_SOURCE,
                VAPOUR_PRESSURE_SOURCE,
                cautions.isEmpty() ? List.of() : cautions);
    }
}
