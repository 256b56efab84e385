package org.headway.app;

import java.nio.file.Path;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
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
                SheetCharts.friction(sheet));
    }
}
