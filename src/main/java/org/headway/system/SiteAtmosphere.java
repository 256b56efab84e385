package org.headway.system;

import org.headway.caution.InputException;

/**
 * The barometric pressure at the site, used for NPSH available and every absolute pressure: given
 * directly, or from the site altitude by the standard atmosphere's troposphere,
 * p = p₀ (1 − L h/T₀)^(g M/(R L)) with p₀ = 101 325 Pa, T₀ = 288.15 K, L = 0.0065 K/m and
 * g M/(R L) = 5.255 88 (ISO 2533:1975 / U.S. Standard Atmosphere 1976, Table 1 and eq. 33a).
 *
 * @param pressure barometric pressure (Pa), positive
 * @param altitude site altitude it was derived from (m), NaN-free; 0 when the pressure was given
 * @param basis how the pressure was found, in words
 */
public record SiteAtmosphere(double pressure, double altitude, String basis) {

    /** Sea-level standard pressure p₀ (Pa), ISO 2533. */
    public static final double SEA_LEVEL_PRESSURE = 101_325.0;

    /** Sea-level standard temperature T₀ (K), ISO 2533. */
    public static final double SEA_LEVEL_TEMPERATURE = 288.15;

    /** Troposphere temperature lapse rate L (K/m), ISO 2533. */
    public static final double LAPSE_RATE = 0.0065;

    /** g₀ M/(R* L) of the troposphere (ratio), U.S. Standard Atmosphere 1976. */
    public static final double PRESSURE_EXPONENT = 5.25588;

    /** Top of the troposphere in the standard atmosphere (m); the formula above holds below it. */
    public static final double TROPOPAUSE = 11_000.0;

    /** Sea level, standard atmosphere. */
    public static final SiteAtmosphere SEA_LEVEL =
            new SiteAtmosphere(SEA_LEVEL_PRESSURE, 0.0, "standard atmosphere at sea level (ISO 2533)");

    public SiteAtmosphere {
        InputException.requirePositive("barometric pressure", pressure);
        if (pressure > 2e5) {
            throw new InputException(
                    "barometric pressure",
                    "value " + pressure + " Pa is above any site's air pressure; check the unit");
        }
        InputException.requireFinite("altitude", altitude);
        basis = basis == null ? "" : basis;
    }

    /**
     * The standard atmosphere's pressure at an altitude.
     *
     * @param altitude site altitude above mean sea level (m), −500 to 11 000
     */
    public static SiteAtmosphere atAltitude(double altitude) {
        InputException.requireFinite("altitude", altitude);
        if (altitude < -500 || altitude > TROPOPAUSE) {
            throw new InputException(
                    "altitude",
                    "must lie between −500 m and " + TROPOPAUSE + " m (the troposphere), got " + altitude + " m");
        }
        double p =
                SEA_LEVEL_PRESSURE * Math.pow(1.0 - LAPSE_RATE * altitude / SEA_LEVEL_TEMPERATURE, PRESSURE_EXPONENT);
        return new SiteAtmosphere(p, altitude, "standard atmosphere at " + altitude + " m (ISO 2533)");
    }

    /**
     * A barometric pressure given by the engineer.
     *
     * @param pressure absolute air pressure at the site (Pa)
     */
    public static SiteAtmosphere ofPressure(double pressure) {
        return new SiteAtmosphere(pressure, 0.0, "barometric pressure as given");
    }
}
