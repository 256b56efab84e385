package org.headway.project;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.pipe.Material;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;

/**
 * A network's line list as engineers keep it in a spreadsheet: a CSV of nodes and a CSV of links,
 * read into a project's {@link Project.NetworkSpec}.
 *
 * <p>A column name may carry its unit in brackets ({@code diameter [mm]}, {@code demand [L/s]});
 * the column's cells are then bare numbers in that unit. Without a bracket a cell is a number in SI
 * or a number with its own unit ({@code 150 mm}). A blank cell means "not given". Every bad cell is
 * refused with the file, the line and the column. Columns whose name starts with {@code #} and the
 * columns {@code notes} and {@code comment} are ignored; any other unknown column is refused, so
 * that a misspelt {@code diamter} is not silently dropped.
 *
 * <p>Node columns: {@code id}, {@code elevation}, {@code demand} (category {@code base}), any number
 * of {@code demand_NAME} (a demand of category NAME), {@code fixed_head}, and optional
 * {@code fixed_pressure}, {@code reference} ({@code yes}/{@code no}), {@code x}, {@code y}, {@code
 * name}. Link columns: {@code id}, {@code from}, {@code to}, {@code kind} ({@code pipe} when blank;
 * {@code valve}, {@code component}, {@code check-valve}, {@code flow-control} (with {@code setting}
 * a flow), {@code pressure-reducing} and {@code pressure-sustaining} (with {@code setting} a gauge
 * pressure at the outlet or inlet node),
 * {@code pump}, {@code closed}, {@code open}), {@code length}, {@code diameter}, {@code roughness}, {@code loss_coefficient}, {@code
 * hw_c}, {@code material}, {@code size}, {@code schedule}, {@code kv}, {@code cv}, {@code
 * rated_pressure_drop}, {@code rated_flow}, {@code exponent}, {@code pump_curve} ({@code "0 L/s:40
 * m; 5 L/s:36 m; 10 L/s:25 m"}), {@code speed_ratio}, {@code npsh_required}, {@code design_flow},
 * {@code name}.
 */
public final class LineList {

    /** Node columns understood. */
    public static final List<String> NODE_COLUMNS =
            List.of("id", "name", "elevation", "demand", "fixed_head", "fixed_pressure", "reference", "x", "y");

    /**
     * Prefix of a node column giving a named demand: {@code demand_domestic [L/s]} is the demand of
     * category {@code domestic} (the plain {@code demand} column is category {@code base}).
     */
    public static final String NAMED_DEMAND_PREFIX = "demand_";

    /** Demand-case columns understood. */
    public static final List<String> CASE_COLUMNS = List.of("case", "multiplier", "demand", "node", "value");

    /** Link columns understood. */
    public static final List<String> LINK_COLUMNS = List.of(
            "id",
            "name",
            "from",
            "to",
            "kind",
            "length",
            "diameter",
            "roughness",
            "loss_coefficient",
            "hw_c",
            "material",
            "size",
            "schedule",
            "kv",
            "cv",
            "rated_pressure_drop",
            "rated_flow",
            "exponent",
            "pump_curve",
            "speed_ratio",
            "npsh_required",
            "design_flow",
            "setting",
            "inlet_diameter",
            "outlet_diameter",
            "cone_angle");

    /** Link kinds a line list may name. */
    public static final List<String> LINK_KINDS = List.of(
            "pipe",
            "valve",
            "component",
            "check-valve",
            "flow-control",
            "pressure-reducing",
            "pressure-sustaining",
            "pump",
            "closed",
            "open",
            "reducer");

    /** Largest line-list file read (bytes): far beyond any real network's list. */
    public static final long MAX_BYTES = 512L * 1024 * 1024;

    private static final Pattern HEADER = Pattern.compile("^\\s*([A-Za-z_][A-Za-z0-9_\\-]*)\\s*(?:\\[(.*)\\])?\\s*$");
    private static final Pattern BARE_NUMBER = Pattern.compile("^[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?$");

    private LineList() {}

