package org.headway.app;

import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.BiConsumer;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.BooleanBinding;
import javafx.beans.binding.StringBinding;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableMap;
import org.headway.caution.InputException;
import org.headway.fluid.Fluids;
import org.headway.friction.FrictionMethods;
import org.headway.pipe.Catalog;
import org.headway.project.Project;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;

/**
 * View-model of the pipe-run editor and the project actions. The project record is the one piece
 * of state: every accepted edit replaces it (and can be undone); a rejected edit leaves it as it
 * was and puts a message under the field's key ({@code flow}, {@code segments[1].length}) for the
 * view to show beside the field.
 */
public final class ProjectEditor {

    /** Undo steps kept; older ones are dropped. */
    public static final int UNDO_LIMIT = 200;

    private final Catalog catalog;
    private final Dialogs dialogs;
    private final RecentFiles recent;

    private final ObjectProperty<Project> project = new SimpleObjectProperty<>();
    private final ObjectProperty<Project> saved = new SimpleObjectProperty<>();
    private final ObjectProperty<Path> file = new SimpleObjectProperty<>();
    private final ObjectProperty<UnitSystem> unitSystem = new SimpleObjectProperty<>(UnitSystem.SI);
    private final ObservableMap<String, String> messages = FXCollections.observableHashMap();
    private final UndoHistory<Project> history = new UndoHistory<>(project, UNDO_LIMIT);
    private final BooleanBinding dirty;
    private final StringBinding windowTitle;
    private BiConsumer<Project, Path> writer = ProjectFile::save;
    private java.util.function.BiPredicate<Project, Path> networkOpener;
    private Project pendingNetwork;
    private Path pendingNetworkFile;

    public ProjectEditor(Catalog catalog, Dialogs dialogs, RecentFiles recent) {
        this.catalog = catalog;
        this.dialogs = dialogs;
        this.recent = recent;
        Project blank = blankProject();
        project.set(blank);
        saved.set(blank);
        dirty = Bindings.createBooleanBinding(() -> !project.get().equals(saved.get()), project, saved);
        windowTitle = Bindings.createStringBinding(
                () -> (dirty.get() ? "• " : "") + displayName() + " — Headway", project, saved, file);
    }

    /** A new project: water at 20 °C through one 10 m length of 2-inch steel pipe. */
    public static Project blankProject() {
        return Project.of(
                "New pipe run",
                Project.TitleBlock.EMPTY,
                new Project.FluidSpec("water", "20 degC", "", "", "", ""),
                "3 L/s",
                "",
                "auto",
                List.of(newSegment("Segment 1")),
                Project.EndsSpec.OPEN,
                Optional.empty(),
                Project.LimitsSpec.NONE,
                Optional.empty(),
                Optional.empty());
    }

    private static Project.SegmentSpec newSegment(String name) {
        return new Project.SegmentSpec(
                name,
                "10 m",
                Optional.of(new Project.PipeSpec("steel-commercial-new", "2", "40")),
                "",
                "",
                List.of(),
                "",
                "");
    }

    // ---- state for the view ----

    public ReadOnlyObjectProperty<Project> projectProperty() {
        return project;
    }

    public Project project() {
        return project.get();
    }

    public ReadOnlyObjectProperty<Path> fileProperty() {
        return file;
    }

    public ObjectProperty<UnitSystem> unitSystemProperty() {
        return unitSystem;
    }

    /** Messages of rejected edits by field key; empty when every field holds what was typed. */
    public ObservableMap<String, String> messages() {
        return messages;
    }

    public BooleanBinding dirtyProperty() {
        return dirty;
    }

    public StringBinding windowTitleProperty() {
        return windowTitle;
    }

    public ReadOnlyBooleanProperty canUndoProperty() {
        return history.canUndoProperty();
    }

    public ReadOnlyBooleanProperty canRedoProperty() {
        return history.canRedoProperty();
    }

    public Catalog catalog() {
        return catalog;
    }

