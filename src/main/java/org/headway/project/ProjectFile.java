package org.headway.project;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.headway.caution.InputException;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;

/**
 * Reads and writes project files: JSON of our own schema, format {@value Project#FORMAT}, version
 * {@value Project#VERSION}. Unknown keys are errors (a typo must not be ignored); every error names
 * the file and the JSON path. Saving is atomic.
 */
public final class ProjectFile {

    /** Largest project file accepted (bytes). */
    public static final long MAX_DOCUMENT_LENGTH = StrictJson.MAX_DOCUMENT_LENGTH;
    /** Deepest nesting accepted; a project needs about six levels. */
    public static final int MAX_NESTING_DEPTH = StrictJson.MAX_NESTING_DEPTH;
    /** Longest string accepted (characters). */
    public static final int MAX_STRING_LENGTH = StrictJson.MAX_STRING_LENGTH;

    private static final ObjectMapper MAPPER = StrictJson.mapper();

    private ProjectFile() {}

    /**
     * Loads a project file.
     *
     * @throws InputException naming the file and JSON path of the first structural problem
     */
    public static Project load(Path file) {
        // A root such as "/" has no file name.
        String name = file.getFileName() == null
                ? file.toString()
                : file.getFileName().toString();
        byte[] bytes;
        try {
            if (Files.size(file) > MAX_DOCUMENT_LENGTH) {
                throw new InputException(name, "file is larger than " + MAX_DOCUMENT_LENGTH / (1024 * 1024) + " MB");
            }
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new InputException(file.toString(), "file not found");
        } catch (IOException e) {
            throw new InputException(file.toString(), "cannot read: " + e.getMessage());
        }
        String text = org.headway.caution.TextFiles.decode(bytes, name);
        try {
            return parse(text);
        } catch (InputException e) {
            throw e.at(name + " ");
        }
    }

