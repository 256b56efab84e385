package org.headway.pipe;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.headway.caution.InputException;

/**
 * The pipe catalog: materials with their roughness, size tables (nominal size and schedule to
 * outside diameter and wall) and fittings with their loss-coefficient methods.
 *
 * <p>Immutable. {@link #bundled()} reads the files packaged from {@code fluids-data/catalog/};
 * {@link #withUserFolder(Path)} lays a user's files of the same names over them (a user row replaces
 * the bundled row with the same id; a user {@code sizes-<table>.csv} may add a new table); {@link
 * #load(Path)} reads one folder on its own. Every file is validated as it loads and errors name the
 * file, line, column and value.
 */
public final class Catalog {

    /** File of materials. */
    public static final String MATERIALS_FILE = "materials.csv";
    /** File of fittings. */
    public static final String FITTINGS_FILE = "fittings.csv";
    /** Size tables are files named {@code sizes-<table id>.csv}. */
    public static final String SIZES_PREFIX = "sizes-";

    private static final String CSV_SUFFIX = ".csv";
    private static final String RESOURCE_FOLDER = "/fluids-data/catalog/";

    /** Files packaged in the jar under {@code fluids-data/catalog/}. */
    static final List<String> BUNDLED_FILES = List.of(
            MATERIALS_FILE,
            FITTINGS_FILE,
            "sizes-asme-b36.10m.csv",
            "sizes-asme-b36.19m.csv",
            "sizes-astm-b88.csv",
            "sizes-astm-d1785.csv",
            "sizes-en-10255.csv",
            "sizes-en-545.csv",
            "sizes-iso-4427.csv");

    static final List<String> MATERIAL_COLUMNS = List.of(
            "id", "name", "roughness_mm", "roughness_low_mm", "roughness_high_mm", "condition", "size_table", "source");
    /** Optional material columns: {@code hw_c}, the Hazen–Williams coefficient C of the material. */
    static final List<String> MATERIAL_OPTIONAL_COLUMNS = List.of("hw_c", "hw_c_source");

    static final List<String> SIZE_COLUMNS = List.of("nominal", "schedule", "od_mm", "wall_mm");
    /**
     * Optional size column: {@code lining_mm}, an internal lining (cement mortar) inside the wall;
     * the bore is then OD − 2·wall − 2·lining.
     */
    static final List<String> SIZE_OPTIONAL_COLUMNS = List.of("lining_mm");

    static final List<String> FITTING_COLUMNS =
            List.of("id", "description", "method", "k", "k1", "k_inf", "k_d", "source");
    /**
     * Optional fitting columns a file may carry without breaking: {@code kv} and {@code cv}, a
     * maker's flow coefficient for the size in use (m³/h at 1 bar; US gal/min at 1 psi), and
     * {@code notes}. They are checked (a flow coefficient must be a positive number) but do not
     * change K: the row's method gives the loss.
     */
    static final List<String> FITTING_OPTIONAL_COLUMNS = List.of("kv", "cv", "notes");

    /** Material conditions a file may name. */
    public static final List<String> CONDITIONS = List.of("new", "aged");
    /** Fitting method names a file may use. */
    public static final List<String> METHODS = List.of("fixed", "2-k", "3-k");

    private static final double METRES_PER_MILLIMETRE = 1.0e-3;
    /** Largest catalog file read (bytes): far above any real table, far below memory trouble. */
    public static final long MAX_FILE_SIZE = 8L * 1024 * 1024;
    /**
     * Largest loss coefficient or 2-K/3-K constant a fittings file may give. Published K1 values
     * reach a few thousand; the bound only stops a typo (or 1e308) from overflowing K to infinity.
     * Common practice, no source.
     */
    static final double MAX_COEFFICIENT = 1.0e6;

    private static final int MAX_SUGGESTIONS = 6;

    private final Map<String, Material> materials;
    private final Map<String, List<PipeSize>> tables;
    private final Map<String, Fitting> fittings;

    private Catalog(
            Map<String, Material> materials, Map<String, List<PipeSize>> tables, Map<String, Fitting> fittings) {
        this.materials = materials;
        this.tables = tables;
        this.fittings = fittings;
    }

