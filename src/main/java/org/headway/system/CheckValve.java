package org.headway.system;

import java.util.List;
import java.util.Objects;

/**
 * A check (non-return) valve: its open loss for forward flow, and no flow in reverse. The series
 * calculators only meet forward flow; a network solver treats a check valve that would pass
 * reverse flow as closed.
 *
 * @param id stable id
 * @param name name the engineer gave it
 * @param openLoss loss when open
 */
public record CheckValve(String id, String name, LocalLoss openLoss) implements OneWayValve {

    public CheckValve {
        FlowCoefficientValve.requireId(id);
        Objects.requireNonNull(openLoss, "openLoss");
        name = name == null || name.isBlank() ? id : name;
    }

    @Override
    public String kind() {
        return "check-valve";
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
                "check valve, open: " + openLoss.description(),
                List.of());
    }
}
