package org.headway.project;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.fluid.Fluid;
import org.headway.fluid.Fluids;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionMethods;
import org.headway.rig.InstrumentUncertainty;
import org.headway.rig.RigAnalysis;
import org.headway.rig.RigDescription;
import org.headway.rig.RigFluid;
import org.headway.rig.RigPointResult;
import org.headway.rig.RigReport;
import org.headway.rig.RigUncertainty;
import org.headway.rig.UncertaintySource;
import org.headway.system.SiteAtmosphere;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;

/**
 * A rig description file (JSON, our own schema) and the data file it names.
 *
 * <pre>
 * { "format": "headway-rig", "version": 1,
 *   "name": "…", "note": "…",                           (optional, free text)
 *   "data": "points.csv",                                (relative to this file's folder)
 *   "columns": { "flow": "flow", "pressureDrop": "dp", "temperature": "T" },   (optional; these are the defaults)
 *   "innerDiameter": "25.4 mm", "tapSpacing": "2 m", "roughness": "0.0015 mm",
 *   "fluid": { "name": "water", "temperature": "20 degC", "pressure": "101.325 kPa" }
 *        or  { "name": "test oil", "density": "870 kg/m3", "viscosity": "40 mPa*s" },
 *   "uncertainty": { "flow": "1 %", "pressureDrop": "0.25 kPa", "temperature": "0.2 K",
 *                    "innerDiameter": "0.05 mm", "tapSpacing": "2 mm", "density": "0.05 %", "viscosity": "1 %" },
 *   "compareWith": "colebrook" }
 * </pre>
 *
 * Every uncertainty is a standard uncertainty (one standard deviation), absolute with a unit or
 * relative with {@code %}; a maker's tolerance ±a is entered as a/√3 (rectangular distribution,
 * JCGM 100:2008, 4.3.7). Unknown keys are errors naming their JSON path. The data file is a CSV
 * with a header row whose flow, pressure-drop and optional temperature columns carry units in
 * brackets ({@code flow [L/s]}, {@code dp [kPa]}, {@code T [degC]}); lines starting with {@code #}
 * are comments; other columns are carried through as text. It is streamed ({@link RigDataReader}).
 * With a fluid model and a temperature column, the properties are evaluated at each point's
 * temperature. A file loaded from the class path ({@link #loadResource}) finds its data on the class
 * path, relative to itself, so the bundled demo runs from the jar.
 */
public final class RigFile {

    /** Value of the {@code format} key. */
    public static final String FORMAT = "headway-rig";
    /** Current file version. */
    public static final int VERSION = 1;
    /** Pressure at which fluid properties are evaluated when the file gives none (Pa). */
    public static final double DEFAULT_PRESSURE = SiteAtmosphere.SEA_LEVEL_PRESSURE;

    private static final Pattern PERCENT =
            Pattern.compile("^\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*%\\s*$");
    private static final Pattern NUMBER_THEN_UNIT =
            Pattern.compile("^\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*?)\\s*$");

    private final RigDescription description;
    private final DataSource data;
    private final Columns columns;
    private final RigFluid fluid;

    private RigFile(RigDescription description, DataSource data, Columns columns, RigFluid fluid) {
        this.description = description;
        this.data = data;
        this.columns = columns;
        this.fluid = fluid;
    }

    /** Where the data file is read from. */
    interface DataSource {
        /** Name used in messages, e.g. the path. */
        String name();

        /** Opens the data file for reading. */
        Reader open() throws IOException;
    }

    /** Column names of the measured quantities. */
    record Columns(String flow, String pressureDrop, String temperature) {}

    /**
     * Reads a rig file from disk; its data path is taken relative to the file's folder.
     *
     * @param file the rig JSON
     * @return the rig, ready to stream its data
     * @throws InputException naming the file and JSON path of any bad or unknown key
     */
    public static RigFile load(Path file) {
        String text;
        text = org.headway.caution.TextFiles.read(
                file, StrictJson.MAX_DOCUMENT_LENGTH, "a rig file is a few kilobytes");
        Path folder = file.toAbsolutePath().getParent();
        return parse(text, file.toString(), file.getFileName().toString(), dataPath -> {
            Path resolved = folder.resolve(dataPath).normalize();
            Path shown = file.getParent() == null
                    ? Path.of(dataPath)
                    : file.getParent().resolve(dataPath);
            return new DataSource() {
                @Override
                public String name() {
                    return shown.toString();
                }

                @Override
                public Reader open() throws IOException {
                    try {
                        return org.headway.caution.TextFiles.reader(resolved, shown.toString());
                    } catch (NoSuchFileException e) {
                        throw new InputException(shown.toString(), "data file not found");
                    }
                }
            };
        });
    }

