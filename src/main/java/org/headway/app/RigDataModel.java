package org.headway.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.chart.FrictionChart;
import org.headway.project.RigFile;
import org.headway.rig.EffectiveRoughness;
import org.headway.rig.RigPointResult;
import org.headway.rig.RigReport;
import org.headway.rig.RigSummary;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;

/**
 * View-model of the rig-data view: open a rig file (its description and the CSV it names), see
 * each point's Re, measured f with its expanded uncertainty, the comparison correlation's f and
 * the deviation, a summary, and the effective roughness with its 95 % interval; the points go on
 * the friction chart with their uncertainty bars. The analysis is plain work ({@link #analyse})
 * the view runs in a background task.
 */
public final class RigDataModel {

    /** Per-point rows kept for the table; the summary and the roughness cover every point. */
    public static final int KEPT_POINTS = 20_000;

    /**
     * One point as the table shows it.
     *
     * @param line line in the data file
     * @param reynolds Re
     * @param frictionFactor measured f
     * @param frictionUncertainty expanded U(f)/f in percent
     * @param reference f of the comparison correlation, or "—"
     * @param deviation f/f_ref − 1 in percent, or "—"
     * @param regime laminar, transitional or turbulent
     */
    public record PointRow(
            long line,
            String reynolds,
            String frictionFactor,
            String frictionUncertainty,
            String reference,
            String deviation,
            String regime) {}

    /**
     * One line of the summary.
     *
     * @param label what
     * @param value the figure in words
     */
    public record SummaryRow(String label, String value) {}

    private final Dialogs dialogs;
    private final ObjectProperty<RigReport> report = new SimpleObjectProperty<>();
    private final ObjectProperty<Path> file = new SimpleObjectProperty<>();
    private final ObservableList<PointRow> points = FXCollections.observableArrayList();
    private final ObservableList<SummaryRow> summary = FXCollections.observableArrayList();
    private final ObservableList<String> cautions = FXCollections.observableArrayList();
    private final SimpleStringProperty roughness = new SimpleStringProperty("");
    private final SimpleStringProperty problem = new SimpleStringProperty("");
    private final SimpleStringProperty status = new SimpleStringProperty("Open a rig file to analyse its points.");
    private final ObjectProperty<UnitSystem> units;

    public RigDataModel(Dialogs dialogs, ObjectProperty<UnitSystem> units) {
        this.dialogs = dialogs;
        this.units = units;
        units.addListener((o, a, b) -> {
            if (report.get() != null) {
                show(file.get(), report.get());
            }
        });
    }

    public ReadOnlyObjectProperty<RigReport> reportProperty() {
        return report;
    }

    public ReadOnlyObjectProperty<Path> fileProperty() {
        return file;
    }

    public ObservableList<PointRow> points() {
        return points;
    }

    public ObservableList<SummaryRow> summary() {
        return summary;
    }

    public ObservableList<String> cautions() {
        return cautions;
    }

    /** The effective roughness in words, with its interval. */
    public ReadOnlyStringProperty roughnessProperty() {
        return roughness;
    }

    public ReadOnlyStringProperty problemProperty() {
        return problem;
    }

    public ReadOnlyStringProperty statusProperty() {
        return status;
    }

    /** Asks which rig file to open. */
    public Optional<Path> chooseRigFile(Path startFolder) {
        return dialogs.chooseRigFile(startFolder);
    }

    /**
     * Loads the rig file and streams its data through the analysis; stops with a {@link
     * CancellationException} when asked to.
     */
    public static RigReport analyse(Path rigFile, BooleanSupplier cancelled) {
        RigFile rig = RigFile.load(rigFile);
        long[] seen = {0};
        // The analysis streams points through the sink; a cancel is looked for every 1,000 points.
        return rig.analyse(KEPT_POINTS, point -> {
            if (seen[0]++ % 1_000 == 0 && cancelled.getAsBoolean()) {
                throw new CancellationException("rig analysis cancelled");
            }
        });
    }

    /** Opens and analyses at once on the calling thread (tests; the view uses a task). */
    public boolean open(Path rigFile) {
        try {
            show(rigFile, analyse(rigFile, () -> false));
            return true;
        } catch (InputException e) {
            failed(e);
            return false;
        }
    }

    /** Reports an analysis that failed; the previous results stay. */
    public void failed(Throwable t) {
        problem.set(t instanceof InputException e ? plain(e) : "internal error (please report): " + t);
        status.set("Could not analyse the rig file; the previous results are kept");
    }

    public void cancelled() {
        status.set("Rig analysis cancelled; the previous results are kept");
    }

