package org.headway.project;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Supplier;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.fluid.Fluid;
import org.headway.fluid.FluidState;
import org.headway.fluid.Fluids;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionMethods;
import org.headway.pipe.BoreChange;
import org.headway.pipe.Catalog;
import org.headway.pipe.Fitting;
import org.headway.pipe.HazenWilliamsCoefficient;
import org.headway.pipe.Material;
import org.headway.pipe.PipeSize;
import org.headway.system.CheckValve;
import org.headway.system.DesignLimits;
import org.headway.system.DiameterChange;
import org.headway.system.Element;
import org.headway.system.EndCondition;
import org.headway.system.FittingUse;
import org.headway.system.FlowCoefficientValve;
import org.headway.system.FlowControlValve;
import org.headway.system.GivenLossCoefficient;
import org.headway.system.Gravity;
import org.headway.system.IsolationValve;
import org.headway.system.LocalLoss;
import org.headway.system.PipeRun;
import org.headway.system.PressureControlValve;
import org.headway.system.PressureLimits;
import org.headway.system.PumpCurve;
import org.headway.system.PumpElement;
import org.headway.system.RatedComponent;
import org.headway.system.Segment;
import org.headway.system.SiteAtmosphere;
import org.headway.system.SizeSelector;
import org.headway.units.PressureReading;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;

/**
 * Turns a {@link Project} into a {@link ResolvedProject}: parses every quantity, looks up fluids,
 * materials, sizes and fittings, and applies the engineer's overrides. Every problem found is
 * reported with its JSON path, all of them at once.
 *
 * <p>Readings that need the project's own state are converted here:
 *
 * <ul>
 *   <li>Pressures marked gauge or absolute ({@code barg}, {@code psia}, {@code kPa(g)}). End
 *       pressures and {@code pressureLimits} are gauge by convention: a gauge or plain reading is
 *       taken as it is, an absolute one less the site's barometric pressure. The fluid's {@code
 *       pressure} is absolute: a gauge reading gets the barometric pressure added. A {@code
 *       vapourPressure} or {@code site.barometricPressure} is absolute by its nature and refuses a
 *       gauge reading (a vapour pressure in gauge would be negative for cold water; the
 *       atmosphere's own gauge pressure is zero). A device's {@code ratedPressureDrop} is a
 *       difference and refuses both markers.
 *   <li>Mass flows ({@code kg/h}, {@code kg/s}, {@code lb/h}, {@code t/h}) for the design flow,
 *       the {@code curve} range, pump curve points and a component's {@code ratedFlow}, divided by
 *       the fluid's density at its resolved state; when the fluid cannot be resolved there is no
 *       density and a mass flow is refused.
 *   <li>The friction-loss limit {@code maximumFrictionLossPer100m}, written as a gradient ({@code 4
 *       m per 100 m}, {@code 4 ft per 100 ft}, {@code 0.04 m/m}) or a bare number of m per 100 m; a
 *       pressure per length ({@code 400 Pa/m}, {@code 1.2 psi/100ft}) is divided by ρ g with the
 *       fluid's density and standard gravity.
 * </ul>
 */
public final class ProjectResolver {

    /** Default flow uncertainty when the project gives none (ratio). */
    public static final double DEFAULT_FLOW_UNCERTAINTY = 0.0;

    private final Catalog catalog;
    private final Path baseFolder;
    private final List<String> problems = new ArrayList<>();

    /** The place of each problem in {@link #problems}, in the same order. */
    private final List<String> places = new ArrayList<>();

    /**
     * The collected problems as one error: a single one keeps its place; several are listed, each
     * line with its own.
     */
    private InputException failure() {
        if (problems.size() == 1) {
            String where = places.get(0);
            String line = problems.get(0);
            return new InputException(where, where.isEmpty() ? line : line.substring(where.length() + 2));
        }
        // Several problems: each line names its own place; the list as a whole has none.
        return new InputException("", problems.size() + " problems:\n  " + String.join("\n  ", problems));
    }

    private ProjectResolver(Catalog catalog, Path baseFolder) {
        this.catalog = catalog;
        this.baseFolder = baseFolder;
    }

    /**
     * @param project the project as written
     * @param catalog catalog to look names up in
     * @param baseFolder folder relative paths in the project are resolved against (its own folder)
     * @throws InputException listing every problem with its JSON path
     */
    public static ResolvedProject resolve(Project project, Catalog catalog, Path baseFolder) {
        return new ProjectResolver(catalog, baseFolder).run(project);
    }

    /**
     * Resolves a network project's nodes and links. Heads: a node's {@code fixedHead} is a level on
     * the elevations' datum; a {@code fixedPressure} (gauge) is held at the node's elevation, head z +
     * p/(ρ g). Each link's element is resolved as in a series run; a pipe's elevation change is not
     * used (node elevations are).
     *
     * @throws InputException listing every problem with its JSON path
     */
    public static org.headway.network.Network resolveNetwork(Project project, Catalog catalog, Path baseFolder) {
        if (project.network().isEmpty()) {
            throw new InputException("nodes", "this project is a series run, not a network (no nodes and links)");
        }
        return new ProjectResolver(catalog, baseFolder).network(project);
    }

    /**
     * Resolves a network project with its demand cases ({@code demandCases}), its gauge-pressure
     * limits ({@code pressureLimits}, checked at every junction in every case) and its NPSH margin
     * ({@code limits.npshMargin}, else {@link DesignLimits#USUAL}'s).
     *
     * @throws InputException listing every problem with its JSON path
     */
    public static org.headway.network.NetworkStudy resolveNetworkStudy(
            Project project, Catalog catalog, Path baseFolder) {
        if (project.network().isEmpty()) {
            throw new InputException("nodes", "this project is a series run, not a network (no nodes and links)");
        }
        return new ProjectResolver(catalog, baseFolder).study(project);
    }

    private org.headway.network.NetworkStudy study(Project p) {
        org.headway.network.Network net = network(p);
        double barometric = net.site().pressure();
        double density = net.context().fluid().density();
        PressureLimits limits = attempt("pressureLimits", () -> pressureLimits(p.pressureLimits(), barometric));
        double margin = p.limits().npshMargin().isEmpty()
                ? DesignLimits.USUAL.npshMargin()
                : orZero(attempt(
                        "limits.npshMargin",
                        () -> InputException.requireNonNegative(
                                "npshMargin",
                                Quantities.parse(p.limits().npshMargin(), QuantityKind.HEAD, "npshMargin"))));
        List<org.headway.network.DemandCase> cases = new ArrayList<>();
        List<Project.DemandCaseSpec> specs = p.network().orElseThrow().demandCases();
        for (int i = 0; i < specs.size(); i++) {
            Project.DemandCaseSpec c = specs.get(i);
            String path = "demandCases[" + i + "] (" + c.name() + ")";
            org.headway.network.DemandCase dc = attempt(path, () -> demandCase(c, density));
            if (dc != null && attempt(path, () -> dc.applyTo(net)) != null) {
                cases.add(dc);
            }
        }
        if (!problems.isEmpty()) {
            throw failure();
        }
        return new org.headway.network.NetworkStudy(net, cases, limits, margin);
    }

