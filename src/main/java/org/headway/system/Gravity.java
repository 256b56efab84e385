package org.headway.system;

/** Gravitational acceleration used for every head ↔ pressure conversion. */
public final class Gravity {

    /**
     * Standard acceleration of gravity g_n = 9.80665 m/s² (exact by definition; 3rd CGPM 1901, ISO
     * 80000-3). Local g differs by up to about 0.3 %; the head-loss sheet states the value used.
     */
    public static final double STANDARD = 9.80665;

    private Gravity() {}
}
