package org.headway.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.headway.caution.Caution;
import org.headway.caution.Severity;
import org.headway.report.HeadLossSheet;
import org.headway.system.ElementProfile;
import org.headway.system.OperatingPoint;
import org.headway.system.RunResult;
import org.headway.system.RunTotals;
import org.headway.system.SegmentResult;
import org.headway.system.UncertaintyBand;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;
import org.jfree.chart.JFreeChart;

/**
 * View-model of the results: the per-segment table, the totals, the cautions and the three charts,
 * recomputed through a {@link Recalculator} whenever the project or the unit system changes.
 */
public final class ResultsModel {

    /** One row of the segment table, every value formatted with its unit. */
    public record SegmentRow(
            int number,
            String name,
            String velocity,
            String reynolds,
            String regime,
            String frictionFactor,
            String frictionLoss,
            String lossCoefficient,
            String minorLoss,
            String totalLoss) {}

    /**
     * One row of the element table: every element in run order with its loss and the gauge pressures
     * at its ends, formatted with units.
     */
    public record ElementRow(
            String id,
            String kind,
            String name,
            String headLoss,
            String inletPressure,
            String outletPressure,
            String lowestAbsolutePressure,
            String law) {}

    /** One line of the totals. */
    public record TotalRow(String label, String value) {}

    /**
     * A caution as the panel shows it.
     *
     * @param segmentIndex index of the segment it concerns, or −1 when it concerns the whole run
     * @param severity how much it matters
     * @param message plain words, naming the segment
     * @param basis where the rule comes from
     */
    public record CautionItem(int segmentIndex, Severity severity, String message, String basis) {

        /** Severity in words for the panel. */
        public String severityWords() {
            return switch (severity) {
                case NOTE -> "Note";
                case WARNING -> "Check";
                case SERIOUS -> "Serious";
            };
        }
    }

    private final ProjectEditor editor;
    private final Recalculator recalculator;
    private final String version;

    private final ObservableList<SegmentRow> rows = FXCollections.observableArrayList();
    private final ObservableList<ElementRow> elementRows = FXCollections.observableArrayList();
    private final ObservableList<TotalRow> totals = FXCollections.observableArrayList();
    private final ObservableList<CautionItem> cautions = FXCollections.observableArrayList();
    private final StringProperty problem = new SimpleStringProperty("");
    private final BooleanProperty computing = new SimpleBooleanProperty(false);
    private final ObjectProperty<Recalculation.Outcome> outcome = new SimpleObjectProperty<>();
    private final ObjectProperty<JFreeChart> gradeChart = new SimpleObjectProperty<>();
    private final ObjectProperty<JFreeChart> systemChart = new SimpleObjectProperty<>();
    private final ObjectProperty<JFreeChart> frictionChart = new SimpleObjectProperty<>();
    private final java.util.Map<String, FrictionOverlay> overlays = new java.util.LinkedHashMap<>();
    private final StringProperty projectFriction = new SimpleStringProperty();

    public ResultsModel(ProjectEditor editor, Recalculator recalculator, String version) {
        this.editor = editor;
        this.recalculator = recalculator;
        this.version = version;
        editor.projectProperty().addListener((obs, old, now) -> recalculate());
        editor.unitSystemProperty().addListener((obs, old, now) -> recalculate());
        projectFriction.set(editor.project().friction());
        editor.projectProperty().addListener((obs, old, now) -> projectFriction.set(now.friction()));
        recalculate();
    }

    /** Asks for a recalculation of the current project. */
    public void recalculate() {
        var project = editor.project();
        var units = editor.unitSystemProperty().get();
        var catalog = editor.catalog();
        var folder = editor.baseFolder();
        var extra = FrictionOverlay.combine(overlays.values());
        computing.set(true);
        recalculator.request(() -> Recalculation.compute(project, units, catalog, folder, version, extra), this::show);
    }