    private static org.headway.network.DemandCase demandCase(Project.DemandCaseSpec c, double density) {
        if (c.name().isBlank()) {
            throw new InputException("name", "every demand case needs a name");
        }
        double multiplier = c.multiplier().isEmpty() ? 1 : multiplier(c.multiplier(), "multiplier");
        java.util.Map<String, Double> categories = new java.util.LinkedHashMap<>();
        c.demandMultipliers().forEach((k, v) -> categories.put(k, multiplier(v, "demandMultipliers." + k)));
        java.util.Map<String, Double> nodes = new java.util.LinkedHashMap<>();
        c.nodeDemands().forEach((k, v) -> nodes.put(k, flow(v, density, "nodeDemands." + k)));
        return new org.headway.network.DemandCase(c.name(), multiplier, categories, nodes);
    }

    /** A demand multiplier: a plain number (0.4) or a percentage ("40 %"). */
    static double multiplier(String text, String where) {
        String t = text.strip();
        double value;
        try {
            value = t.endsWith("%")
                    ? Double.parseDouble(t.substring(0, t.length() - 1).strip()) / 100.0
                    : Double.parseDouble(t);
        } catch (NumberFormatException e) {
            throw new InputException(where, "expected a multiplier such as 0.4 or \"40 %\", got \"" + text + "\"");
        }
        if (!Double.isFinite(value) || value < 0 || value > org.headway.network.DemandCase.MAX_MULTIPLIER) {
            throw new InputException(
                    where,
                    "a demand multiplier must lie between 0 and " + (int) org.headway.network.DemandCase.MAX_MULTIPLIER
                            + ", got \"" + text + "\"");
        }
        return value;
    }

    private org.headway.network.Network network(Project p) {
        double barometric = siteForReadings(p.site()).pressure();
        FluidState fluid = attempt("fluid", () -> fluid(p.fluid(), barometric));
        boolean hazenWilliamsRun = HAZEN_WILLIAMS.equals(p.friction());
        FrictionCorrelation friction =
                hazenWilliamsRun ? FrictionMethods.byId("auto") : attempt("friction", () -> friction(p.friction()));
        SiteAtmosphere site = attempt("site", () -> site(p.site()));
        Project.NetworkSpec spec = p.network().orElseThrow();
        double density = fluid == null ? Double.NaN : fluid.density();
        List<org.headway.network.Node> nodes = new ArrayList<>();
        for (int i = 0; i < spec.nodes().size(); i++) {
            Project.NodeSpec n = spec.nodes().get(i);
            org.headway.network.Node node = attempt("nodes[" + i + "] (" + n.id() + ")", () -> node(n, density));
            if (node != null) {
                nodes.add(node);
            }
        }
        List<org.headway.network.Link> links = new ArrayList<>();
        for (int i = 0; i < spec.links().size(); i++) {
            Project.LinkSpec l = spec.links().get(i);
            String path = "links[" + i + "] (" + l.element().id() + ")";
            Element e = null;
            if (l.element() instanceof Project.SegmentSpec seg) {
                e = attempt(path, () -> segment(seg, fluid, hazenWilliamsRun, null, 0));
            } else if (l.element() instanceof Project.PumpSpec ps) {
                e = attempt(path, () -> pumpElement(ps, density));
            } else if (l.element() instanceof Project.DeviceSpec d) {
                e = attempt(path, () -> device(d, fluid));
            }
            if (e != null) {
                Element element = e;
                org.headway.network.Link link = attempt(
                        path,
                        () -> new org.headway.network.Link(
                                element,
                                l.from(),
                                l.to(),
                                l.designFlow().isEmpty() ? Double.NaN : flow(l.designFlow(), density, "designFlow")));
                if (link != null) {
                    links.add(link);
                }
            }
        }
        if (!problems.isEmpty()) {
            throw failure();
        }
        return new org.headway.network.Network(
                p.title(), new org.headway.system.FlowContext(fluid, friction), nodes, links, site);
    }

    private static org.headway.network.Node node(Project.NodeSpec n, double density) {
        double z = n.elevation().isEmpty() ? 0 : Quantities.parse(n.elevation(), QuantityKind.LENGTH, "elevation");
        double x = n.x().isEmpty() ? Double.NaN : Quantities.parse(n.x(), QuantityKind.LENGTH, "x");
        double y = n.y().isEmpty() ? Double.NaN : Quantities.parse(n.y(), QuantityKind.LENGTH, "y");
        OptionalDouble head = OptionalDouble.empty();
        if (!n.fixedHead().isEmpty() && !n.fixedPressure().isEmpty()) {
            throw new InputException("fixedHead", "give a fixed head or a fixed pressure, not both");
        }
        if (!n.fixedHead().isEmpty()) {
            head = OptionalDouble.of(Quantities.parse(n.fixedHead(), QuantityKind.HEAD, "fixedHead"));
        } else if (!n.fixedPressure().isEmpty()) {
            if (Double.isNaN(density)) {
                throw new InputException("fixedPressure", "needs the fluid's density, which could not be found");
            }
            double pa = Quantities.parse(n.fixedPressure(), QuantityKind.PRESSURE, "fixedPressure");
            head = OptionalDouble.of(z + pa / (density * Gravity.STANDARD));
        }
        if (n.reference() && head.isEmpty()) {
            throw new InputException("reference", "a pressure reference needs a fixedHead or fixedPressure");
        }
        if (n.elevation().isEmpty() && head.isPresent() && n.fixedPressure().isEmpty()) {
            // A reservoir or tank given by its level alone: the level is its free surface, at gauge zero.
            z = head.getAsDouble();
        }
        double demand = n.demand().isEmpty() ? 0 : flow(n.demand(), density, "demand");
        List<org.headway.network.Node.Demand> demands = new ArrayList<>();
        if (demand != 0) {
            demands.add(new org.headway.network.Node.Demand(org.headway.network.Node.Demand.BASE, demand));
        }
        for (var e : n.demands().entrySet()) {
            if (e.getKey().equals(org.headway.network.Node.Demand.BASE)) {
                throw new InputException(
                        "demands." + e.getKey(), "the category \"base\" is the node's plain demand; give it as demand");
            }
            double q = flow(e.getValue(), density, "demands." + e.getKey());
            demands.add(new org.headway.network.Node.Demand(e.getKey(), q));
        }
        org.headway.network.Node.Kind kind = n.reference()
                ? org.headway.network.Node.Kind.REFERENCE
                : head.isPresent() ? org.headway.network.Node.Kind.FIXED_HEAD : org.headway.network.Node.Kind.JUNCTION;
        return new org.headway.network.Node(
                n.id(),
                n.name(),
                kind,
                z,
                demands,
                head,
                Double.isNaN(x) ? OptionalDouble.empty() : OptionalDouble.of(x),
                Double.isNaN(y) ? OptionalDouble.empty() : OptionalDouble.of(y));
    }

