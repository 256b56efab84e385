package org.headway.app;

import java.io.OutputStreamWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.BooleanBinding;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableMap;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.project.AtomicFiles;
import org.headway.project.LineList;
import org.headway.project.Project;
import org.headway.project.ProjectFile;
import org.headway.units.UnitSystem;

/**
 * View-model of the network workspace: the line list being edited (node rows and link rows, each
 * cell kept as typed with its unit, in the columns of the line-list CSV the command line reads),
 * undo and redo, the selection shared by the tables and the schematic, and the last solution.
 *
 * <p>Every edit is checked by the line-list reader itself ({@link LineList#parse}) on the whole
 * list: a problem in the edited cell rejects the edit (the cell keeps its value and the message
 * names the row and field, as the run editor does); a problem elsewhere (a new valve still without
 * its Kv) is accepted and shown as the list's standing problem until it is fixed.
 */
public final class NetworkEditor {

    /** Undo steps kept, as in the run editor. */
    public static final int UNDO_LIMIT = ProjectEditor.UNDO_LIMIT;

    /** Which table a row is in. */
    public enum Part {
        NODE,
        LINK
    }

    /** A row of one of the tables; row −1 is no selection. */
    public record Selection(Part part, int row) {
        static final Selection NONE = new Selection(Part.NODE, -1);
    }

    /**
     * The line list as edited. Cells are column → text (blank cells absent), columns as in the CSV
     * ({@link LineList#NODE_COLUMNS}, {@code demand_NAME}, {@link LineList#LINK_COLUMNS}).
     *
     * @param base the project the list came from (site, limits, title block kept on save)
     * @param title project title
     * @param fluid fluid id
     * @param temperature fluid temperature as typed
     * @param friction friction method id
     * @param nodes node rows in order
     * @param links link rows in order
     * @param cases demand cases of an opened project, kept unchanged (the workspace solves the
     *     network's own demands)
     */
    public record Draft(
            Project base,
            String title,
            String fluid,
            String temperature,
            String friction,
            List<Map<String, String>> nodes,
            List<Map<String, String>> links,
            List<Project.DemandCaseSpec> cases) {
        public Draft {
            nodes = nodes.stream().map(NetworkEditor::frozen).toList();
            links = links.stream().map(NetworkEditor::frozen).toList();
            cases = List.copyOf(cases);
        }

        List<Map<String, String>> rows(Part part) {
            return part == Part.NODE ? nodes : links;
        }

        Draft with(Part part, List<Map<String, String>> rows) {
            return part == Part.NODE
                    ? new Draft(base, title, fluid, temperature, friction, rows, links, cases)
                    : new Draft(base, title, fluid, temperature, friction, nodes, rows, cases);
        }

        Draft withBoth(List<Map<String, String>> n, List<Map<String, String>> l) {
            return new Draft(base, title, fluid, temperature, friction, n, l, cases);
        }
    }

    /** Columns each link kind uses besides id, name, from, to, kind and design_flow (as the line list reads them). */
    static final Map<String, List<String>> KIND_FIELDS = kindFields();

    private static Map<String, List<String>> kindFields() {
        Map<String, List<String>> m = new LinkedHashMap<>();
        for (String kind : LineList.LINK_KINDS) {
            m.put(
                    kind,
                    switch (kind) {
                        case "pipe" ->
                            List.of(
                                    "length",
                                    "diameter",
                                    "roughness",
                                    "material",
                                    "size",
                                    "schedule",
                                    "loss_coefficient",
                                    "hw_c");
                        case "pump" -> List.of("pump_curve", "speed_ratio", "npsh_required");
                        case "component" -> List.of("rated_pressure_drop", "rated_flow", "exponent");
                        case "valve" -> List.of("kv", "cv");
                        case "flow-control", "pressure-reducing", "pressure-sustaining" ->
                            List.of("setting", "kv", "cv", "loss_coefficient", "diameter");
                        default -> List.of("kv", "cv", "loss_coefficient", "diameter");
                    });
        }
        return Collections.unmodifiableMap(m);
    }

    /** Link columns every kind has. */
    static final List<String> LINK_COMMON = List.of("id", "name", "from", "to", "kind", "design_flow");

