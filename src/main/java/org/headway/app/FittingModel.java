package org.headway.app;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.BooleanSupplier;
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
import org.headway.caution.InputException;
import org.headway.chart.FrictionChart;
import org.headway.correlation.FittedCorrelation;
import org.headway.fitting.FitComparison;
import org.headway.fitting.FitForm;
import org.headway.fitting.FitResult;
import org.headway.fitting.FittedParameter;
import org.headway.fitting.LeastSquaresFitter;
import org.headway.fitting.Observations;
import org.headway.project.FittedCorrelationFile;
import org.headway.project.ProjectResolver;
import org.jfree.chart.JFreeChart;

/**
 * View-model of the fitting view: import a CSV of one's own measurements, choose the response and
 * explanatory columns, fit several forms side by side (ranked by AICc), look at the residuals of
 * the chosen one, save it as a fitted-correlation file and name it as the pipe run's friction
 * method. No toolkit types; the fits themselves run through {@link #runFits} so that the view can
 * put them in a background task and tests can call them directly.
 */
public final class FittingModel {

    /** A form offered for fitting, with whether it is ticked. */
    public static final class FormChoice {
        private final FitForm form;
        private final BooleanProperty chosen;

        FormChoice(FitForm form, boolean chosen) {
            this.form = form;
            this.chosen = new SimpleBooleanProperty(chosen);
        }

        public FitForm form() {
            return form;
        }

        public BooleanProperty chosenProperty() {
            return chosen;
        }

        /** Label for the check box: the form's equation. */
        public String label() {
            return form.description();
        }
    }

    /**
     * One fitted form as the comparison table shows it.
     *
     * @param rank 1 for the lowest AICc
     * @param form form id
     * @param model the fitted model, {@code y = …}
     * @param parameters each parameter as {@code a = value (95 % CI low … high)}, one per line
     * @param rSquared R²
     * @param adjustedRSquared adjusted R²
     * @param aicc corrected Akaike criterion
     * @param residualSd residual standard deviation
     * @param result the fit itself
     */
    public record FitRow(
            int rank,
            String form,
            String model,
            String parameters,
            String rSquared,
            String adjustedRSquared,
            String aicc,
            String residualSd,
            FitResult result) {}

    /** Reports progress of a run of fits: forms done of forms to fit, and the form being fitted. */
    public interface Progress {
        void update(int done, int total, String form);
    }

    private final ProjectEditor editor;
    private final Dialogs dialogs;
    private final LeastSquaresFitter fitter;

    private final ObjectProperty<DataTable> table = new SimpleObjectProperty<>();
    private final ObservableList<String> columnLabels = FXCollections.observableArrayList();
    private final StringProperty responseColumn = new SimpleStringProperty();
    private final StringProperty explanatoryColumn = new SimpleStringProperty();
    private final ObservableList<FormChoice> forms = FXCollections.observableArrayList();
    private final ObservableList<FitRow> fits = FXCollections.observableArrayList();
    private final ObservableList<String> skipped = FXCollections.observableArrayList();
    private final ObjectProperty<FitRow> selected = new SimpleObjectProperty<>();
    private final ObjectProperty<JFreeChart> residualChart = new SimpleObjectProperty<>();
    private final StringProperty problem = new SimpleStringProperty("");
    private final StringProperty status = new SimpleStringProperty("Import a CSV of your measurements to fit.");
    private final ObjectProperty<Path> savedFit = new SimpleObjectProperty<>();
    /** Whether the points and the chosen fit go on the friction chart (when x is Re and y is f). */
    private final BooleanProperty onFrictionChart = new SimpleBooleanProperty(true);

    private double[] fittedX;
    private FitRow savedRow;

    public FittingModel(ProjectEditor editor, Dialogs dialogs) {
        this.editor = editor;
        this.dialogs = dialogs;
        this.fitter = new LeastSquaresFitter();
        forms.setAll(
                new FormChoice(new FitForm.Power(false), true),
                new FormChoice(new FitForm.Power(true), false),
                new FormChoice(new FitForm.Linear(), true),
                new FormChoice(new FitForm.Logarithmic(), true),
                new FormChoice(new FitForm.Exponential(), true),
                new FormChoice(new FitForm.Polynomial(2), true),
                new FormChoice(new FitForm.Constant(), false));
        selected.addListener(
                (o, a, b) -> residualChart.set(b == null ? null : FittingCharts.residuals(b.result(), fittedX)));
    }

    // ---- state for the view ----

    public ReadOnlyObjectProperty<DataTable> tableProperty() {
        return table;
    }

    /** Column names with their units, for the column choosers. */
    public ObservableList<String> columnLabels() {
        return columnLabels;
    }

    /** Label of the response (y) column. */
    public StringProperty responseColumnProperty() {
        return responseColumn;
    }