    private ResolvedProject run(Project p) {
        // Gauge and absolute readings are converted with the site's barometric pressure; a bad site
        // is reported once, where the site itself is resolved below.
        double barometric = siteForReadings(p.site()).pressure();
        FluidState fluid = attempt("fluid", () -> fluid(p.fluid(), barometric));
        double knownDensity = fluid == null ? Double.NaN : fluid.density();
        double flow = orZero(attempt("flow", () -> flow(p.flow(), knownDensity, "flow")));
        double uncertainty = p.flowUncertainty().isEmpty()
                ? DEFAULT_FLOW_UNCERTAINTY
                : orZero(attempt("flowUncertainty", () -> ratio(p.flowUncertainty())));

        boolean hazenWilliamsRun = HAZEN_WILLIAMS.equals(p.friction());
        FrictionCorrelation friction =
                hazenWilliamsRun ? FrictionMethods.byId("auto") : attempt("friction", () -> friction(p.friction()));
        Double inletLevel = p.inletLevel().isEmpty()
                ? null
                : attempt("inletLevel", () -> Quantities.parse(p.inletLevel(), QuantityKind.LENGTH, "inletLevel"));
        List<Element> elements = new ArrayList<>();
        List<PendingReducer> pendingReducers = new ArrayList<>();
        double level = inletLevel == null ? 0 : inletLevel;
        int pipeIndex = 0;
        for (int i = 0; i < p.elements().size(); i++) {
            Project.ElementSpec spec = p.elements().get(i);
            String path = elementPath(p, spec, i, pipeIndex);
            if (spec instanceof Project.SegmentSpec seg) {
                pipeIndex++;
                final double here = level;
                Segment s = attempt(path, () -> segment(seg, fluid, hazenWilliamsRun, inletLevel, here));
                if (s != null) {
                    elements.add(s);
                    level += s.elevationChange();
                }
            } else if (spec instanceof Project.PumpSpec ps) {
                String pumpPath = p.elements().stream().anyMatch(e -> e instanceof Project.DeviceSpec)
                                || !ps.id().equals("pump")
                        ? path
                        : "pump";
                PumpElement pump = attempt(pumpPath, () -> pumpElement(ps, knownDensity));
                if (pump != null) {
                    elements.add(pump);
                }
            } else if (spec instanceof Project.DeviceSpec d) {
                if (d.kind().equals("reducer")
                        && (d.value("inletDiameter").isEmpty()
                                || d.value("outletDiameter").isEmpty())) {
                    // its bores come from the pipes either side, resolved after the loop
                    pendingReducers.add(new PendingReducer(d, path, elements.size()));
                    continue;
                }
                Element e = attempt(path, () -> device(d, fluid));
                if (e != null) {
                    elements.add(e);
                }
            }
        }
        // with a pipe already refused, its neighbour's bore is unknown: the run fails on that problem
        for (int r = problems.isEmpty() ? pendingReducers.size() - 1 : -1; r >= 0; r--) {
            PendingReducer pending = pendingReducers.get(r);
            Element e = attempt(pending.path(), () -> reducerBetweenPipes(pending, elements));
            if (e != null) {
                elements.add(pending.position(), e);
            }
        }
        double density = fluid == null ? 1000 : fluid.density();
        EndCondition source = attempt("ends.source", () -> end(p.ends().source(), barometric));
        EndCondition delivery = attempt("ends.delivery", () -> end(p.ends().delivery(), barometric));

        DesignLimits limits = attempt("limits", () -> limits(p.limits(), knownDensity));
        SiteAtmosphere site = attempt("site", () -> site(p.site()));
        PressureLimits pressureLimits = attempt("pressureLimits", () -> pressureLimits(p.pressureLimits(), barometric));
        List<SizeSelector.CandidateSize> candidates = new ArrayList<>();
        if (p.sizing().isPresent()) {
            List<SizeSelector.CandidateSize> found =
                    attempt("sizing", () -> candidates(p.sizing().get()));
            if (found != null) {
                candidates.addAll(found);
            }
        }
        Optional<ResolvedProject.CurveRange> curve = Optional.empty();
        if (p.curve().isPresent()) {
            curve = Optional.ofNullable(attempt("curve", () -> curve(p.curve().get(), knownDensity)));
        }
        if (!problems.isEmpty()) {
            throw failure();
        }
        PipeRun run = attempt(
                "",
                () -> new PipeRun(
                        p.title(),
                        fluid,
                        friction,
                        elements,
                        source,
                        delivery,
                        site,
                        flow,
                        uncertainty,
                        limits,
                        pressureLimits));
        if (!problems.isEmpty()) {
            throw failure();
        }
        if (density <= 0) {
            throw new IllegalStateException("density must be positive");
        }
        return new ResolvedProject(p, run, candidates, limits, curve);
    }

    private <T> T attempt(String path, Supplier<T> work) {
        try {
            return work.get();
        } catch (InputException e) {
            String where = path.isEmpty() ? e.where() : (e.where().isEmpty() ? path : joinPath(path, e.where()));
            problems.add(where.isEmpty() ? e.problem() : where + ": " + e.problem());
            places.add(where);
            return null;
        }
    }

    private static String joinPath(String outer, String inner) {
        if (inner.startsWith(outer)) {
            return inner;
        }
        return outer + "." + inner;
    }

    private static double orZero(Double d) {
        return d == null ? 0 : d;
    }

    /** Parses "5 %", "5%" or a plain ratio "0.05". */
    static double ratio(String text) {
        String t = text.strip();
        double value;
        try {
            if (t.endsWith("%")) {
                value = Double.parseDouble(t.substring(0, t.length() - 1).strip()) / 100.0;
            } else {
                value = Double.parseDouble(t);
            }
        } catch (NumberFormatException e) {
            throw new InputException("", "expected a ratio such as \"5 %\" or 0.05, got \"" + text + "\"");
        }
        if (!Double.isFinite(value) || value < 0 || value >= 1) {
            throw new InputException("", "must be between 0 and 100 %, got \"" + text + "\"");
        }
        return value;
    }

    /**
     * A flow as typed, by volume or by mass, in m³/s.
     *
     * @param density the fluid's density at its state (kg/m³), NaN when the fluid is unknown
     */
    private static double flow(String text, double density, String where) {
        return Quantities.parseFlow(text, where).volumetric(density, where);
    }

    /** The site's atmosphere for converting readings; sea level when the site itself is in error. */
    private static SiteAtmosphere siteForReadings(Project.SiteSpec spec) {
        try {
            return site(spec);
        } catch (InputException e) {
            return SiteAtmosphere.SEA_LEVEL;
        }
    }

    /**
     * A pressure that is absolute by its nature (vapour pressure, barometric pressure): a plain or
     * absolute reading is taken as it is, a gauge reading is refused.
     */
    private static double absoluteOnly(String text, String where, String what) {
        PressureReading reading = Quantities.parsePressure(text, where);
        if (reading.reference() == PressureReading.Reference.GAUGE) {
            throw new InputException(
                    where,
                    "\"" + text.strip() + "\" is a gauge reading, but " + what + " is an absolute pressure (measured"
                            + " from vacuum); give its absolute value, e.g. in kPa, kPa(a), bara or psia");
        }
        return reading.pascals();
    }

