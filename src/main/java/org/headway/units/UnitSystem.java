package org.headway.units;

/** The unit system results are shown in; the core always computes in SI. */
public enum UnitSystem {
    /** SI as building-services and water engineers read it: L/s, kPa, m, mm, °C. */
    SI,
    /** US customary: gpm, psi, ft, in, °F. */
    US_CUSTOMARY,
    /** SI as process and plant engineers read it: flows in m³/h and pressures in bar, the rest as SI. */
    SI_PROCESS
}