    /** {@link #BARE_NUMBER} without a regular expression (it is asked of every cell under a unit). */
    static boolean isBareNumber(String v) {
        int n = v.length();
        int i = 0;
        if (i < n && (v.charAt(i) == '+' || v.charAt(i) == '-')) {
            i++;
        }
        int before = 0;
        while (i < n && v.charAt(i) >= '0' && v.charAt(i) <= '9') {
            i++;
            before++;
        }
        int after = 0;
        if (i < n && v.charAt(i) == '.') {
            i++;
            while (i < n && v.charAt(i) >= '0' && v.charAt(i) <= '9') {
                i++;
                after++;
            }
        }
        if (before == 0 && after == 0) {
            return false;
        }
        if (i < n && (v.charAt(i) == 'e' || v.charAt(i) == 'E')) {
            i++;
            if (i < n && (v.charAt(i) == '+' || v.charAt(i) == '-')) {
                i++;
            }
            int exponent = 0;
            while (i < n && v.charAt(i) >= '0' && v.charAt(i) <= '9') {
                i++;
                exponent++;
            }
            if (exponent == 0) {
                return false;
            }
        }
        return i == n;
    }

    /**
     * Reads both files.
     *
     * @param nodes the nodes CSV
     * @param links the links CSV
     * @param catalog catalog for a material given without a size
     * @param hazenWilliams whether pipes are computed by Hazen–Williams (a material's C is then taken
     *     from the catalog)
     * @return the network as typed, values kept as text with their units
     */
    public static Project.NetworkSpec read(Path nodes, Path links, Catalog catalog, boolean hazenWilliams) {
        Table n = Table.read(nodes, NODE_COLUMNS);
        Table l = Table.read(links, LINK_COLUMNS);
        Map<String, String> nodeIds = new java.util.HashMap<>();
        List<Project.NodeSpec> nodeList = nodes(n, nodeIds);
        return new Project.NetworkSpec(nodeList, links(l, catalog, hazenWilliams, nodeIds));
    }

    /** Reads from text (tests and fuzzing), naming the files as given. */
    public static Project.NetworkSpec parse(
            String nodesName, String nodesText, String linksName, String linksText, Catalog c, boolean hazenWilliams) {
        Table n = Table.parse(nodesName, nodesText, NODE_COLUMNS);
        Table l = Table.parse(linksName, linksText, LINK_COLUMNS);
        Map<String, String> nodeIds = new java.util.HashMap<>();
        List<Project.NodeSpec> nodeList = nodes(n, nodeIds);
        return new Project.NetworkSpec(nodeList, links(l, c, hazenWilliams, nodeIds));
    }

    /**
     * The node lines; fills ids with each node id (key and value the same string, so that the links
     * may share the nodes' strings instead of holding copies).
     */
    private static List<Project.NodeSpec> nodes(Table t, Map<String, String> ids) {
        t.require("id");
        List<Project.NodeSpec> out = new ArrayList<>();
        for (Row r : t.rows) {
            String id = r.text("id");
            if (id.isEmpty()) {
                throw r.error("id", "every node needs an id");
            }
            if (ids.putIfAbsent(id, id) != null) {
                throw r.error("id", "node id \"" + id + "\" is used by an earlier line");
            }
            String reference = r.text("reference").toLowerCase(Locale.ROOT);
            if (!List.of("", "yes", "no", "true", "false", "1", "0").contains(reference)) {
                throw r.error("reference", "expected yes or no, got \"" + r.text("reference") + "\"");
            }
            out.add(new Project.NodeSpec(
                    id,
                    r.text("name"),
                    r.quantity("elevation", QuantityKind.LENGTH),
                    r.flow("demand"),
                    r.quantity("fixed_head", QuantityKind.HEAD),
                    r.quantity("fixed_pressure", QuantityKind.PRESSURE),
                    reference.equals("yes") || reference.equals("true") || reference.equals("1"),
                    r.quantity("x", QuantityKind.LENGTH),
                    r.quantity("y", QuantityKind.LENGTH),
                    namedDemands(t, r)));
        }
        if (out.isEmpty()) {
            throw new InputException(t.name, "has no node lines");
        }
        return out;
    }

    private static Map<String, String> namedDemands(Table t, Row r) {
        Map<String, String> out = new LinkedHashMap<>();
        for (String column : t.column.keySet()) {
            if (column.startsWith(NAMED_DEMAND_PREFIX)) {
                String v = r.flow(column);
                if (!v.isEmpty()) {
                    out.put(column.substring(NAMED_DEMAND_PREFIX.length()), v);
                }
            }
        }
        return out;
    }