    /** Label of the explanatory (x) column. */
    public StringProperty explanatoryColumnProperty() {
        return explanatoryColumn;
    }

    public ObservableList<FormChoice> forms() {
        return forms;
    }

    /** Fits of the last run, best (lowest AICc) first. */
    public ObservableList<FitRow> fits() {
        return fits;
    }

    /** Forms the last run could not fit, with the reason. */
    public ObservableList<String> skipped() {
        return skipped;
    }

    /** The fit the engineer chose (the best one after a run). */
    public BooleanProperty onFrictionChartProperty() {
        return onFrictionChart;
    }

    public ObjectProperty<FitRow> selectedProperty() {
        return selected;
    }

    /** Residuals of the chosen fit against x. */
    public ReadOnlyObjectProperty<JFreeChart> residualChartProperty() {
        return residualChart;
    }

    /** Problem of the last import, fit or save, in plain words; empty when none. */
    public ReadOnlyStringProperty problemProperty() {
        return problem;
    }

    /** What happened last, for the status line. */
    public ReadOnlyStringProperty statusProperty() {
        return status;
    }

    /** The fitted-correlation file saved last, or null. */
    public ReadOnlyObjectProperty<Path> savedFitProperty() {
        return savedFit;
    }

    // ---- actions ----

    /** Asks which CSV to import. */
    public java.util.Optional<Path> chooseImportFile() {
        return dialogs.chooseDataToImport(editor.startFolder());
    }

    /**
     * Reads a CSV and offers its columns, at once on the calling thread (the view reads in a
     * background task with {@link DataTable#read(Path, BooleanSupplier, java.util.function.IntConsumer)}
     * and then calls {@link #showTable}). A file that does not read leaves the previous data.
     */
    public boolean importCsv(Path file) {
        DataTable t;
        try {
            t = DataTable.read(file);
        } catch (InputException e) {
            importFailed(e);
            return false;
        }
        showTable(t);
        return true;
    }

    /** Reports an import that failed; the previous data stay. */
    public void importFailed(Throwable t) {
        problem.set(t instanceof InputException e ? plain(e) : "internal error (please report): " + t);
        status.set("Import failed; the previous data are kept");
    }

    /** Records a cancelled import; the previous data stay. */
    public void importCancelled() {
        status.set("Import cancelled; the previous data are kept");
    }

    /** Offers a table's columns; guesses f (or the first column) as y and Re (or the second) as x. */
    public void showTable(DataTable t) {
        Path file = t.file();
        problem.set("");
        fits.clear();
        skipped.clear();
        selected.set(null);
        table.set(t);
        List<String> labels = t.columns().stream().map(DataTable.Column::label).toList();
        columnLabels.setAll(labels);
        responseColumn.set(guess(t, List.of("f", "friction", "friction_factor", "K"), 0));
        explanatoryColumn.set(guess(t, List.of("Re", "Reynolds", "re"), labels.size() > 1 ? 1 : 0));
        status.set("Imported " + t.rows() + " rows, " + labels.size() + " columns from " + file.getFileName());
    }

    private static String guess(DataTable t, List<String> names, int fallback) {
        for (String n : names) {
            for (DataTable.Column c : t.columns()) {
                if (c.name().equalsIgnoreCase(n)) {
                    return c.label();
                }
            }
        }
        return t.columns().get(Math.min(fallback, t.columns().size() - 1)).label();
    }

    private DataTable.Column columnByLabel(String label, String role) {
        DataTable t = table.get();
        if (t == null) {
            throw new InputException("data", "import a CSV first");
        }
        for (DataTable.Column c : t.columns()) {
            if (c.label().equals(label)) {
                return c;
            }
        }
        throw new InputException(role, "choose a column");
    }

    /** The chosen columns as observations for the fitter. */
    public Observations observations() {
        DataTable.Column y = columnByLabel(responseColumn.get(), "response column (y)");
        DataTable.Column x = columnByLabel(explanatoryColumn.get(), "explanatory column (x)");
        if (x == y) {
            throw new InputException("explanatory column (x)", "choose a column other than the response " + y.name());
        }
        return Observations.of(y.name(), y.values(), List.of(x.name()), x.values());
    }

    /**
     * What a run of fits needs, captured on the view's thread.
     *
     * @param data the observations
     * @param forms the ticked forms
     */
    public record FitJob(Observations data, List<FitForm> forms) {}

    /**
     * Prepares a run of fits; reports why it cannot start (no data, no form ticked) and returns null.
     */
    public FitJob prepareFits() {
        try {
            Observations data = observations();
            List<FitForm> chosen = forms.stream()
                    .filter(f -> f.chosenProperty().get())
                    .map(FormChoice::form)
                    .toList();
            if (chosen.isEmpty()) {
                throw new InputException("forms", "tick at least one form to fit");
            }
            problem.set("");
            return new FitJob(data, chosen);
        } catch (InputException e) {
            problem.set(plain(e));
            return null;
        }
    }