    /** Parses project JSON text (no file name in messages). */
    public static Project parse(String json) {
        JsonNode root = StrictJson.read(StrictJson.withoutByteOrderMark(json), "");
        if (root == null || !root.isObject()) {
            throw new InputException("$", "a project file must be a JSON object");
        }
        Obj top = new Obj(root, "");
        String format = top.has("format") ? top.text("format", true) : "";
        if (!Project.FORMAT.equals(format)) {
            throw new InputException("format", "expected \"" + Project.FORMAT + "\", got \"" + format + "\"");
        }
        int version = top.integer("version", true, 0);
        if (version > Project.VERSION) {
            throw new InputException(
                    "version",
                    "this Headway reads format versions 1 to " + Project.VERSION + "; the file is of version " + version
                            + ", written by a newer Headway — update Headway to open it");
        }
        if (version < 1) {
            throw new InputException(
                    "version", "this Headway reads versions 1 to " + Project.VERSION + ", the file says " + version);
        }
        if (version == 1) {
            top.allow(
                    "format",
                    "version",
                    "title",
                    "reference",
                    "fluid",
                    "flow",
                    "flowUncertainty",
                    "friction",
                    "segments",
                    "ends",
                    "pump",
                    "limits",
                    "sizing",
                    "curve");
        } else {
            top.allow(
                    "format",
                    "version",
                    "title",
                    "reference",
                    "fluid",
                    "flow",
                    "flowUncertainty",
                    "friction",
                    "elements",
                    "ends",
                    "limits",
                    "sizing",
                    "curve",
                    "site",
                    "pressureLimits",
                    "inletLevel",
                    "nodes",
                    "links",
                    "demandCases");
        }
        Project.TitleBlock titleBlock = Project.TitleBlock.EMPTY;
        if (top.has("reference")) {
            Obj r = top.object("reference");
            r.allow("job", "revision", "preparedBy", "checkedBy", "date", "notes");
            titleBlock = new Project.TitleBlock(
                    r.text("job", false),
                    r.text("revision", false),
                    r.text("preparedBy", false),
                    r.text("checkedBy", false),
                    r.text("date", false),
                    r.text("notes", false));
        }
        Obj f = top.object("fluid");
        f.allow("name", "temperature", "pressure", "density", "viscosity", "vapourPressure");
        Project.FluidSpec fluid = new Project.FluidSpec(
                f.text("name", true),
                f.quantity("temperature"),
                f.quantity("pressure"),
                f.quantity("density"),
                f.quantity("viscosity"),
                f.quantity("vapourPressure"));

        Project.EndsSpec ends = Project.EndsSpec.OPEN;
        if (top.has("ends")) {
            Obj e = top.object("ends");
            e.allow("source", "delivery");
            ends = new Project.EndsSpec(end(e, "source"), end(e, "delivery"));
        }
        Project.LimitsSpec limits = Project.LimitsSpec.NONE;
        if (top.has("limits")) {
            Obj l = top.object("limits");
            l.allow("minimumVelocity", "maximumVelocity", "maximumFrictionLossPer100m", "headBudget", "npshMargin");
            limits = new Project.LimitsSpec(
                    l.quantity("minimumVelocity"),
                    l.quantity("maximumVelocity"),
                    version == 1
                            ? formatOneFrictionLimit(l.quantity("maximumFrictionLossPer100m"))
                            : metresPer100m(l.quantity("maximumFrictionLossPer100m")),
                    l.quantity("headBudget"),
                    l.quantity("npshMargin"));
        }
        Optional<Project.SizingSpec> sizing = Optional.empty();
        if (top.has("sizing")) {
            Obj z = top.object("sizing");
            z.allow("material", "schedule");
            sizing = Optional.of(new Project.SizingSpec(z.text("material", true), z.textOrNumber("schedule", false)));
        }
        Optional<Project.CurveSpec> curve = Optional.empty();
        if (top.has("curve")) {
            Obj c = top.object("curve");
            c.allow("minimumFlow", "maximumFlow", "points");
            curve = Optional.of(new Project.CurveSpec(
                    c.quantity("minimumFlow"), c.quantityRequired("maximumFlow"), c.integer("points", false, 41)));
        }
        String friction = top.has("friction") ? top.text("friction", true) : "auto";
        if (version == 1) {
            List<Project.SegmentSpec> segments = new ArrayList<>();
            ArrayNode segs = top.array("segments", true);
            for (int i = 0; i < segs.size(); i++) {
                Obj s = new Obj(segs.get(i), "segments[" + i + "]");
                s.allow(
                        "name",
                        "length",
                        "pipe",
                        "innerDiameter",
                        "roughness",
                        "fittings",
                        "lossCoefficient",
                        "elevationChange");
                segments.add(segment(s, "segment " + (i + 1), false));
            }
            Optional<Project.PumpSpec> pump = Optional.empty();
            if (top.has("pump")) {
                Obj p = top.object("pump");
                p.allow("name", "position", "points", "npshRequired");
                pump = Optional.of(new Project.PumpSpec(
                        p.has("name") ? p.text("name", true) : "pump",
                        p.integer("position", false, 0),
                        pumpPoints(p),
                        p.quantity("npshRequired")));
            }
            return Project.of(
                    top.text("title", false),
                    titleBlock,
                    fluid,
                    top.quantityRequired("flow"),
                    top.quantity("flowUncertainty"),
                    friction,
                    segments,
                    ends,
                    pump,
                    limits,
                    sizing,
                    curve);
        }
        boolean isNetwork = top.has("nodes") || top.has("links");
        List<Project.ElementSpec> elements = new ArrayList<>();
        ArrayNode list = isNetwork && !top.has("elements") ? null : top.array("elements", true);
        java.util.Set<String> ids = new java.util.HashSet<>();
        for (int i = 0; list != null && i < list.size(); i++) {
            Obj e = new Obj(list.get(i), "elements[" + i + "]");
            String kind = e.has("kind") ? e.text("kind", true) : "pipe";
            String id = e.text("id", true);
            if (id.isBlank()) {
                throw new InputException(e.path + ".id", "an element needs a non-blank id");
            }
            if (!ids.add(id)) {
                throw new InputException(
                        e.path + ".id", "the id \"" + id + "\" is used by an earlier element; ids must be unique");
            }
            elements.add(element(e, id, kind, List.of()));
        }
        if (!isNetwork && top.has("demandCases")) {
            throw new InputException("demandCases", "demand cases belong to a network project (nodes and links)");
        }
        Optional<Project.NetworkSpec> network = isNetwork ? Optional.of(network(top)) : Optional.empty();
        Project.SiteSpec site = Project.SiteSpec.SEA_LEVEL;
        if (top.has("site")) {
            Obj z = top.object("site");
            z.allow("altitude", "barometricPressure");
            site = new Project.SiteSpec(z.quantity("altitude"), z.quantity("barometricPressure"));
            if (!site.altitude().isEmpty() && !site.barometricPressure().isEmpty()) {
                throw new InputException("site", "give the site altitude or its barometric pressure, not both");
            }
        }
        Project.PressureLimitsSpec pressureLimits = Project.PressureLimitsSpec.NONE;
        if (top.has("pressureLimits")) {
            Obj z = top.object("pressureLimits");
            z.allow("minimum", "maximum");
            pressureLimits = new Project.PressureLimitsSpec(z.quantity("minimum"), z.quantity("maximum"));
        }
        return new Project(
                top.text("title", false),
                titleBlock,
                fluid,
                isNetwork ? top.quantity("flow") : top.quantityRequired("flow"),
                top.quantity("flowUncertainty"),
                friction,
                elements,
                ends,
                limits,
                sizing,
                curve,
                site,
                pressureLimits,
                top.quantity("inletLevel"),
                network);
    }