    /**
     * Reads a demand-case list: one line per setting, columns {@code case} (required), {@code
     * multiplier}, {@code demand}, {@code node}, {@code value}. A line with {@code case} and
     * {@code multiplier} only sets the case's factor on every demand; with {@code demand} (a
     * category) and {@code multiplier}, that category's factor; with {@code node} and {@code value}
     * (a flow), that junction's total demand in the case. A line with only {@code case} declares a
     * case of the network's own demands. Cases keep the order of their first line.
     *
     * @param file the CSV
     * @param network the network the cases are for: nodes and categories named must exist
     */
    public static List<Project.DemandCaseSpec> readCases(Path file, Project.NetworkSpec network) {
        return cases(Table.read(file, CASE_COLUMNS), network);
    }

    /** Reads a demand-case list from text (tests), naming the file as given. */
    public static List<Project.DemandCaseSpec> parseCases(String name, String text, Project.NetworkSpec network) {
        return cases(Table.parse(name, text, CASE_COLUMNS), network);
    }

    private static final class CaseDraft {
        String multiplier = "";
        final Map<String, String> categories = new LinkedHashMap<>();
        final Map<String, String> nodes = new LinkedHashMap<>();
    }

    private static List<Project.DemandCaseSpec> cases(Table t, Project.NetworkSpec network) {
        t.require("case");
        Map<String, Project.NodeSpec> nodeById = new LinkedHashMap<>();
        Set<String> categories = new java.util.LinkedHashSet<>();
        for (Project.NodeSpec n : network.nodes()) {
            nodeById.put(n.id(), n);
            if (!n.demand().isEmpty()) {
                categories.add("base");
            }
            categories.addAll(n.demands().keySet());
        }
        Map<String, CaseDraft> drafts = new LinkedHashMap<>();
        for (Row r : t.rows) {
            String name = r.text("case");
            if (name.isEmpty()) {
                throw r.error("case", "every line needs the name of its case");
            }
            CaseDraft d = drafts.computeIfAbsent(name, k -> new CaseDraft());
            String demand = r.text("demand");
            String node = r.text("node");
            String multiplier = r.text("multiplier");
            String value = r.flow("value");
            if (!multiplier.isEmpty()) {
                try {
                    ProjectResolver.multiplier(multiplier, "multiplier");
                } catch (InputException e) {
                    throw r.error("multiplier", e.problem());
                }
            }
            if (!demand.isEmpty() && !node.isEmpty()) {
                throw r.error("node", "give a demand category or a node on one line, not both");
            }
            if (!node.isEmpty()) {
                Project.NodeSpec n = nodeById.get(node);
                if (n == null) {
                    throw r.error("node", "node \"" + node + "\" is not in the node list");
                }
                if (!n.fixedHead().isEmpty() || !n.fixedPressure().isEmpty()) {
                    throw r.error("node", "node \"" + node + "\" has a fixed head; cases change junction demands only");
                }
                if (!multiplier.isEmpty()) {
                    throw r.error("multiplier", "a node line gives the node's demand in value, not a multiplier");
                }
                if (value.isEmpty()) {
                    throw r.error("value", "a node line needs the node's demand in this case (a flow)");
                }
                if (d.nodes.put(node, value) != null) {
                    throw r.error("node", "case " + name + " gives node " + node + " twice");
                }
            } else if (!demand.isEmpty()) {
                if (!categories.contains(demand)) {
                    throw r.error(
                            "demand",
                            "no node has a demand of category \"" + demand + "\"; the categories are "
                                    + (categories.isEmpty() ? "(none)" : String.join(", ", categories)));
                }
                if (multiplier.isEmpty()) {
                    throw r.error("multiplier", "a demand-category line needs its multiplier");
                }
                if (!value.isEmpty()) {
                    throw r.error("value", "a value belongs on a node line; a category takes a multiplier");
                }
                if (d.categories.put(demand, multiplier) != null) {
                    throw r.error("demand", "case " + name + " gives category " + demand + " twice");
                }
            } else {
                if (!value.isEmpty()) {
                    throw r.error("value", "a value needs the node it is for");
                }
                if (!multiplier.isEmpty()) {
                    if (!d.multiplier.isEmpty()) {
                        throw r.error("multiplier", "case " + name + " has its overall multiplier on an earlier line");
                    }
                    d.multiplier = multiplier;
                }
            }
        }
        if (drafts.isEmpty()) {
            throw new InputException(t.name, "has no case lines");
        }
        List<Project.DemandCaseSpec> out = new ArrayList<>();
        drafts.forEach((name, d) -> out.add(new Project.DemandCaseSpec(name, d.multiplier, d.categories, d.nodes)));
        return out;
    }