    private static final Pattern LINE_LIST_PLACE =
            Pattern.compile("^(nodes|links) line (\\d+)(?:, column ([A-Za-z0-9_]+))?$");
    private static final Pattern RESOLVER_PLACE = Pattern.compile("(nodes|links)\\[(\\d+)\\] \\(([^)]*)\\)");

    private final Catalog catalog;
    private final ObjectProperty<UnitSystem> units;
    private final ObjectProperty<Draft> draft = new SimpleObjectProperty<>();
    private final ObjectProperty<Draft> saved = new SimpleObjectProperty<>();
    private final ObjectProperty<Path> file = new SimpleObjectProperty<>();
    private final ObjectProperty<Selection> selection = new SimpleObjectProperty<>(Selection.NONE);
    private final ObjectProperty<NetworkSolution> solution = new SimpleObjectProperty<>();
    private final BooleanProperty stale = new SimpleBooleanProperty(false);
    private final StringProperty problem = new SimpleStringProperty("");
    private final ObservableMap<String, String> messages = FXCollections.observableHashMap();
    private final UndoHistory<Draft> history = new UndoHistory<>(draft, UNDO_LIMIT);
    private final BooleanBinding dirty;

    public NetworkEditor(Catalog catalog, ObjectProperty<UnitSystem> units) {
        this.catalog = catalog;
        this.units = units;
        Draft blank = blank();
        draft.set(blank);
        saved.set(blank);
        dirty = Bindings.createBooleanBinding(() -> !draft.get().equals(saved.get()), draft, saved);
        draft.addListener((o, a, b) ->
                stale.set(solution.get() != null && !solution.get().draft().equals(b)));
    }

    /** A new network: a reservoir feeding one junction through one pipe. */
    public static Draft blank() {
        List<Map<String, String>> nodes = List.of(
                cells("id", "R1", "name", "Reservoir", "fixed_head", "40 m", "x", "0 m", "y", "0 m"),
                cells("id", "N1", "elevation", "10 m", "demand", "2 L/s", "x", "200 m", "y", "0 m"));
        List<Map<String, String>> links = List.of(cells(
                "id",
                "L1",
                "from",
                "R1",
                "to",
                "N1",
                "kind",
                "pipe",
                "length",
                "200 m",
                "diameter",
                "100 mm",
                "roughness",
                "0.05 mm"));
        return new Draft(
                Project.network(
                        "New network", "water", "15 degC", "auto", new Project.NetworkSpec(List.of(), List.of())),
                "New network",
                "water",
                "15 degC",
                "auto",
                nodes,
                links,
                List.of());
    }

    static Map<String, String> cells(String... pairs) {
        Map<String, String> m = new LinkedHashMap<>();
        for (int i = 0; i < pairs.length; i += 2) {
            if (!pairs[i + 1].isEmpty()) {
                m.put(pairs[i], pairs[i + 1]);
            }
        }
        return m;
    }

    private static Map<String, String> frozen(Map<String, String> m) {
        Map<String, String> out = new LinkedHashMap<>();
        m.forEach((k, v) -> {
            if (v != null && !v.isBlank()) {
                out.put(k, v.strip());
            }
        });
        return Collections.unmodifiableMap(out);
    }

    // ---- state for the views ----

    public ReadOnlyObjectProperty<Draft> draftProperty() {
        return draft;
    }

    public Draft draft() {
        return draft.get();
    }

    public ObjectProperty<Selection> selectionProperty() {
        return selection;
    }

    public ReadOnlyObjectProperty<NetworkSolution> solutionProperty() {
        return solution;
    }

    /** Whether the list was edited after the solution shown. */
    public ReadOnlyBooleanProperty staleProperty() {
        return stale;
    }

    /** The list's standing problem (first one the reader finds), empty when it reads. */
    public StringProperty problemProperty() {
        return problem;
    }

    /** Messages of rejected edits by cell key ({@code links[2].length}). */
    public ObservableMap<String, String> messages() {
        return messages;
    }

    public ObjectProperty<UnitSystem> unitSystemProperty() {
        return units;
    }

    public ReadOnlyBooleanProperty canUndoProperty() {
        return history.canUndoProperty();
    }

    public ReadOnlyBooleanProperty canRedoProperty() {
        return history.canRedoProperty();
    }

    public BooleanBinding dirtyProperty() {
        return dirty;
    }