    /** Shows an outcome (on the view's thread). */
    void show(Recalculation.Outcome o) {
        computing.set(recalculator.busy());
        outcome.set(o);
        if (!o.ok()) {
            problem.set("Results cannot be computed until this is fixed: " + o.problem());
            // The last good results stay visible but are marked stale by the problem line.
            return;
        }
        problem.set("");
        HeadLossSheet sheet = o.sheet();
        UnitSystem u = o.units();
        RunResult result = sheet.result();
        List<SegmentRow> newRows = new ArrayList<>();
        for (int i = 0; i < result.segments().size(); i++) {
            SegmentResult s = result.segments().get(i);
            newRows.add(new SegmentRow(
                    i + 1,
                    s.name(),
                    Quantities.format(s.velocity(), QuantityKind.VELOCITY, u),
                    String.format(Locale.ROOT, "%,.0f", s.reynolds()),
                    s.regime().name().toLowerCase(Locale.ROOT),
                    String.format(Locale.ROOT, "%.4f", s.frictionFactor()),
                    Quantities.format(s.majorHeadLoss(), QuantityKind.HEAD, u),
                    String.format(Locale.ROOT, "%.2f", s.totalLossCoefficient()),
                    Quantities.format(s.minorHeadLoss(), QuantityKind.HEAD, u),
                    Quantities.format(s.headLoss(), QuantityKind.HEAD, u)));
        }
        rows.setAll(newRows);
        elementRows.setAll(elementRows(sheet, u));
        totals.setAll(totalRows(sheet, u));
        cautions.setAll(cautionItems(sheet, u));
        gradeChart.set(o.grades());
        systemChart.set(o.system());
        frictionChart.set(o.friction());
    }

    static List<ElementRow> elementRows(HeadLossSheet sheet, UnitSystem u) {
        double air = sheet.run().site().pressure();
        List<ElementRow> list = new ArrayList<>();
        for (ElementProfile e : sheet.result().elements()) {
            double scale = Math.abs(e.inletPressure()) + Math.abs(e.outletPressure());
            list.add(new ElementRow(
                    e.id(),
                    e.kind(),
                    e.name(),
                    Quantities.format(e.result().headLoss(), QuantityKind.HEAD, u),
                    Quantities.format(Quantities.withoutNoise(e.inletPressure(), scale), QuantityKind.PRESSURE, u),
                    Quantities.format(Quantities.withoutNoise(e.outletPressure(), scale), QuantityKind.PRESSURE, u),
                    Quantities.format(e.lowestPressure() + air, QuantityKind.PRESSURE, u),
                    Quantities.inSystem(e.result().law(), u)));
        }
        return list;
    }

    static List<TotalRow> totalRows(HeadLossSheet sheet, UnitSystem u) {
        RunResult r = sheet.result();
        RunTotals t = r.totals();
        List<TotalRow> list = new ArrayList<>();
        list.add(new TotalRow("Design flow", Quantities.format(r.flow(), QuantityKind.VOLUMETRIC_FLOW, u)));
        list.add(new TotalRow("Friction loss", Quantities.format(t.frictionHeadLoss(), QuantityKind.HEAD, u)));
        list.add(new TotalRow("Fittings loss", Quantities.format(t.minorHeadLoss(), QuantityKind.HEAD, u)));
        list.add(new TotalRow("Total head loss", Quantities.format(t.headLoss(), QuantityKind.HEAD, u)));
        list.add(new TotalRow(
                "Static head",
                Quantities.format(
                        Quantities.withoutNoise(t.staticHead(), sheet.run().staticHeadScale()), QuantityKind.HEAD, u)));
        double scale = Math.abs(t.staticHead()) + Math.abs(t.frictionHeadLoss()) + Math.abs(t.minorHeadLoss());
        double totalHead = Quantities.withoutNoise(t.totalHead(), scale);
        // a negative total head is not a requirement: the ends give that much beyond the losses
        list.add(
                totalHead < 0
                        ? new TotalRow("Surplus head", Quantities.format(-totalHead, QuantityKind.HEAD, u))
                        : new TotalRow("Head required", Quantities.format(totalHead, QuantityKind.HEAD, u)));
        list.add(new TotalRow("Pressure drop", Quantities.format(t.pressureDrop(), QuantityKind.PRESSURE, u)));
        list.add(new TotalRow(
                "Site air pressure",
                Quantities.format(sheet.run().site().pressure(), QuantityKind.PRESSURE, u) + " ("
                        + sheet.run().site().basis() + ")"));
        r.npshAvailable()
                .ifPresent(n -> list.add(new TotalRow("NPSH available", Quantities.format(n, QuantityKind.HEAD, u))));
        UncertaintyBand band = sheet.band();
        if (band != null) {
            list.add(new TotalRow(
                    "Head required, band",
                    Quantities.format(band.totalHead().low(), QuantityKind.HEAD, u) + " to "
                            + Quantities.format(band.totalHead().high(), QuantityKind.HEAD, u)));
        }
        OperatingPoint op = sheet.operatingPoint();
        if (op != null) {
            list.add(new TotalRow(
                    "Pump operating point",
                    op.found()
                            ? Quantities.format(op.flow(), QuantityKind.VOLUMETRIC_FLOW, u) + " at "
                                    + Quantities.format(op.head(), QuantityKind.HEAD, u)
                            : Quantities.inSystem(op.message(), u)));
        }
        return list;
    }