    /**
     * Fits the forms one after another, as {@link LeastSquaresFitter#compare} does, but looks for a
     * cancel between forms. Plain work with no toolkit: run it off the view's thread.
     *
     * @return the ranking, or null when cancelled
     */
    public FitComparison runFits(FitJob job, Progress progress, BooleanSupplier cancelled) {
        List<FitResult> done = new ArrayList<>();
        Map<String, String> notFitted = new LinkedHashMap<>();
        int i = 0;
        for (FitForm form : job.forms()) {
            if (cancelled.getAsBoolean()) {
                return null;
            }
            progress.update(i, job.forms().size(), form.id());
            FitComparison one = fitter.compare(job.data(), List.of(form));
            done.addAll(one.ranked());
            notFitted.putAll(one.skipped());
            i++;
        }
        progress.update(i, job.forms().size(), "");
        done.sort(Comparator.comparingDouble(FitResult::informationCriterion));
        return new FitComparison(done, notFitted);
    }

    /** Shows the outcome of a run (on the view's thread); the best fit is chosen. */
    public void showFits(FitJob job, FitComparison comparison) {
        fittedX = job.data().column(0);
        selected.set(null);
        List<FitRow> rows = new ArrayList<>();
        int rank = 1;
        for (FitResult f : comparison.ranked()) {
            rows.add(row(rank++, f));
        }
        fits.setAll(rows);
        List<String> why = new ArrayList<>();
        comparison.skipped().forEach((form, reason) -> why.add(form + ": " + reason));
        skipped.setAll(why);
        selected.set(rows.isEmpty() ? null : rows.get(0));
        if (rows.isEmpty()) {
            problem.set("No form could be fitted to these data. " + String.join("; ", why));
            status.set("Nothing fitted");
        } else {
            problem.set("");
            status.set("Fitted " + rows.size() + " form" + (rows.size() == 1 ? "" : "s") + " to "
                    + comparison.ranked().get(0).pointCount() + " points; best by AICc: "
                    + rows.get(0).form());
        }
    }

    /** Records that a run was cancelled; the previous fits stay. */
    public void fitsCancelled() {
        status.set("Fitting cancelled; the previous fits are kept");
    }

    /** Reports a run that failed unexpectedly. */
    public void fitsFailed(Throwable t) {
        problem.set(t instanceof InputException e ? plain(e) : "internal error (please report): " + t);
        status.set("Fitting failed");
    }

    static FitRow row(int rank, FitResult f) {
        StringBuilder params = new StringBuilder();
        for (FittedParameter p : f.parameters()) {
            if (params.length() > 0) {
                params.append('\n');
            }
            params.append(String.format(
                    Locale.ROOT, "%s = %.6g   (%.5g … %.5g)", p.name(), p.value(), p.ci95Low(), p.ci95High()));
        }
        return new FitRow(
                rank,
                f.formId(),
                f.responseName() + " = " + f.modelExpression(),
                params.toString(),
                String.format(Locale.ROOT, "%.5f", f.rSquared()),
                String.format(Locale.ROOT, "%.5f", f.adjustedRSquared()),
                String.format(Locale.ROOT, "%.2f", f.informationCriterion()),
                String.format(Locale.ROOT, "%.4g", f.residualStandardDeviation()),
                f);
    }

    /** Cautions of the chosen fit, in plain words. */
    public List<String> selectedCautions() {
        FitRow r = selected.get();
        if (r == null) {
            return List.of();
        }
        return r.result().cautions().stream().map(Caution::message).toList();
    }

    /** Asks where and saves the chosen fit. */
    public boolean chooseAndSave() {
        FitRow r = selected.get();
        if (r == null) {
            problem.set("Fit the data and choose a fit before saving");
            return false;
        }
        String name = ProjectEditor.slug(r.result().responseName() + "-" + r.form()) + "-fit.json";
        return dialogs.chooseExportTarget(editor.startFolder(), name, "fitted correlation")
                .map(this::saveSelected)
                .orElse(false);
    }

