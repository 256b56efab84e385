package org.headway.units;

/** The unit system results are shown in; the core always computes in SI. */
public enum UnitSystem {
    SI,
    US_CUSTOMARY
}