    public RecentFiles recentFiles() {
        return recent;
    }

    /** Folder relative paths in the project are resolved against. */
    public Path baseFolder() {
        Path f = file.get();
        return f == null || f.toAbsolutePath().getParent() == null
                ? Path.of("").toAbsolutePath()
                : f.toAbsolutePath().getParent();
    }

    /** File name without extension, or the title for a project never saved. */
    public String displayName() {
        Path f = file.get();
        if (f == null) {
            String title = project.get().title();
            return title == null || title.isBlank() ? "Untitled" : title;
        }
        String name = f.getFileName().toString();
        return name.endsWith(".json") ? name.substring(0, name.length() - 5) : name;
    }

    /** A segment as the table shows it, quantities in the chosen units. */
    public record SegmentSummary(
            int number,
            String name,
            String length,
            String material,
            String size,
            String bore,
            String roughness,
            String fittings,
            String elevation) {}

    /** The segments as the table shows them. */
    public List<SegmentSummary> summaries() {
        List<SegmentSummary> list = new ArrayList<>();
        List<Project.SegmentSpec> segments = project.get().segments();
        for (int i = 0; i < segments.size(); i++) {
            Project.SegmentSpec s = segments.get(i);
            String material = s.pipe()
                    .map(x -> {
                        try {
                            return ProjectResolver.catalogMaterial(catalog, x).name();
                        } catch (InputException e) {
                            return x.material() + " (unknown)";
                        }
                    })
                    .orElse("explicit bore");
            String size = s.pipe()
                    .map(x -> x.size() + (x.schedule().isEmpty() ? "" : " / " + x.schedule()))
                    .orElse("—");
            double bore = RunEdits.boreOf(s, catalog);
            double roughness = RunEdits.roughnessOf(s, catalog);
            list.add(new SegmentSummary(
                    i + 1,
                    s.name(),
                    shown(s.length(), QuantityKind.LENGTH),
                    material,
                    size,
                    Double.isNaN(bore) ? "?" : text(bore, QuantityKind.DIAMETER),
                    Double.isNaN(roughness) ? "?" : text(roughness, QuantityKind.ROUGHNESS),
                    FittingsText.summary(s.fittings()),
                    s.elevationChange().isEmpty() ? "0" : shown(s.elevationChange(), QuantityKind.LENGTH)));
        }
        return list;
    }

    /** Typed text re-expressed in the shown units, or the text itself when it does not parse. */
    private String shown(String typed, QuantityKind kind) {
        try {
            return text(Quantities.parse(typed, kind), kind);
        } catch (InputException e) {
            return typed;
        }
    }

    private String text(double si, QuantityKind kind) {
        return RunEdits.text(si, kind, unitSystem.get());
    }

    /**
     * An input echoed back without padding zeros ("420 m", not "420.0 m"): the engineer typed it,
     * so the zeros would claim a precision they never gave.
     */
    static String compact(String number) {
        return RunEdits.compact(number);
    }

    // ---- run-level edits ----

    public boolean setTitle(String text) {
        Project p = project.get();
        return accept("title", () -> RunEdits.with(p, text.strip(), p.fluid(), p.flow(), p.friction(), p.segments()));
    }

    /** The sheet's title-block fields, by their project-file keys under {@code reference}. */
    public static final List<String> TITLE_BLOCK_KEYS =
            List.of("job", "revision", "preparedBy", "checkedBy", "date", "notes");

    /** A title-block field's text as the project holds it. */
    public String titleBlockField(String key) {
        Project.TitleBlock t = project.get().titleBlock();
        return switch (key) {
            case "job" -> t.job();
            case "revision" -> t.revision();
            case "preparedBy" -> t.preparedBy();
            case "checkedBy" -> t.checkedBy();
            case "date" -> t.date();
            case "notes" -> t.notes();
            default -> throw new IllegalArgumentException("no title-block field " + key);
        };
    }

