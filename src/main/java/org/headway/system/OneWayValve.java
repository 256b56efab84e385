package org.headway.system;

/**
 * A valve that passes flow one way only and, while passing it, loses what its open loss says: a
 * check valve, and the control valves when fully open. The network solver decides their status.
 */
public sealed interface OneWayValve extends Element permits CheckValve, FlowControlValve, PressureControlValve {

    /** Loss when fully open. */
    LocalLoss openLoss();

    @Override
    default boolean blocksReverseFlow() {
        return true;
    }

    @Override
    default double headLoss(double flow, FlowContext context) {
        Element.requireForwardFlow(this, flow);
        return openLoss().headLoss(flow);
    }

    @Override
    default double headLossSlope(double flow, FlowContext context) {
        Element.requireForwardFlow(this, flow);
        return openLoss().slope(flow);
    }
}