    public ReadOnlyObjectProperty<Path> fileProperty() {
        return file;
    }

    public Catalog catalog() {
        return catalog;
    }

    /** Folder relative paths are resolved against: the project's, else the working folder. */
    public Path baseFolder() {
        Path f = file.get();
        return f == null || f.toAbsolutePath().getParent() == null
                ? Path.of("").toAbsolutePath()
                : f.toAbsolutePath().getParent();
    }

    /** Message key of a cell. */
    public static String key(Part part, int row, String column) {
        return (part == Part.NODE ? "nodes[" : "links[") + row + "]." + column;
    }

    /** A cell's text, empty when blank. */
    public String cell(Part part, int row, String column) {
        List<Map<String, String>> rows = draft.get().rows(part);
        return row < 0 || row >= rows.size() ? "" : rows.get(row).getOrDefault(column, "");
    }

    /** The node columns of the list: the line list's, then any named demands the rows carry. */
    public List<String> nodeColumns() {
        Set<String> out = new LinkedHashSet<>(LineList.NODE_COLUMNS);
        for (Map<String, String> r : draft.get().nodes()) {
            for (String k : r.keySet()) {
                if (k.startsWith(LineList.NAMED_DEMAND_PREFIX)) {
                    out.add(k);
                }
            }
        }
        return List.copyOf(out);
    }

    /** Where a row is in words: {@code link row 3 (P3)}. */
    public String rowName(Part part, int row) {
        String id = cell(part, row, "id");
        return (part == Part.NODE ? "node row " : "link row ") + (row + 1) + (id.isEmpty() ? "" : " (" + id + ")");
    }

    // ---- edits ----

    /**
     * Puts typed text in a cell. A node id change is carried to the links that name it; a kind
     * change clears the cells the new kind does not use.
     *
     * @return whether the edit was accepted
     */
    public boolean setCell(Part part, int row, String column, String typed) {
        String text = typed == null ? "" : typed.strip();
        String key = key(part, row, column);
        Draft d = draft.get();
        List<Map<String, String>> rows = d.rows(part);
        if (row < 0 || row >= rows.size()) {
            return false;
        }
        String old = rows.get(row).getOrDefault(column, "");
        if (text.contains("\n") || text.contains("\r")) {
            return reject(key, part, row, column, "a cell holds one line", old);
        }
        if (column.equals("id")) {
            if (text.isEmpty()) {
                return reject(key, part, row, column, "every " + partWord(part) + " needs an id", old);
            }
            for (int i = 0; i < rows.size(); i++) {
                if (i != row && rows.get(i).getOrDefault("id", "").equals(text)) {
                    return reject(
                            key,
                            part,
                            row,
                            column,
                            partWord(part) + " id \"" + text + "\" is used by row " + (i + 1),
                            old);
                }
            }
        }
        Map<String, String> changed = new LinkedHashMap<>(rows.get(row));
        changed.put(column, text);
        if (part == Part.LINK && column.equals("kind")) {
            String kind = text.isEmpty() ? "pipe" : text.toLowerCase(Locale.ROOT);
            if (!KIND_FIELDS.containsKey(kind)) {
                return reject(
                        key,
                        part,
                        row,
                        column,
                        "unknown kind \"" + text + "\"; expected " + String.join(", ", LineList.LINK_KINDS),
                        old);
            }
            changed.put("kind", kind);
            changed.keySet()
                    .removeIf(k ->
                            !LINK_COMMON.contains(k) && !KIND_FIELDS.get(kind).contains(k));
        }
        List<Map<String, String>> next = new ArrayList<>(rows);
        next.set(row, changed);
        Draft candidate = d.with(part, next);
        if (part == Part.NODE && column.equals("id") && !old.isEmpty()) {
            List<Map<String, String>> links = new ArrayList<>();
            for (Map<String, String> l : d.links()) {
                Map<String, String> m = new LinkedHashMap<>(l);
                m.replaceAll((k, v) -> (k.equals("from") || k.equals("to")) && v.equals(old) ? text : v);
                links.add(m);
            }
            candidate = candidate.withBoth(next, links);
        }
        Optional<Problem> found = check(candidate);
        if (found.isPresent()
                && found.get().part() == part
                && found.get().row() == row
                && found.get().column().equals(column)) {
            return reject(key, part, row, column, found.get().problem(), old);
        }
        messages.remove(key);
        replace(candidate);
        return true;
    }

