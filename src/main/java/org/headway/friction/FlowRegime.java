package org.headway.friction;

/** Flow regime in a full circular pipe, decided by Reynolds number (limits in {@link FlowRegimes}). */
public enum FlowRegime {
    LAMINAR,
    TRANSITIONAL,
    TURBULENT
}
