package org.headway.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.Callable;
import org.headway.caution.InputException;
import org.headway.dimensional.DimensionalAnalysis;
import org.headway.dimensional.DimensionalVariable;
import org.headway.dimensional.DimensionlessGroup;
import org.headway.dimensional.GroupAnalysis;
import org.headway.units.DimensionParser;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code headway groups}: Buckingham π groups from variables and their units. */
@Command(
        name = "groups",
        mixinStandardHelpOptions = true,
        description = {
            "Form the dimensionless (π) groups of a problem from its variables and their units.",
            "List the dependent variable first. Example:",
            "  headway groups --var dp=Pa --var rho=kg/m^3 --var V=m/s --var D=m --var mu=Pa*s"
        })
public final class GroupsCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Option(
            names = "--var",
            required = true,
            paramLabel = "NAME=UNIT",
            description = "a variable and its unit (kg/m^3, Pa*s, m/s, N, W, Hz, L/min, …); repeat for each variable")
    List<String> variables;

    @Option(
            names = "--repeating",
            split = ",",
            paramLabel = "NAME",
            description = "repeating variables (default: density, velocity, a diameter, then the others in order)")
    List<String> repeating = new ArrayList<>();

    @Mixin
    SharedOptions.TextOrJson formatOption;

    @Override
    public Integer call() throws Exception {
        String format = formatOption.format;
        if (!format.equals("text") && !format.equals("json")) {
            throw new InputException("--format", "must be text or json, got '" + format + "'");
        }
        List<DimensionalVariable> vars = new ArrayList<>();
        for (String v : variables) {
            int eq = v.indexOf('=');
            if (eq <= 0 || eq == v.length() - 1) {
                throw new InputException("--var", "expected NAME=UNIT such as rho=kg/m^3, got '" + v + "'");
            }
            String name = v.substring(0, eq).trim();
            vars.add(
                    DimensionalVariable.ofExponents(name, DimensionParser.parse(v.substring(eq + 1), "--var " + name)));
        }
        GroupAnalysis analysis = DimensionalAnalysis.analyse(vars, repeating);
        PrintWriter out = spec.commandLine().getOut();
        if (format.equals("json")) {
            ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
            ObjectNode root = mapper.createObjectNode();
            root.put("rank", analysis.rank());
            ArrayNode dims = root.putArray("dimensions");
            analysis.dimensions().forEach(d -> dims.add(d.symbol()));
            ArrayNode rep = root.putArray("repeating");
            analysis.repeating().forEach(rep::add);
            ArrayNode groups = root.putArray("groups");
            for (DimensionlessGroup g : analysis.groups()) {
                ObjectNode node = groups.addObject();
                node.put("name", g.name());
                node.put("formula", g.formula());
                ObjectNode exps = node.putObject("exponents");
                g.exponents().forEach(exps::put);
            }
            root.put("explanation", analysis.explanation());
            out.println(mapper.writeValueAsString(root));
        } else {
            out.println("Variables:");
            for (DimensionalVariable v : analysis.variables()) {
                out.printf("  %-8s %s%n", v.name(), v.formula());
            }
            out.println(analysis.explanation());
            out.println("Groups:");
            int width = analysis.groups().stream()
                    .mapToInt(g -> g.name().length())
                    .max()
                    .orElse(0);
            for (DimensionlessGroup g : analysis.groups()) {
                out.printf("  %-" + width + "s  = %s%n", g.name(), g.formula());
            }
            out.println("Any relation among the variables can be written as one group as a function of the others.");
        }
        out.flush();
        return HeadwayCommand.EXIT_OK;
    }

    @Override
    public String toString() {
        return "groups " + Arrays.toString(variables.toArray());
    }
}