    private boolean reject(String key, Part part, int row, String column, String problem, String old) {
        messages.put(
                key,
                rowName(part, row) + ", " + column + ": " + problem + " — still using "
                        + (old.isEmpty() ? "(blank)" : old));
        return false;
    }

    private static String partWord(Part part) {
        return part == Part.NODE ? "node" : "link";
    }

    /** Changes the fluid, its temperature or the friction method (checked when solving). */
    public void setRunField(String field, String text) {
        Draft d = draft.get();
        String t = text == null ? "" : text.strip();
        replace(
                switch (field) {
                    case "title" ->
                        new Draft(
                                d.base(), t, d.fluid(), d.temperature(), d.friction(), d.nodes(), d.links(), d.cases());
                    case "fluid" ->
                        new Draft(
                                d.base(), d.title(), t, d.temperature(), d.friction(), d.nodes(), d.links(), d.cases());
                    case "temperature" ->
                        new Draft(d.base(), d.title(), d.fluid(), t, d.friction(), d.nodes(), d.links(), d.cases());
                    default ->
                        new Draft(d.base(), d.title(), d.fluid(), d.temperature(), t, d.nodes(), d.links(), d.cases());
                });
    }

    /** A title-block field (project-file key under {@code reference}) of the network project. */
    public String titleBlockField(String key) {
        return ProjectEditor.titleBlockField(draft.get().base().titleBlock(), key);
    }

    /**
     * Sets one field of the network sheet's title block, as one undo step; refused with the field
     * named (in {@link #messages()} under {@code reference.KEY}) when too long or unprintable.
     *
     * @param key one of {@link ProjectEditor#TITLE_BLOCK_KEYS}
     * @return whether the text was taken
     */
    public boolean setTitleBlockField(String key, String text) {
        Draft d = draft.get();
        Project.TitleBlock n;
        try {
            n = ProjectEditor.titleBlockWith(d.base().titleBlock(), key, text);
        } catch (InputException e) {
            messages.put("reference." + key, inWords(e));
            return false;
        }
        messages.remove("reference." + key);
        Project b = d.base();
        Project base = new Project(
                b.title(),
                n,
                b.fluid(),
                b.flow(),
                b.flowUncertainty(),
                b.friction(),
                b.elements(),
                b.ends(),
                b.limits(),
                b.sizing(),
                b.curve(),
                b.site(),
                b.pressureLimits(),
                b.inletLevel(),
                b.network());
        replace(new Draft(base, d.title(), d.fluid(), d.temperature(), d.friction(), d.nodes(), d.links(), d.cases()));
        return true;
    }

    /**
     * Adds a row after the selected one (or at the end): a node with a fresh id, or a link like the
     * selected or last link from the last node but one to the last node.
     *
     * @return the new row's index
     */
    public int add(Part part) {
        Draft d = draft.get();
        List<Map<String, String>> rows = new ArrayList<>(d.rows(part));
        Map<String, String> row;
        if (part == Part.NODE) {
            row = cells("id", freshId(rows, "N"), "elevation", "0 m", "demand", "0 L/s");
        } else {
            int like = selection.get().part() == Part.LINK && selection.get().row() >= 0
                    ? selection.get().row()
                    : rows.size() - 1;
            List<Map<String, String>> nodes = d.nodes();
            String from = nodes.size() >= 2 ? nodes.get(nodes.size() - 2).getOrDefault("id", "") : "";
            String to = nodes.isEmpty() ? "" : nodes.get(nodes.size() - 1).getOrDefault("id", "");
            row = new LinkedHashMap<>(
                    like >= 0 && like < rows.size()
                            ? rows.get(like)
                            : cells("kind", "pipe", "length", "100 m", "diameter", "100 mm", "roughness", "0.05 mm"));
            row.remove("name");
            row.remove("design_flow");
            row.put("id", freshId(rows, "L"));
            row.put("from", from);
            row.put("to", to);
        }
        int at = insertionPoint(part, rows.size());
        rows.add(at, row);
        replace(d.with(part, rows));
        selection.set(new Selection(part, at));
        return at;
    }

