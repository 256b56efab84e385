package org.headway.system;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.headway.caution.InputException;
import org.headway.fluid.FluidState;
import org.headway.friction.FrictionCorrelation;

/**
 * A series run from source to delivery: the fluid state, the default friction method, the ordered
 * elements (pipes, valves, components, diameter changes, at most one pump), the end conditions,
 * the site atmosphere and the limits.
 *
 * <p>Elevations are measured from the run inlet (the first element's inlet is at 0 m).
 *
 * @param title the engineer's name for the run
 * @param fluid fluid properties used throughout (one temperature for the run)
 * @param friction default friction method for pipes
 * @param elements elements in flow order, ids unique, at least one pipe, at most one pump
 * @param source condition at the source end
 * @param delivery condition at the delivery end
 * @param site barometric pressure at the site
 * @param designFlow design flow (m³/s), ≥ 0
 * @param flowUncertainty relative uncertainty of the design flow for the band (ratio, e.g. 0.05)
 * @param limits design limits for cautions and sizing
 * @param pressureLimits gauge-pressure limits along the run
 */
public record PipeRun(
        String title,
        FluidState fluid,
        FrictionCorrelation friction,
        List<Element> elements,
        EndCondition source,
        EndCondition delivery,
        SiteAtmosphere site,
        double designFlow,
        double flowUncertainty,
        DesignLimits limits,
        PressureLimits pressureLimits) {

    /** Largest design flow accepted (m³/s), above the flow of most rivers; guards against unit slips. */
    public static final double MAX_FLOW = 1e4;

    public PipeRun {
        Objects.requireNonNull(fluid, "fluid");
        Objects.requireNonNull(friction, "friction");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(delivery, "delivery");
        Objects.requireNonNull(site, "site");
        Objects.requireNonNull(limits, "limits");
        pressureLimits = pressureLimits == null ? PressureLimits.NONE : pressureLimits;
        title = title == null ? "" : title;
        elements = List.copyOf(elements);
        if (elements.stream().noneMatch(e -> e instanceof Segment)) {
            throw new InputException("segments", "a run needs at least one segment");
        }
        Set<String> ids = new HashSet<>();
        int pumps = 0;
        for (Element e : elements) {
            if (!ids.add(e.id())) {
                throw new InputException("elements", "two elements share the id '" + e.id() + "'; ids must be unique");
            }
            if (e instanceof PumpElement) {
                pumps++;
            }
        }
        if (pumps > 1) {
            throw new InputException(
                    "elements",
                    "a series run takes at most one pump, found " + pumps + "; pumps in series or parallel need a"
                            + " network");
        }
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

    /**
     * A run of pipe segments with an optional pump placed before the segment at {@code pumpPosition}
     * (the shape of a format-1 project).
     *
     * @param atmosphericPressure barometric pressure (Pa)
     */
    public static PipeRun of(
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
        Objects.requireNonNull(pump, "pump");
        if (pumpPosition < 0 || pumpPosition > segments.size()) {
            throw new InputException(
                    "pump position", "must be between 0 and " + segments.size() + ", got " + pumpPosition);
        }
        List<Element> elements = new ArrayList<>(segments);
        if (pump.isPresent()) {
            Set<String> taken = new HashSet<>();
            segments.forEach(s -> taken.add(s.id()));
            String id = "pump";
            for (int n = 2; taken.contains(id); n++) {
                id = "pump-" + n;
            }
            elements.add(pumpPosition, new PumpElement(id, pump.get()));
        }
        SiteAtmosphere site = atmosphericPressure == SiteAtmosphere.SEA_LEVEL_PRESSURE
                ? SiteAtmosphere.SEA_LEVEL
                : SiteAtmosphere.ofPressure(atmosphericPressure);
        return new PipeRun(
                title,
                fluid,
                friction,
                elements,
                source,
                delivery,
                site,
                designFlow,
                flowUncertainty,
                limits,
                PressureLimits.NONE);
    }

    /** The pipes in flow order. */
    public List<Segment> segments() {
        List<Segment> pipes = new ArrayList<>();
        for (Element e : elements) {
            if (e instanceof Segment s) {
                pipes.add(s);
            }
        }
        return pipes;
    }

    /** The pump element, if the run has one. */
    public Optional<PumpElement> pumpElement() {
        for (Element e : elements) {
            if (e instanceof PumpElement p) {
                return Optional.of(p);
            }
        }
        return Optional.empty();
    }

    /** The pump's curve, if the run has a pump. */
    public Optional<PumpCurve> pump() {
        return pumpElement().map(PumpElement::curve);
    }

    /** Number of pipes upstream of the pump (0 when it sits at the source end or there is none). */
    public int pumpPosition() {
        int pipes = 0;
        for (Element e : elements) {
            if (e instanceof PumpElement) {
                return pipes;
            }
            if (e instanceof Segment) {
                pipes++;
            }
        }
        return 0;
    }

    /** Barometric pressure at the site (Pa). */
    public double atmosphericPressure() {
        return site.pressure();
    }

    /** The context every element law is evaluated in. */
    public FlowContext context() {
        return new FlowContext(fluid, friction);
    }

    /** The element with an id. */
    public Optional<Element> element(String id) {
        for (Element e : elements) {
            if (e.id().equals(id)) {
                return Optional.of(e);
            }
        }
        return Optional.empty();
    }

    /**
     * A copy with some pipes replaced, matched by id (sizing). Every replacement must name a pipe
     * of this run.
     */
    public PipeRun withSegments(List<Segment> newSegments) {
        Map<String, Segment> byId = new LinkedHashMap<>();
        for (Segment s : newSegments) {
            byId.put(s.id(), s);
        }
        List<Element> replaced = new ArrayList<>(elements.size());
        for (Element e : elements) {
            Segment s = e instanceof Segment ? byId.remove(e.id()) : null;
            replaced.add(s == null ? e : s);
        }
        if (!byId.isEmpty()) {
            throw new InputException(
                    "segments",
                    "no pipe with the id '" + byId.keySet().iterator().next() + "' in this run");
        }
        return withElements(replaced);
    }

    /** A copy with other elements. */
    public PipeRun withElements(List<Element> newElements) {
        return new PipeRun(
                title,
                fluid,
                friction,
                newElements,
                source,
                delivery,
                site,
                designFlow,
                flowUncertainty,
                limits,
                pressureLimits);
    }

    /** A copy with another friction method. */
    public PipeRun withFriction(FrictionCorrelation method) {
        return new PipeRun(
                title,
                fluid,
                method,
                elements,
                source,
                delivery,
                site,
                designFlow,
                flowUncertainty,
                limits,
                pressureLimits);
    }

    /** A copy with another design flow. */
    public PipeRun withDesignFlow(double flow) {
        return new PipeRun(
                title,
                fluid,
                friction,
                elements,
                source,
                delivery,
                site,
                flow,
                flowUncertainty,
                limits,
                pressureLimits);
    }

    /** A copy with another site atmosphere. */
    public PipeRun withSite(SiteAtmosphere newSite) {
        return new PipeRun(
                title,
                fluid,
                friction,
                elements,
                source,
                delivery,
                newSite,
                designFlow,
                flowUncertainty,
                limits,
                pressureLimits);
    }

    /** A copy with other pressure limits. */
    public PipeRun withPressureLimits(PressureLimits newLimits) {
        return new PipeRun(
                title,
                fluid,
                friction,
                elements,
                source,
                delivery,
                site,
                designFlow,
                flowUncertainty,
                limits,
                newLimits);
    }

    /**
     * Static head the pump must overcome: outlet elevation plus delivery head minus source head.
     *
     * @return static head (m)
     */
    public double staticHead() {
        double rise = 0;
        for (Element e : elements) {
            rise += e.rise();
        }
        return rise + delivery.head(fluid.density()) - source.head(fluid.density());
    }

    /**
     * Size of the terms the static head is summed from, Σ|rise| + |delivery head| + |source head|,
     * against which a static head of rounding size is zero for display ({@code
     * Quantities.withoutNoise}).
     *
     * @return scale (m)
     */
    public double staticHeadScale() {
        double scale = 0;
        for (Element e : elements) {
            scale += Math.abs(e.rise());
        }
        return scale + Math.abs(delivery.head(fluid.density())) + Math.abs(source.head(fluid.density()));
    }
}
