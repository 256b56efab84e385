package org.headway.system;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.headway.caution.InputException;
import org.headway.fluid.FluidState;
import org.headway.friction.FrictionCorrelation;

/**
 * A pipe run from source to delivery: the fluid state, the friction method, the ordered segments,
 * the end conditions, and optionally a pump.
 *
 * <p>Elevations are measured from the pipe inlet (the first segment's inlet is at 0 m).
 *
 * @param title the engineer's name for the run
 * @param fluid fluid properties used throughout (one temperature for the run)
 * @param friction friction method
 * @param segments segments in flow order, at least one
 * @param source condition at the source end
 * @param delivery condition at the delivery end
 * @param pump the pump, if any
 * @param pumpPosition index of the first segment downstream of the pump (0 = at the source end)
 * @param atmosphericPressure atmospheric pressure for NPSH (Pa)
 * @param designFlow design flow (m³/s), ≥ 0
 * @param flowUncertainty relative uncertainty of the design flow for the band (ratio, e.g. 0.05)
 * @param limits design limits for cautions and sizing
 */
public record PipeRun(
        String title,
        FluidState fluid,
        FrictionCorrelation friction,
        List<Segment> segments,
        EndCondition source,
        EndCondition delivery,
        Optional<PumpCurve> pump,
        int pumpPosition,
        double atmosphericPressure,
        double designFlow,
        double flowUncertainty,
        DesignLimits limits) {

    /** Largest design flow accepted (m³/s), above the flow of most rivers; guards against unit slips. */
    public static final double MAX_FLOW = 1e4;

    /** Standard atmosphere, 101 325 Pa (ISO 2533). */
    public static final double STANDARD_ATMOSPHERE = 101_325.0;

    public PipeRun {
        Objects.requireNonNull(fluid, "fluid");
        Objects.requireNonNull(friction, "friction");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(delivery, "delivery");
        Objects.requireNonNull(pump, "pump");
        Objects.requireNonNull(limits, "limits");
        title = title == null ? "" : title;
        segments = List.copyOf(segments);
        if (segments.isEmpty()) {
            throw new InputException("segments", "a run needs at least one segment");
        }
        if (pumpPosition < 0 || pumpPosition > segments.size()) {
            throw new InputException(
                    "pump position", "must be between 0 and " + segments.size() + ", got " + pumpPosition);
        }
        InputException.requirePositive("atmospheric pressure", atmosphericPressure);
        InputException.requireNonNegative("flow", designFlow);
        if (designFlow > MAX_FLOW) {
            throw new InputException(
                    "flow",
                    "value " + designFlow + " m³/s is beyond the plausible limit of " + MAX_FLOW
                            + " m³/s; check the number and its unit");
        }
        InputException.requireNonNegative("flow uncertainty", flowUncertainty);
        if (flowUncertainty >= 1) {
            throw new InputException("flow uncertainty", "must be below 100 %, got " + flowUncertainty * 100 + " %");
        }
    }

    /** A copy with other segments. */
    public PipeRun withSegments(List<Segment> newSegments) {
        return new PipeRun(
                title,
                fluid,
                friction,
                newSegments,
                source,
                delivery,
                pump,
                pumpPosition,
                atmosphericPressure,
                designFlow,
                flowUncertainty,
                limits);
    }

    /** A copy with another friction method. */
    public PipeRun withFriction(FrictionCorrelation method) {
        return new PipeRun(
                title,
                fluid,
                method,
                segments,
                source,
                delivery,
                pump,
                pumpPosition,
                atmosphericPressure,
                designFlow,
                flowUncertainty,
                limits);
    }

    /** A copy with another design flow. */
    public PipeRun withDesignFlow(double flow) {
        return new PipeRun(
                title,
                fluid,
                friction,
                segments,
                source,
                delivery,
                pump,
                pumpPosition,
                atmosphericPressure,
                flow,
                flowUncertainty,
                limits);
    }

    /** A copy with other limits. */
    public PipeRun withLimits(DesignLimits newLimits) {
        return new PipeRun(
                title,
                fluid,
                friction,
                segments,
                source,
                delivery,
                pump,
                pumpPosition,
                atmosphericPressure,
                designFlow,
                flowUncertainty,
                newLimits);
    }

    /**
     * Static head the pump must overcome: outlet elevation plus delivery head minus source head.
     *
     * @return static head (m)
     */
    public double staticHead() {
        double rise = 0;
        for (Segment s : segments) {
            rise += s.elevationChange();
        }
        return rise + delivery.head(fluid.density()) - source.head(fluid.density());
    }
}