    /** Copies a row beside itself with a fresh id. */
    public int duplicate(Part part, int row) {
        Draft d = draft.get();
        List<Map<String, String>> rows = new ArrayList<>(d.rows(part));
        if (row < 0 || row >= rows.size()) {
            return -1;
        }
        Map<String, String> copy = new LinkedHashMap<>(rows.get(row));
        String id = copy.getOrDefault("id", part == Part.NODE ? "N" : "L");
        copy.put("id", freshId(rows, id.replaceAll("\\d+$", "")));
        rows.add(row + 1, copy);
        replace(d.with(part, rows));
        selection.set(new Selection(part, row + 1));
        return row + 1;
    }

    /** Removes a row; links that named a removed node stay, and the reader then says so. */
    public boolean remove(Part part, int row) {
        Draft d = draft.get();
        List<Map<String, String>> rows = new ArrayList<>(d.rows(part));
        if (row < 0 || row >= rows.size() || rows.size() <= 1) {
            return false;
        }
        rows.remove(row);
        messages.keySet().removeIf(k -> k.startsWith(part == Part.NODE ? "nodes[" : "links["));
        replace(d.with(part, rows));
        selection.set(new Selection(part, Math.min(row, rows.size() - 1)));
        return true;
    }

    private int insertionPoint(Part part, int size) {
        Selection s = selection.get();
        return s.part() == part && s.row() >= 0 && s.row() < size ? s.row() + 1 : size;
    }

    private static String freshId(List<Map<String, String>> rows, String prefix) {
        Set<String> used = new java.util.HashSet<>();
        rows.forEach(r -> used.add(r.getOrDefault("id", "")));
        String p = prefix.isEmpty() ? "X" : prefix;
        for (int i = rows.size() + 1; ; i++) {
            if (!used.contains(p + i)) {
                return p + i;
            }
        }
    }

    /**
     * Writes sizes chosen by a sizing study into the links' {@code size} cells, as one undoable step.
     * Only links that are in the draft, take their bore from a catalog size, and whose size differs
     * are changed; a study run on an earlier draft still applies by link id.
     *
     * @param chosen link id → the size as the study names it (e.g. {@code NPS 2-1/2 Sch 40}); the
     *     size cell gets that size's nominal in the link's own table and schedule
     * @return the ids of the links changed, in the draft's order (empty: nothing changed, no step)
     */
    public List<String> applySizes(Map<String, String> chosen) {
        Draft d = draft.get();
        List<Map<String, String>> next = new ArrayList<>(d.links());
        List<String> changed = new ArrayList<>();
        for (int i = 0; i < next.size(); i++) {
            Map<String, String> link = next.get(i);
            String size = chosen.get(link.getOrDefault("id", ""));
            String kind = link.getOrDefault("kind", "");
            boolean pipe = kind.isEmpty() || kind.equals("pipe");
            if (size == null || !pipe || link.getOrDefault("material", "").isEmpty()) {
                continue;
            }
            String nominal = nominalOf(link, size);
            if (nominal.equals(link.getOrDefault("size", ""))) {
                continue;
            }
            Map<String, String> m = new LinkedHashMap<>(link);
            m.put("size", nominal);
            next.set(i, m);
            changed.add(link.get("id"));
        }
        if (changed.isEmpty()) {
            return changed;
        }
        Draft candidate = d.with(Part.LINK, next);
        Optional<Problem> found = check(candidate);
        if (found.isPresent()) {
            throw new InputException(
                    rowName(found.get().part(), found.get().row()) + ", "
                            + found.get().column(),
                    "the chosen sizes could not be applied: " + found.get().problem());
        }
        replace(candidate);
        return changed;
    }

    /** The nominal size, in the link's material table and schedule, that sizing names by a label. */
    private String nominalOf(Map<String, String> link, String label) {
        String id = link.getOrDefault("id", "");
        try {
            org.headway.pipe.Material material = catalog.material(link.get("material"));
            org.headway.pipe.PipeSize given =
                    catalog.size(material, link.getOrDefault("size", ""), link.getOrDefault("schedule", ""));
            for (org.headway.pipe.PipeSize size : catalog.sizes(material.sizeTable(), given.schedule())) {
                if (org.headway.project.ProjectResolver.candidateLabel(size).equals(label)) {
                    return size.nominal();
                }
            }
        } catch (InputException e) {
            throw new InputException(
                    "link " + id, "the chosen size " + label + " could not be applied: " + e.getMessage());
        }
        throw new InputException(
                "link " + id,
                "the chosen size " + label + " is not in the link's size table and schedule; it was not applied");
    }