    private static List<Project.LinkSpec> links(
            Table t, Catalog catalog, boolean hazenWilliams, Map<String, String> nodeIds) {
        t.require("id");
        t.require("from");
        t.require("to");
        List<Project.LinkSpec> out = new ArrayList<>();
        Set<String> ids = new HashSet<>();
        for (Row r : t.rows) {
            String id = r.text("id");
            if (id.isEmpty()) {
                throw r.error("id", "every link needs an id");
            }
            if (!ids.add(id)) {
                throw r.error("id", "link id \"" + id + "\" is used by an earlier line");
            }
            String from = r.text("from");
            String to = r.text("to");
            if (from.isEmpty() || to.isEmpty()) {
                throw r.error(from.isEmpty() ? "from" : "to", "a link needs both its from and to nodes");
            }
            String kind = r.text("kind").isEmpty() ? "pipe" : r.text("kind").toLowerCase(Locale.ROOT);
            if (!LINK_KINDS.contains(kind)) {
                throw r.error(
                        "kind", "unknown kind \"" + r.text("kind") + "\"; expected " + String.join(", ", LINK_KINDS));
            }
            for (String column : t.column.keySet()) {
                if (!r.text(column).isEmpty() && !USED_BY.get(kind).contains(column)) {
                    throw r.error(
                            column,
                            "is not used by a link of kind " + kind + "; leave it blank (got \"" + r.text(column)
                                    + "\")");
                }
            }
            Project.ElementSpec element = switch (kind) {
                case "pipe" -> pipe(r, id, catalog, hazenWilliams);
                case "pump" -> pump(r, id);
                default -> device(r, id, kind);
            };
            out.add(new Project.LinkSpec(
                    nodeIds.getOrDefault(from, from), nodeIds.getOrDefault(to, to), element, r.flow("design_flow")));
        }
        if (out.isEmpty()) {
            throw new InputException(t.name, "has no link lines");
        }
        return out;
    }

    /** Columns each link kind reads. */
    private static final Map<String, java.util.Set<String>> USED_BY = usedByKind();

    private static Map<String, java.util.Set<String>> usedByKind() {
        List<String> common = List.of("id", "name", "from", "to", "kind", "design_flow");
        Map<String, java.util.Set<String>> m = new LinkedHashMap<>();
        for (String kind : LINK_KINDS) {
            List<String> own = switch (kind) {
                case "pipe" ->
                    List.of(
                            "length",
                            "diameter",
                            "roughness",
                            "loss_coefficient",
                            "hw_c",
                            "material",
                            "size",
                            "schedule");
                case "pump" -> List.of("pump_curve", "speed_ratio", "npsh_required");
                case "component" -> List.of("rated_pressure_drop", "rated_flow", "exponent");
                case "valve" -> List.of("kv", "cv");
                case "reducer" -> List.of("inlet_diameter", "outlet_diameter", "cone_angle");
                case "flow-control", "pressure-reducing", "pressure-sustaining" ->
                    List.of("setting", "kv", "cv", "loss_coefficient", "diameter");
                default -> List.of("kv", "cv", "loss_coefficient", "diameter");
            };
            List<String> all = new ArrayList<>(common);
            all.addAll(own);
            m.put(kind, java.util.Set.copyOf(all));
        }
        return Map.copyOf(m);
    }

