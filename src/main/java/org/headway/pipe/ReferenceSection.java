package org.headway.pipe;

/** Which side of a diameter change a loss coefficient's velocity head is taken from. */
public enum ReferenceSection {
    /** The pipe before the change, in the direction of flow. */
    UPSTREAM,
    /** The pipe after the change, in the direction of flow. */
    DOWNSTREAM
}