    /**
     * Reads a rig file from the class path; its data path is a class-path resource relative to it.
     *
     * @param resource absolute resource path, e.g. {@code /fluids-data/examples/rig.json}
     * @return the rig
     */
    public static RigFile loadResource(String resource) {
        String text;
        try (InputStream in = RigFile.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new InputException(resource, "resource not found on the class path");
            }
            text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        String folder = resource.substring(0, resource.lastIndexOf('/') + 1);
        String name = resource.substring(resource.lastIndexOf('/') + 1);
        return parse(text, resource, name, dataPath -> {
            if (dataPath.startsWith("/") || dataPath.contains("..")) {
                throw new InputException(
                        "$.data", "a bundled rig must name its data beside it, got \"" + dataPath + "\"");
            }
            String dataResource = folder + dataPath;
            return new DataSource() {
                @Override
                public String name() {
                    return dataResource.substring(1);
                }

                @Override
                public Reader open() {
                    InputStream in = RigFile.class.getResourceAsStream(dataResource);
                    if (in == null) {
                        throw new InputException(dataResource, "data resource not found on the class path");
                    }
                    return new InputStreamReader(in, StandardCharsets.UTF_8);
                }
            };
        });
    }

    /** Resolves the {@code data} value of a rig file to something that can be opened. */
    interface DataResolver {
        DataSource resolve(String dataPath);
    }

    static RigFile parse(String text, String where, String name, DataResolver resolver) {
        JsonNode root = StrictJson.read(text, where);
        try {
            return fromJson(root, name, resolver);
        } catch (InputException e) {
            throw e.at(where + ": ");
        }
    }

    private static RigFile fromJson(JsonNode root, String fileName, DataResolver resolver) {
        StrictJson.object(root, "$");
        StrictJson.keys(
                root,
                "$",
                Set.of(
                        "format",
                        "version",
                        "name",
                        "note",
                        "data",
                        "columns",
                        "innerDiameter",
                        "tapSpacing",
                        "roughness",
                        "fluid",
                        "uncertainty",
                        "compareWith"));
        String format = text(root, "$", "format");
        if (!format.equals(FORMAT)) {
            throw new InputException("$.format", "expected \"" + FORMAT + "\", got \"" + format + "\"");
        }
        int version = StrictJson.integer(root, "$", "version");
        if (version != VERSION) {
            throw new InputException("$.version", "this Headway reads version " + VERSION + ", got " + version);
        }
        String name = root.has("name") ? text(root, "$", "name") : fileName;
        if (root.has("note")) {
            text(root, "$", "note");
        }
        double diameter = quantity(root, "$", "innerDiameter", QuantityKind.DIAMETER);
        double spacing = quantity(root, "$", "tapSpacing", QuantityKind.LENGTH);
        double roughness = quantity(root, "$", "roughness", QuantityKind.ROUGHNESS);
        FrictionCorrelation comparison;
        String compareWith = root.has("compareWith") ? text(root, "$", "compareWith") : "colebrook";
        try {
            comparison = FrictionMethods.byId(compareWith);
        } catch (InputException e) {
            throw new InputException("$.compareWith", e.problem());
        }
        Columns columns = columns(root);
        RigFluid fluid = fluid(root);
        RigUncertainty uncertainty = uncertainty(root);
        String dataPath = text(root, "$", "data");
        DataSource data = resolver.resolve(dataPath);
        String fluidDescription = fluid.model() == null
                ? "constant properties given in the rig file"
                : fluid.model().displayName()
                        + (fluid.fixedTemperature() == null
                                ? " at each point's temperature"
                                : " at "
                                        + Quantities.format(
                                                fluid.fixedTemperature(),
                                                QuantityKind.TEMPERATURE,
                                                org.headway.units.UnitSystem.SI));
        RigDescription description;
        try {
            description = new RigDescription(
                    name, diameter, spacing, roughness, comparison, fluidDescription, uncertainty, List.of());
        } catch (InputException e) {
            throw e.at("$");
        }
        return new RigFile(description, data, columns, fluid);
    }

