package org.headway.app;

import javafx.beans.property.ReadOnlyStringProperty;
import javafx.collections.ObservableList;

/**
 * What the π-groups helper will bind to once the dimensional-analysis engine is in the tree:
 * variables with units in, dimensionless groups out. Not implemented yet and not shown.
 */
public interface PiGroupsModel {

    /** A variable as typed: symbol and unit, e.g. {@code ρ} and {@code kg/m3}. */
    record Variable(String symbol, String unit) {}

    ObservableList<Variable> variables();

    /** The groups as plain text, e.g. {@code ρVD/μ}, one per line of the list. */
    ObservableList<String> groups();

    /** Problem with the variables (unknown unit, too few variables), empty when none. */
    ReadOnlyStringProperty problemProperty();
}