    /** Replaces the demand cases (read from a cases CSV), undoably. */
    public void setCases(List<Project.DemandCaseSpec> cases) {
        Draft d = draft.get();
        replace(new Draft(d.base(), d.title(), d.fluid(), d.temperature(), d.friction(), d.nodes(), d.links(), cases));
    }

    /** The current line list as the reader reads it (for a cases CSV to be checked against). */
    public Project.NetworkSpec readDraft() {
        return read(draft.get());
    }

    private void replace(Draft next) {
        if (history.replace(next)) {
            afterChange();
        }
    }

    public boolean undo() {
        if (!history.undo()) {
            return false;
        }
        messages.clear();
        afterChange();
        return true;
    }

    public boolean redo() {
        if (!history.redo()) {
            return false;
        }
        messages.clear();
        afterChange();
        return true;
    }

    private void afterChange() {
        problem.set(check(draft.get()).map(Problem::text).orElse(""));
        Selection s = selection.get();
        if (s.row() >= draft.get().rows(s.part()).size()) {
            selection.set(new Selection(s.part(), draft.get().rows(s.part()).size() - 1));
        }
    }

    // ---- checking and the line list ----

    /** A problem the reader found, placed in the tables (row −1: not tied to one row). */
    public record Problem(Part part, int row, String column, String problem, String text) {}

    /** The first problem the line-list reader finds in a draft, placed on its row and column. */
    Optional<Problem> check(Draft d) {
        try {
            read(d);
            return Optional.empty();
        } catch (InputException e) {
            return Optional.of(place(d, e));
        }
    }

    private Problem place(Draft d, InputException e) {
        Matcher m = LINE_LIST_PLACE.matcher(e.where());
        if (m.matches()) {
            Part part = m.group(1).equals("nodes") ? Part.NODE : Part.LINK;
            // Line 1 is the header; the writer puts one row on each line after it.
            int row = Integer.parseInt(m.group(2)) - 2;
            String column = m.group(3) == null ? "" : m.group(3);
            String id = row >= 0 && row < d.rows(part).size()
                    ? d.rows(part).get(row).getOrDefault("id", "")
                    : "";
            String where = (part == Part.NODE ? "node row " : "link row ")
                    + (row + 1)
                    + (id.isEmpty() ? "" : " (" + id + ")")
                    + (column.isEmpty() ? "" : ", " + column);
            return new Problem(part, row, column, e.problem(), where + ": " + e.problem());
        }
        return new Problem(Part.NODE, -1, "", e.problem(), inWords(e));
    }

    /** An engine message with the resolver's {@code links[3] (P4)} put as the table rows. */
    static String inWords(InputException e) {
        String text = e.where().isEmpty() ? e.problem() : e.where() + ": " + e.problem();
        Matcher m = RESOLVER_PLACE.matcher(text);
        StringBuilder out = new StringBuilder();
        while (m.find()) {
            String word = m.group(1).equals("nodes") ? "node row " : "link row ";
            m.appendReplacement(
                    out, Matcher.quoteReplacement(word + (Integer.parseInt(m.group(2)) + 1) + " (" + m.group(3) + ")"));
        }
        m.appendTail(out);
        return out.toString();
    }

    /** The draft read by the line-list reader (the command line's), with the opened project's demand cases. */
    Project.NetworkSpec read(Draft d) {
        Project.NetworkSpec spec = LineList.parse(
                "nodes",
                csv(nodeColumnsOf(d), d.nodes()),
                "links",
                csv(LineList.LINK_COLUMNS, d.links()),
                catalog,
                d.friction().equals("hazen-williams"));
        return spec.withDemandCases(d.cases());
    }

    /** The project to solve or save: the opened project with this network, title, fluid and method. */
    public Project project() {
        return project(draft.get());
    }

