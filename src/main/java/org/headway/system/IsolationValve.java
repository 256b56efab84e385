package org.headway.system;

import java.util.List;
import java.util.Objects;
import org.headway.caution.InputException;

/**
 * An isolation valve, open or closed. Open, it loses what its open loss says (often nothing worth
 * counting); closed, it carries no flow, and asking it to is an error that names it.
 *
 * @param id stable id
 * @param name name the engineer gave it
 * @param open whether the valve is open
 * @param openLoss loss when open
 */
public record IsolationValve(String id, String name, boolean open, LocalLoss openLoss) implements Element {

    public IsolationValve {
        FlowCoefficientValve.requireId(id);
        Objects.requireNonNull(openLoss, "openLoss");
        name = name == null || name.isBlank() ? id : name;
    }

    @Override
    public String kind() {
        return open ? "isolation" : "closed";
    }

    @Override
    public boolean isClosed() {
        return !open;
    }

    private void requireOpen(double flow) {
        Element.requireFiniteFlow(this, flow);
        if (!open && flow != 0) {
            throw new InputException(
                    id, "the isolation valve is closed, so it carries no flow; open it or remove it from the path");
        }
    }

    @Override
    public double headLoss(double flow, FlowContext context) {
        requireOpen(flow);
        return openLoss.headLoss(flow);
    }

    @Override
    public double headLossSlope(double flow, FlowContext context) {
        requireOpen(flow);
        return openLoss.slope(flow);
    }

    @Override
    public ElementResult evaluate(double flow, FlowContext context) {
        double h = headLoss(flow, context);
        return new ElementResult(
                id,
                kind(),
                flow,
                h,
                context.fluid().density() * Gravity.STANDARD * h,
                open ? "isolation valve, open: " + openLoss.description() : "isolation valve, closed",
                List.of());
    }
}