    private static final class Bundled {
        static final Catalog INSTANCE = readBundled().build();
    }

    /** The catalog packaged with Headway (read once, then cached). */
    public static Catalog bundled() {
        return Bundled.INSTANCE;
    }

    /**
     * The bundled catalog with a user's folder laid over it. The folder may hold any of {@code
     * materials.csv}, {@code fittings.csv} and {@code sizes-<table>.csv}; a row whose id (for sizes:
     * nominal and schedule) matches a bundled row replaces it.
     *
     * @param dir folder with the user's catalog files
     * @throws InputException when the folder is missing, holds no catalog file, or a file is invalid
     */
    public static Catalog withUserFolder(Path dir) {
        List<Path> files = catalogFiles(dir);
        if (files.isEmpty()) {
            throw new InputException(
                    dir.toString(),
                    "no catalog files found; expected any of " + MATERIALS_FILE + ", " + FITTINGS_FILE + ", "
                            + SIZES_PREFIX + "<table>" + CSV_SUFFIX);
        }
        Builder builder = readBundled();
        readFolder(builder, files);
        return builder.build();
    }

    /**
     * A catalog read from one folder only, without the bundled data. The folder must hold {@code
     * materials.csv} and {@code fittings.csv}, and may hold size tables.
     *
     * @param dir folder with catalog files
     * @throws InputException when a file is missing or invalid
     */
    public static Catalog load(Path dir) {
        List<Path> files = catalogFiles(dir);
        for (String required : List.of(MATERIALS_FILE, FITTINGS_FILE)) {
            if (files.stream().noneMatch(f -> f.getFileName().toString().equals(required))) {
                throw new InputException(dir.toString(), "missing " + required);
            }
        }
        Builder builder = new Builder();
        readFolder(builder, files);
        return builder.build();
    }

    private static Builder readBundled() {
        Builder builder = new Builder();
        for (String name : BUNDLED_FILES) {
            builder.add(name, name, readResource(name));
        }
        return builder;
    }