    /**
     * The fluid's state; without a pressure of its own it is evaluated at the site's air pressure.
     *
     * @param barometric the site's barometric pressure (Pa)
     */
    private FluidState fluid(Project.FluidSpec spec, double barometric) {
        boolean hasOverrides = !spec.density().isEmpty() || !spec.viscosity().isEmpty();
        // The fluid's state pressure is absolute; a gauge reading is above the site's atmosphere.
        double pressure = spec.pressure().isEmpty()
                ? barometric
                : Quantities.parsePressure(spec.pressure(), "pressure").asAbsolute(barometric);
        FluidState state;
        Fluid model = null;
        try {
            model = Fluids.byId(spec.name());
        } catch (InputException e) {
            if (!(!spec.density().isEmpty() && !spec.viscosity().isEmpty())) {
                throw new InputException(
                        "name", e.problem() + " (or give density and viscosity for a fluid of your own)");
            }
        }
        double temperature = spec.temperature().isEmpty()
                ? Double.NaN
                : Quantities.parse(spec.temperature(), QuantityKind.TEMPERATURE, "temperature");
        if (model != null) {
            if (Double.isNaN(temperature)) {
                throw new InputException("temperature", "missing; " + spec.name() + " needs a temperature");
            }
            state = model.state(temperature, pressure);
        } else {
            state = null;
        }
        if (state == null || hasOverrides || !spec.vapourPressure().isEmpty()) {
            double density = !spec.density().isEmpty()
                    ? plausible(
                            "density",
                            positive("density", Quantities.parse(spec.density(), QuantityKind.DENSITY, "density")),
                            MIN_DENSITY,
                            MAX_DENSITY,
                            "kg/m³")
                    : state.density();
            double viscosity = !spec.viscosity().isEmpty()
                    ? plausible(
                            "viscosity",
                            positive(
                                    "viscosity",
                                    Quantities.parse(spec.viscosity(), QuantityKind.DYNAMIC_VISCOSITY, "viscosity")),
                            MIN_VISCOSITY,
                            MAX_VISCOSITY,
                            "Pa·s")
                    : state.dynamicViscosity();
            OptionalDouble vapour = !spec.vapourPressure().isEmpty()
                    ? OptionalDouble.of(InputException.requireNonNegative(
                            "vapourPressure",
                            absoluteOnly(spec.vapourPressure(), "vapourPressure", "a vapour pressure")))
                    : state == null ? OptionalDouble.empty() : state.vapourPressure();
            String given = "given in the project file";
            List<Caution> cautions = state == null ? List.of() : state.cautions();
            state = new FluidState(
                    spec.name(),
                    Double.isNaN(temperature) ? 293.15 : temperature,
                    pressure,
                    density,
                    viscosity,
                    viscosity / density,
                    vapour,
                    spec.density().isEmpty() ? state.densitySource() : given,
                    spec.viscosity().isEmpty() ? state.viscositySource() : given,
                    spec.vapourPressure().isEmpty() ? (state == null ? "" : state.vapourPressureSource()) : given,
                    cautions,
                    !Double.isNaN(temperature));
        }
        return state;
    }

    private static double positive(String field, double v) {
        return InputException.requirePositive(field, v);
    }

    /** Least density accepted (kg/m³): far below any liquid, about a hundredth of air. */
    public static final double MIN_DENSITY = 0.01;

    /** Largest density accepted (kg/m³): above mercury (13,534) with room to spare. */
    public static final double MAX_DENSITY = 30_000;

    /** Least dynamic viscosity accepted (Pa·s): below any gas at ordinary conditions. */
    public static final double MIN_VISCOSITY = 1e-7;

    /** Largest dynamic viscosity accepted (Pa·s): a bitumen; beyond it nothing flows in a pipe. */
    public static final double MAX_VISCOSITY = 1e6;

    /** Largest curve flow accepted (m³/s): above the largest penstocks and mains. */
    public static final double MAX_CURVE_FLOW = 1e3;

    private static double plausible(String field, double v, double min, double max, String unit) {
        if (v < min || v > max) {
            throw new InputException(
                    field,
                    "value " + Quantities.formatNumber(v) + " " + unit + " is outside the plausible range "
                            + Quantities.formatNumber(min) + " to " + Quantities.formatNumber(max) + " " + unit
                            + "; check the number and its unit");
        }
        return v;
    }

    /** Prefix of a friction method or fitting kind that names a saved fitted correlation. */
    public static final String FITTED_PREFIX = "fitted:";

    private FrictionCorrelation friction(String id) {
        if (id.startsWith(FITTED_PREFIX)) {
            Path file = fittedFile(id);
            return new org.headway.correlation.FittedFrictionCorrelation(stem(file), loadFitted(file));
        }
        try {
            return FrictionMethods.byId(id);
        } catch (InputException e) {
            // The project key is "friction" itself; the library's own field name would read as a sub-key.
            throw new InputException("", e.problem() + " (or hazen-williams, or fitted:FILE)");
        }
    }

    /**
     * Loads a fitted-correlation file; its errors become the problem text, so that the file, line
     * and column stay in the message after the project path is put in front.
     */
    private static org.headway.correlation.FittedCorrelation loadFitted(Path file) {
        try {
            return FittedCorrelationFile.load(file);
        } catch (InputException e) {
            throw new InputException("", e.getMessage(), e);
        }
    }

    private Path fittedFile(String id) {
        String name = id.substring(FITTED_PREFIX.length()).strip();
        if (name.isEmpty()) {
            throw new InputException(
                    "", "\"" + FITTED_PREFIX + "\" must be followed by the path of a fitted-correlation file");
        }
        return baseFolder.resolve(name).normalize();
    }

    private static String stem(Path file) {
        String n = file.getFileName() == null
                ? file.toString()
                : file.getFileName().toString();
        int dot = n.lastIndexOf('.');
        return dot > 0 ? n.substring(0, dot) : n;
    }

