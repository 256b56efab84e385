package org.headway.system;

import org.headway.caution.InputException;

/**
 * One part of a system joining two points — a pipe, a valve, a rated component, a diameter change,
 * a pump — with its own law of head change against flow.
 *
 * <p>Sign convention: {@link #headLoss} is the head lost from inlet to outlet for a flow Q in the
 * element's positive direction (inlet → outlet); it is an odd function of Q for elements that
 * allow reverse flow, so that reverse flow loses head in the reverse direction (a diameter change
 * meets the opposite change in reverse, so its law is odd only with its bores swapped). A pump's
 * head loss is negative (it adds head). Elevation is not part of the law: the ends' elevations are
 * the system's business ({@link #rise()}).
 *
 * <p>{@link #headLossSlope} is the exact derivative dh/dQ of that law (analytic; a pipe's includes
 * the slope of its friction factor with Reynolds number). At Q = 0 it is the limit of the slope as
 * Q → 0: finite and positive where the law is linear at small flow (laminar friction, the 1/Re
 * part of a 2-K or 3-K fitting), zero where the law is quadratic.
 */
public sealed interface Element
        permits Segment,
                FlowCoefficientValve,
                RatedComponent,
                DiameterChange,
                IsolationValve,
                OneWayValve,
                PumpElement {

    /** Stable id, unique in its system; results are keyed by it. */
    String id();

    /** Kind as written in project files and line lists: {@code pipe}, {@code valve}, … */
    String kind();

    /** Name the engineer gave it (the id when none was given). */
    default String name() {
        return id();
    }

    /**
     * Outlet elevation minus inlet elevation.
     *
     * @return rise (m); 0 for components
     */
    default double rise() {
        return 0;
    }

    /** Whether the element refuses flow from outlet to inlet (a check valve, a pump). */
    default boolean blocksReverseFlow() {
        return false;
    }

    /** Whether the element is shut and carries no flow (an isolation valve set closed). */
    default boolean isClosed() {
        return false;
    }

    /**
     * Head loss from inlet to outlet at a flow.
     *
     * @param flow volumetric flow, positive inlet → outlet (m³/s)
     * @param context fluid and default friction method
     * @return head loss (m); negative for a pump
     */
    double headLoss(double flow, FlowContext context);

    /**
     * Exact derivative of {@link #headLoss} with flow.
     *
     * @param flow volumetric flow (m³/s)
     * @param context fluid and default friction method
     * @return dh/dQ (m per m³/s)
     */
    double headLossSlope(double flow, FlowContext context);

    /**
     * Evaluates the law at a flow with what a reviewer needs: the loss, the law in words and the
     * cautions that apply.
     *
     * @param flow volumetric flow (m³/s)
     * @param context fluid and default friction method
     * @return the element's result
     */
    ElementResult evaluate(double flow, FlowContext context);

    /** Refuses a flow that is not a finite number, naming the element. */
    static void requireFiniteFlow(Element element, double flow) {
        if (!Double.isFinite(flow)) {
            throw new InputException(element.id(), "flow must be a finite number, got " + flow);
        }
    }

    /** Refuses reverse flow through an element that blocks it. */
    static void requireForwardFlow(Element element, double flow) {
        requireFiniteFlow(element, flow);
        if (flow < 0 && element.blocksReverseFlow()) {
            throw new InputException(
                    element.id(),
                    element.kind() + " blocks reverse flow; a flow of " + flow + " m³/s from outlet to inlet cannot"
                            + " pass it");
        }
    }
}
