package org.headway.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.headway.caution.InputException;
import org.headway.chart.FrictionChart;
import org.headway.correlation.FittedCorrelation;
import org.headway.pipe.Catalog;
import org.headway.project.FittedCorrelationFile;
import org.headway.project.Project;
import org.headway.project.ProjectResolver;
import org.headway.project.ResolvedProject;
import org.headway.report.HeadLossSheet;
import org.headway.report.SheetCharts;
import org.headway.units.UnitSystem;
import org.jfree.chart.JFreeChart;

/**
 * One recalculation of the results: resolve the project, solve the run and build the charts.
 * Plain work with no toolkit, run off the FX thread.
 */
public final class Recalculation {

    private Recalculation() {}

    /**
     * What a recalculation gave: either a sheet with its charts, or the problem that stopped it.
     *
     * @param project the project computed
     * @param units unit system the charts are drawn in
     * @param sheet results, or null when the project does not resolve
     * @param problem the engine's message when it does not, else empty
     * @param grades grade-line chart, or null
     * @param system system-curve chart, or null
     * @param friction friction chart, or null
     */
    public record Outcome(
            Project project,
            UnitSystem units,
            HeadLossSheet sheet,
            String problem,
            JFreeChart grades,
            JFreeChart system,
            JFreeChart friction) {

        public boolean ok() {
            return sheet != null;
        }
    }

    /**
     * @param project the project as edited
     * @param units unit system for the charts
     * @param catalog catalog to resolve names in
     * @param baseFolder the project's folder
     * @param version Headway version for the sheet
     */
    public static Outcome compute(Project project, UnitSystem units, Catalog catalog, Path baseFolder, String version) {
        return compute(project, units, catalog, baseFolder, version, FrictionOverlay.NONE);
    }

    /**
     * As {@link #compute(Project, UnitSystem, Catalog, Path, String)}, with the engineer's own
     * points and fits drawn on the friction chart; a project whose friction method is a fitted
     * correlation ({@code fitted:FILE}) has that fit drawn too.
     */
    public static Outcome compute(
            Project project,
            UnitSystem units,
            Catalog catalog,
            Path baseFolder,
            String version,
            FrictionOverlay overlay) {
        HeadLossSheet sheet;
        try {
            ResolvedProject resolved = ProjectResolver.resolve(project, catalog, baseFolder);
            sheet = HeadLossSheet.of(resolved, version);
        } catch (InputException e) {
            String message = e.where().isEmpty() ? e.problem() : e.where() + ": " + e.problem();
            return new Outcome(project, units, null, message, null, null, null);
        }
        return new Outcome(
                project,
                units,
                sheet,
                "",
                SheetCharts.grades(sheet, units),
                SheetCharts.system(sheet, units),
                SheetCharts.friction(sheet, overlay.rigPoints(), fittedCurves(project, baseFolder, overlay)));
    }

    private static List<FrictionChart.FittedCurve> fittedCurves(
            Project project, Path baseFolder, FrictionOverlay overlay) {
        List<FrictionChart.FittedCurve> curves = new ArrayList<>(overlay.fitted());
        String method = project.friction() == null ? "" : project.friction().strip();
        if (method.startsWith(ProjectResolver.FITTED_PREFIX)) {
            String name =
                    method.substring(ProjectResolver.FITTED_PREFIX.length()).strip();
            try {
                FittedCorrelation fit = FittedCorrelationFile.load(baseFolder.resolve(name));
                // A fit of (Re, ε/D) has no single curve to draw.
                if (fit.variableNames().size() == 1) {
                    curves.add(FittingModel.curve("pipe run: " + Path.of(name).getFileName(), fit));
                }
            } catch (InputException e) {
                // The run resolved with this file a moment ago; if it has gone since, the chart goes without it.
            }
        }
        return curves;
    }
}