    Project project(Draft d) {
        Project b = d.base();
        Project.FluidSpec f = b.fluid();
        return new Project(
                d.title(),
                b.titleBlock(),
                new Project.FluidSpec(
                        d.fluid(), d.temperature(), f.pressure(), f.density(), f.viscosity(), f.vapourPressure()),
                b.flow(),
                b.flowUncertainty(),
                d.friction(),
                b.elements(),
                b.ends(),
                b.limits(),
                b.sizing(),
                b.curve(),
                b.site(),
                b.pressureLimits(),
                b.inletLevel(),
                Optional.of(read(d)));
    }

    private static List<String> nodeColumnsOf(Draft d) {
        Set<String> out = new LinkedHashSet<>(LineList.NODE_COLUMNS);
        d.nodes()
                .forEach(r -> r.keySet().stream()
                        .filter(k -> k.startsWith(LineList.NAMED_DEMAND_PREFIX))
                        .forEach(out::add));
        return List.copyOf(out);
    }

    /** CSV text of rows: a header of the column names (no units: each cell carries its own). */
    static String csv(List<String> columns, List<Map<String, String>> rows) {
        StringBuilder out = new StringBuilder();
        out.append(String.join(",", columns)).append('\n');
        for (Map<String, String> r : rows) {
            for (int c = 0; c < columns.size(); c++) {
                if (c > 0) {
                    out.append(',');
                }
                out.append(quoted(r.getOrDefault(columns.get(c), "")));
            }
            out.append('\n');
        }
        return out.toString();
    }

    private static String quoted(String v) {
        if (v.contains(",") || v.contains("\"") || v.startsWith(" ") || v.startsWith("#")) {
            return "\"" + v.replace("\"", "\"\"") + "\"";
        }
        return v;
    }

    /**
     * Writes the line list, nodes and links both or neither (atomic), in the CSV the command line's
     * {@code network --nodes --links} reads.
     */
    public void exportLineList(Path nodes, Path links) {
        Draft d = draft.get();
        String n = csv(nodeColumnsOf(d), d.nodes());
        String l = csv(LineList.LINK_COLUMNS, d.links());
        AtomicFiles.writeAll(
                List.of(
                        new AtomicFiles.Entry(nodes, out -> text(out, n)),
                        new AtomicFiles.Entry(links, out -> text(out, l))),
                true);
    }

    private static void text(java.io.OutputStream out, String s) throws java.io.IOException {
        Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
        w.write(s);
        w.flush();
    }

    /**
     * Reads a line list with the command line's reader and puts it in place of the current one (one
     * undo step). A list that does not read leaves the current one and throws with file, line and
     * column.
     */
    public void importLineList(Path nodes, Path links) {
        Draft d = draft.get();
        Project.NetworkSpec spec =
                LineList.read(nodes, links, catalog, d.friction().equals("hazen-williams"));
        Draft next = rows(spec, d.base(), d.title(), d.fluid(), d.temperature(), d.friction());
        messages.clear();
        selection.set(Selection.NONE);
        replace(next);
    }

    /**
     * Shows a network project (as {@code headway solve} reads it) as the list to edit: undo history
     * cleared, the file remembered for saving.
     */
    public void load(Project p, Path path) {
        Project.NetworkSpec spec = p.network().orElseThrow(() -> new InputException("nodes", "not a network project"));
        Draft d = rows(spec, p, p.title(), p.fluid().name(), p.fluid().temperature(), p.friction());
        messages.clear();
        file.set(path);
        saved.set(d);
        selection.set(Selection.NONE);
        solution.set(null);
        history.reset(d);
        stale.set(false);
        afterChange();
    }

    /** Starts a new network. */
    public void newNetwork() {
        messages.clear();
        file.set(null);
        Draft d = blank();
        saved.set(d);
        selection.set(Selection.NONE);
        solution.set(null);
        history.reset(d);
        stale.set(false);
        afterChange();
    }

    /** Saves the network project (atomic, as every project save). */
    public void save(Path target) {
        ProjectFile.save(project(), target);
        file.set(target.toAbsolutePath());
        saved.set(draft.get());
    }