    /**
     * Sets one field of the sheet's title block (project-file key under {@code reference}), as one
     * undo step; the sheet prints it in its reference block.
     *
     * @param key one of {@link #TITLE_BLOCK_KEYS}
     */
    public boolean setTitleBlockField(String key, String text) {
        Project p = project.get();
        Project.TitleBlock t = p.titleBlock();
        String v = text == null ? "" : text.strip();
        return accept("reference." + key, () -> {
            Project.TitleBlock n = titleBlockWith(t, key, v);
            return new Project(
                    p.title(),
                    n,
                    p.fluid(),
                    p.flow(),
                    p.flowUncertainty(),
                    p.friction(),
                    p.elements(),
                    p.ends(),
                    p.limits(),
                    p.sizing(),
                    p.curve(),
                    p.site(),
                    p.pressureLimits(),
                    p.inletLevel(),
                    p.network());
        });
    }

    /**
     * A title block with one field changed, checked as the sheet needs it (shared by the run editor
     * and the network workspace).
     *
     * @throws InputException at {@code reference.KEY}: too long, or control characters
     */
    static Project.TitleBlock titleBlockWith(Project.TitleBlock t, String key, String text) {
        String v = text == null ? "" : text.strip();
        if (v.length() > TITLE_BLOCK_LIMIT) {
            throw new InputException(
                    "reference." + key,
                    "at most " + TITLE_BLOCK_LIMIT + " characters fit the sheet's title block, got " + v.length());
        }
        if (v.chars().anyMatch(c -> c < 0x20)) {
            throw new InputException("reference." + key, "control characters cannot be printed on the sheet");
        }
        return switch (key) {
            case "job" -> new Project.TitleBlock(v, t.revision(), t.preparedBy(), t.checkedBy(), t.date(), t.notes());
            case "revision" -> new Project.TitleBlock(t.job(), v, t.preparedBy(), t.checkedBy(), t.date(), t.notes());
            case "preparedBy" -> new Project.TitleBlock(t.job(), t.revision(), v, t.checkedBy(), t.date(), t.notes());
            case "checkedBy" -> new Project.TitleBlock(t.job(), t.revision(), t.preparedBy(), v, t.date(), t.notes());
            case "date" -> new Project.TitleBlock(t.job(), t.revision(), t.preparedBy(), t.checkedBy(), v, t.notes());
            case "notes" -> new Project.TitleBlock(t.job(), t.revision(), t.preparedBy(), t.checkedBy(), t.date(), v);
            default -> throw new IllegalArgumentException("no title-block field " + key);
        };
    }

    /** A title-block field's text from a title block. */
    static String titleBlockField(Project.TitleBlock t, String key) {
        return switch (key) {
            case "job" -> t.job();
            case "revision" -> t.revision();
            case "preparedBy" -> t.preparedBy();
            case "checkedBy" -> t.checkedBy();
            case "date" -> t.date();
            case "notes" -> t.notes();
            default -> throw new IllegalArgumentException("no title-block field " + key);
        };
    }

    /** Longest title-block entry taken: a sheet line, with room (common practice, no source). */
    static final int TITLE_BLOCK_LIMIT = 200;

    /** @param text a fluid id from {@link Fluids#ids()} (or {@code seawater:35} and the like) */
    public boolean setFluid(String text) {
        Project p = project.get();
        return accept("fluid", () -> {
            String id = text == null ? "" : text.strip();
            Project.FluidSpec f = p.fluid();
            boolean ownFluid = !f.density().isEmpty() && !f.viscosity().isEmpty();
            if (!ownFluid) {
                try {
                    Fluids.byId(id);
                } catch (InputException e) {
                    throw new InputException("fluid", e.problem());
                }
            } else if (id.isEmpty()) {
                throw new InputException("fluid", "a name is required");
            }
            Project.FluidSpec next = new Project.FluidSpec(
                    id, f.temperature(), f.pressure(), f.density(), f.viscosity(), f.vapourPressure());
            return RunEdits.with(p, p.title(), next, p.flow(), p.friction(), p.segments());
        });
    }