    private Segment segment(
            Project.SegmentSpec spec, FluidState fluid, boolean hazenWilliamsRun, Double inletLevel, double level) {
        Segment.Builder b = Segment.builder(spec.name()).id(spec.id());
        Material catalogMaterial = null;
        // Darby's 3-K size term takes the nominal size (Darby 2001); unknown for an explicit bore.
        OptionalDouble nominalDiameter = OptionalDouble.empty();
        b.length(InputException.requireNonNegative(
                "length", Quantities.parse(spec.length(), QuantityKind.LENGTH, "length")));
        double diameter;
        double roughness;
        double low;
        double high;
        if (spec.pipe().isPresent()) {
            Project.PipeSpec ps = spec.pipe().get();
            Material material = catalogMaterial(catalog, ps);
            PipeSize size = catalogSize(catalog, material, ps);
            catalogMaterial = material;
            nominalDiameter = size.nominalDiameter();
            diameter = size.innerDiameter();
            roughness = material.roughness();
            low = material.roughnessLow();
            high = material.roughnessHigh();
            String description = material.name() + ", " + sizeLabel(size)
                    + (size.schedule().isEmpty() ? "" : " " + scheduleLabel(size.schedule())) + " (" + size.table()
                    + ")";
            b.pipeDescription(description).pipeCondition(material.condition()).roughnessSource(material.source());
            if (!spec.innerDiameter().isEmpty()) {
                diameter = Quantities.parse(spec.innerDiameter(), QuantityKind.DIAMETER, "innerDiameter");
                b.pipeDescription(description + ", bore given in project");
            }
            if (!spec.roughness().isEmpty()) {
                roughness = Quantities.parse(spec.roughness(), QuantityKind.ROUGHNESS, "roughness");
                low = roughness;
                high = roughness;
                b.roughnessSource("given in the project file");
            }
        } else {
            if (spec.innerDiameter().isEmpty()) {
                throw new InputException("innerDiameter", "missing; give a catalog pipe or an inner diameter");
            }
            if (spec.roughness().isEmpty()) {
                throw new InputException("roughness", "missing; an explicit bore needs its absolute roughness");
            }
            diameter = Quantities.parse(spec.innerDiameter(), QuantityKind.DIAMETER, "innerDiameter");
            roughness = Quantities.parse(spec.roughness(), QuantityKind.ROUGHNESS, "roughness");
            low = roughness;
            high = roughness;
        }
        InputException.requirePositive("innerDiameter", diameter);
        InputException.requireNonNegative("roughness", roughness);
        if (roughness >= diameter) {
            throw new InputException(
                    "roughness",
                    String.format(
                            "roughness %s is not smaller than the inner diameter %s",
                            Quantities.formatNumber(roughness) + " m", Quantities.formatNumber(diameter) + " m"));
        }
        b.bore(diameter, roughness).roughnessRange(Math.min(low, roughness), Math.max(high, roughness));
        for (int j = 0; j < spec.fittings().size(); j++) {
            Project.FittingSpec fs = spec.fittings().get(j);
            String path = "fittings[" + j + "]";
            Fitting fitting;
            if (fs.kind().strip().equals(BoreChange.KIND)) {
                b.fitting(new FittingUse(boreChange(fs, path), fs.count()));
                continue;
            }
            if (!fs.toDiameter().isEmpty() || !fs.includedAngleDegrees().isEmpty()) {
                throw new InputException(
                        path + (fs.toDiameter().isEmpty() ? ".includedAngleDegrees" : ".toDiameter"),
                        "only a " + BoreChange.KIND + " fitting takes a bore and a cone angle; " + fs.kind()
                                + " is a catalog fitting");
            }
            try {
                if (!fs.lossCoefficient().isEmpty()) {
                    double k = Quantities.parse(fs.lossCoefficient(), QuantityKind.DIMENSIONLESS, "lossCoefficient");
                    String replaces = "";
                    try {
                        replaces = catalog.fitting(fs.kind()).description();
                    } catch (InputException notInCatalog) {
                        replaces = fs.kind();
                    }
                    fitting = new GivenLossCoefficient(fs.kind(), k, replaces);
                } else if (fs.kind().startsWith(FITTED_PREFIX)) {
                    Path file = fittedFile(fs.kind());
                    fitting = new org.headway.system.FittedComponentLoss(
                            new org.headway.correlation.FittedLossCoefficient(stem(file), loadFitted(file)),
                            "fitted by the engineer, " + file.getFileName());
                } else {
                    fitting = catalog.fitting(fs.kind());
                }
            } catch (InputException e) {
                throw new InputException(
                        path + (fs.lossCoefficient().isEmpty() ? ".kind" : ".lossCoefficient"), e.problem());
            }
            b.fitting(new FittingUse(fitting.atNominalSize(nominalDiameter), fs.count()));
        }
        if (!spec.lossCoefficient().isEmpty()) {
            b.extraLossCoefficient(InputException.requireNonNegative(
                    "lossCoefficient",
                    Quantities.parse(spec.lossCoefficient(), QuantityKind.DIMENSIONLESS, "lossCoefficient")));
        }
        if (!spec.elevationChange().isEmpty()) {
            b.elevationChange(Quantities.parse(spec.elevationChange(), QuantityKind.LENGTH, "elevationChange"));
        }
        if (!spec.outletLevel().isEmpty()) {
            if (inletLevel == null) {
                throw new InputException(
                        "outletLevel",
                        "an absolute outlet level needs the project's inletLevel (the run inlet's level)");
            }
            b.elevationChange(Quantities.parse(spec.outletLevel(), QuantityKind.LENGTH, "outletLevel") - level);
        }
        boolean hazenWilliams = hazenWilliamsRun || HAZEN_WILLIAMS.equals(spec.friction());
        if (!spec.friction().isEmpty() && !hazenWilliams) {
            try {
                b.friction(friction(spec.friction()));
            } catch (InputException e) {
                throw new InputException("friction", e.problem());
            }
        }
        if (hazenWilliams) {
            if (!spec.hazenWilliamsC().isEmpty()) {
                double c = Quantities.parse(spec.hazenWilliamsC(), QuantityKind.DIMENSIONLESS, "hazenWilliamsC");
                try {
                    b.hazenWilliams(new HazenWilliamsCoefficient(c, "given in the project file"));
                } catch (InputException e) {
                    throw new InputException("hazenWilliamsC", e.problem());
                }
            } else if (catalogMaterial != null
                    && catalogMaterial.hazenWilliams().isPresent()) {
                b.hazenWilliams(catalogMaterial.hazenWilliams().get());
            } else {
                throw new InputException(
                        "hazenWilliamsC",
                        "missing; Hazen–Williams needs a C for this pipe (give hazenWilliamsC, or a catalog material"
                                + " with an hw_c value)");
            }
        } else if (!spec.hazenWilliamsC().isEmpty()) {
            throw new InputException(
                    "hazenWilliamsC",
                    "given, but the pipe is computed by Darcy–Weisbach; set friction to hazen-williams");
        }
        if (!spec.highPointDistance().isEmpty() || !spec.highPointRise().isEmpty()) {
            b.highPoint(
                    InputException.requireNonNegative(
                            "highPoint.distance",
                            Quantities.parse(spec.highPointDistance(), QuantityKind.LENGTH, "highPoint.distance")),
                    Quantities.parse(spec.highPointRise(), QuantityKind.LENGTH, "highPoint.rise"));
        }
        return b.build();
    }

    /** Friction method id that selects Hazen–Williams (for water) instead of Darcy–Weisbach. */
    public static final String HAZEN_WILLIAMS = "hazen-williams";

    private static String elementPath(Project p, Project.ElementSpec spec, int index, int pipeIndex) {
        boolean formatOneShape = p.elements().stream().noneMatch(e -> e instanceof Project.DeviceSpec);
        if (formatOneShape && spec instanceof Project.SegmentSpec) {
            // Keep the paths a format-1 file's author knows (segments[3].length).
            return "segments[" + pipeIndex + "]";
        }
        return "elements[" + index + "] (" + spec.id() + ")";
    }

    private PumpElement pumpElement(Project.PumpSpec spec, double density) {
        PumpCurve curve = pump(spec, density);
        double speed = spec.speedRatio().isEmpty()
                ? 1.0
                : Quantities.parse(spec.speedRatio(), QuantityKind.DIMENSIONLESS, "speedRatio");
        try {
            return new PumpElement(spec.id().isEmpty() ? "pump" : spec.id(), curve, speed);
        } catch (InputException e) {
            throw new InputException("speedRatio", e.problem());
        }
    }

