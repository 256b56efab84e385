package org.headway.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.pipe.Material;
import org.headway.pipe.PipeSize;
import org.headway.project.Project;
import org.headway.project.ProjectResolver;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;

/**
 * The pipe-run editor's edits as functions of the project record, without toolkit state: a
 * segment field changed as typed, the pump kept on the pipe it feeds when segments are removed or
 * moved, the pump curve read from its one-line form, the project copied with new parts. {@link
 * ProjectEditor} holds the record, the undo history and the messages and calls these; catalog
 * lookups go through {@link ProjectResolver}, so the editor reads a pipe as a run is built from it.
 */
final class RunEdits {

    private RunEdits() {}

    /**
     * A segment with one field changed as typed, checked.
     *
     * @param typed as typed or chosen; for {@link SegmentField#MATERIAL} a material id, or empty for
     *     an explicit bore and roughness
     * @param u the units a bare number is read in and values are written back in
     * @throws InputException naming the field when the text cannot be taken
     */
    static Project.SegmentSpec edited(
            Project.SegmentSpec s, SegmentField field, String typed, Catalog catalog, UnitSystem u) {
        String t = typed.strip();
        switch (field) {
            case NAME -> {
                if (t.isEmpty()) {
                    throw new InputException("name", "a segment needs a name");
                }
                return segment(
                        s,
                        t,
                        s.length(),
                        s.pipe(),
                        s.innerDiameter(),
                        s.roughness(),
                        s.fittings(),
                        s.elevationChange());
            }
            case LENGTH -> {
                String v = QuantityText.accept(t, QuantityKind.LENGTH, u, "length", QuantityText.Sign.NON_NEGATIVE);
                return segment(
                        s, s.name(), v, s.pipe(), s.innerDiameter(), s.roughness(), s.fittings(), s.elevationChange());
            }
            case ELEVATION -> {
                String v = t.isEmpty()
                        ? ""
                        : QuantityText.accept(t, QuantityKind.LENGTH, u, "elevation change", QuantityText.Sign.ANY);
                return segment(s, s.name(), s.length(), s.pipe(), s.innerDiameter(), s.roughness(), s.fittings(), v);
            }
            case BORE -> {
                if (t.isEmpty() && s.pipe().isEmpty()) {
                    throw new InputException("inner diameter", "required when no catalog pipe is chosen");
                }
                String v = t.isEmpty()
                        ? ""
                        : QuantityText.accept(
                                t, QuantityKind.DIAMETER, u, "inner diameter", QuantityText.Sign.POSITIVE);
                return segment(s, s.name(), s.length(), s.pipe(), v, s.roughness(), s.fittings(), s.elevationChange());
            }
            case ROUGHNESS -> {
                if (t.isEmpty() && s.pipe().isEmpty()) {
                    throw new InputException("roughness", "required when no catalog pipe is chosen");
                }
                String v = t.isEmpty()
                        ? ""
                        : QuantityText.accept(
                                t, QuantityKind.ROUGHNESS, u, "roughness", QuantityText.Sign.NON_NEGATIVE);
                return segment(
                        s, s.name(), s.length(), s.pipe(), s.innerDiameter(), v, s.fittings(), s.elevationChange());
            }
            case FITTINGS -> {
                List<Project.FittingSpec> fittings = FittingsText.parse(t, catalog);
                return segment(
                        s,
                        s.name(),
                        s.length(),
                        s.pipe(),
                        s.innerDiameter(),
                        s.roughness(),
                        fittings,
                        s.elevationChange());
            }
            case MATERIAL -> {
                return withMaterial(s, t, catalog, u);
            }
            case SIZE, SCHEDULE -> {
                if (s.pipe().isEmpty()) {
                    throw new InputException(
                            field == SegmentField.SIZE ? "size" : "schedule", "choose a catalog material first");
                }
                Project.PipeSpec pipe = s.pipe().get();
                Material material = ProjectResolver.catalogMaterial(catalog, pipe);
                Project.PipeSpec next;
                if (field == SegmentField.SIZE) {
                    next = new Project.PipeSpec(pipe.material(), t, pipe.schedule());
                    try {
                        ProjectResolver.catalogSize(catalog, material, next);
                    } catch (InputException e) {
                        throw new InputException("size", e.problem());
                    }
                } else {
                    // A new schedule keeps the nominal size where the table has it, else the nearest bore.
                    next = new Project.PipeSpec(pipe.material(), pipe.size(), t);
                    try {
                        ProjectResolver.catalogSize(catalog, material, next);
                    } catch (InputException e) {
                        PipeSize nearest = ProjectResolver.nearestSize(catalog, material, t, boreOf(s, catalog));
                        next = new Project.PipeSpec(pipe.material(), nearest.nominal(), nearest.schedule());
                    }
                }
                return segment(
                        s,
                        s.name(),
                        s.length(),
                        Optional.of(next),
                        s.innerDiameter(),
                        s.roughness(),
                        s.fittings(),
                        s.elevationChange());
            }
            default -> throw new IllegalStateException("unhandled field " + field);
        }
    }