    private static Project.SegmentSpec pipe(Row r, String id, Catalog catalog, boolean hazenWilliams) {
        String length = r.quantity("length", QuantityKind.LENGTH);
        if (length.isEmpty()) {
            throw r.error("length", "a pipe needs its length");
        }
        String material = r.text("material");
        String size = r.text("size");
        String diameter = r.quantity("diameter", QuantityKind.DIAMETER);
        String roughness = r.quantity("roughness", QuantityKind.ROUGHNESS);
        String hwC = r.quantity("hw_c", QuantityKind.DIMENSIONLESS);
        Optional<Project.PipeSpec> pipe = Optional.empty();
        if (!material.isEmpty() && !size.isEmpty()) {
            pipe = Optional.of(new Project.PipeSpec(material, size, r.text("schedule")));
        } else if (!material.isEmpty()) {
            Material m;
            try {
                m = catalog.material(material);
            } catch (InputException e) {
                throw r.error("material", e.problem());
            }
            if (diameter.isEmpty()) {
                throw r.error("size", "material \"" + material + "\" without a size needs a diameter");
            }
            if (roughness.isEmpty()) {
                roughness = Double.toString(m.roughness()) + " m";
            }
            if (hazenWilliams && hwC.isEmpty() && m.hazenWilliams().isPresent()) {
                hwC = Double.toString(m.hazenWilliams().get().value());
            }
        } else if (!size.isEmpty()) {
            throw r.error("material", "a size needs its material");
        } else if (diameter.isEmpty()) {
            throw r.error("diameter", "a pipe needs a diameter, or a material and size from the catalog");
        } else if (roughness.isEmpty() && hwC.isEmpty()) {
            throw r.error("roughness", "a pipe with an explicit diameter needs its roughness (or a material)");
        } else if (roughness.isEmpty()) {
            // A Hazen–Williams pipe given by C alone: the roughness is used only for the comparison with
            // Colebrook, so take that of new commercial steel and say so in the description of the source.
            roughness = "0.045 mm";
        }
        return new Project.SegmentSpec(
                id,
                r.text("name").isEmpty() ? id : r.text("name"),
                length,
                pipe,
                diameter,
                roughness,
                List.of(),
                r.quantity("loss_coefficient", QuantityKind.DIMENSIONLESS),
                "",
                "",
                "",
                hwC,
                "",
                "");
    }

    private static Project.PumpSpec pump(Row r, String id) {
        String curve = r.text("pump_curve");
        if (curve.isEmpty()) {
            throw r.error("pump_curve", "a pump needs its curve, e.g. \"0 L/s:40 m; 5 L/s:36 m; 10 L/s:25 m\"");
        }
        List<Project.PumpPointSpec> points = new ArrayList<>();
        String[] parts = curve.split(";");
        for (String part : parts) {
            if (part.isBlank()) {
                continue;
            }
            String[] fh = part.split(":");
            if (fh.length != 2) {
                throw r.error(
                        "pump_curve", "each point is flow:head, e.g. \"5 L/s:36 m\"; got \"" + part.strip() + "\"");
            }
            String flow = fh[0].strip();
            String head = fh[1].strip();
            if (BARE_NUMBER.matcher(flow).matches() || BARE_NUMBER.matcher(head).matches()) {
                throw r.error(
                        "pump_curve", "give each point's units, e.g. \"5 L/s:36 m\"; got \"" + part.strip() + "\"");
            }
            try {
                Quantities.parseFlow(flow, "pump_curve").volumetric(1000, "pump_curve");
                Quantities.parse(head, QuantityKind.HEAD, "pump_curve");
            } catch (InputException e) {
                throw r.error("pump_curve", e.problem());
            }
            points.add(new Project.PumpPointSpec(flow, head));
        }
        if (points.size() < 3) {
            throw r.error("pump_curve", "a pump curve needs at least three points, got " + points.size());
        }
        return new Project.PumpSpec(
                id,
                r.text("name").isEmpty() ? id : r.text("name"),
                0,
                points,
                r.quantity("npsh_required", QuantityKind.HEAD),
                r.quantity("speed_ratio", QuantityKind.DIMENSIONLESS));
    }

