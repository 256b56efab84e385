package org.headway.caution;

import java.util.Objects;

/**
 * One thing a reviewer should know about a result.
 *
 * @param code stable machine-readable identifier, lower-case with dashes (e.g. {@code transitional-flow})
 * @param severity how much it matters
 * @param message plain-words explanation including the values involved
 * @param basis where the limit or rule comes from (publication, or "common practice, no source")
 */
public record Caution(String code, Severity severity, String message, String basis) {

    /** The standing caution carried by every pipe-run result and every exported sheet. */
    public static final Caution GENERAL_REVIEW = new Caution(
            "design-review",
            Severity.NOTE,
            "Results are engineering estimates for design review. Check them against the applicable local"
                    + " codes and standards; a licensed or otherwise qualified engineer must review them before"
                    + " they are used for construction, purchase or operation.",
            "common practice, no source");

    public Caution {
        Objects.requireNonNull(code, "code");
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(message, "message");
        Objects.requireNonNull(basis, "basis");
    }

    /** A warning-level caution. */
    public static Caution warning(String code, String message, String basis) {
        return new Caution(code, Severity.WARNING, message, basis);
    }

    /** A note-level caution. */
    public static Caution note(String code, String message, String basis) {
        return new Caution(code, Severity.NOTE, message, basis);
    }

    /** A serious caution. */
    public static Caution serious(String code, String message, String basis) {
        return new Caution(code, Severity.SERIOUS, message, basis);
    }

    /** The same caution with its message prefixed by the thing it concerns, e.g. a segment name. */
    public Caution about(String subject) {
        return new Caution(code, severity, subject + ": " + message, basis);
    }
}
