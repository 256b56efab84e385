package org.headway.project;

import java.util.List;
import java.util.Optional;

/**
 * A project file as the engineer wrote it: quantities stay as the text they typed ({@code "35 m"},
 * {@code "12 L/s"}) so that saving gives back their units. {@link ProjectResolver} turns it into a
 * {@link org.headway.system.PipeRun}.
 *
 * @param title project title
 * @param titleBlock job reference and sign-off fields for the sheet
 * @param fluid the fluid
 * @param flow design flow, text with unit
 * @param flowUncertainty relative uncertainty of the flow, e.g. {@code "5 %"} or {@code "0.05"}
 * @param friction friction method id ({@code hazen-williams} too), or {@code fitted:PATH} for a saved
 *     fitted correlation
 * @param elements the run's elements in flow order: pipes, the pump, valves, components
 * @param ends end conditions
 * @param limits design limits (each optional)
 * @param sizing what sizing may choose from, if given
 * @param curve system curve range, if given
 * @param site site atmosphere (altitude or barometric pressure), each optional
 * @param pressureLimits gauge-pressure limits along the run, each optional
 * @param inletLevel absolute level of the run inlet, when the file gives absolute levels
 */
public record Project(
        String title,
        TitleBlock titleBlock,
        FluidSpec fluid,
        String flow,
        String flowUncertainty,
        String friction,
        List<ElementSpec> elements,
        EndsSpec ends,
        LimitsSpec limits,
        Optional<SizingSpec> sizing,
        Optional<CurveSpec> curve,
        SiteSpec site,
        PressureLimitsSpec pressureLimits,
        String inletLevel,
        Optional<NetworkSpec> network) {

    /** Format name written into every project file. */
    public static final String FORMAT = "headway-project";
    /** Current format version: 2, named elements with ids. Version 1 files load and migrate. */
    public static final int VERSION = 2;

    public Project {
        elements = List.copyOf(elements);
        site = site == null ? SiteSpec.SEA_LEVEL : site;
        pressureLimits = pressureLimits == null ? PressureLimitsSpec.NONE : pressureLimits;
        inletLevel = inletLevel == null ? "" : inletLevel;
        network = network == null ? Optional.empty() : network;
    }

    /** A series-run project of format 2 (no network). */
    public Project(
            String title,
            TitleBlock titleBlock,
            FluidSpec fluid,
            String flow,
            String flowUncertainty,
            String friction,
            List<ElementSpec> elements,
            EndsSpec ends,
            LimitsSpec limits,
            Optional<SizingSpec> sizing,
            Optional<CurveSpec> curve,
            SiteSpec site,
            PressureLimitsSpec pressureLimits,
            String inletLevel) {
        this(
                title,
                titleBlock,
                fluid,
                flow,
                flowUncertainty,
                friction,
                elements,
                ends,
                limits,
                sizing,
                curve,
                site,
                pressureLimits,
                inletLevel,
                Optional.empty());
    }

    /**
     * A network project as a line list gives it: a title, the fluid at a temperature, the default
     * friction method and the nodes and links; everything else at its default.
     */
    public static Project network(String title, String fluid, String temperature, String friction, NetworkSpec net) {
        return new Project(
                title,
                TitleBlock.EMPTY,
                new FluidSpec(fluid, temperature, "", "", "", ""),
                "",
                "",
                friction,
                List.of(),
                EndsSpec.OPEN,
                LimitsSpec.NONE,
                Optional.empty(),
                Optional.empty(),
                SiteSpec.SEA_LEVEL,
                PressureLimitsSpec.NONE,
                "",
                Optional.of(net));
    }

    /** The same project with other gauge-pressure limits. */
    public Project withPressureLimits(PressureLimitsSpec limits) {
        return new Project(
                title,
                titleBlock,
                fluid,
                flow,
                flowUncertainty,
                friction,
                elements,
                ends,
                this.limits,
                sizing,
                curve,
                site,
                limits,
                inletLevel,
                network);
    }

    /** Whether this project holds a network (nodes and links) rather than a series run. */
    public boolean isNetwork() {
        return network.isPresent();
    }

    /**
     * A project of the format-1 shape: pipe segments and a pump placed before the segment at its
     * position. Ids come from the segment names (made unique) and {@code pump}.
     */
    public static Project of(
            String title,
            TitleBlock titleBlock,
            FluidSpec fluid,
            String flow,
            String flowUncertainty,
            String friction,
            List<SegmentSpec> segments,
            EndsSpec ends,
            Optional<PumpSpec> pump,
            LimitsSpec limits,
            Optional<SizingSpec> sizing,
            Optional<CurveSpec> curve) {
        return new Project(
                title,
                titleBlock,
                fluid,
                flow,
                flowUncertainty,
                friction,
                elementsOf(segments, pump),
                ends,
                limits,
                sizing,
                curve,
                SiteSpec.SEA_LEVEL,
                PressureLimitsSpec.NONE,
                "");
    }

    /** Pipes with unique ids from their names, then the pump at its position. */
    static List<ElementSpec> elementsOf(List<SegmentSpec> segments, Optional<PumpSpec> pump) {
        java.util.Set<String> taken = new java.util.HashSet<>();
        List<ElementSpec> out = new java.util.ArrayList<>();
        for (SegmentSpec s : segments) {
            String id = s.id().isEmpty() ? s.name() : s.id();
            String unique = id;
            for (int n = 2; !taken.add(unique); n++) {
                unique = id + " (" + n + ")";
            }
            out.add(unique.equals(s.id()) ? s : s.withId(unique));
        }
        if (pump.isPresent()) {
            PumpSpec ps = pump.get();
            String id = ps.id().isEmpty() ? "pump" : ps.id();
            String unique = id;
            for (int n = 2; !taken.add(unique); n++) {
                unique = id + "-" + n;
            }
            int index = 0;
            int pipes = 0;
            while (index < out.size() && pipes < ps.position()) {
                if (out.get(index) instanceof SegmentSpec) {
                    pipes++;
                }
                index++;
            }
            // The element order holds the position; the stored spec carries 0 so that a format-2 reload is equal.
            out.add(Math.min(index, out.size()), ps.withId(unique).withPosition(0));
        }
        return out;
    }

    /** The pipes in flow order. */
    public List<SegmentSpec> segments() {
        List<SegmentSpec> out = new java.util.ArrayList<>();
        for (ElementSpec e : elements) {
            if (e instanceof SegmentSpec s) {
                out.add(s);
            }
        }
        return out;
    }

    /** The pump with its position (pipes upstream of it), if the run has one. */
    public Optional<PumpSpec> pump() {
        int pipes = 0;
        for (ElementSpec e : elements) {
            if (e instanceof PumpSpec p) {
                return Optional.of(p.withPosition(pipes));
            }
            if (e instanceof SegmentSpec) {
                pipes++;
            }
        }
        return Optional.empty();
    }

    /**
     * This project's elements other than pipes and the pump (valves, components…) put back into
     * a format-1-shaped edit of it, each after the element it followed here (matched by id), so
     * that an edit of the pipes loses none of them; site, pressure limits and inlet level are kept.
     */
    public Project keepingDevicesOf(Project before) {
        List<ElementSpec> merged = new java.util.ArrayList<>(elements);
        String previous = "";
        for (ElementSpec e : before.elements()) {
            if (e instanceof DeviceSpec) {
                int at = 0;
                if (!previous.isEmpty()) {
                    for (int i = 0; i < merged.size(); i++) {
                        if (merged.get(i).id().equals(previous)) {
                            at = i + 1;
                            break;
                        }
                    }
                }
                merged.add(at, e);
            }
            previous = e.id();
        }
        return new Project(
                title,
                titleBlock,
                fluid,
                flow,
                flowUncertainty,
                friction,
                merged,
                ends,
                limits,
                sizing,
                curve,
                before.site(),
                before.pressureLimits(),
                before.inletLevel());
    }

    /** An element of the run as written: a pipe, the pump, or a device (valve, component…). */
    public sealed interface ElementSpec permits SegmentSpec, PumpSpec, DeviceSpec {
        /** The element's id. */
        String id();

        /** The element's kind as written ({@code pipe}, {@code pump}, {@code valve}, …). */
        String kind();
    }

    /**
     * A device other than a pipe or pump, with its fields as typed.
     *
     * @param kind {@code valve}, {@code component}, {@code reducer}, {@code check-valve}, {@code isolation}
     * @param id stable id
     * @param name name, optional
     * @param values the kind's fields as text (e.g. {@code kv} → {@code "25"})
     */
    public record DeviceSpec(String kind, String id, String name, java.util.Map<String, String> values)
            implements ElementSpec {

        /** Fields each device kind may carry. */
        public static final java.util.Map<String, List<String>> FIELDS = java.util.Map.of(
                "valve", List.of("kv", "cv"),
                "component", List.of("ratedPressureDrop", "ratedFlow", "exponent"),
                "reducer", List.of("inletDiameter", "outletDiameter", "includedAngleDegrees"),
                "check-valve", List.of("lossCoefficient", "diameter", "kv", "cv"),
                "isolation", List.of("status", "lossCoefficient", "diameter", "kv", "cv"),
                "flow-control", List.of("setting", "lossCoefficient", "diameter", "kv", "cv"),
                "pressure-reducing", List.of("setting", "lossCoefficient", "diameter", "kv", "cv"),
                "pressure-sustaining", List.of("setting", "lossCoefficient", "diameter", "kv", "cv"));

        public DeviceSpec {
            name = name == null ? "" : name;
            values = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(values));
        }

        /** A field's text, empty when not given. */
        public String value(String key) {
            return values.getOrDefault(key, "");
        }
    }

    /**
     * A network node as typed.
     *
     * @param id stable id
     * @param name optional name
     * @param elevation elevation (a length)
     * @param demand demand out of the network (a flow; blank = 0), of category {@code base}
     * @param fixedHead head of a fixed-head node (a length on the elevations' datum), or blank
     * @param fixedPressure gauge pressure held at a fixed-pressure node (its head is elevation plus
     *     pressure over ρg), or blank
     * @param reference whether the node is a closed loop's pressure reference (with fixedHead or
     *     fixedPressure)
     * @param x drawing position, optional
     * @param y drawing position, optional
     * @param demands further named demands (category → flow text), in order; demand cases scale them
     *     by category
     */
    public record NodeSpec(
            String id,
            String name,
            String elevation,
            String demand,
            String fixedHead,
            String fixedPressure,
            boolean reference,
            String x,
            String y,
            java.util.Map<String, String> demands) {
        public NodeSpec {
            name = name == null ? "" : name;
            elevation = elevation == null ? "" : elevation;
            demand = demand == null ? "" : demand;
            fixedHead = fixedHead == null ? "" : fixedHead;
            fixedPressure = fixedPressure == null ? "" : fixedPressure;
            x = x == null ? "" : x;
            y = y == null ? "" : y;
            // Most nodes have no named demand: the shared empty map (10⁶ nodes would hold 10⁶ empty maps).
            demands = demands == null || demands.isEmpty()
                    ? java.util.Map.of()
                    : java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(demands));
        }

        /** A node with at most its one plain demand. */
        public NodeSpec(
                String id,
                String name,
                String elevation,
                String demand,
                String fixedHead,
                String fixedPressure,
                boolean reference,
                String x,
                String y) {
            this(id, name, elevation, demand, fixedHead, fixedPressure, reference, x, y, java.util.Map.of());
        }
    }

    /**
     * A network link as typed: an element between two nodes.
     *
     * @param from upstream node id for positive flow
     * @param to downstream node id
     * @param element the element
     * @param designFlow the flow the link should carry (used by balancing), or blank
     */
    public record LinkSpec(String from, String to, ElementSpec element, String designFlow) {
        public LinkSpec {
            designFlow = designFlow == null ? "" : designFlow;
        }
    }

    /** A network as typed: nodes, links and demand cases (which may be none). */
    public record NetworkSpec(List<NodeSpec> nodes, List<LinkSpec> links, List<DemandCaseSpec> demandCases) {
        public NetworkSpec {
            nodes = List.copyOf(nodes);
            links = List.copyOf(links);
            demandCases = List.copyOf(demandCases == null ? List.of() : demandCases);
        }

        /** A network without demand cases. */
        public NetworkSpec(List<NodeSpec> nodes, List<LinkSpec> links) {
            this(nodes, links, List.of());
        }

        /** The same network with these demand cases. */
        public NetworkSpec withDemandCases(List<DemandCaseSpec> cases) {
            return new NetworkSpec(nodes, links, cases);
        }
    }

    /**
     * A demand case as typed.
     *
     * @param name unique name ({@code peak}, {@code night}, {@code fire}…)
     * @param multiplier factor on every demand (a ratio as text; blank = 1)
     * @param demandMultipliers factor on the demands of a category (category → ratio text), on top of
     *     the multiplier
     * @param nodeDemands a junction's total demand in this case (node id → flow text), replacing its
     *     own
     */
    public record DemandCaseSpec(
            String name,
            String multiplier,
            java.util.Map<String, String> demandMultipliers,
            java.util.Map<String, String> nodeDemands) {
        public DemandCaseSpec {
            name = name == null ? "" : name;
            multiplier = multiplier == null ? "" : multiplier;
            demandMultipliers = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(demandMultipliers));
            nodeDemands = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(nodeDemands));
        }
    }

    /** Site atmosphere as typed: an altitude or a barometric pressure (at most one). */
    public record SiteSpec(String altitude, String barometricPressure) {
        public static final SiteSpec SEA_LEVEL = new SiteSpec("", "");
    }

    /** Gauge-pressure limits as typed, each optional. */
    public record PressureLimitsSpec(String minimum, String maximum) {
        public static final PressureLimitsSpec NONE = new PressureLimitsSpec("", "");
    }

    /** Sign-off block: all fields may be empty (the sheet then prints a blank line to sign). */
    public record TitleBlock(
            String job, String revision, String preparedBy, String checkedBy, String date, String notes) {
        public static final TitleBlock EMPTY = new TitleBlock("", "", "", "", "", "");
    }

    /**
     * @param name fluid id (e.g. {@code water}, {@code seawater:35}) or a user name with density and viscosity
     * @param temperature text with unit, required for catalog fluids
     * @param pressure absolute pressure text, optional (standard atmosphere if empty)
     * @param density override, text with unit, optional
     * @param viscosity dynamic viscosity override, text with unit, optional
     * @param vapourPressure override, text with unit, optional
     */
    public record FluidSpec(
            String name,
            String temperature,
            String pressure,
            String density,
            String viscosity,
            String vapourPressure) {}

    /**
     * @param id stable id (empty: the name)
     * @param name segment name
     * @param length text with unit
     * @param pipe catalog pipe, or empty when the bore is given
     * @param innerDiameter explicit bore or override, text with unit (optional with a catalog pipe)
     * @param roughness explicit roughness or override, text with unit (optional with a catalog pipe)
     * @param fittings fittings with counts
     * @param lossCoefficient explicit additional K, text (optional)
     * @param elevationChange outlet minus inlet elevation, text with unit (optional, 0)
     * @param outletLevel absolute outlet level, text with unit (optional; needs the project's inlet level)
     * @param friction the pipe's own friction method id, optional
     * @param hazenWilliamsC the pipe's Hazen–Williams C, optional
     * @param highPointDistance distance of a high point from the inlet, optional
     * @param highPointRise rise of that high point above the inlet, optional
     */
    public record SegmentSpec(
            String id,
            String name,
            String length,
            Optional<PipeSpec> pipe,
            String innerDiameter,
            String roughness,
            List<FittingSpec> fittings,
            String lossCoefficient,
            String elevationChange,
            String outletLevel,
            String friction,
            String hazenWilliamsC,
            String highPointDistance,
            String highPointRise)
            implements ElementSpec {
        public SegmentSpec {
            fittings = List.copyOf(fittings);
            id = id == null ? "" : id;
            outletLevel = outletLevel == null ? "" : outletLevel;
            friction = friction == null ? "" : friction;
            hazenWilliamsC = hazenWilliamsC == null ? "" : hazenWilliamsC;
            highPointDistance = highPointDistance == null ? "" : highPointDistance;
            highPointRise = highPointRise == null ? "" : highPointRise;
        }

        /** A segment of the format-1 shape (id from the name, no per-pipe method, no high point). */
        public SegmentSpec(
                String name,
                String length,
                Optional<PipeSpec> pipe,
                String innerDiameter,
                String roughness,
                List<FittingSpec> fittings,
                String lossCoefficient,
                String elevationChange) {
            this(
                    "",
                    name,
                    length,
                    pipe,
                    innerDiameter,
                    roughness,
                    fittings,
                    lossCoefficient,
                    elevationChange,
                    "",
                    "",
                    "",
                    "",
                    "");
        }

        @Override
        public String kind() {
            return "pipe";
        }

        /** A copy with another id. */
        public SegmentSpec withId(String newId) {
            return new SegmentSpec(
                    newId,
                    name,
                    length,
                    pipe,
                    innerDiameter,
                    roughness,
                    fittings,
                    lossCoefficient,
                    elevationChange,
                    outletLevel,
                    friction,
                    hazenWilliamsC,
                    highPointDistance,
                    highPointRise);
        }

        /** A copy with the edited format-1 fields of another spec, keeping this one's id and format-2 fields. */
        public SegmentSpec withCoreOf(SegmentSpec edited) {
            return new SegmentSpec(
                    id,
                    edited.name(),
                    edited.length(),
                    edited.pipe(),
                    edited.innerDiameter(),
                    edited.roughness(),
                    edited.fittings(),
                    edited.lossCoefficient(),
                    edited.elevationChange(),
                    outletLevel,
                    friction,
                    hazenWilliamsC,
                    highPointDistance,
                    highPointRise);
        }
    }

    /** A catalog pipe: material id, nominal size, schedule. */
    public record PipeSpec(String material, String size, String schedule) {}

    /**
     * @param kind fitting id in the catalog, {@code fitted:PATH} for a saved K-vs-Re correlation, or
     *     {@code bore-change} for a reducer or enlarger at the pipe's outlet
     * @param count how many
     * @param lossCoefficient explicit K override (optional)
     * @param toDiameter a {@code bore-change}'s bore after the change (a length as typed), else empty
     * @param includedAngleDegrees a {@code bore-change}'s included cone angle in degrees (optional,
     *     default 180: sudden), else empty
     */
    public record FittingSpec(
            String kind, int count, String lossCoefficient, String toDiameter, String includedAngleDegrees) {

        public FittingSpec {
            toDiameter = toDiameter == null ? "" : toDiameter;
            includedAngleDegrees = includedAngleDegrees == null ? "" : includedAngleDegrees;
        }

        /** A catalog or fitted fitting (no bore change). */
        public FittingSpec(String kind, int count, String lossCoefficient) {
            this(kind, count, lossCoefficient, "", "");
        }
    }

    /** Source and delivery end. */
    public record EndsSpec(EndSpec source, EndSpec delivery) {
        public static final EndsSpec OPEN = new EndsSpec(EndSpec.OPEN, EndSpec.OPEN);
    }

    /** One end: surface level above the adjacent pipe end and gauge pressure, as text. */
    public record EndSpec(String level, String pressure) {
        public static final EndSpec OPEN = new EndSpec("", "");
    }

    /**
     * @param id stable id (empty: {@code pump})
     * @param name pump name
     * @param position number of pipes upstream of the pump (derived from the element order in format 2)
     * @param points maker's points
     * @param npshRequired NPSH required, optional
     * @param speedRatio running speed over the curve's speed, optional (1)
     */
    public record PumpSpec(
            String id, String name, int position, List<PumpPointSpec> points, String npshRequired, String speedRatio)
            implements ElementSpec {
        public PumpSpec {
            points = List.copyOf(points);
            id = id == null ? "" : id;
            speedRatio = speedRatio == null ? "" : speedRatio;
        }

        /** A pump of the format-1 shape. */
        public PumpSpec(String name, int position, List<PumpPointSpec> points, String npshRequired) {
            this("", name, position, points, npshRequired, "");
        }

        @Override
        public String kind() {
            return "pump";
        }

        PumpSpec withId(String newId) {
            return new PumpSpec(newId, name, position, points, npshRequired, speedRatio);
        }

        PumpSpec withPosition(int newPosition) {
            return new PumpSpec(id, name, newPosition, points, npshRequired, speedRatio);
        }
    }

    /** A pump point as text. */
    public record PumpPointSpec(String flow, String head, String npshRequired) {

        public PumpPointSpec {
            npshRequired = npshRequired == null ? "" : npshRequired;
        }

        /** A point without NPSH required. */
        public PumpPointSpec(String flow, String head) {
            this(flow, head, "");
        }
    }

    /** Design limits as text, each optional. */
    public record LimitsSpec(
            String minimumVelocity,
            String maximumVelocity,
            String maximumFrictionLossPer100m,
            String headBudget,
            String npshMargin) {
        public static final LimitsSpec NONE = new LimitsSpec("", "", "", "", "");
    }

    /** Sizing candidates: a material and schedule from the catalog. */
    public record SizingSpec(String material, String schedule) {}

    /** System curve range as text. */
    public record CurveSpec(String minimumFlow, String maximumFlow, int points) {}
}