    public boolean setTemperature(String text) {
        Project p = project.get();
        return accept("temperature", () -> {
            String t = QuantityText.accept(
                    text, QuantityKind.TEMPERATURE, unitSystem.get(), "temperature", QuantityText.Sign.POSITIVE);
            Project.FluidSpec f = p.fluid();
            Project.FluidSpec next =
                    new Project.FluidSpec(f.name(), t, f.pressure(), f.density(), f.viscosity(), f.vapourPressure());
            return RunEdits.with(p, p.title(), next, p.flow(), p.friction(), p.segments());
        });
    }

    public boolean setFlow(String text) {
        Project p = project.get();
        return accept("flow", () -> {
            String q = QuantityText.accept(
                    text, QuantityKind.VOLUMETRIC_FLOW, unitSystem.get(), "design flow", QuantityText.Sign.POSITIVE);
            return RunEdits.with(p, p.title(), p.fluid(), q, p.friction(), p.segments());
        });
    }

    /** @param id a method id from {@link FrictionMethods#ids()} */
    public boolean setFriction(String id) {
        Project p = project.get();
        return accept("friction", () -> {
            String method = id == null ? "" : id.strip();
            if (!method.startsWith("fitted:")) {
                try {
                    method = FrictionMethods.byId(method).id();
                } catch (InputException e) {
                    throw new InputException("friction method", e.problem());
                }
            }
            return RunEdits.with(p, p.title(), p.fluid(), p.flow(), method, p.segments());
        });
    }

    // ---- ends and limits ----

    /** The end conditions and design limits the editor offers, with their message keys. */
    public enum RunField {
        SOURCE_LEVEL("ends.source.level"),
        SOURCE_PRESSURE("ends.source.pressure"),
        DELIVERY_LEVEL("ends.delivery.level"),
        DELIVERY_PRESSURE("ends.delivery.pressure"),
        MAXIMUM_VELOCITY("limits.maximumVelocity"),
        MAXIMUM_FRICTION_LOSS("limits.maximumFrictionLossPer100m"),
        HEAD_BUDGET("limits.headBudget");

        private final String key;

        RunField(String key) {
            this.key = key;
        }

        /** Message key, as the JSON path in the project file. */
        public String key() {
            return key;
        }
    }

    /** The text of an end condition or limit as it stands (empty = not given). */
    public String runField(RunField field) {
        Project p = project.get();
        return switch (field) {
            case SOURCE_LEVEL -> p.ends().source().level();
            case SOURCE_PRESSURE -> p.ends().source().pressure();
            case DELIVERY_LEVEL -> p.ends().delivery().level();
            case DELIVERY_PRESSURE -> p.ends().delivery().pressure();
            case MAXIMUM_VELOCITY -> p.limits().maximumVelocity();
            case MAXIMUM_FRICTION_LOSS -> p.limits().maximumFrictionLossPer100m();
            case HEAD_BUDGET -> p.limits().headBudget();
        };
    }