    static List<CautionItem> cautionItems(HeadLossSheet sheet) {
        return cautionItems(sheet, UnitSystem.SI);
    }

    /** The sheet's cautions, their SI text shown in the chosen system. */
    static List<CautionItem> cautionItems(HeadLossSheet sheet, UnitSystem u) {
        List<CautionItem> items = new ArrayList<>();
        List<SegmentResult> segments = sheet.result().segments();
        for (Caution c : sheet.cautions()) {
            int index = -1;
            for (int i = 0; i < segments.size() && index < 0; i++) {
                if (segments.get(i).cautions().contains(c)) {
                    index = i;
                }
            }
            // a caution several segments share is listed once ("a, b: …"): it points at the first of them
            int split = c.message().indexOf(": ");
            for (int i = 0; i < segments.size() && index < 0 && split > 0; i++) {
                String own = segments.get(i).name() + ": " + c.message().substring(split + 2);
                if (segments.get(i).cautions().stream()
                        .anyMatch(x -> x.code().equals(c.code()) && x.message().equals(own))) {
                    index = i;
                }
            }
            items.add(new CautionItem(index, c.severity(), Quantities.inSystem(c.message(), u), c.basis()));
        }
        // The standing caution goes last and stays reachable even when nothing else is raised.
        items.sort((a, b) -> Boolean.compare(isGeneral(a), isGeneral(b)));
        return items;
    }

    private static boolean isGeneral(CautionItem item) {
        return item.message().equals(Caution.GENERAL_REVIEW.message());
    }

    /** The cautions besides the standing one. */
    public long specificCautionCount() {
        return cautions.stream().filter(c -> !isGeneral(c)).count();
    }

    public ObservableList<SegmentRow> rows() {
        return rows;
    }

    public ObservableList<ElementRow> elementRows() {
        return elementRows;
    }

    public ObservableList<TotalRow> totals() {
        return totals;
    }

    public ObservableList<CautionItem> cautions() {
        return cautions;
    }

    public ReadOnlyStringProperty problemProperty() {
        return problem;
    }

    public BooleanProperty computingProperty() {
        return computing;
    }

    public ReadOnlyObjectProperty<JFreeChart> gradeChartProperty() {
        return gradeChart;
    }

    public ReadOnlyObjectProperty<JFreeChart> systemChartProperty() {
        return systemChart;
    }

    /** The project's friction method; changes only when the method does, not on every edit. */
    public ReadOnlyStringProperty projectFrictionProperty() {
        return projectFriction;
    }

    /**
     * Sets what one view adds to the friction chart (its points and fits) and redraws.
     *
     * @param source which view, e.g. {@code fitting} or {@code rig}
     */
    public void setFrictionOverlay(String source, FrictionOverlay overlay) {
        overlays.put(source, overlay == null ? FrictionOverlay.NONE : overlay);
        recalculate();
    }

    /** All the views' additions to the friction chart, combined. */
    public FrictionOverlay frictionOverlay() {
        return FrictionOverlay.combine(overlays.values());
    }

    public ReadOnlyObjectProperty<JFreeChart> frictionChartProperty() {
        return frictionChart;
    }

    /** The value of a total by label, or empty. */
    public String total(String label) {
        return totals.stream()
                .filter(t -> t.label().equals(label))
                .map(TotalRow::value)
                .findFirst()
                .orElse("");
    }
}
