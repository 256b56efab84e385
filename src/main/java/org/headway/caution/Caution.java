package org.headway.caution;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
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

    /**
     * The same cautions with those that differ only in their subject (the text before the first
     * ": ", as {@link #about} writes it) merged into one naming every subject, e.g. five pipes'
     * identical fitted-correlation warnings become one "p1, p2, p3, p4, p5: …". Code, severity,
     * basis and the rest of the message must all agree; order is that of each group's first member.
     *
     * @param cautions cautions in the order raised
     * @return grouped cautions, never longer than the input
     */
    public static List<Caution> grouped(List<Caution> cautions) {
        Map<List<Object>, List<String>> subjects = new LinkedHashMap<>();
        Map<List<Object>, Caution> first = new LinkedHashMap<>();
        int alone = 0;
        for (Caution c : cautions) {
            int split = c.message.indexOf(": ");
            List<Object> key;
            String subject = null;
            if (split > 0) {
                subject = c.message.substring(0, split);
                key = List.of(c.code, c.severity, c.basis, c.message.substring(split + 2));
            } else {
                key = List.of(c.code, c.severity, c.basis, c.message, alone++);
            }
            first.putIfAbsent(key, c);
            List<String> names = subjects.computeIfAbsent(key, k -> new ArrayList<>());
            if (subject != null && !names.contains(subject)) {
                names.add(subject);
            }
        }
        List<Caution> out = new ArrayList<>();
        for (Map.Entry<List<Object>, Caution> e : first.entrySet()) {
            List<String> names = subjects.get(e.getKey());
            Caution c = e.getValue();
            out.add(
                    names.size() < 2
                            ? c
                            : new Caution(
                                    c.code,
                                    c.severity,
                                    String.join(", ", names) + ": " + e.getKey().get(3),
                                    c.basis));
        }
        return out;
    }
}