    /** A pipe's {@code bore-change} fitting: a reducer or enlarger at its outlet to {@code toDiameter}. */
    private static BoreChange boreChange(Project.FittingSpec fs, String path) {
        if (fs.count() != 1) {
            throw new InputException(
                    path + ".count", "a bore change happens once at the pipe's outlet; got " + fs.count());
        }
        if (!fs.lossCoefficient().isEmpty()) {
            throw new InputException(
                    path + ".lossCoefficient",
                    "a bore change takes its K from the two bores; to give a K yourself use a catalog fitting id"
                            + " with lossCoefficient");
        }
        if (fs.toDiameter().isEmpty()) {
            throw new InputException(path + ".toDiameter", "missing; give the bore after the change, e.g. \"73.6 mm\"");
        }
        double to;
        double angle;
        try {
            to = Quantities.parse(fs.toDiameter(), QuantityKind.DIAMETER, "toDiameter");
        } catch (InputException e) {
            throw new InputException(path + ".toDiameter", e.problem());
        }
        try {
            angle = fs.includedAngleDegrees().isEmpty()
                    ? Math.PI
                    : Math.toRadians(Quantities.parse(
                            fs.includedAngleDegrees(), QuantityKind.DIMENSIONLESS, "includedAngleDegrees"));
        } catch (InputException e) {
            throw new InputException(path + ".includedAngleDegrees", e.problem());
        }
        if (to > Segment.MAX_DIAMETER) {
            throw new InputException(
                    path + ".toDiameter",
                    "a bore of " + to + " m is beyond the plausible limit of " + Segment.MAX_DIAMETER
                            + " m; check the unit");
        }
        try {
            return new BoreChange(BoreChange.KIND, to, angle);
        } catch (InputException e) {
            throw new InputException(path + "." + e.where(), e.problem());
        }
    }

    /** A reducer of a series run whose inlet or outlet bore is left to the pipes beside it. */
    private record PendingReducer(Project.DeviceSpec spec, String path, int position) {}

    /**
     * A reducer with a blank {@code inletDiameter} takes the bore of the nearest pipe upstream of it in
     * the run, a blank {@code outletDiameter} that of the nearest pipe downstream (so a change between
     * two catalog sizes needs no bore typed by hand).
     *
     * @param pending the reducer and the place in {@code elements} where it belongs
     * @param elements the run's other elements, in flow order, reducers not yet inserted
     */
    private static Element reducerBetweenPipes(PendingReducer pending, List<Element> elements) {
        Project.DeviceSpec d = pending.spec();
        double in;
        if (d.value("inletDiameter").isEmpty()) {
            in = Double.NaN;
            for (int j = pending.position() - 1; j >= 0 && Double.isNaN(in); j--) {
                if (elements.get(j) instanceof Segment s) {
                    in = s.innerDiameter();
                }
            }
            if (Double.isNaN(in)) {
                throw new InputException(
                        "inletDiameter",
                        "missing, and no pipe comes before the reducer to take it from; give the bore at its inlet");
            }
        } else {
            in = Quantities.parse(d.value("inletDiameter"), QuantityKind.DIAMETER, "inletDiameter");
        }
        double out;
        if (d.value("outletDiameter").isEmpty()) {
            out = Double.NaN;
            for (int j = pending.position(); j < elements.size() && Double.isNaN(out); j++) {
                if (elements.get(j) instanceof Segment s) {
                    out = s.innerDiameter();
                }
            }
            if (Double.isNaN(out)) {
                throw new InputException(
                        "outletDiameter",
                        "missing, and no pipe comes after the reducer to take it from; give the bore at its outlet");
            }
        } else {
            out = Quantities.parse(d.value("outletDiameter"), QuantityKind.DIAMETER, "outletDiameter");
        }
        return new DiameterChange(d.id(), d.name(), in, out, includedAngle(d));
    }

    private static double includedAngle(Project.DeviceSpec d) {
        return d.value("includedAngleDegrees").isEmpty()
                ? DiameterChange.SUDDEN
                : Math.toRadians(Quantities.parse(
                        d.value("includedAngleDegrees"), QuantityKind.DIMENSIONLESS, "includedAngleDegrees"));
    }

    private static Element device(Project.DeviceSpec d, FluidState fluid) {
        switch (d.kind()) {
            case "valve" -> {
                return flowCoefficientValve(d, true);
            }
            case "component" -> {
                double dp = Quantities.parse(d.value("ratedPressureDrop"), QuantityKind.PRESSURE, "ratedPressureDrop");
                double q = flow(d.value("ratedFlow"), fluid == null ? Double.NaN : fluid.density(), "ratedFlow");
                double n = d.value("exponent").isEmpty()
                        ? RatedComponent.QUADRATIC
                        : Quantities.parse(d.value("exponent"), QuantityKind.DIMENSIONLESS, "exponent");
                return new RatedComponent(d.id(), d.name(), dp, q, n);
            }
            case "reducer" -> {
                if (d.value("inletDiameter").isEmpty()
                        || d.value("outletDiameter").isEmpty()) {
                    // a network link has no pipes "either side" in a run order
                    String key = d.value("inletDiameter").isEmpty() ? "inletDiameter" : "outletDiameter";
                    throw new InputException(
                            key,
                            "missing; a reducer that is a network link needs both bores (inletDiameter and"
                                    + " outletDiameter)");
                }
                double in = Quantities.parse(d.value("inletDiameter"), QuantityKind.DIAMETER, "inletDiameter");
                double out = Quantities.parse(d.value("outletDiameter"), QuantityKind.DIAMETER, "outletDiameter");
                return new DiameterChange(d.id(), d.name(), in, out, includedAngle(d));
            }
            case "check-valve" -> {
                return new CheckValve(d.id(), d.name(), localLoss(d, true));
            }
            case "isolation" -> {
                String status =
                        d.value("status").isEmpty() ? "open" : d.value("status").strip();
                if (!status.equals("open") && !status.equals("closed")) {
                    throw new InputException("status", "expected open or closed, got \"" + status + "\"");
                }
                return new IsolationValve(d.id(), d.name(), status.equals("open"), localLoss(d, false));
            }
            case "flow-control" -> {
                if (d.value("setting").isEmpty()) {
                    throw new InputException("setting", "missing; a flow-control valve needs the flow it holds");
                }
                double setting = Quantities.parseFlow(d.value("setting"), "setting")
                        .volumetric(fluid == null ? Double.NaN : fluid.density(), "setting");
                return new FlowControlValve(d.id(), d.name(), setting, localLoss(d, true));
            }
            case "pressure-reducing", "pressure-sustaining" -> {
                if (d.value("setting").isEmpty()) {
                    throw new InputException(
                            "setting", "missing; a pressure-control valve needs the gauge pressure it holds");
                }
                double setting = Quantities.parse(d.value("setting"), QuantityKind.PRESSURE, "setting");
                return new PressureControlValve(
                        d.id(), d.name(), d.kind().equals("pressure-reducing"), setting, localLoss(d, true));
            }
            default -> throw new InputException("kind", "unknown element kind \"" + d.kind() + "\"");
        }
    }