    private static Project.SegmentSpec withMaterial(Project.SegmentSpec s, String id, Catalog catalog, UnitSystem u) {
        double bore = boreOf(s, catalog);
        if (id.isEmpty()) {
            if (s.pipe().isEmpty()) {
                return s;
            }
            // Explicit bore and roughness start from the catalog pipe's values, written in the shown unit.
            Material material =
                    ProjectResolver.catalogMaterial(catalog, s.pipe().get());
            String d = s.innerDiameter().isEmpty() ? text(bore, QuantityKind.DIAMETER, u) : s.innerDiameter();
            String e = s.roughness().isEmpty() ? text(material.roughness(), QuantityKind.ROUGHNESS, u) : s.roughness();
            return segment(s, s.name(), s.length(), Optional.empty(), d, e, s.fittings(), s.elevationChange());
        }
        Material material;
        try {
            material = catalog.material(id);
        } catch (InputException e) {
            throw new InputException("material", e.problem());
        }
        String schedule = s.pipe().map(Project.PipeSpec::schedule).orElse("");
        String size = s.pipe().map(Project.PipeSpec::size).orElse("");
        Project.PipeSpec next = new Project.PipeSpec(id, size, schedule);
        try {
            ProjectResolver.catalogSize(catalog, material, next);
        } catch (InputException e) {
            PipeSize nearest = ProjectResolver.nearestSize(catalog, material, null, bore);
            next = new Project.PipeSpec(id, nearest.nominal(), nearest.schedule());
        }
        // Leaving an explicit bore for a catalog pipe drops the explicit values; overrides on a catalog pipe stay.
        String d = s.pipe().isEmpty() ? "" : s.innerDiameter();
        String e = s.pipe().isEmpty() ? "" : s.roughness();
        return segment(s, s.name(), s.length(), Optional.of(next), d, e, s.fittings(), s.elevationChange());
    }

    /** An SI value written in the shown units, without padding zeros. */
    static String text(double si, QuantityKind kind, UnitSystem u) {
        return compact(Quantities.formatNumber(Quantities.fromSi(si, kind, u))) + " " + Quantities.unitSymbol(kind, u);
    }

    /**
     * An input echoed back without padding zeros ("420 m", not "420.0 m"): the engineer typed it,
     * so the zeros would claim a precision they never gave.
     */
    static String compact(String number) {
        return number.replaceAll("(\\.\\d*?)0+(?=$|e)", "$1").replaceAll("\\.(?=$|e)", "");
    }

    /** Bore of a segment as it stands (m), NaN when it cannot be read. */
    static double boreOf(Project.SegmentSpec s, Catalog catalog) {
        try {
            return ProjectResolver.innerDiameter(s, catalog);
        } catch (InputException e) {
            return Double.NaN;
        }
    }

    /** Roughness of a segment as it stands (m), NaN when it cannot be read. */
    static double roughnessOf(Project.SegmentSpec s, Catalog catalog) {
        try {
            return ProjectResolver.roughness(s, catalog);
        } catch (InputException e) {
            return Double.NaN;
        }
    }

    private static Project.SegmentSpec segment(
            Project.SegmentSpec s,
            String name,
            String length,
            Optional<Project.PipeSpec> pipe,
            String bore,
            String roughness,
            List<Project.FittingSpec> fittings,
            String elevation) {
        // The edit keeps the segment's id and its format-2 fields, so results and devices stay tied to it.
        return s.withCoreOf(
                new Project.SegmentSpec(name, length, pipe, bore, roughness, fittings, s.lossCoefficient(), elevation));
    }