    /** Shows a report (on the view's thread). */
    public void show(Path rigFile, RigReport r) {
        UnitSystem u = units.get();
        problem.set("");
        file.set(rigFile);
        report.set(r);
        List<PointRow> rows = new ArrayList<>();
        for (RigPointResult p : r.points()) {
            rows.add(new PointRow(
                    p.line(),
                    String.format(Locale.ROOT, "%,.0f", p.reynolds()),
                    String.format(Locale.ROOT, "%.5f", p.frictionFactor()),
                    String.format(Locale.ROOT, "±%.1f %%", 100 * p.uncertainty().frictionExpandedRelative()),
                    p.referenceFrictionFactor().isPresent()
                            ? String.format(
                                    Locale.ROOT,
                                    "%.5f",
                                    p.referenceFrictionFactor().getAsDouble())
                            : "—",
                    p.deviation().isPresent()
                            ? String.format(
                                    Locale.ROOT, "%+.2f %%", 100 * p.deviation().getAsDouble())
                            : "—",
                    p.regime().name().toLowerCase(Locale.ROOT)));
        }
        points.setAll(rows);
        RigSummary s = r.summary();
        List<SummaryRow> sum = new ArrayList<>();
        sum.add(new SummaryRow(
                "Points",
                String.format(
                        Locale.ROOT,
                        "%,d (laminar %,d, transitional %,d, turbulent %,d)%s",
                        s.pointCount(),
                        s.laminarCount(),
                        s.transitionalCount(),
                        s.turbulentCount(),
                        r.allPointsKept()
                                ? ""
                                : "; the table shows the first " + r.points().size())));
        sum.add(new SummaryRow(
                "Re range", String.format(Locale.ROOT, "%,.0f to %,.0f", s.minReynolds(), s.maxReynolds())));
        sum.add(new SummaryRow("Compared with", r.description().comparison().displayName()));
        sum.add(new SummaryRow(
                "Inside its validity range",
                String.format(Locale.ROOT, "%,d points (%,d outside)", s.comparedCount(), s.outsideValidityCount())));
        if (s.meanDeviation().isPresent()) {
            sum.add(new SummaryRow(
                    "Deviation f/f_ref − 1",
                    String.format(
                            Locale.ROOT,
                            "mean %+.2f %%, rms %.2f %%, largest %+.2f %% (line %d)",
                            100 * s.meanDeviation().getAsDouble(),
                            100 * s.rmsDeviation().getAsDouble(),
                            100 * s.maxDeviation().getAsDouble(),
                            s.maxDeviationLine())));
            sum.add(new SummaryRow(
                    "Beyond their uncertainty",
                    String.format(
                            Locale.ROOT,
                            "%,d of %,d compared points",
                            s.significantDeviationCount(),
                            s.comparedCount())));
        }
        sum.add(new SummaryRow(
                "Expanded uncertainty of f",
                String.format(
                        Locale.ROOT,
                        "mean ±%.1f %%, largest ±%.1f %%%s",
                        100 * s.meanFrictionExpandedUncertainty(),
                        100 * s.maxFrictionExpandedUncertainty(),
                        s.dominantFrictionSource()
                                .map(d -> "; mostly from " + d.label())
                                .orElse(""))));
        summary.setAll(sum);
        roughness.set(roughnessText(r.roughness(), u));
        // The report repeats the roughness fit's own cautions; each is shown once.
        java.util.Set<String> notes = new java.util.LinkedHashSet<>();
        for (Caution c : r.cautions()) {
            notes.add(c.message());
        }
        for (Caution c : r.roughness().cautions()) {
            notes.add(c.message());
        }
        cautions.setAll(new ArrayList<>(notes));
        status.set("Analysed " + rigFile.getFileName() + ": " + s.pointCount() + " points");
    }

    static String roughnessText(EffectiveRoughness e, UnitSystem u) {
        QuantityKind k = QuantityKind.ROUGHNESS;
        if (e.roughness().isEmpty()) {
            return e.statement();
        }
        String value = Quantities.format(e.roughness().getAsDouble(), k, u);
        String interval = Quantities.format(e.ci95Low(), k, u) + " … " + (e.upperOpen() ? "above " : "")
                + Quantities.format(e.ci95High(), k, u);
        return "Effective roughness ε = " + value + "  (95 % CI " + interval + ", " + e.pointsUsed()
                + " turbulent points)\n" + e.statement();
    }

    /** The points with their expanded uncertainties, for the friction chart. */
    public FrictionOverlay frictionOverlay() {
        RigReport r = report.get();
        if (r == null) {
            return FrictionOverlay.NONE;
        }
        List<FrictionChart.RigPoint> pts = new ArrayList<>();
        for (RigPointResult p : r.points()) {
            pts.add(new FrictionChart.RigPoint(
                    p.reynolds(),
                    p.frictionFactor(),
                    p.uncertainty().reynoldsExpanded(),
                    p.uncertainty().frictionExpanded()));
        }
        return new FrictionOverlay(pts, List.of());
    }

    private static String plain(InputException e) {
        return e.where().isEmpty() ? e.problem() : e.where() + ": " + e.problem();
    }
}