    private static String readResource(String name) {
        try (InputStream in = Catalog.class.getResourceAsStream(RESOURCE_FOLDER + name)) {
            if (in == null) {
                throw new IllegalStateException("bundled catalog file missing from the class path: " + name);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read bundled catalog file " + name, e);
        }
    }

    private static List<Path> catalogFiles(Path dir) {
        if (!Files.isDirectory(dir)) {
            throw new InputException(dir.toString(), "not a folder");
        }
        try (Stream<Path> list = Files.list(dir)) {
            return list.filter(Files::isRegularFile)
                    .filter(p -> isCatalogFileName(p.getFileName().toString()))
                    .sorted()
                    .collect(Collectors.toList());
        } catch (IOException e) {
            throw new InputException(dir.toString(), "cannot list the folder: " + e.getMessage(), e);
        }
    }

    private static boolean isCatalogFileName(String name) {
        return name.equals(MATERIALS_FILE)
                || name.equals(FITTINGS_FILE)
                || (name.startsWith(SIZES_PREFIX) && name.endsWith(CSV_SUFFIX));
    }

    private static void readFolder(Builder builder, List<Path> files) {
        // materials refer to size tables, so tables and fittings go first
        List<Path> ordered = new ArrayList<>(files);
        ordered.sort(Comparator.comparing(p -> p.getFileName().toString().equals(MATERIALS_FILE)));
        for (Path file : ordered) {
            String text;
            try {
                if (Files.size(file) > MAX_FILE_SIZE) {
                    throw new InputException(
                            file.toString(),
                            "file is larger than " + MAX_FILE_SIZE / (1024 * 1024)
                                    + " MB; a catalog file holds one short line per material, size or fitting");
                }
                text = org.headway.caution.TextFiles.decode(Files.readAllBytes(file), file.toString());
            } catch (IOException e) {
                throw new InputException(file.toString(), "cannot read the file: " + e.getMessage(), e);
            }
            builder.add(file.getFileName().toString(), file.toString(), text);
        }
    }

    /**
     * A material by id.
     *
     * @param id material id, e.g. {@code steel-commercial-new}
     * @throws InputException naming close ids when there is no such material
     */
    public Material material(String id) {
        Material material = id == null ? null : materials.get(id.strip());
        if (material == null) {
            throw new InputException("material", unknown("material", id, materials.keySet()));
        }
        return material;
    }

    /** All materials, in catalog order. */
    public List<Material> materials() {
        return List.copyOf(materials.values());
    }

    /** Ids of the size tables, sorted. */
    public List<String> tables() {
        return List.copyOf(tables.keySet());
    }

    /**
     * The pipe size of a material's size table for a nominal size and schedule.
     *
     * @param material material whose {@link Material#sizeTable()} is searched
     * @param nominal nominal size as the standard writes it, e.g. {@code 2}, {@code 1-1/2}
     * @param schedule schedule, type or class, e.g. {@code 40}, {@code STD}, {@code 10S}, {@code L}
     *     (case ignored)
     * @throws InputException naming table, nominal and schedule and what the table holds
     */
    public PipeSize size(Material material, String nominal, String schedule) {
        String table = material.sizeTable();
        if (table == null || table.isEmpty()) {
            throw new InputException(
                    "size", "material " + material.id() + " has no size table; give the inner diameter directly");
        }
        List<PipeSize> rows = tableRows(table);
        String wantedNominal = normaliseNominal(nominal);
        String wantedSchedule = schedule == null ? "" : schedule.strip();
        for (PipeSize size : rows) {
            if (size.nominal().equals(wantedNominal) && size.schedule().equalsIgnoreCase(wantedSchedule)) {
                return size;
            }
        }
        List<String> schedulesForNominal = rows.stream()
                .filter(s -> s.nominal().equals(wantedNominal))
                .map(PipeSize::schedule)
                .distinct()
                .collect(Collectors.toList());
        String problem;
        if (!schedulesForNominal.isEmpty()) {
            problem = "table " + table + " has no nominal " + wantedNominal + " in schedule " + wantedSchedule
                    + "; schedules for nominal " + wantedNominal + ": " + String.join(", ", schedulesForNominal);
        } else {
            List<String> nominals = rows.stream()
                    .filter(s -> s.schedule().equalsIgnoreCase(wantedSchedule))
                    .map(PipeSize::nominal)
                    .distinct()
                    .collect(Collectors.toList());
            if (nominals.isEmpty()) {
                problem = "table " + table + " has no nominal " + wantedNominal + " and no schedule " + wantedSchedule
                        + "; schedules: " + String.join(", ", schedules(rows));
            } else {
                problem = "table " + table + " has no nominal " + wantedNominal + " in schedule " + wantedSchedule
                        + "; nominal sizes in schedule " + wantedSchedule + ": " + String.join(", ", nominals);
            }
        }
        throw new InputException("size", problem);
    }

    /**
     * Sizes of one table, sorted by inner diameter ascending.
     *
     * @param table table id, e.g. {@code asme-b36.10m}
     * @param schedule schedule to keep (case ignored), or null for all schedules
     * @throws InputException when the table or schedule does not exist
     */
    public List<PipeSize> sizes(String table, String schedule) {
        List<PipeSize> rows = tableRows(table);
        List<PipeSize> kept = rows;
        if (schedule != null) {
            String wanted = schedule.strip();
            kept = rows.stream()
                    .filter(s -> s.schedule().equalsIgnoreCase(wanted))
                    .collect(Collectors.toList());
            if (kept.isEmpty()) {
                throw new InputException(
                        "schedule",
                        "table " + table + " has no schedule " + wanted + "; schedules: "
                                + String.join(", ", schedules(rows)));
            }
        }
        List<PipeSize> sorted = new ArrayList<>(kept);
        sorted.sort(Comparator.comparingDouble(PipeSize::innerDiameter).thenComparingDouble(PipeSize::outsideDiameter));
        return Collections.unmodifiableList(sorted);
    }

    /** Schedules of a table, in the order the file first names them. */
    public List<String> schedules(String table) {
        return schedules(tableRows(table));
    }

    private static List<String> schedules(List<PipeSize> rows) {
        return rows.stream().map(PipeSize::schedule).distinct().collect(Collectors.toList());
    }

    private List<PipeSize> tableRows(String table) {
        List<PipeSize> rows = table == null ? null : tables.get(table.strip());
        if (rows == null) {
            throw new InputException("table", unknown("size table", table, tables.keySet()));
        }
        return rows;
    }

    /**
     * A fitting by id.
     *
     * @param id fitting id, e.g. {@code elbow-90-standard}
     * @throws InputException naming close ids when there is no such fitting
     */
    public Fitting fitting(String id) {
        Fitting fitting = id == null ? null : fittings.get(id.strip());
        if (fitting == null) {
            throw new InputException("fitting", unknown("fitting", id, fittings.keySet()));
        }
        return fitting;
    }

    /** All fittings, in catalog order. */
    public List<Fitting> fittings() {
        return List.copyOf(fittings.values());
    }

    /** Writes "1 1/2" and " 2 " the way the tables do ("1-1/2", "2"). */
    static String normaliseNominal(String nominal) {
        if (nominal == null) {
            return "";
        }
        return nominal.strip().replaceAll("^(\\d+)\\s+(\\d+/\\d+)$", "$1-$2");
    }

    private static String unknown(String kind, String id, java.util.Collection<String> known) {
        String wanted = id == null ? "" : id.strip();
        List<String> close = closeIds(wanted, known);
        String list = close.isEmpty()
                ? "known ids: " + String.join(", ", known)
                : "did you mean " + String.join(", ", close) + "?";
        return "unknown " + kind + " '" + wanted + "'; " + list;
    }

    /** Ids within a small edit distance of, or containing, the wanted id, closest first. */
    static List<String> closeIds(String wanted, java.util.Collection<String> known) {
        String w = wanted.toLowerCase(Locale.ROOT);
        TreeMap<Integer, TreeSet<String>> byDistance = new TreeMap<>();
        for (String id : known) {
            String k = id.toLowerCase(Locale.ROOT);
            int distance = editDistance(w, k);
            boolean contains = !w.isEmpty() && (k.contains(w) || w.contains(k));
            if (distance <= Math.max(2, w.length() / 4) || contains) {
                byDistance.computeIfAbsent(distance, d -> new TreeSet<>()).add(id);
            }
        }
        return byDistance.values().stream()
                .flatMap(TreeSet::stream)
                .limit(MAX_SUGGESTIONS)
                .collect(Collectors.toList());
    }

    private static int editDistance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int substitution = previous[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                current[j] = Math.min(substitution, Math.min(previous[j] + 1, current[j - 1] + 1));
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }

    /** Collects files in order; later files override earlier rows with the same id. */
    private static final class Builder {
        private final Map<String, Material> materials = new LinkedHashMap<>();
        private final Map<String, String> materialOrigins = new LinkedHashMap<>();
        private final Map<String, Map<String, PipeSize>> tables = new TreeMap<>();
        private final Map<String, Fitting> fittings = new LinkedHashMap<>();

        void add(String fileName, String label, String text) {
            if (fileName.equals(MATERIALS_FILE)) {
                addMaterials(CatalogFile.parse(label, text, MATERIAL_COLUMNS, MATERIAL_OPTIONAL_COLUMNS));
            } else if (fileName.equals(FITTINGS_FILE)) {
                addFittings(CatalogFile.parse(label, text, FITTING_COLUMNS, FITTING_OPTIONAL_COLUMNS));
            } else {
                String table = fileName.substring(SIZES_PREFIX.length(), fileName.length() - CSV_SUFFIX.length());
                if (!table.matches("[A-Za-z0-9][A-Za-z0-9._-]*")) {
                    throw new InputException(
                            label,
                            "a size table file is named sizes-<table>.csv with a table id of letters, digits,"
                                    + " '.', '-' or '_'; got '" + fileName + "'");
                }
                addSizes(table, CatalogFile.parse(label, text, SIZE_COLUMNS, SIZE_OPTIONAL_COLUMNS));
            }
        }

        private void addMaterials(CatalogFile file) {
            Map<String, Integer> seen = new LinkedHashMap<>();
            for (CatalogFile.Row row : file.rows()) {
                String id = file.text(row, "id");
                requireUnique(file, row, id, seen);
                double typical = file.nonNegative(row, "roughness_mm") * METRES_PER_MILLIMETRE;
                double low = file.nonNegative(row, "roughness_low_mm") * METRES_PER_MILLIMETRE;
                double high = file.nonNegative(row, "roughness_high_mm") * METRES_PER_MILLIMETRE;
                if (low > typical) {
                    throw file.error(
                            row,
                            "roughness_low_mm",
                            "low roughness " + row.cells().get("roughness_low_mm")
                                    + " mm exceeds the typical roughness "
                                    + row.cells().get("roughness_mm")
                                    + " mm; need low ≤ typical ≤ high");
                }
                if (typical > high) {
                    throw file.error(
                            row,
                            "roughness_high_mm",
                            "high roughness " + row.cells().get("roughness_high_mm")
                                    + " mm is below the typical roughness "
                                    + row.cells().get("roughness_mm")
                                    + " mm; need low ≤ typical ≤ high");
                }
                String condition = file.text(row, "condition");
                if (!CONDITIONS.contains(condition)) {
                    throw file.error(
                            row,
                            "condition",
                            "unknown condition '" + condition + "'; expected one of " + String.join(", ", CONDITIONS));
                }
                Material material = new Material(
                        id,
                        file.text(row, "name"),
                        typical,
                        low,
                        high,
                        condition,
                        file.optionalText(row, "size_table"),
                        file.text(row, "source"),
                        hazenWilliams(file, row));
                materials.remove(id);
                materials.put(id, material);
                materialOrigins.put(id, file.where(row, "size_table"));
            }
        }

        private static java.util.Optional<HazenWilliamsCoefficient> hazenWilliams(
                CatalogFile file, CatalogFile.Row row) {
            if (file.isBlank(row, "hw_c")) {
                return java.util.Optional.empty();
            }
            double c = file.positive(row, "hw_c");
            if (c < HazenWilliamsCoefficient.MIN || c > HazenWilliamsCoefficient.MAX) {
                throw file.error(
                        row,
                        "hw_c",
                        "Hazen–Williams C " + row.cells().get("hw_c") + " is outside " + HazenWilliamsCoefficient.MIN
                                + "–" + HazenWilliamsCoefficient.MAX + "; published values lie within it");
            }
            String source = file.optionalText(row, "hw_c_source");
            return java.util.Optional.of(
                    new HazenWilliamsCoefficient(c, source.isEmpty() ? file.text(row, "source") : source));
        }

        private void addSizes(String table, CatalogFile file) {
            Map<String, Integer> seen = new LinkedHashMap<>();
            Map<String, Double> outsideByNominal = new LinkedHashMap<>();
            Map<String, Integer> outsideLine = new LinkedHashMap<>();
            Map<String, PipeSize> rows = tables.computeIfAbsent(table, t -> new LinkedHashMap<>());
            for (CatalogFile.Row row : file.rows()) {
                String nominal = normaliseNominal(file.text(row, "nominal"));
                String schedule = file.text(row, "schedule");
                String key = nominal + " / " + schedule.toUpperCase(Locale.ROOT);
                requireUnique(file, row, key, seen);
                double outside = file.positive(row, "od_mm");
                double wall = file.positive(row, "wall_mm");
                if (wall >= outside / 2.0) {
                    throw file.error(
                            row,
                            "wall_mm",
                            "wall " + row.cells().get("wall_mm") + " mm must be less than half the outside diameter "
                                    + row.cells().get("od_mm") + " mm");
                }
                Double earlier = outsideByNominal.putIfAbsent(nominal, outside);
                outsideLine.putIfAbsent(nominal, row.line());
                if (earlier != null && earlier != outside) {
                    throw file.error(
                            row,
                            "od_mm",
                            "outside diameter " + row.cells().get("od_mm") + " mm for nominal " + nominal
                                    + " differs from " + earlier + " mm on line " + outsideLine.get(nominal)
                                    + "; one nominal size has one outside diameter in a table");
                }
                double lining = file.isBlank(row, "lining_mm") ? 0.0 : file.nonNegative(row, "lining_mm");
                double inner = outside - 2.0 * wall - 2.0 * lining;
                if (!(inner > 0)) {
                    throw file.error(
                            row,
                            "lining_mm",
                            "wall " + row.cells().get("wall_mm") + " mm and lining "
                                    + row.cells().get("lining_mm")
                                    + " mm leave no bore inside the outside diameter "
                                    + row.cells().get("od_mm")
                                    + " mm");
                }
                rows.put(
                        key,
                        new PipeSize(
                                table,
                                nominal,
                                schedule,
                                outside * METRES_PER_MILLIMETRE,
                                wall * METRES_PER_MILLIMETRE,
                                inner * METRES_PER_MILLIMETRE,
                                file.source(),
                                lining * METRES_PER_MILLIMETRE));
            }
        }

        private void addFittings(CatalogFile file) {
            Map<String, Integer> seen = new LinkedHashMap<>();
            for (CatalogFile.Row row : file.rows()) {
                String id = file.text(row, "id");
                requireUnique(file, row, id, seen);
                String method = file.text(row, "method");
                String description = file.text(row, "description");
                String source = file.text(row, "source");
                for (String flowCoefficient : List.of("kv", "cv")) {
                    if (row.cells().containsKey(flowCoefficient) && !file.isBlank(row, flowCoefficient)) {
                        file.positive(row, flowCoefficient);
                    }
                }
                Fitting fitting;
                switch (method) {
                    case "fixed":
                        requireUnused(file, row, method, "k1", "k_inf", "k_d");
                        fitting = new Weisbach1845FixedK(
                                id, description, file.nonNegativeAtMost(row, "k", MAX_COEFFICIENT), source);
                        break;
                    case "2-k":
                        requireUnused(file, row, method, "k", "k_d");
                        fitting = new Hooper1981TwoK(
                                id,
                                description,
                                file.nonNegativeAtMost(row, "k1", MAX_COEFFICIENT),
                                file.nonNegativeAtMost(row, "k_inf", MAX_COEFFICIENT),
                                source);
                        break;
                    case "3-k":
                        requireUnused(file, row, method, "k");
                        fitting = new Darby2001ThreeK(
                                id,
                                description,
                                file.nonNegativeAtMost(row, "k1", MAX_COEFFICIENT),
                                file.nonNegativeAtMost(row, "k_inf", MAX_COEFFICIENT),
                                file.nonNegativeAtMost(row, "k_d", MAX_COEFFICIENT),
                                source);
                        break;
                    default:
                        throw file.error(
                                row,
                                "method",
                                "unknown method '" + method + "'; expected one of " + String.join(", ", METHODS));
                }
                fittings.remove(id);
                fittings.put(id, fitting);
            }
        }

        private static void requireUnused(CatalogFile file, CatalogFile.Row row, String method, String... columns) {
            for (String column : columns) {
                if (!file.isBlank(row, column)) {
                    throw file.error(
                            row,
                            column,
                            "method " + method + " does not use " + column + "; leave it empty (got '"
                                    + row.cells().get(column) + "')");
                }
            }
        }

        private static void requireUnique(CatalogFile file, CatalogFile.Row row, String id, Map<String, Integer> seen) {
            Integer first = seen.putIfAbsent(id, row.line());
            if (first != null) {
                throw new InputException(file.where(row), "duplicate id '" + id + "', first given on line " + first);
            }
        }

        Catalog build() {
            for (Material material : materials.values()) {
                String table = material.sizeTable();
                if (!table.isEmpty() && !tables.containsKey(table)) {
                    throw new InputException(
                            materialOrigins.get(material.id()),
                            "material " + material.id() + " names size table '" + table + "', which is not loaded;"
                                    + " tables: " + String.join(", ", tables.keySet()));
                }
            }
            Map<String, List<PipeSize>> frozen = new TreeMap<>();
            tables.forEach((id, rows) -> frozen.put(id, List.copyOf(rows.values())));
            return new Catalog(
                    Collections.unmodifiableMap(new LinkedHashMap<>(materials)),
                    Collections.unmodifiableMap(frozen),
                    Collections.unmodifiableMap(new LinkedHashMap<>(fittings)));
        }
    }
}