    private static void writeElementFields(ObjectNode n, Project.ElementSpec element) {
        if (element instanceof Project.SegmentSpec s) {
            n.put("name", s.name());
            n.put("length", s.length());
            s.pipe().ifPresent(pipe -> {
                ObjectNode pn = n.putObject("pipe");
                pn.put("material", pipe.material());
                pn.put("size", pipe.size());
                putIf(pn, "schedule", pipe.schedule());
            });
            putIf(n, "innerDiameter", s.innerDiameter());
            putIf(n, "roughness", s.roughness());
            if (!s.fittings().isEmpty()) {
                ArrayNode fits = n.putArray("fittings");
                for (Project.FittingSpec fit : s.fittings()) {
                    ObjectNode fn = fits.addObject();
                    fn.put("kind", fit.kind());
                    fn.put("count", fit.count());
                    putIf(fn, "lossCoefficient", fit.lossCoefficient());
                    putIf(fn, "toDiameter", fit.toDiameter());
                    putIf(fn, "includedAngleDegrees", fit.includedAngleDegrees());
                }
            }
            putIf(n, "lossCoefficient", s.lossCoefficient());
            putIf(n, "elevationChange", s.elevationChange());
            putIf(n, "outletLevel", s.outletLevel());
            putIf(n, "friction", s.friction());
            putIf(n, "hazenWilliamsC", s.hazenWilliamsC());
            if (!s.highPointDistance().isEmpty() || !s.highPointRise().isEmpty()) {
                ObjectNode h = n.putObject("highPoint");
                putIf(h, "distance", s.highPointDistance());
                putIf(h, "rise", s.highPointRise());
            }
        } else if (element instanceof Project.PumpSpec pump) {
            n.put("name", pump.name());
            ArrayNode pts = n.putArray("points");
            for (Project.PumpPointSpec pt : pump.points()) {
                ObjectNode ptn = pts.addObject();
                ptn.put("flow", pt.flow());
                ptn.put("head", pt.head());
                putIf(ptn, "npshRequired", pt.npshRequired());
            }
            putIf(n, "npshRequired", pump.npshRequired());
            putIf(n, "speedRatio", pump.speedRatio());
        } else if (element instanceof Project.DeviceSpec d) {
            putIf(n, "name", d.name());
            d.values().forEach((k, v) -> putIf(n, k, v));
        }
    }

