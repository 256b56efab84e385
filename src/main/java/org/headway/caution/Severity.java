package org.headway.caution;

/** How much a caution matters to the person reviewing a result. */
public enum Severity {
    /** Worth knowing; the result stands as computed. */
    NOTE,
    /** The result is computed but less certain than usual; review it. */
    WARNING,
    /** The result may be wrong or unsafe to rely on without further checks. */
    SERIOUS
}
