package org.headway.network;

import java.util.Objects;
import org.headway.caution.InputException;
import org.headway.system.Element;

/**
 * An element placed between two nodes: flow is positive from {@code from} to {@code to}, the
 * element's positive direction.
 *
 * @param element the element (pipe, valve, component, check or isolation valve, pump); its id is
 *     the link's id
 * @param from id of the upstream node for positive flow
 * @param to id of the downstream node
 * @param designFlow the flow the link should carry (m³/s, positive from → to), used by balancing;
 *     NaN when not given
 */
public record Link(Element element, String from, String to, double designFlow) {

    /** A link without a design flow. */
    public Link(Element element, String from, String to) {
        this(element, from, to, Double.NaN);
    }

    public Link {
        Objects.requireNonNull(element, "element");
        if (from == null || from.isBlank() || to == null || to.isBlank()) {
            throw new InputException(element.id(), "a link needs both a from and a to node");
        }
        if (from.equals(to)) {
            throw new InputException(element.id(), "a link cannot start and end at the same node \"" + from + "\"");
        }
        if (!Double.isNaN(designFlow) && (Double.isInfinite(designFlow) || designFlow <= 0)) {
            throw new InputException(
                    element.id() + " design_flow", "must be a positive flow, not " + designFlow + " m³/s");
        }
    }

    /** Whether a design flow was given. */
    public boolean hasDesignFlow() {
        return !Double.isNaN(designFlow);
    }

    /** The link's id, its element's. */
    public String id() {
        return element.id();
    }

    /** The element's kind. */
    public String kind() {
        return element.kind();
    }
}