    private static Columns columns(JsonNode root) {
        if (!root.has("columns")) {
            return new Columns("flow", "dp", "T");
        }
        JsonNode c = root.get("columns");
        StrictJson.object(c, "$.columns");
        StrictJson.keys(c, "$.columns", Set.of("flow", "pressureDrop", "temperature"));
        return new Columns(
                c.has("flow") ? text(c, "$.columns", "flow") : "flow",
                c.has("pressureDrop") ? text(c, "$.columns", "pressureDrop") : "dp",
                c.has("temperature") ? text(c, "$.columns", "temperature") : "T");
    }

    private static RigFluid fluid(JsonNode root) {
        JsonNode f = StrictJson.required(root, "$", "fluid");
        String path = "$.fluid";
        StrictJson.object(f, path);
        StrictJson.keys(f, path, Set.of("name", "temperature", "pressure", "density", "viscosity"));
        String name = text(f, path, "name");
        Double temperature = f.has("temperature") ? quantity(f, path, "temperature", QuantityKind.TEMPERATURE) : null;
        double pressure = f.has("pressure") ? quantity(f, path, "pressure", QuantityKind.PRESSURE) : DEFAULT_PRESSURE;
        boolean hasDensity = f.has("density");
        boolean hasViscosity = f.has("viscosity");
        if (hasDensity != hasViscosity) {
            throw new InputException(
                    path + (hasDensity ? ".viscosity" : ".density"),
                    "missing; constant properties need both density and viscosity");
        }
        if (hasDensity) {
            double density = quantity(f, path, "density", QuantityKind.DENSITY);
            double viscosity = quantity(f, path, "viscosity", QuantityKind.DYNAMIC_VISCOSITY);
            InputException.requirePositive(path + ".density", density);
            InputException.requirePositive(path + ".viscosity", viscosity);
            return new RigFluid(null, temperature, pressure, density, viscosity);
        }
        Fluid model;
        try {
            model = Fluids.byId(name);
        } catch (InputException e) {
            throw new InputException(
                    path + ".name", e.problem() + "; or give constant properties with \"density\" and \"viscosity\"");
        }
        return new RigFluid(model, temperature, pressure, null, null);
    }

    private static RigUncertainty uncertainty(JsonNode root) {
        if (!root.has("uncertainty")) {
            return RigUncertainty.NONE;
        }
        JsonNode u = root.get("uncertainty");
        String path = "$.uncertainty";
        StrictJson.object(u, path);
        Map<String, UncertaintySource> keys = Map.of(
                "flow", UncertaintySource.FLOW,
                "pressureDrop", UncertaintySource.PRESSURE_DROP,
                "temperature", UncertaintySource.TEMPERATURE,
                "innerDiameter", UncertaintySource.INNER_DIAMETER,
                "tapSpacing", UncertaintySource.TAP_SPACING,
                "density", UncertaintySource.DENSITY,
                "viscosity", UncertaintySource.VISCOSITY);
        StrictJson.keys(u, path, keys.keySet());
        Map<UncertaintySource, InstrumentUncertainty> stated = new EnumMap<>(UncertaintySource.class);
        for (Map.Entry<String, UncertaintySource> e : keys.entrySet()) {
            if (u.has(e.getKey())) {
                String where = path + "." + e.getKey();
                String text = text(u, path, e.getKey());
                stated.put(e.getValue(), instrumentUncertainty(text, e.getValue(), where));
            }
        }
        return RigUncertainty.of(stated);
    }