    /**
     * Saves the chosen fit as a fitted-correlation file (atomic); a failed save leaves any previous
     * file as it was and says why.
     */
    public boolean saveSelected(Path target) {
        FitRow r = selected.get();
        if (r == null) {
            problem.set("Fit the data and choose a fit before saving");
            return false;
        }
        try {
            FittedCorrelationFile.save(target, FittedCorrelation.of(r.result()));
        } catch (UncheckedIOException e) {
            dialogs.showError("Could not save " + target.getFileName(), String.valueOf(e.getMessage()));
            return false;
        } catch (java.nio.file.NoSuchFileException e) {
            dialogs.showError(
                    "Could not save " + target.getFileName(),
                    "could not write " + target + ": the folder "
                            + target.toAbsolutePath().getParent() + " does not exist");
            return false;
        } catch (IOException e) {
            dialogs.showError(
                    "Could not save " + target.getFileName(), "could not write " + target + ": " + e.getMessage());
            return false;
        } catch (InputException e) {
            dialogs.showError("Could not save " + target.getFileName(), plain(e));
            return false;
        }
        savedRow = r;
        savedFit.set(target.toAbsolutePath());
        status.set("Saved the " + r.form() + " fit to " + target.toAbsolutePath());
        return true;
    }

    /**
     * Names the saved fit as the pipe run's friction method, {@code fitted:PATH} with the path
     * relative to the project's folder (absolute while the project has never been saved).
     */
    public boolean useInPipeRun() {
        Path saved = savedFit.get();
        if (saved == null) {
            problem.set("Save the fit first; the project names the file");
            return false;
        }
        String path = fittedReference(editor.fileProperty().get() == null ? null : editor.baseFolder(), saved);
        boolean ok = editor.setFriction(ProjectResolver.FITTED_PREFIX + path);
        if (ok) {
            status.set("The pipe run now uses " + ProjectResolver.FITTED_PREFIX + path);
        } else {
            problem.set(editor.messages().getOrDefault("friction", "the project did not accept the fit"));
        }
        return ok;
    }

    static String fittedReference(Path projectFolder, Path fitFile) {
        Path abs = fitFile.toAbsolutePath().normalize();
        if (projectFolder == null) {
            return abs.toString();
        }
        Path rel = projectFolder.toAbsolutePath().normalize().relativize(abs);
        // Forward slashes so the project file reads the same on every system.
        return rel.toString().replace('\\', '/');
    }

    /**
     * The data and chosen fit to draw on the friction chart, when x is a Reynolds number and y a
     * friction factor (column names Re and f); empty otherwise.
     */
    public FrictionOverlay frictionOverlay() {
        DataTable t = table.get();
        if (t == null) {
            return FrictionOverlay.NONE;
        }
        DataTable.Column y, x;
        try {
            y = columnByLabel(responseColumn.get(), "y");
            x = columnByLabel(explanatoryColumn.get(), "x");
        } catch (InputException e) {
            return FrictionOverlay.NONE;
        }
        if (!looksLikeReynolds(x.name()) || !looksLikeFriction(y.name())) {
            return FrictionOverlay.NONE;
        }
        List<FrictionChart.RigPoint> points = new ArrayList<>();
        for (int i = 0; i < t.rows(); i++) {
            if (x.values()[i] > 0 && y.values()[i] > 0) {
                points.add(new FrictionChart.RigPoint(x.values()[i], y.values()[i], 0, 0));
            }
        }
        List<FrictionChart.FittedCurve> curves = new ArrayList<>();
        FitRow r = selected.get();
        // The fit the run already uses is drawn by the run; a second copy would only double the legend.
        if (r != null && !(r == savedRow && usedByRun())) {
            curves.add(curve("fit: " + r.form() + " (not saved)", FittedCorrelation.of(r.result())));
        }
        return new FrictionOverlay(points, curves);
    }

    private boolean usedByRun() {
        Path saved = savedFit.get();
        String method = editor.project().friction() == null
                ? ""
                : editor.project().friction().strip();
        if (saved == null || !method.startsWith(ProjectResolver.FITTED_PREFIX)) {
            return false;
        }
        Path named = editor.baseFolder()
                .resolve(
                        method.substring(ProjectResolver.FITTED_PREFIX.length()).strip())
                .toAbsolutePath()
                .normalize();
        return named.equals(saved.normalize());
    }

    static boolean looksLikeReynolds(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        return n.equals("re") || n.startsWith("reynolds");
    }

    static boolean looksLikeFriction(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        return n.equals("f") || n.startsWith("friction") || n.equals("f_darcy") || n.equals("lambda");
    }

    /** A one-input fitted correlation as a chart curve over Re, solid over its fitted range. */
    static FrictionChart.FittedCurve curve(String name, FittedCorrelation fit) {
        var range = fit.variableRanges().get(0);
        return new FrictionChart.FittedCurve(
                name,
                re -> {
                    try {
                        return fit.variableNames().size() == 1 ? fit.evaluate(re) : Double.NaN;
                    } catch (InputException e) {
                        return Double.NaN;
                    }
                },
                range.min(),
                range.max());
    }

    private static String plain(InputException e) {
        return e.where().isEmpty() ? e.problem() : e.where() + ": " + e.problem();
    }
}