    private static Project.DeviceSpec device(Row r, String id, String kind) {
        Map<String, String> values = new LinkedHashMap<>();
        String kv = r.quantity("kv", QuantityKind.DIMENSIONLESS);
        String cv = r.quantity("cv", QuantityKind.DIMENSIONLESS);
        String deviceKind = kind;
        switch (kind) {
            case "valve" -> {
                if (kv.isEmpty() == cv.isEmpty()) {
                    throw r.error("kv", "a valve needs its kv or its cv (one of them)");
                }
            }
            case "component" -> {
                String dp = r.quantity("rated_pressure_drop", QuantityKind.PRESSURE);
                String q = r.flow("rated_flow");
                if (dp.isEmpty() || q.isEmpty()) {
                    throw r.error(
                            dp.isEmpty() ? "rated_pressure_drop" : "rated_flow",
                            "a rated component needs rated_pressure_drop and rated_flow");
                }
                values.put("ratedPressureDrop", dp);
                values.put("ratedFlow", q);
                putIf(values, "exponent", r.quantity("exponent", QuantityKind.DIMENSIONLESS));
            }
            case "flow-control" -> {
                String setting = r.flow("setting");
                if (setting.isEmpty()) {
                    throw r.error("setting", "a flow-control valve needs the flow it holds");
                }
                values.put("setting", setting);
            }
            case "pressure-reducing", "pressure-sustaining" -> {
                String setting = r.quantity("setting", QuantityKind.PRESSURE);
                if (setting.isEmpty()) {
                    throw r.error("setting", "a pressure-control valve needs the gauge pressure it holds");
                }
                values.put("setting", setting);
            }
            case "closed", "open" -> {
                deviceKind = "isolation";
                values.put("status", kind);
            }
            case "reducer" -> {
                String in = r.quantity("inlet_diameter", QuantityKind.DIAMETER);
                String out = r.quantity("outlet_diameter", QuantityKind.DIAMETER);
                if (in.isEmpty() || out.isEmpty()) {
                    throw r.error(
                            in.isEmpty() ? "inlet_diameter" : "outlet_diameter",
                            "a reducer link needs its inlet_diameter and outlet_diameter (the bores at its from and"
                                    + " to ends)");
                }
                values.put("inletDiameter", in);
                values.put("outletDiameter", out);
                putIf(values, "includedAngleDegrees", r.quantity("cone_angle", QuantityKind.DIMENSIONLESS));
                return new Project.DeviceSpec(deviceKind, id, r.text("name"), values);
            }
            default -> {}
        }
        if (!kind.equals("component")) {
            putIf(values, "kv", kv);
            putIf(values, "cv", cv);
            String k = r.quantity("loss_coefficient", QuantityKind.DIMENSIONLESS);
            if (!k.isEmpty()) {
                if (kind.equals("valve")) {
                    throw r.error("loss_coefficient", "a valve is given by kv or cv; use kind check-valve or open");
                }
                String d = r.quantity("diameter", QuantityKind.DIAMETER);
                if (d.isEmpty()) {
                    throw r.error("diameter", "a loss coefficient needs the diameter its velocity is taken in");
                }
                values.put("lossCoefficient", k);
                values.put("diameter", d);
            }
        }
        return new Project.DeviceSpec(deviceKind, id, r.text("name"), values);
    }

    private static void putIf(Map<String, String> m, String k, String v) {
        if (!v.isEmpty()) {
            m.put(k, v);
        }
    }

    /** A CSV file read into named columns with optional units. */
    static final class Table {
        final String name;
        final Map<String, Integer> column = new LinkedHashMap<>();
        final Map<String, String> unit = new LinkedHashMap<>();

        Table(String name) {
            this.name = name;
        }

        /** Cells with their unit seen so far, up to {@link #SHARED_LIMIT}: repeated values share one string. */
        private final Map<String, String> shared = new java.util.HashMap<>();

        private static final int SHARED_LIMIT = 4096;

        String shared(String v) {
            String s = shared.get(v);
            if (s != null) {
                return s;
            }
            if (shared.size() < SHARED_LIMIT) {
                shared.put(v, v);
            }
            return v;
        }

        static Table read(Path file, List<String> known) {
            String text;
            try {
                if (Files.size(file) > MAX_BYTES) {
                    throw new InputException(file.toString(), "is larger than " + (MAX_BYTES >> 20) + " MB");
                }
                text = org.headway.caution.TextFiles.decode(Files.readAllBytes(file), file.toString());
            } catch (NoSuchFileException e) {
                throw new InputException(file.toString(), "file not found");
            } catch (IOException e) {
                throw new InputException(file.toString(), "cannot be read: " + e.getMessage());
            }
            return parse(file.toString(), text, known);
        }

        static Table parse(String name, String text, List<String> known) {
            if (text.startsWith("\uFEFF")) {
                text = text.substring(1);
            }
            Table t = new Table(name);
            CsvText reader = CsvText.reader(text);
            CsvText.Line first = t.next(reader);
            if (first == null) {
                throw new InputException(name, "is empty; it needs a header row naming its columns");
            }
            List<String> cells = first.fields();
            for (int c = 0; c < cells.size(); c++) {
                t.header(cells.get(c), c, known);
            }
            t.reader = reader;
            return t;
        }

        /** The reader of the lines after the header; null once {@link #rows} has been asked for. */
        private CsvText reader;

        /**
         * The lines after the header, read as they are asked for (one pass), so that a large list's
         * cells are not all held at once; a line with too many cells or malformed CSV is refused when
         * it is reached.
         */
        final Iterable<Row> rows = this::rowIterator;