    /**
     * "1 %" → relative 0.01; "0.25 kPa" → absolute 250 Pa; "0.5 % + 2 Pa" → both, combined in
     * quadrature; temperatures as differences (0.2 degC → 0.2 K).
     */
    static InstrumentUncertainty instrumentUncertainty(String text, UncertaintySource source, String where) {
        String[] parts = text.split("\\s\\+\\s");
        if (parts.length > 2) {
            throw new InputException(
                    where,
                    "expected a % value, an absolute value with its unit, or both as \"0.5 % + 2 Pa\", got \"" + text
                            + "\"");
        }
        double relative = 0;
        double absolute = 0;
        boolean haveRelative = false;
        boolean haveAbsolute = false;
        for (String part : parts) {
            Matcher percent = PERCENT.matcher(part);
            if (percent.matches()) {
                if (haveRelative) {
                    throw new InputException(where, "two % values in \"" + text + "\"");
                }
                relative = Double.parseDouble(percent.group(1)) / 100.0;
                checkUncertainty(relative, text, where);
                haveRelative = true;
            } else {
                if (haveAbsolute) {
                    throw new InputException(where, "two absolute values in \"" + text + "\"");
                }
                absolute = absoluteUncertainty(part.strip(), source, where);
                checkUncertainty(absolute, text, where);
                haveAbsolute = true;
            }
        }
        return new InstrumentUncertainty(absolute, relative);
    }

    private static double absoluteUncertainty(String text, UncertaintySource source, String where) {
        QuantityKind kind = switch (source) {
            case FLOW -> QuantityKind.VOLUMETRIC_FLOW;
            case PRESSURE_DROP -> QuantityKind.PRESSURE;
            case TEMPERATURE -> QuantityKind.TEMPERATURE;
            case INNER_DIAMETER -> QuantityKind.DIAMETER;
            case TAP_SPACING -> QuantityKind.LENGTH;
            case DENSITY -> QuantityKind.DENSITY;
            case VISCOSITY -> QuantityKind.DYNAMIC_VISCOSITY;
        };
        if (kind != QuantityKind.TEMPERATURE) {
            return Quantities.parse(text, kind, where);
        }
        Matcher m = NUMBER_THEN_UNIT.matcher(text);
        if (!m.matches() || m.group(2).isEmpty()) {
            throw new InputException(
                    where,
                    "a temperature uncertainty needs a number and unit, e.g. 0.2 K or 0.2 degC, or a %, got \"" + text
                            + "\"");
        }
        // A temperature uncertainty is a difference: the offset of °C or °F must not enter it.
        double zero = Quantities.parse("0 " + m.group(2), kind, where);
        return Quantities.parse(text, kind, where) - zero;
    }

    private static void checkUncertainty(double value, String text, String where) {
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new InputException(where, "an uncertainty must be zero or positive, got \"" + text + "\"");
        }
    }

    private static double quantity(JsonNode node, String path, String key, QuantityKind kind) {
        String text = text(node, path, key);
        return Quantities.parse(text, kind, path + "." + key);
    }

    /** The rig in SI. */
    public RigDescription description() {
        return description;
    }

    /** Name of the data file, as shown in messages. */
    public String dataName() {
        return data.name();
    }

    /**
     * Opens the data file for streaming. Close the reader when done.
     *
     * @return a reader of the data points, one at a time
     * @throws InputException for a missing data file or a bad header
     */
    public RigDataReader openData() {
        Reader reader;
        try {
            reader = data.open();
        } catch (IOException e) {
            throw new InputException(data.name(), "cannot read: " + e.getMessage());
        }
        return new RigDataReader(reader, data.name(), columns, fluid);
    }

    /**
     * Streams the data through the analysis.
     *
     * @param keepPoints per-point results kept in the report
     * @param sink receives each per-point result
     * @return the report, with the data file's own cautions (fluid property range) added
     */
    public RigReport analyse(int keepPoints, Consumer<RigPointResult> sink) {
        try (RigDataReader reader = openData()) {
            RigReport report;
            try {
                report = RigAnalysis.of(description.withCarriedColumns(reader.carriedColumns()))
                        .analyse(reader, keepPoints, sink);
            } catch (InputException e) {
                if (e.where().startsWith("point at line")) {
                    throw e.at(data.name() + " ");
                }
                if (e.where().equals("data")) {
                    throw new InputException(data.name(), "has no data rows after its header");
                }
                throw e;
            }
            List<Caution> cautions = new ArrayList<>(report.cautions());
            cautions.addAll(reader.cautions());
            return new RigReport(
                    report.description(),
                    report.summary(),
                    report.points(),
                    report.allPointsKept(),
                    report.roughness(),
                    cautions);
        }
    }

    /** A required text value; the message says a quantity is expected, as most of this file's values are. */
    private static String text(JsonNode node, String path, String key) {
        return StrictJson.text(node, path, key, "text (a number with its unit in quotes, e.g. \"25.4 mm\")");
    }
}
