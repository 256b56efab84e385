package org.headway.app;

import java.util.ArrayList;
import java.util.List;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.headway.caution.InputException;
import org.headway.dimensional.DimensionalAnalysis;
import org.headway.dimensional.DimensionalVariable;
import org.headway.dimensional.DimensionlessGroup;
import org.headway.dimensional.GroupAnalysis;
import org.headway.units.DimensionParser;

/**
 * View-model of the π-groups helper: variables with their units in, the rank of the dimension
 * matrix and the dimensionless groups out (Buckingham π, {@link DimensionalAnalysis}).
 */
public final class PiGroupsModel {

    /**
     * A variable as typed.
     *
     * @param symbol name used in the groups, e.g. {@code rho}
     * @param unit its unit, e.g. {@code kg/m^3}
     * @param dimensions its dimension formula once read, e.g. {@code M L^-3}, or empty
     */
    public record Variable(String symbol, String unit, String dimensions) {}

    /**
     * One group.
     *
     * @param name familiar name (Reynolds number, relative roughness, …) or π₁, π₂, …
     * @param formula the group as a product of powers
     */
    public record GroupRow(String name, String formula) {}

    private final ObservableList<Variable> variables = FXCollections.observableArrayList();
    private final StringProperty repeating = new SimpleStringProperty("");
    private final ObservableList<GroupRow> groups = FXCollections.observableArrayList();
    private final SimpleIntegerProperty rank = new SimpleIntegerProperty(0);
    private final SimpleStringProperty explanation = new SimpleStringProperty("");
    private final SimpleStringProperty problem = new SimpleStringProperty("");

    /** Starts with the variables of pipe friction: Δp/L, ρ, V, D, μ, ε. */
    public PiGroupsModel() {
        variables.setAll(
                new Variable("dpdx", "Pa/m", ""),
                new Variable("rho", "kg/m^3", ""),
                new Variable("V", "m/s", ""),
                new Variable("D", "m", ""),
                new Variable("mu", "Pa*s", ""),
                new Variable("eps", "m", ""));
        analyse();
    }

    public ObservableList<Variable> variables() {
        return variables;
    }

    /** Repeating variables, comma-separated; blank = chosen by the default rule. */
    public StringProperty repeatingProperty() {
        return repeating;
    }

    public ObservableList<GroupRow> groups() {
        return groups;
    }

    /** Rank r of the dimension matrix; the number of groups is n − r. */
    public ReadOnlyIntegerProperty rankProperty() {
        return rank;
    }

    /** How the groups were formed, in words. */
    public ReadOnlyStringProperty explanationProperty() {
        return explanation;
    }

    /** Problem with the variables (unknown unit, dependent repeating variables, …); empty when none. */
    public ReadOnlyStringProperty problemProperty() {
        return problem;
    }

    /** Adds a variable; a symbol already in the list replaces that one. */
    public void put(String symbol, String unit) {
        String s = symbol == null ? "" : symbol.strip();
        String u = unit == null ? "" : unit.strip();
        for (int i = 0; i < variables.size(); i++) {
            if (variables.get(i).symbol().equals(s)) {
                variables.set(i, new Variable(s, u, ""));
                analyse();
                return;
            }
        }
        variables.add(new Variable(s, u, ""));
        analyse();
    }

    public void remove(int index) {
        if (index >= 0 && index < variables.size()) {
            variables.remove(index);
            analyse();
        }
    }

    /**
     * Reads every unit and forms the groups. On a problem the message says which variable or why
     * (for dependent repeating variables, the engine's explanation), and the groups are cleared so
     * that no stale answer stays on screen.
     */
    public boolean analyse() {
        List<DimensionalVariable> vars = new ArrayList<>();
        List<Variable> shown = new ArrayList<>();
        String firstProblem = "";
        for (Variable v : variables) {
            try {
                if (v.symbol().isBlank()) {
                    throw new InputException("variable", "a variable needs a symbol");
                }
                DimensionalVariable dv = DimensionalVariable.ofExponents(
                        v.symbol(), DimensionParser.parse(v.unit(), "unit of " + v.symbol()));
                vars.add(dv);
                shown.add(new Variable(v.symbol(), v.unit(), dv.formula()));
            } catch (InputException e) {
                shown.add(new Variable(v.symbol(), v.unit(), "?"));
                if (firstProblem.isEmpty()) {
                    firstProblem = plain(e);
                }
            }
        }
        if (!shown.equals(variables)) {
            variables.setAll(shown);
        }
        if (firstProblem.isEmpty()) {
            try {
                GroupAnalysis a = DimensionalAnalysis.analyse(vars, repeatingNames());
                rank.set(a.rank());
                explanation.set(a.explanation());
                groups.setAll(a.groups().stream()
                        .map(g -> new GroupRow(g.name(), formula(g)))
                        .toList());
                problem.set("");
                return true;
            } catch (InputException e) {
                firstProblem = plain(e);
            }
        }
        problem.set(firstProblem);
        groups.clear();
        rank.set(0);
        explanation.set("");
        return false;
    }

    private List<String> repeatingNames() {
        List<String> names = new ArrayList<>();
        String text = repeating.get() == null ? "" : repeating.get();
        for (String part : text.split("[,;\\s]+")) {
            if (!part.isBlank()) {
                names.add(part.strip());
            }
        }
        return names;
    }

    private static String formula(DimensionlessGroup g) {
        return g.formula();
    }

    private static String plain(InputException e) {
        return e.where().isEmpty() ? e.problem() : e.where() + ": " + e.problem();
    }
}