    /** One element as written, of any kind; {@code extra} names keys the caller reads itself. */
    private static Project.ElementSpec element(Obj e, String id, String kind, List<String> extra) {
        List<String> common = new ArrayList<>(List.of("id", "kind", "name"));
        common.addAll(extra);
        switch (kind) {
            case "pipe" -> {
                List<String> keys = new ArrayList<>(common);
                keys.addAll(List.of(
                        "length",
                        "pipe",
                        "innerDiameter",
                        "roughness",
                        "fittings",
                        "lossCoefficient",
                        "elevationChange",
                        "outletLevel",
                        "friction",
                        "hazenWilliamsC",
                        "highPoint"));
                e.allow(keys.toArray(new String[0]));
                return segment(e, id, true).withId(id);
            }
            case "pump" -> {
                List<String> keys = new ArrayList<>(common);
                keys.addAll(List.of("points", "npshRequired", "speedRatio"));
                e.allow(keys.toArray(new String[0]));
                return new Project.PumpSpec(
                        id,
                        e.has("name") ? e.text("name", true) : id,
                        0,
                        pumpPoints(e),
                        e.quantity("npshRequired"),
                        e.quantity("speedRatio"));
            }
            default -> {
                List<String> fields = Project.DeviceSpec.FIELDS.get(kind);
                if (fields == null) {
                    throw new InputException(
                            e.path + ".kind",
                            "unknown element kind \"" + kind + "\"; expected pipe, pump, "
                                    + String.join(", ", new java.util.TreeSet<>(Project.DeviceSpec.FIELDS.keySet())));
                }
                List<String> allowed = new ArrayList<>(common);
                allowed.addAll(fields);
                e.allow(allowed.toArray(new String[0]));
                java.util.Map<String, String> values = new java.util.LinkedHashMap<>();
                for (String key : fields) {
                    String v = e.quantity(key);
                    if (!v.isEmpty()) {
                        values.put(key, v);
                    }
                }
                return new Project.DeviceSpec(kind, id, e.has("name") ? e.text("name", true) : "", values);
            }
        }
    }

    /** The top-level {@code nodes} and {@code links} of a network project. */
    private static Project.NetworkSpec network(Obj top) {
        List<Project.NodeSpec> nodes = new ArrayList<>();
        ArrayNode nl = top.array("nodes", true);
        java.util.Set<String> nodeIds = new java.util.HashSet<>();
        for (int i = 0; i < nl.size(); i++) {
            Obj n = new Obj(nl.get(i), "nodes[" + i + "]");
            n.allow(
                    "id",
                    "name",
                    "elevation",
                    "demand",
                    "demands",
                    "fixedHead",
                    "fixedPressure",
                    "reference",
                    "x",
                    "y");
            String id = n.text("id", true);
            if (id.isBlank() || !nodeIds.add(id)) {
                throw new InputException(
                        n.path + ".id",
                        id.isBlank() ? "a node needs a non-blank id" : "node id \"" + id + "\" is used twice");
            }
            nodes.add(new Project.NodeSpec(
                    id,
                    n.text("name", false),
                    n.quantity("elevation"),
                    n.quantity("demand"),
                    n.quantity("fixedHead"),
                    n.quantity("fixedPressure"),
                    n.has("reference") && n.bool("reference"),
                    n.quantity("x"),
                    n.quantity("y"),
                    n.has("demands") ? quantities(n.object("demands")) : Map.of()));
        }
        List<Project.LinkSpec> links = new ArrayList<>();
        ArrayNode ll = top.array("links", true);
        java.util.Set<String> linkIds = new java.util.HashSet<>();
        for (int i = 0; i < ll.size(); i++) {
            Obj e = new Obj(ll.get(i), "links[" + i + "]");
            String kind = e.has("kind") ? e.text("kind", true) : "pipe";
            String id = e.text("id", true);
            if (id.isBlank() || !linkIds.add(id)) {
                throw new InputException(
                        e.path + ".id",
                        id.isBlank() ? "a link needs a non-blank id" : "link id \"" + id + "\" is used twice");
            }
            Project.ElementSpec element = element(e, id, kind, List.of("from", "to", "designFlow"));
            links.add(
                    new Project.LinkSpec(e.text("from", true), e.text("to", true), element, e.quantity("designFlow")));
        }
        List<Project.DemandCaseSpec> cases = new ArrayList<>();
        if (top.has("demandCases")) {
            ArrayNode cl = top.array("demandCases", false);
            java.util.Set<String> names = new java.util.HashSet<>();
            for (int i = 0; i < cl.size(); i++) {
                Obj c = new Obj(cl.get(i), "demandCases[" + i + "]");
                c.allow("name", "multiplier", "demandMultipliers", "nodeDemands");
                String name = c.text("name", true);
                if (!names.add(name)) {
                    throw new InputException(c.at("name"), "the case name \"" + name + "\" is used twice");
                }
                cases.add(new Project.DemandCaseSpec(
                        name,
                        c.quantity("multiplier"),
                        c.has("demandMultipliers") ? quantities(c.object("demandMultipliers")) : Map.of(),
                        c.has("nodeDemands") ? quantities(c.object("nodeDemands")) : Map.of()));
            }
        }
        return new Project.NetworkSpec(nodes, links, cases);
    }

