package org.headway.app;

import java.nio.file.Path;
import java.util.List;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.collections.ObservableList;

/**
 * What the rig-data view will bind to once the correlation engine (org.headway.correlation) is in
 * the tree: import a CSV with a column and unit mapping, see each point's Re, f and deviation,
 * fit forms side by side, and save a fitted correlation for the pipe run. Not implemented yet and
 * not shown in the window: no view uses it, so nothing pretends to fit.
 */
public interface RigFittingModel {

    /** How one CSV column maps to a rig quantity, with the unit its numbers are in. */
    record ColumnMapping(String column, String quantity, String unit) {}

    /** One imported point with values as shown: Re, f, and deviation from the chosen curve (%). */
    record PointRow(int line, String reynolds, String frictionFactor, String deviation) {}

    /** One fitted form: its name, parameters with confidence intervals, R² and residual sum. */
    record FitRow(String form, List<String> parameters, String rSquared, String residualSum) {}

    /** Reads a CSV with the given mapping (long imports run in a background task). */
    void importCsv(Path file, List<ColumnMapping> mapping);

    ObservableList<PointRow> points();

    /** Fits the chosen forms to the imported points. */
    void fit(List<String> formIds);

    ObservableList<FitRow> fits();

    /** Saves a fit as a correlation file the project can name as {@code fitted:PATH}. */
    void saveFit(String form, Path target);

    /** Problem of the last import or fit, in plain words; empty when none. */
    ReadOnlyStringProperty problemProperty();
}