    private static FlowCoefficientValve flowCoefficientValve(Project.DeviceSpec d, boolean required) {
        boolean kv = !d.value("kv").isEmpty();
        boolean cv = !d.value("cv").isEmpty();
        if (kv && cv) {
            throw new InputException("kv", "give kv or cv, not both");
        }
        if (!kv && !cv) {
            if (required) {
                throw new InputException("kv", "missing; a valve needs its flow coefficient kv (m³/h at 1 bar) or cv");
            }
            return null;
        }
        if (kv) {
            return FlowCoefficientValve.ofKv(
                    d.id(), d.name(), Quantities.parse(d.value("kv"), QuantityKind.DIMENSIONLESS, "kv"));
        }
        return FlowCoefficientValve.ofCv(
                d.id(), d.name(), Quantities.parse(d.value("cv"), QuantityKind.DIMENSIONLESS, "cv"));
    }

    private static LocalLoss localLoss(Project.DeviceSpec d, boolean required) {
        FlowCoefficientValve byCoefficient = flowCoefficientValve(d, false);
        boolean k = !d.value("lossCoefficient").isEmpty();
        if (byCoefficient != null && k) {
            throw new InputException(
                    "lossCoefficient", "give a loss coefficient with its diameter, or kv/cv, not both");
        }
        if (byCoefficient != null) {
            return LocalLoss.ofFlowCoefficient(byCoefficient);
        }
        if (k) {
            if (d.value("diameter").isEmpty()) {
                throw new InputException(
                        "diameter", "missing; a loss coefficient is referred to the velocity in a bore");
            }
            return LocalLoss.ofLossCoefficient(
                    InputException.requireNonNegative(
                            "lossCoefficient",
                            Quantities.parse(
                                    d.value("lossCoefficient"), QuantityKind.DIMENSIONLESS, "lossCoefficient")),
                    Quantities.parse(d.value("diameter"), QuantityKind.DIAMETER, "diameter"));
        }
        if (required) {
            throw new InputException(
                    "lossCoefficient", "missing; give the open loss as lossCoefficient with diameter, or kv/cv");
        }
        return LocalLoss.NONE;
    }

    private static SiteAtmosphere site(Project.SiteSpec spec) {
        if (!spec.altitude().isEmpty()) {
            return SiteAtmosphere.atAltitude(Quantities.parse(spec.altitude(), QuantityKind.LENGTH, "altitude"));
        }
        if (!spec.barometricPressure().isEmpty()) {
            try {
                return SiteAtmosphere.ofPressure(absoluteOnly(
                        spec.barometricPressure(), "barometricPressure", "the site's barometric pressure"));
            } catch (InputException e) {
                throw new InputException("barometricPressure", e.problem());
            }
        }
        return SiteAtmosphere.SEA_LEVEL;
    }

    /** Gauge limits: a gauge or plain reading as it is, an absolute one less the barometric pressure. */
    private static PressureLimits pressureLimits(Project.PressureLimitsSpec spec, double barometric) {
        double min = spec.minimum().isEmpty()
                ? Double.NEGATIVE_INFINITY
                : Quantities.parsePressure(spec.minimum(), "minimum").asGauge(barometric);
        double max = spec.maximum().isEmpty()
                ? Double.POSITIVE_INFINITY
                : Quantities.parsePressure(spec.maximum(), "maximum").asGauge(barometric);
        return new PressureLimits(min, max);
    }

    /**
     * The catalog material a project pipe names.
     *
     * @throws InputException at {@code pipe.material} when the catalog has no such material
     */
    public static Material catalogMaterial(Catalog catalog, Project.PipeSpec pipe) {
        try {
            return catalog.material(pipe.material());
        } catch (InputException e) {
            throw e.at("pipe.material");
        }
    }

    /**
     * The catalog size a project pipe names, in its material's size table.
     *
     * @param material the pipe's material ({@link #catalogMaterial})
     * @throws InputException at {@code pipe.size} when the table has no such size and schedule
     */
    public static PipeSize catalogSize(Catalog catalog, Material material, Project.PipeSpec pipe) {
        try {
            return catalog.size(material, pipe.size(), pipe.schedule());
        } catch (InputException e) {
            throw e.at("pipe.size");
        }
    }

    /**
     * A segment's inner diameter as a run takes it: the bore given in the project, else that of its
     * catalog size.
     *
     * @return inner diameter (m)
     * @throws InputException when it cannot be read or is missing
     */
    public static double innerDiameter(Project.SegmentSpec spec, Catalog catalog) {
        if (!spec.innerDiameter().isEmpty()) {
            return Quantities.parse(spec.innerDiameter(), QuantityKind.DIAMETER, "innerDiameter");
        }
        if (spec.pipe().isEmpty()) {
            throw new InputException("innerDiameter", "missing; give a catalog pipe or an inner diameter");
        }
        Project.PipeSpec pipe = spec.pipe().get();
        return catalogSize(catalog, catalogMaterial(catalog, pipe), pipe).innerDiameter();
    }

    /**
     * A segment's absolute roughness as a run takes it: the value given in the project, else its
     * catalog material's.
     *
     * @return absolute roughness (m)
     * @throws InputException when it cannot be read or is missing
     */
    public static double roughness(Project.SegmentSpec spec, Catalog catalog) {
        if (!spec.roughness().isEmpty()) {
            return Quantities.parse(spec.roughness(), QuantityKind.ROUGHNESS, "roughness");
        }
        if (spec.pipe().isEmpty()) {
            throw new InputException("roughness", "missing; an explicit bore needs its absolute roughness");
        }
        return catalogMaterial(catalog, spec.pipe().get()).roughness();
    }

    /**
     * The size of a material nearest a bore, by ratio (|ln(D/bore)| least): among one schedule's
     * sizes, or all of the table's when no schedule is given; the table's first when the bore is
     * unknown.
     *
     * @param schedule a schedule, or null or empty for any
     * @param bore inner diameter to come near (m), or NaN
     */
    public static PipeSize nearestSize(Catalog catalog, Material material, String schedule, double bore) {
        List<PipeSize> sizes =
                catalog.sizes(material.sizeTable(), schedule == null || schedule.isEmpty() ? null : schedule);
        if (Double.isNaN(bore)) {
            return sizes.get(0);
        }
        return sizes.stream()
                .min(java.util.Comparator.comparingDouble(z -> Math.abs(Math.log(z.innerDiameter() / bore))))
                .orElseThrow();
    }

    /** A catalog size as sizing names its candidates, e.g. {@code NPS 2-1/2 Sch 40}. */
    public static String candidateLabel(PipeSize size) {
        return sizeLabel(size) + (size.schedule().isEmpty() ? "" : " " + scheduleLabel(size.schedule()));
    }

    /** "NPS 4" for the tables that use nominal pipe size, the bare nominal size otherwise. */
    static String sizeLabel(PipeSize size) {
        boolean nps = size.table().startsWith("asme-b36") || size.table().equals("astm-d1785");
        return (nps ? "NPS " : "") + size.nominal();
    }

    private static String scheduleLabel(String schedule) {
        return schedule.matches("\\d+S?") ? "Sch " + schedule : schedule;
    }

    /** An end's gauge pressure: a gauge or plain reading as it is, an absolute one less the barometric. */
    private static EndCondition end(Project.EndSpec spec, double barometric) {
        double level = spec.level().isEmpty() ? 0 : Quantities.parse(spec.level(), QuantityKind.LENGTH, "level");
        double pressure = spec.pressure().isEmpty()
                ? 0
                : Quantities.parsePressure(spec.pressure(), "pressure").asGauge(barometric);
        return new EndCondition(level, pressure);
    }