    /** An object whose every value is a quantity (a name → value table), in order. */
    private static Map<String, String> quantities(Obj o) {
        Map<String, String> out = new java.util.LinkedHashMap<>();
        Iterator<String> names = o.node.fieldNames();
        while (names.hasNext()) {
            String key = names.next();
            if (key.isBlank()) {
                throw new InputException(o.at(key), "a name must not be empty");
            }
            String v = o.quantity(key);
            if (v.isEmpty()) {
                throw new InputException(o.at(key), "missing value");
            }
            out.put(key, v);
        }
        return out;
    }

    /**
     * Format 1 read {@code maximumFrictionLossPer100m} as a head lost per 100 m of pipe, so {@code
     * "5 m"} meant 5 m per 100 m and {@code "4 ft"} 4 ft per 100 m. Format 2 wants the gradient
     * written out and refuses a head alone; a format-1 head migrates to the text that keeps its
     * meaning ({@code "4 ft per 100 m"}). A bare number (m per 100 m in both) and anything that does
     * not read as a head are left as written, for the resolver to judge.
     */
    static String formatOneFrictionLimit(String text) {
        if (text.isBlank()) {
            return text;
        }
        try {
            Quantities.parseGradient(text, "maximumFrictionLossPer100m");
            return text;
        } catch (InputException notAGradient) {
            try {
                Quantities.parse(text, QuantityKind.HEAD, "maximumFrictionLossPer100m");
            } catch (InputException notAHead) {
                return text;
            }
            return text.strip() + " per 100 m";
        }
    }

    /**
     * Format-2 files saved before the gradient was written out hold a limit such as {@code "4 m"},
     * which Headway has always read as 4 m per 100 m and which metric practice reads the same way;
     * it keeps that meaning. A head in any other unit alone ({@code "4 ft"}: per 100 ft or per 100
     * m?) is left for the resolver to refuse with the way to write it.
     */
    static String metresPer100m(String text) {
        if (text.strip().matches("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?\\s*m")) {
            return text.strip() + " per 100 m";
        }
        return text;
    }

    private static List<Project.PumpPointSpec> pumpPoints(Obj p) {
        List<Project.PumpPointSpec> points = new ArrayList<>();
        ArrayNode pts = p.array("points", true);
        for (int i = 0; i < pts.size(); i++) {
            Obj pt = new Obj(pts.get(i), p.path + ".points[" + i + "]");
            pt.allow("flow", "head", "npshRequired");
            points.add(new Project.PumpPointSpec(
                    pt.quantityRequired("flow"), pt.quantityRequired("head"), pt.quantity("npshRequired")));
        }
        return points;
    }