    /**
     * Changes an end condition (surface level above the adjacent pipe end, gauge pressure) or a
     * design limit. Blank clears it: an open end at the pipe level, or the usual limit.
     *
     * @return whether the edit was accepted
     */
    public boolean setRunField(RunField field, String text) {
        Project p = project.get();
        String t = text == null ? "" : text.strip();
        UnitSystem u = unitSystem.get();
        return accept(field.key(), () -> {
            String v = switch (field) {
                case SOURCE_LEVEL, DELIVERY_LEVEL ->
                    t.isEmpty() ? "" : QuantityText.accept(t, QuantityKind.LENGTH, u, "level", QuantityText.Sign.ANY);
                case SOURCE_PRESSURE, DELIVERY_PRESSURE ->
                    t.isEmpty() ? "" : QuantityText.acceptPressureReading(t, u, "gauge pressure");
                case MAXIMUM_VELOCITY ->
                    t.isEmpty()
                            ? ""
                            : QuantityText.accept(
                                    t, QuantityKind.VELOCITY, u, "maximum velocity", QuantityText.Sign.POSITIVE);
                case MAXIMUM_FRICTION_LOSS -> t.isEmpty() ? "" : QuantityText.acceptGradient(t, u, "limit");
                case HEAD_BUDGET ->
                    t.isEmpty()
                            ? ""
                            : QuantityText.accept(t, QuantityKind.HEAD, u, "limit", QuantityText.Sign.POSITIVE);
            };
            Project.EndSpec src = p.ends().source();
            Project.EndSpec dst = p.ends().delivery();
            Project.LimitsSpec l = p.limits();
            switch (field) {
                case SOURCE_LEVEL -> src = new Project.EndSpec(v, src.pressure());
                case SOURCE_PRESSURE -> src = new Project.EndSpec(src.level(), v);
                case DELIVERY_LEVEL -> dst = new Project.EndSpec(v, dst.pressure());
                case DELIVERY_PRESSURE -> dst = new Project.EndSpec(dst.level(), v);
                case MAXIMUM_VELOCITY ->
                    l = new Project.LimitsSpec(
                            l.minimumVelocity(), v, l.maximumFrictionLossPer100m(), l.headBudget(), l.npshMargin());
                case MAXIMUM_FRICTION_LOSS ->
                    l = new Project.LimitsSpec(
                            l.minimumVelocity(), l.maximumVelocity(), v, l.headBudget(), l.npshMargin());
                case HEAD_BUDGET ->
                    l = new Project.LimitsSpec(
                            l.minimumVelocity(),
                            l.maximumVelocity(),
                            l.maximumFrictionLossPer100m(),
                            v,
                            l.npshMargin());
            }
            return Project.of(
                            p.title(),
                            p.titleBlock(),
                            p.fluid(),
                            p.flow(),
                            p.flowUncertainty(),
                            p.friction(),
                            p.segments(),
                            new Project.EndsSpec(src, dst),
                            p.pump(),
                            l,
                            p.sizing(),
                            p.curve())
                    .keepingDevicesOf(p);
        });
    }

    // ---- pump ----

    /** The pump curve as one line: {@code 0 L/s: 58 m; 5 L/s: 56 m; …}; empty without a pump. */
    public String pumpPointsText() {
        return project.get()
                .pump()
                .map(pump -> String.join(
                        "; ",
                        pump.points().stream()
                                .map(pt -> pt.flow() + ": " + pt.head())
                                .toList()))
                .orElse("");
    }

    /** The segment the pump feeds, counted from 1; empty without a pump. */
    public String pumpPositionText() {
        return project.get()
                .pump()
                .map(pump -> String.valueOf(pump.position() + 1))
                .orElse("");
    }

    /**
     * Sets the pump curve from text ({@code flow: head} pairs separated by semicolons); blank
     * removes the pump. A run without a pump gets one feeding its first segment.
     *
     * @return whether the edit was accepted
     */
    public boolean setPumpPoints(String text) {
        Project p = project.get();
        String t = text == null ? "" : text.strip();
        UnitSystem u = unitSystem.get();
        return accept("pump.points", () -> {
            if (t.isEmpty()) {
                return RunEdits.withPump(p, Optional.empty());
            }
            List<Project.PumpPointSpec> points = RunEdits.pumpPoints(t, u);
            Project.PumpSpec pump = p.pump()
                    .map(old -> new Project.PumpSpec(old.name(), old.position(), points, old.npshRequired()))
                    .orElse(new Project.PumpSpec("pump", 0, points, ""));
            return RunEdits.withPump(p, Optional.of(pump));
        });
    }