    /** A network as typed, back into rows of line-list cells. */
    static Draft rows(
            Project.NetworkSpec spec, Project base, String title, String fluid, String temperature, String friction) {
        List<Map<String, String>> nodes = new ArrayList<>();
        for (Project.NodeSpec n : spec.nodes()) {
            Map<String, String> m = cells(
                    "id", n.id(),
                    "name", n.name(),
                    "elevation", n.elevation(),
                    "demand", n.demand(),
                    "fixed_head", n.fixedHead(),
                    "fixed_pressure", n.fixedPressure(),
                    "reference", n.reference() ? "yes" : "",
                    "x", n.x(),
                    "y", n.y());
            n.demands().forEach((k, v) -> m.put(LineList.NAMED_DEMAND_PREFIX + k, v));
            nodes.add(m);
        }
        List<Map<String, String>> links = new ArrayList<>();
        for (int i = 0; i < spec.links().size(); i++) {
            Project.LinkSpec l = spec.links().get(i);
            Map<String, String> m = cells("from", l.from(), "to", l.to(), "design_flow", l.designFlow());
            try {
                element(l.element(), m);
            } catch (InputException e) {
                throw e.at("links[" + i + "]");
            }
            Map<String, String> ordered = new LinkedHashMap<>();
            for (String c : LineList.LINK_COLUMNS) {
                if (m.containsKey(c) && !m.get(c).isEmpty()) {
                    ordered.put(c, m.get(c));
                }
            }
            links.add(ordered);
        }
        return new Draft(base, title, fluid, temperature, friction, nodes, links, spec.demandCases());
    }

    /**
     * A roughness the line-list reader wrote from the catalog ({@code 1.5E-6 m}) in millimetres,
     * exactly ({@code 0.0015 mm}); anything typed stays as typed.
     */
    static String readable(String roughness) {
        Matcher m = Pattern.compile("^([0-9.]+E-?[0-9]+) m$").matcher(roughness);
        if (!m.matches()) {
            return roughness;
        }
        return new java.math.BigDecimal(m.group(1))
                        .movePointRight(3)
                        .stripTrailingZeros()
                        .toPlainString() + " mm";
    }

    private static void element(Project.ElementSpec e, Map<String, String> m) {
        if (e instanceof Project.SegmentSpec s) {
            m.putAll(cells(
                    "id", s.id(),
                    "name", s.name().equals(s.id()) ? "" : s.name(),
                    "kind", "pipe",
                    "length", s.length(),
                    "diameter", s.innerDiameter(),
                    "roughness", readable(s.roughness()),
                    "loss_coefficient", s.lossCoefficient(),
                    "hw_c", s.hazenWilliamsC()));
            s.pipe()
                    .ifPresent(
                            p -> m.putAll(cells("material", p.material(), "size", p.size(), "schedule", p.schedule())));
            if (!s.fittings().isEmpty()) {
                throw new InputException(
                        "fittings", "a link's fittings are not a line-list column; give its loss_coefficient");
            }
        } else if (e instanceof Project.PumpSpec p) {
            List<String> points = new ArrayList<>();
            p.points().forEach(x -> points.add(x.flow() + ":" + x.head()));
            m.putAll(cells(
                    "id", p.id(),
                    "name", p.name().equals(p.id()) ? "" : p.name(),
                    "kind", "pump",
                    "pump_curve", String.join("; ", points),
                    "npsh_required", p.npshRequired(),
                    "speed_ratio", p.speedRatio()));
        } else if (e instanceof Project.DeviceSpec d) {
            String kind = d.kind().equals("isolation") ? d.value("status") : d.kind();
            if (!KIND_FIELDS.containsKey(kind)) {
                throw new InputException(
                        "kind", "a " + d.kind() + " is not a line-list kind; the network workspace cannot edit it yet");
            }
            m.putAll(cells(
                    "id", d.id(),
                    "name", d.name(),
                    "kind", kind,
                    "kv", d.value("kv"),
                    "cv", d.value("cv"),
                    "rated_pressure_drop", d.value("ratedPressureDrop"),
                    "rated_flow", d.value("ratedFlow"),
                    "exponent", d.value("exponent"),
                    "setting", d.value("setting"),
                    "loss_coefficient", d.value("lossCoefficient"),
                    "diameter", d.value("diameter")));
        } else {
            throw new InputException(
                    "kind", "this element is not a line-list kind; the network workspace cannot edit it");
        }
    }

    /** Shows a solution (from the background solve) as the current one. */
    void show(NetworkSolution s) {
        solution.set(s);
        stale.set(s != null && !s.draft().equals(draft.get()));
    }

    static UncheckedIOException unchecked(java.io.IOException e) {
        return new UncheckedIOException(e);
    }
}