    private static Project.SegmentSpec segment(Obj s, String defaultName, boolean formatTwo) {
        Optional<Project.PipeSpec> pipe = Optional.empty();
        if (s.has("pipe")) {
            Obj p = s.object("pipe");
            p.allow("material", "size", "schedule");
            pipe = Optional.of(new Project.PipeSpec(
                    p.text("material", true), p.textOrNumber("size", true), p.textOrNumber("schedule", false)));
        }
        List<Project.FittingSpec> fittings = new ArrayList<>();
        if (s.has("fittings")) {
            ArrayNode fits = s.array("fittings", false);
            for (int j = 0; j < fits.size(); j++) {
                Obj fit = new Obj(fits.get(j), s.path + ".fittings[" + j + "]");
                fit.allow("kind", "count", "lossCoefficient", "toDiameter", "includedAngleDegrees");
                int count = fit.integer("count", false, 1);
                if (count < 1) {
                    throw new InputException(fit.path + ".count", "must be at least 1, got " + count);
                }
                fittings.add(new Project.FittingSpec(
                        fit.text("kind", true),
                        count,
                        fit.quantity("lossCoefficient"),
                        fit.quantity("toDiameter"),
                        fit.quantity("includedAngleDegrees")));
            }
        }
        String name = s.has("name") ? s.text("name", true) : defaultName;
        String highDistance = "";
        String highRise = "";
        if (formatTwo && s.has("highPoint")) {
            Obj h = s.object("highPoint");
            h.allow("distance", "rise");
            highDistance = h.quantityRequired("distance");
            highRise = h.quantityRequired("rise");
        }
        if (formatTwo && s.has("outletLevel") && s.has("elevationChange")) {
            throw new InputException(s.path, "give elevationChange or outletLevel, not both");
        }
        return new Project.SegmentSpec(
                "",
                name,
                s.quantityRequired("length"),
                pipe,
                s.quantity("innerDiameter"),
                s.quantity("roughness"),
                fittings,
                s.quantity("lossCoefficient"),
                s.quantity("elevationChange"),
                formatTwo ? s.quantity("outletLevel") : "",
                formatTwo && s.has("friction") ? s.text("friction", true) : "",
                formatTwo ? s.quantity("hazenWilliamsC") : "",
                highDistance,
                highRise);
    }

    private static Project.EndSpec end(Obj ends, String key) {
        if (!ends.has(key)) {
            return Project.EndSpec.OPEN;
        }
        Obj e = ends.object(key);
        e.allow("level", "pressure");
        return new Project.EndSpec(e.quantity("level"), e.quantity("pressure"));
    }

    /** Saves a project atomically. */
    public static void save(Project project, Path file) {
        byte[] bytes = toJson(project).getBytes(StandardCharsets.UTF_8);
        AtomicFiles.write(file, true, out -> out.write(bytes));
    }