        private java.util.Iterator<Row> rowIterator() {
            CsvText r = reader;
            if (r == null) {
                throw new IllegalStateException("the rows of " + name + " are read once");
            }
            reader = null;
            return new java.util.Iterator<Row>() {
                CsvText.Line line = Table.this.next(r);

                @Override
                public boolean hasNext() {
                    return line != null;
                }

                @Override
                public Row next() {
                    if (line == null) {
                        throw new java.util.NoSuchElementException();
                    }
                    CsvText.Line rec = line;
                    if (rec.fields().size() > width()) {
                        throw new InputException(
                                name + " line " + rec.number(),
                                "has " + rec.fields().size() + " cells, more than the " + width()
                                        + " columns of the header");
                    }
                    line = Table.this.next(r);
                    return new Row(Table.this, rec.number(), rec.fields());
                }
            };
        }

        private CsvText.Line next(CsvText reader) {
            try {
                return reader.next();
            } catch (CsvText.Malformed e) {
                throw new InputException(name + " line " + e.line, "is not valid CSV: " + e.getMessage());
            }
        }

        int width = 0;

        int width() {
            return width;
        }

        void header(String cell, int c, List<String> known) {
            width = Math.max(width, c + 1);
            String h = cell.strip();
            if (h.isEmpty() || h.startsWith("#")) {
                return;
            }
            Matcher m = HEADER.matcher(h);
            if (!m.matches()) {
                throw new InputException(name + " header, column " + (c + 1), "cannot read column name \"" + h + "\"");
            }
            String key = m.group(1).toLowerCase(Locale.ROOT).replace('-', '_');
            if (key.equals("notes") || key.equals("comment")) {
                return;
            }
            boolean namedDemand = known == NODE_COLUMNS
                    && key.startsWith(NAMED_DEMAND_PREFIX)
                    && key.length() > NAMED_DEMAND_PREFIX.length()
                    && !key.equals(NAMED_DEMAND_PREFIX + "base");
            if (!known.contains(key) && !namedDemand) {
                throw new InputException(
                        name + " header, column " + (c + 1),
                        "unknown column \"" + h + "\"; known columns: " + String.join(", ", known)
                                + " (start a column name with # to have it ignored)");
            }
            if (column.put(key, c) != null) {
                throw new InputException(name + " header, column " + (c + 1), "column \"" + key + "\" appears twice");
            }
            if (m.group(2) != null) {
                String u = m.group(2).strip();
                if (u.isEmpty() || u.equals("-")) {
                    return;
                }
                unit.put(key, u);
            }
        }

        void require(String key) {
            if (!column.containsKey(key)) {
                throw new InputException(name + " header", "needs a column \"" + key + "\"");
            }
        }
    }

    /** One line of a table. */
    record Row(Table table, long line, List<String> cells) {

        InputException error(String key, String problem) {
            return new InputException(table.name + " line " + line + ", column " + key, problem);
        }

        String text(String key) {
            Integer c = table.column.get(key);
            if (c == null || c >= cells.size()) {
                return "";
            }
            return cells.get(c).strip();
        }

        /** The cell as quantity text with its unit, checked; empty when blank. */
        String quantity(String key, QuantityKind kind) {
            String v = withUnit(key);
            if (v.isEmpty()) {
                return v;
            }
            try {
                if (kind == QuantityKind.PRESSURE) {
                    Quantities.parsePressure(v, key);
                } else {
                    Quantities.parse(v, kind, key);
                }
            } catch (InputException e) {
                throw error(key, e.problem());
            }
            return v;
        }

        /** A flow cell, by volume or mass, checked; empty when blank. */
        String flow(String key) {
            String v = withUnit(key);
            if (v.isEmpty()) {
                return v;
            }
            try {
                Quantities.parseFlow(v, key);
            } catch (InputException e) {
                throw error(key, e.problem());
            }
            return v;
        }

        String withUnit(String key) {
            String v = text(key);
            if (v.isEmpty()) {
                return v;
            }
            String u = table.unit.get(key);
            if (u == null) {
                return v;
            }
            if (!isBareNumber(v)) {
                throw error(
                        key,
                        "the column gives the unit [" + u + "], so the cell must be a plain number; got \"" + v + "\"");
            }
            return table.shared(v + " " + u);
        }
    }
}