    /**
     * Moves the pump to feed a segment, counted from 1.
     *
     * @return whether the edit was accepted
     */
    public boolean setPumpPosition(String text) {
        Project p = project.get();
        String t = text == null ? "" : text.strip();
        return accept("pump.position", () -> {
            if (p.pump().isEmpty()) {
                throw new InputException("pump position", "give the pump curve first");
            }
            int n = p.segments().size();
            int segment;
            try {
                segment = Integer.parseInt(t);
            } catch (NumberFormatException e) {
                throw new InputException(
                        "pump position", "a segment number from 1 to " + n + " expected, got \"" + t + "\"");
            }
            if (segment < 1 || segment > n) {
                throw new InputException(
                        "pump position", "a segment number from 1 to " + n + " expected, got " + segment);
            }
            Project.PumpSpec old = p.pump().get();
            return RunEdits.withPump(
                    p, Optional.of(new Project.PumpSpec(old.name(), segment - 1, old.points(), old.npshRequired())));
        });
    }

    // ---- segment edits ----

    /**
     * Changes one field of one segment.
     *
     * @param index segment index in flow order
     * @param field which field
     * @param text as typed or chosen; for {@link SegmentField#MATERIAL} a material id, or empty
     *     for an explicit bore and roughness
     * @return whether the edit was accepted
     */
    public boolean setSegmentField(int index, SegmentField field, String text) {
        Project p = project.get();
        if (index < 0 || index >= p.segments().size()) {
            throw new IndexOutOfBoundsException(
                    "segment " + index + " of " + p.segments().size());
        }
        Project.SegmentSpec s = p.segments().get(index);
        String typed = text == null ? "" : text;
        return accept(field.key(index), () -> {
            Project.SegmentSpec next = RunEdits.edited(s, field, typed, catalog, unitSystem.get());
            List<Project.SegmentSpec> segments = new ArrayList<>(p.segments());
            segments.set(index, next);
            return RunEdits.with(p, p.title(), p.fluid(), p.flow(), p.friction(), segments);
        });
    }

    /** Appends a segment like the last one (same pipe), named after its position. */
    public void addSegment() {
        Project p = project.get();
        List<Project.SegmentSpec> segments = new ArrayList<>(p.segments());
        String name = "Segment " + (segments.size() + 1);
        Project.SegmentSpec next =
                segments.isEmpty() ? newSegment(name) : copyPipe(segments.get(segments.size() - 1), name);
        segments.add(next);
        replace(RunEdits.with(p, p.title(), p.fluid(), p.flow(), p.friction(), segments));
    }

    private static Project.SegmentSpec copyPipe(Project.SegmentSpec like, String name) {
        return new Project.SegmentSpec(
                name, "10 m", like.pipe(), like.innerDiameter(), like.roughness(), List.of(), "", "");
    }

    /** Removes a segment; the last one cannot go (a run needs at least one). */
    public boolean removeSegment(int index) {
        Project p = project.get();
        if (p.segments().size() <= 1 || index < 0 || index >= p.segments().size()) {
            return false;
        }
        List<Project.SegmentSpec> segments = new ArrayList<>(p.segments());
        segments.remove(index);
        Optional<Project.PumpSpec> pump = RunEdits.pumpAfterRemoval(p.pump(), index, segments.size());
        clearSegmentMessages();
        replace(RunEdits.with(p, p.title(), p.fluid(), p.flow(), p.friction(), segments, pump));
        return true;
    }

    /**
     * Moves a segment up (−1) or down (+1) in flow order.
     *
     * @return the segment's new index, or the old one when it cannot move
     */
    public int moveSegment(int index, int delta) {
        Project p = project.get();
        int target = index + delta;
        if (index < 0
                || index >= p.segments().size()
                || target < 0
                || target >= p.segments().size()) {
            return index;
        }
        List<Project.SegmentSpec> segments = new ArrayList<>(p.segments());
        Project.SegmentSpec s = segments.remove(index);
        segments.add(target, s);
        Optional<Project.PumpSpec> pump = RunEdits.pumpAfterMove(p.pump(), index, target, segments.size());
        clearSegmentMessages();
        replace(RunEdits.with(p, p.title(), p.fluid(), p.flow(), p.friction(), segments, pump));
        return target;
    }