    /** The project as JSON text, keys in a fixed order, empty optional fields left out. */
    public static String toJson(Project p) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", Project.FORMAT);
        root.put("version", Project.VERSION);
        putIf(root, "title", p.title());
        Project.TitleBlock t = p.titleBlock();
        if (!t.equals(Project.TitleBlock.EMPTY)) {
            ObjectNode r = root.putObject("reference");
            putIf(r, "job", t.job());
            putIf(r, "revision", t.revision());
            putIf(r, "preparedBy", t.preparedBy());
            putIf(r, "checkedBy", t.checkedBy());
            putIf(r, "date", t.date());
            putIf(r, "notes", t.notes());
        }
        ObjectNode f = root.putObject("fluid");
        f.put("name", p.fluid().name());
        putIf(f, "temperature", p.fluid().temperature());
        putIf(f, "pressure", p.fluid().pressure());
        putIf(f, "density", p.fluid().density());
        putIf(f, "viscosity", p.fluid().viscosity());
        putIf(f, "vapourPressure", p.fluid().vapourPressure());
        if (p.isNetwork()) {
            putIf(root, "flow", p.flow());
        } else {
            root.put("flow", p.flow());
        }
        putIf(root, "flowUncertainty", p.flowUncertainty());
        root.put("friction", p.friction());
        putIf(root, "inletLevel", p.inletLevel());
        if (!p.site().equals(Project.SiteSpec.SEA_LEVEL)) {
            ObjectNode z = root.putObject("site");
            putIf(z, "altitude", p.site().altitude());
            putIf(z, "barometricPressure", p.site().barometricPressure());
        }
        if (!p.pressureLimits().equals(Project.PressureLimitsSpec.NONE)) {
            ObjectNode z = root.putObject("pressureLimits");
            putIf(z, "minimum", p.pressureLimits().minimum());
            putIf(z, "maximum", p.pressureLimits().maximum());
        }
        if (!p.isNetwork() || !p.elements().isEmpty()) {
            ArrayNode list = root.putArray("elements");
            for (Project.ElementSpec element : p.elements()) {
                ObjectNode n = list.addObject();
                n.put("id", element.id());
                n.put("kind", element.kind());
                writeElementFields(n, element);
            }
        }
        if (p.network().isPresent()) {
            Project.NetworkSpec net = p.network().get();
            ArrayNode nodes = root.putArray("nodes");
            for (Project.NodeSpec node : net.nodes()) {
                ObjectNode n = nodes.addObject();
                n.put("id", node.id());
                putIf(n, "name", node.name());
                putIf(n, "elevation", node.elevation());
                putIf(n, "demand", node.demand());
                if (!node.demands().isEmpty()) {
                    ObjectNode d = n.putObject("demands");
                    node.demands().forEach(d::put);
                }
                putIf(n, "fixedHead", node.fixedHead());
                putIf(n, "fixedPressure", node.fixedPressure());
                if (node.reference()) {
                    n.put("reference", true);
                }
                putIf(n, "x", node.x());
                putIf(n, "y", node.y());
            }
            ArrayNode links = root.putArray("links");
            for (Project.LinkSpec link : net.links()) {
                ObjectNode n = links.addObject();
                n.put("id", link.element().id());
                n.put("kind", link.element().kind());
                n.put("from", link.from());
                n.put("to", link.to());
                writeElementFields(n, link.element());
                putIf(n, "designFlow", link.designFlow());
            }
            if (!net.demandCases().isEmpty()) {
                ArrayNode cases = root.putArray("demandCases");
                for (Project.DemandCaseSpec c : net.demandCases()) {
                    ObjectNode n = cases.addObject();
                    n.put("name", c.name());
                    putIf(n, "multiplier", c.multiplier());
                    if (!c.demandMultipliers().isEmpty()) {
                        ObjectNode m = n.putObject("demandMultipliers");
                        c.demandMultipliers().forEach(m::put);
                    }
                    if (!c.nodeDemands().isEmpty()) {
                        ObjectNode m = n.putObject("nodeDemands");
                        c.nodeDemands().forEach(m::put);
                    }
                }
            }
        }
        if (!p.ends().equals(Project.EndsSpec.OPEN)) {
            ObjectNode e = root.putObject("ends");
            for (String key : new String[] {"source", "delivery"}) {
                Project.EndSpec end =
                        key.equals("source") ? p.ends().source() : p.ends().delivery();
                ObjectNode en = e.putObject(key);
                putIf(en, "level", end.level());
                putIf(en, "pressure", end.pressure());
            }
        }
        if (!p.limits().equals(Project.LimitsSpec.NONE)) {
            ObjectNode l = root.putObject("limits");
            putIf(l, "minimumVelocity", p.limits().minimumVelocity());
            putIf(l, "maximumVelocity", p.limits().maximumVelocity());
            putIf(l, "maximumFrictionLossPer100m", p.limits().maximumFrictionLossPer100m());
            putIf(l, "headBudget", p.limits().headBudget());
            putIf(l, "npshMargin", p.limits().npshMargin());
        }
        p.sizing().ifPresent(z -> {
            ObjectNode zn = root.putObject("sizing");
            zn.put("material", z.material());
            putIf(zn, "schedule", z.schedule());
        });
        p.curve().ifPresent(c -> {
            ObjectNode cn = root.putObject("curve");
            putIf(cn, "minimumFlow", c.minimumFlow());
            cn.put("maximumFlow", c.maximumFlow());
            cn.put("points", c.points());
        });
        try {
            return MAPPER.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("could not write project JSON", e);
        }
    }

    private static void putIf(ObjectNode node, String key, String value) {
        if (value != null && !value.isEmpty()) {
            node.put(key, value);
        }
    }

    /** A JSON object with its path, for readable errors. */
    static final class Obj {
        final JsonNode node;
        final String path;

        Obj(JsonNode node, String path) {
            this.path = path;
            if (node == null || !node.isObject()) {
                throw new InputException(path.isEmpty() ? "$" : path, "expected a JSON object, got " + kind(node));
            }
            this.node = node;
        }

        String at(String key) {
            if (!key.matches("[A-Za-z_][A-Za-z0-9_]*")) {
                // Odd keys (empty, spaces, dots, control characters) are quoted so the path stays readable.
                String shown = key.length() > 40 ? key.substring(0, 40) + "…" : key;
                String quoted = "[\"" + shown.replace("\"", "\\\"").replaceAll("\\p{Cntrl}", "?") + "\"]";
                return (path.isEmpty() ? "$" : path) + quoted;
            }
            return path.isEmpty() ? key : path + "." + key;
        }

        void allow(String... keys) {
            Set<String> allowed = Set.of(keys);
            Iterator<String> names = node.fieldNames();
            while (names.hasNext()) {
                String name = names.next();
                if (!allowed.contains(name)) {
                    throw new InputException(at(name), "unknown key; expected one of " + String.join(", ", keys));
                }
            }
        }

        boolean has(String key) {
            return node.has(key) && !node.get(key).isNull();
        }

        String text(String key, boolean required) {
            JsonNode v = node.get(key);
            if (v == null || v.isNull()) {
                if (required) {
                    throw new InputException(at(key), "missing");
                }
                return "";
            }
            if (!v.isTextual()) {
                throw new InputException(at(key), "expected text, got " + kind(v));
            }
            if (required && v.asText().isBlank()) {
                throw new InputException(at(key), "must not be empty");
            }
            return v.asText();
        }

        boolean bool(String key) {
            JsonNode v = node.get(key);
            if (v == null || !v.isBoolean()) {
                throw new InputException(at(key), "expected true or false, got " + (v == null ? "nothing" : kind(v)));
            }
            return v.asBoolean();
        }

        String textOrNumber(String key, boolean required) {
            JsonNode v = node.get(key);
            if (v != null && v.isNumber()) {
                return v.asText();
            }
            return text(key, required);
        }

        /** A quantity as text with unit, or a plain number taken as SI; empty when absent. */
        String quantity(String key) {
            JsonNode v = node.get(key);
            if (v == null || v.isNull()) {
                return "";
            }
            if (v.isNumber()) {
                double d = v.asDouble();
                if (!Double.isFinite(d)) {
                    throw new InputException(at(key), "number out of range: " + v.asText());
                }
                return v.isIntegralNumber() ? v.asText() : Double.toString(d);
            }
            if (!v.isTextual()) {
                throw new InputException(at(key), "expected a quantity such as \"12 m\", got " + kind(v));
            }
            if (v.asText().isBlank()) {
                throw new InputException(at(key), "empty quantity");
            }
            return v.asText().strip();
        }

        String quantityRequired(String key) {
            String q = quantity(key);
            if (q.isEmpty()) {
                throw new InputException(at(key), "missing");
            }
            return q;
        }

        int integer(String key, boolean required, int otherwise) {
            JsonNode v = node.get(key);
            if (v == null || v.isNull()) {
                if (required) {
                    throw new InputException(at(key), "missing");
                }
                return otherwise;
            }
            if (!v.isIntegralNumber() || !v.canConvertToInt()) {
                throw new InputException(at(key), "expected a whole number, got " + v);
            }
            return v.intValue();
        }

        Obj object(String key) {
            JsonNode v = node.get(key);
            if (v == null || v.isNull()) {
                throw new InputException(at(key), "missing");
            }
            return new Obj(v, at(key));
        }

        ArrayNode array(String key, boolean nonEmpty) {
            JsonNode v = node.get(key);
            if (v == null || v.isNull()) {
                throw new InputException(at(key), "missing");
            }
            if (!v.isArray()) {
                throw new InputException(at(key), "expected a list, got " + kind(v));
            }
            if (nonEmpty && v.isEmpty()) {
                throw new InputException(at(key), "must not be empty");
            }
            return (ArrayNode) v;
        }

        private static String kind(JsonNode v) {
            if (v == null || v.isNull()) {
                return "nothing";
            }
            if (v.isTextual()) {
                return "text \"" + v.asText() + "\"";
            }
            if (v.isNumber()) {
                return "number " + v.asText();
            }
            if (v.isArray()) {
                return "a list";
            }
            if (v.isObject()) {
                return "an object";
            }
            return v.getNodeType().toString().toLowerCase(java.util.Locale.ROOT);
        }
    }
}