    private static DesignLimits limits(Project.LimitsSpec spec, double density) {
        DesignLimits d = DesignLimits.USUAL;
        return new DesignLimits(
                spec.minimumVelocity().isEmpty()
                        ? d.minimumVelocity()
                        : Quantities.parse(spec.minimumVelocity(), QuantityKind.VELOCITY, "minimumVelocity"),
                spec.maximumVelocity().isEmpty()
                        ? d.maximumVelocity()
                        : Quantities.parse(spec.maximumVelocity(), QuantityKind.VELOCITY, "maximumVelocity"),
                spec.maximumFrictionLossPer100m().isEmpty()
                        ? d.maximumFrictionLossPer100m()
                        : Quantities.parseGradient(spec.maximumFrictionLossPer100m(), "maximumFrictionLossPer100m")
                                .headPer100m(density, Gravity.STANDARD, "maximumFrictionLossPer100m"),
                spec.headBudget().isEmpty()
                        ? d.headBudget()
                        : Quantities.parse(spec.headBudget(), QuantityKind.HEAD, "headBudget"),
                spec.npshMargin().isEmpty()
                        ? d.npshMargin()
                        : Quantities.parse(spec.npshMargin(), QuantityKind.HEAD, "npshMargin"));
    }

    private static PumpCurve pump(Project.PumpSpec spec, double density) {
        List<PumpCurve.Point> points = new ArrayList<>();
        for (int i = 0; i < spec.points().size(); i++) {
            Project.PumpPointSpec pt = spec.points().get(i);
            String path = "points[" + i + "]";
            points.add(new PumpCurve.Point(
                    flow(pt.flow(), density, path + ".flow"),
                    Quantities.parse(pt.head(), QuantityKind.HEAD, path + ".head")));
        }
        OptionalDouble npshr = spec.npshRequired().isEmpty()
                ? OptionalDouble.empty()
                : OptionalDouble.of(Quantities.parse(spec.npshRequired(), QuantityKind.HEAD, "npshRequired"));
        List<PumpCurve.Point> npshCurve = new ArrayList<>();
        for (int i = 0; i < spec.points().size(); i++) {
            Project.PumpPointSpec pt = spec.points().get(i);
            if (!pt.npshRequired().isEmpty()) {
                npshCurve.add(new PumpCurve.Point(
                        points.get(i).flow(),
                        Quantities.parse(pt.npshRequired(), QuantityKind.HEAD, "points[" + i + "].npshRequired")));
            }
        }
        if (!npshCurve.isEmpty() && npshr.isPresent()) {
            throw new InputException(
                    "npshRequired",
                    "given both for the pump and for its points; give one value for the duty or a curve on the"
                            + " points, not both");
        }
        try {
            PumpCurve curve = PumpCurve.fit(spec.name(), points, npshr);
            return npshCurve.isEmpty() ? curve : curve.withNpshCurve(npshCurve);
        } catch (InputException e) {
            String where = e.where().startsWith("pump.") ? e.where().substring(5) : e.where();
            throw new InputException(where, e.problem());
        }
    }

    /**
     * The candidate sizes for sizing a network: for every pipe link given by a catalog material and
     * size (and no bore of its own), the sizes of its material's table in the schedule of the size it
     * was given, smallest first.
     *
     * @param candidates candidate sizes by link id
     * @param notSized pipe links kept as given (an explicit bore, or a material without a size table)
     */
    public record NetworkSizingCandidates(
            java.util.Map<String, List<SizeSelector.CandidateSize>> candidates, List<String> notSized) {
        public NetworkSizingCandidates {
            candidates = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(candidates));
            notSized = List.copyOf(notSized);
        }
    }

    /** The candidate sizes of a network's catalog pipes (see {@link NetworkSizingCandidates}). */
    public static NetworkSizingCandidates networkSizingCandidates(Project.NetworkSpec network, Catalog catalog) {
        java.util.Map<String, List<SizeSelector.CandidateSize>> map = new java.util.LinkedHashMap<>();
        List<String> notSized = new ArrayList<>();
        for (int i = 0; i < network.links().size(); i++) {
            Project.ElementSpec e = network.links().get(i).element();
            if (!(e instanceof Project.SegmentSpec)) {
                continue;
            }
            Project.SegmentSpec s = (Project.SegmentSpec) e;
            String id = s.id() == null || s.id().isBlank() ? s.name() : s.id();
            if (s.pipe().isEmpty() || !s.innerDiameter().isEmpty()) {
                notSized.add(id);
                continue;
            }
            Project.PipeSpec ps = s.pipe().get();
            Material material;
            PipeSize given;
            try {
                material = catalog.material(ps.material());
                if (material.sizeTable() == null || material.sizeTable().isEmpty()) {
                    notSized.add(id);
                    continue;
                }
                given = catalog.size(material, ps.size(), ps.schedule());
            } catch (InputException ex) {
                throw ex.at("links[" + i + "] " + id);
            }
            List<SizeSelector.CandidateSize> list = new ArrayList<>();
            for (PipeSize size : catalog.sizes(material.sizeTable(), given.schedule())) {
                list.add(new SizeSelector.CandidateSize(
                        candidateLabel(size), size.innerDiameter(), size.nominalDiameter()));
            }
            map.put(id, list);
        }
        return new NetworkSizingCandidates(map, notSized);
    }

    private List<SizeSelector.CandidateSize> candidates(Project.SizingSpec spec) {
        Material material;
        try {
            material = catalog.material(spec.material());
        } catch (InputException e) {
            throw e.at("material");
        }
        List<SizeSelector.CandidateSize> list = new ArrayList<>();
        for (PipeSize size : catalog.sizes(material.sizeTable(), spec.schedule())) {
            list.add(
                    new SizeSelector.CandidateSize(candidateLabel(size), size.innerDiameter(), size.nominalDiameter()));
        }
        if (list.isEmpty()) {
            throw new InputException(
                    "schedule", "no sizes of schedule \"" + spec.schedule() + "\" in table " + material.sizeTable());
        }
        return list;
    }

    private static ResolvedProject.CurveRange curve(Project.CurveSpec spec, double density) {
        double min = spec.minimumFlow().isEmpty() ? 0 : flow(spec.minimumFlow(), density, "minimumFlow");
        double max = flow(spec.maximumFlow(), density, "maximumFlow");
        if (max <= min) {
            throw new InputException("maximumFlow", "must exceed the minimum flow");
        }
        if (max > MAX_CURVE_FLOW) {
            throw new InputException(
                    "maximumFlow",
                    "value " + Quantities.formatNumber(max) + " m³/s is beyond the plausible limit of "
                            + Quantities.formatNumber(MAX_CURVE_FLOW) + " m³/s; check the number and its unit");
        }
        if (spec.points() < 2 || spec.points() > 100_000) {
            throw new InputException("points", "must be between 2 and 100000, got " + spec.points());
        }
        return new ResolvedProject.CurveRange(min, max, spec.points());
    }

    /** The folder relative paths are resolved against. */
    Path baseFolder() {
        return baseFolder;
    }
}