    /**
     * The pump after segment {@code index} is removed: it stays on the segment it feeds; when that
     * one goes, on the next one down (or the new last one). A pump after every pipe stays after every
     * pipe.
     *
     * @param remaining number of segments left
     */
    static Optional<Project.PumpSpec> pumpAfterRemoval(Optional<Project.PumpSpec> pump, int index, int remaining) {
        return pump.map(old -> {
            int at = old.position();
            if (index < at) {
                at--;
            } else if (index == at) {
                at = Math.min(at, remaining - 1);
            }
            return at == old.position() ? old : movedPump(old, at);
        });
    }

    /**
     * The pump after segment {@code index} moves to {@code target}: it moves with the segment it feeds
     * (its position counts the pipes upstream of it).
     *
     * @param count number of segments
     */
    static Optional<Project.PumpSpec> pumpAfterMove(Optional<Project.PumpSpec> pump, int index, int target, int count) {
        return pump.map(old -> {
            int fed = old.position();
            if (fed >= count) {
                return old;
            }
            int at;
            if (fed == index) {
                at = target;
            } else {
                at = fed > index ? fed - 1 : fed;
                at = at >= target ? at + 1 : at;
            }
            return at == fed ? old : movedPump(old, at);
        });
    }

    private static Project.PumpSpec movedPump(Project.PumpSpec old, int position) {
        return new Project.PumpSpec(old.id(), old.name(), position, old.points(), old.npshRequired(), old.speedRatio());
    }

    /**
     * The points of a pump curve from {@code flow: head} pairs separated by semicolons.
     *
     * @param t the text, stripped and not blank
     * @param u the units a bare number is read in
     * @throws InputException naming the point, or when fewer than three are given
     */
    static List<Project.PumpPointSpec> pumpPoints(String t, UnitSystem u) {
        List<Project.PumpPointSpec> points = new ArrayList<>();
        String[] items = t.split(";");
        for (int i = 0; i < items.length; i++) {
            String item = items[i].strip();
            String where = "pump point " + (i + 1);
            int colon = item.indexOf(':');
            if (colon < 0) {
                throw new InputException(where, "expected \"flow: head\", e.g. \"5 L/s: 56 m\", got \"" + item + "\"");
            }
            String flow = QuantityText.accept(
                    item.substring(0, colon),
                    QuantityKind.VOLUMETRIC_FLOW,
                    u,
                    where + " flow",
                    QuantityText.Sign.NON_NEGATIVE);
            String head = QuantityText.accept(
                    item.substring(colon + 1), QuantityKind.HEAD, u, where + " head", QuantityText.Sign.POSITIVE);
            points.add(new Project.PumpPointSpec(flow, head));
        }
        if (points.size() < 3) {
            throw new InputException("pump points", "a pump curve needs at least three points, got " + points.size());
        }
        return points;
    }

    /** The project with a new title, fluid, flow, friction method and segments; the rest kept. */
    static Project with(
            Project p,
            String title,
            Project.FluidSpec fluid,
            String flow,
            String friction,
            List<Project.SegmentSpec> segments) {
        return with(p, title, fluid, flow, friction, segments, p.pump());
    }

    /** As the other {@code with}, and a new pump (or none). */
    static Project with(
            Project p,
            String title,
            Project.FluidSpec fluid,
            String flow,
            String friction,
            List<Project.SegmentSpec> segments,
            Optional<Project.PumpSpec> pump) {
        return Project.of(
                        title,
                        p.titleBlock(),
                        fluid,
                        flow,
                        p.flowUncertainty(),
                        friction,
                        segments,
                        p.ends(),
                        pump,
                        p.limits(),
                        p.sizing(),
                        p.curve())
                .keepingDevicesOf(p);
    }

    /** The project with a new pump (or none); the rest kept. */
    static Project withPump(Project p, Optional<Project.PumpSpec> pump) {
        return Project.of(
                        p.title(),
                        p.titleBlock(),
                        p.fluid(),
                        p.flow(),
                        p.flowUncertainty(),
                        p.friction(),
                        p.segments(),
                        p.ends(),
                        pump,
                        p.limits(),
                        p.sizing(),
                        p.curve())
                .keepingDevicesOf(p);
    }
}