    private void clearSegmentMessages() {
        messages.keySet().removeIf(k -> k.startsWith("segments["));
    }

    /** A check that either gives the next project or throws with a message. */
    @FunctionalInterface
    private interface Edit {
        Project next();
    }

    private boolean accept(String key, Edit edit) {
        Project next;
        try {
            next = edit.next();
        } catch (InputException e) {
            // The message sits beside its field, so the field's own name is left out; an item or point number stays.
            String text = e.where().contains("item") || e.where().contains("point") ? plain(e) : e.problem();
            messages.put(key, text + " — still using " + current(key));
            return false;
        }
        messages.remove(key);
        replace(next);
        return true;
    }

    /** The value a field keeps after a rejected edit, for the message. */
    private String current(String key) {
        Project p = project.get();
        String value;
        if (key.startsWith("segments[")) {
            int index = Integer.parseInt(key.substring(9, key.indexOf(']')));
            Project.SegmentSpec s = p.segments().get(index);
            String field = key.substring(key.indexOf("].") + 2);
            value = switch (field) {
                case "name" -> s.name();
                case "length" -> s.length();
                case "innerDiameter" -> s.innerDiameter().isEmpty() ? "the catalog bore" : s.innerDiameter();
                case "roughness" -> s.roughness().isEmpty() ? "the catalog roughness" : s.roughness();
                case "fittings" -> FittingsText.format(s.fittings());
                case "elevationChange" -> s.elevationChange().isEmpty() ? "0 m" : s.elevationChange();
                default ->
                    s.pipe()
                            .map(x -> x.material() + " " + x.size() + " " + x.schedule())
                            .orElse("explicit bore");
            };
        } else {
            value = switch (key) {
                case "title" -> p.title();
                case "fluid" -> p.fluid().name();
                case "temperature" -> p.fluid().temperature();
                case "flow" -> p.flow();
                case "friction" -> p.friction();
                case "pump.points" -> pumpPointsText().isEmpty() ? "no pump" : pumpPointsText();
                case "pump.position" -> pumpPositionText().isEmpty() ? "no pump" : "segment " + pumpPositionText();
                default -> {
                    String v = "";
                    for (RunField f : RunField.values()) {
                        if (f.key().equals(key)) {
                            v = runField(f).isEmpty() ? "the default" : runField(f);
                        }
                    }
                    yield v.isEmpty() ? "the previous value" : v;
                }
            };
        }
        return value.isEmpty() ? "(empty)" : value;
    }

    private static String plain(InputException e) {
        return e.where().isEmpty() ? e.problem() : e.where() + ": " + e.problem();
    }

    private void replace(Project next) {
        history.replace(next);
    }

    public boolean undo() {
        if (!history.undo()) {
            return false;
        }
        messages.clear();
        return true;
    }

    public boolean redo() {
        if (!history.redo()) {
            return false;
        }
        messages.clear();
        return true;
    }

    // ---- project actions ----

    /** Starts a new project, after asking about unsaved changes. */
    public boolean newProject() {
        if (!confirmDiscard()) {
            return false;
        }
        load(blankProject(), null);
        return true;
    }

    /** Asks for a project file and opens it. */
    public boolean open() {
        if (!confirmDiscard()) {
            return false;
        }
        Optional<Path> chosen = dialogs.chooseProjectToOpen(startFolder());
        return chosen.isPresent() && openFile(chosen.get());
    }

    /** Opens a recent project, after asking about unsaved changes. */
    public boolean openRecent(Path path) {
        return confirmDiscard() && openFile(path);
    }

    /**
     * Opens a file without asking about unsaved changes (the caller has). A file that does not load
     * leaves the current project as it was and reports the engine's message.
     */
    public boolean openFile(Path path) {
        Project loaded;
        try {
            loaded = ProjectFile.load(path);
        } catch (InputException e) {
            dialogs.showError("Could not open " + path.getFileName(), plain(e));
            return false;
        } catch (UncheckedIOException e) {
            dialogs.showError("Could not open " + path.getFileName(), e.getMessage());
            return false;
        }
        if (loaded.isNetwork()) {
            // A network project belongs to the network workspace; the run being edited stays as it is.
            if (networkOpener == null) {
                pendingNetwork = loaded;
                pendingNetworkFile = path.toAbsolutePath();
                recent.add(path);
                return true;
            }
            if (!networkOpener.test(loaded, path.toAbsolutePath())) {
                return false;
            }
            recent.add(path);
            return true;
        }
        load(loaded, path.toAbsolutePath());
        recent.add(path);
        return true;
    }

    /**
     * Where network projects go when opened (the network workspace); one opened before it was set
     * is handed over at once.
     *
     * @param opener shows the project and its file; false when it did not (the user kept other work)
     */
    void onNetworkProject(java.util.function.BiPredicate<Project, Path> opener) {
        networkOpener = opener;
        if (pendingNetwork != null) {
            Project p = pendingNetwork;
            Path f = pendingNetworkFile;
            pendingNetwork = null;
            pendingNetworkFile = null;
            opener.test(p, f);
        }
    }

    private void load(Project p, Path path) {
        messages.clear();
        file.set(path);
        saved.set(p);
        history.reset(p);
    }

    /**
     * Puts a project (an autosaved copy) in place as unsaved changes to the current file: the
     * title shows them, Save writes them, Undo goes back to the file's version.
     */
    public void restoreUnsaved(Project p) {
        if (history.replace(p)) {
            messages.clear();
        }
    }

    /**
     * Replaces the project writer (atomic {@link ProjectFile#save} by default), so that tests can
     * make a save fail part-way as a full disk would.
     */
    void useWriter(BiConsumer<Project, Path> writer) {
        this.writer = writer;
    }

    /** Saves to the current file, or asks where when there is none. */
    public boolean save() {
        if (file.get() == null) {
            return saveAs();
        }
        return write(file.get());
    }

    /** Asks where and saves there. */
    public boolean saveAs() {
        String suggested = (file.get() == null ? slug(project.get().title()) : displayName()) + ".json";
        Optional<Path> chosen = dialogs.chooseProjectSaveTarget(startFolder(), suggested);
        if (chosen.isEmpty()) {
            return false;
        }
        Path target = chosen.get();
        if (!target.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".json")) {
            target = target.resolveSibling(target.getFileName() + ".json");
        }
        return write(target);
    }

    private boolean write(Path target) {
        Project p = project.get();
        try {
            writer.accept(p, target);
        } catch (InputException e) {
            dialogs.showError("Could not save " + target.getFileName(), plain(e));
            return false;
        } catch (UncheckedIOException e) {
            dialogs.showError("Could not save " + target.getFileName(), e.getMessage());
            return false;
        }
        file.set(target.toAbsolutePath());
        saved.set(p);
        recent.add(target);
        return true;
    }

    /**
     * Asks what to do with unsaved changes, if there are any.
     *
     * @return true when the caller may go on (saved, discarded, or nothing to lose)
     */
    public boolean confirmDiscard() {
        if (!dirty.get()) {
            return true;
        }
        return switch (dialogs.askUnsavedChanges(displayName())) {
            case SAVE -> save();
            case DISCARD -> true;
            case CANCEL -> false;
        };
    }

    /** Folder to start file dialogs in: the current file's, else the most recent project's. */
    public Path startFolder() {
        if (file.get() != null) {
            return baseFolder();
        }
        return recent.entries().isEmpty() ? null : recent.entries().get(0).getParent();
    }

    static String slug(String title) {
        String s = title == null ? "" : title.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-");
        s = s.replaceAll("^-+|-+$", "");
        if (s.length() > 40) {
            s = s.substring(0, 40).replaceAll("-+$", "");
        }
        return s.isEmpty() ? "pipe-run" : s;
    }
}
