package org.headway.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.fluid.Fluid;
import org.headway.fluid.FluidState;
import org.headway.fluid.Fluids;
import org.headway.units.PressureReading;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code headway fluid}: properties of a liquid at one temperature and pressure. */
@Command(
        name = "fluid",
        mixinStandardHelpOptions = true,
        description = {
            "Density, viscosity and vapour pressure of a liquid at one state, with the source of each value.",
            "Example: headway fluid water --temperature 25degC --pressure 101.325kPa"
        })
public final class FluidCommand implements Callable<Integer> {

    /** Output layouts. */
    enum Layout {
        text,
        json
    }

    /** Unit systems for text output. */
    enum Units {
        si,
        us
    }

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(
            index = "0",
            arity = "0..1",
            paramLabel = "FLUID",
            description = "Fluid id, e.g. water, seawater, seawater:40, ethylene-glycol-30 (see --list).")
    String fluidId;

    @Option(names = "--list", description = "List the built-in fluids and exit.")
    boolean list;

    @Option(
            names = {"-t", "--temperature"},
            paramLabel = "TEMP",
            description = "Temperature, e.g. 25degC, 77degF, 298.15K (a bare number is kelvin).")
    String temperature;

    @Option(
            names = {"-p", "--pressure"},
            paramLabel = "PRESSURE",
            defaultValue = "101.325 kPa",
            description = "Absolute pressure, e.g. 250kPa, 2.4bar, 35psi (default: ${DEFAULT-VALUE}).")
    String pressure;

    @Option(
            names = "--format",
            defaultValue = "text",
            description = "Output: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
    Layout format;

    @Option(
            names = "--units",
            defaultValue = "si",
            description = "Units for text output: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
    Units units;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        if (list) {
            for (Fluid fluid : Fluids.all()) {
                out.printf("%-22s %s%n", fluid.id(), fluid.displayName());
            }
            out.println("seawater:S             Seawater of salinity S g/kg (e.g. seawater:40)");
            out.flush();
            return HeadwayCommand.EXIT_OK;
        }
        if (fluidId == null) {
            throw new CommandLine.ParameterException(spec.commandLine(), "Missing FLUID (or use --list)");
        }
        if (temperature == null) {
            throw new CommandLine.ParameterException(spec.commandLine(), "Missing required option: '--temperature'");
        }
        Fluid fluid = Fluids.byId(fluidId);
        double t = Quantities.parse(temperature, QuantityKind.TEMPERATURE, "--temperature");
        // The state pressure is absolute; without a site there is no barometric pressure to add to a gauge reading.
        PressureReading reading = Quantities.parsePressure(pressure, "--pressure");
        if (reading.reference() == PressureReading.Reference.GAUGE) {
            throw new InputException(
                    "--pressure",
                    "\"" + pressure.strip() + "\" is a gauge reading, but the fluid's pressure is absolute; give it in"
                            + " kPa, bara or psia (a project converts gauge readings with its site's barometric pressure)");
        }
        double p = reading.pascals();
        FluidState state = fluid.state(t, p);
        if (format == Layout.json) {
            out.println(json(state));
        } else {
            printText(out, fluid, state, units == Units.us ? UnitSystem.US_CUSTOMARY : UnitSystem.SI);
        }
        out.flush();
        return HeadwayCommand.EXIT_OK;
    }

    private static void printText(PrintWriter out, Fluid fluid, FluidState s, UnitSystem system) {
        out.println(fluid.displayName());
        out.printf(
                "  at %s, %s%n",
                Quantities.format(s.temperature(), QuantityKind.TEMPERATURE, system),
                Quantities.format(s.pressure(), QuantityKind.PRESSURE, system));
        row(out, "density", Quantities.format(s.density(), QuantityKind.DENSITY, system), s.densitySource());
        row(
                out,
                "dynamic viscosity",
                Quantities.format(s.dynamicViscosity(), QuantityKind.DYNAMIC_VISCOSITY, system),
                s.viscositySource());
        row(
                out,
                "kinematic viscosity",
                Quantities.format(s.kinematicViscosity(), QuantityKind.KINEMATIC_VISCOSITY, system),
                "dynamic viscosity / density");
        if (s.vapourPressure().isPresent()) {
            row(
                    out,
                    "vapour pressure",
                    Quantities.format(s.vapourPressure().getAsDouble(), QuantityKind.PRESSURE, system),
                    s.vapourPressureSource());
        } else {
            row(out, "vapour pressure", "not modelled", "");
        }
        for (Caution c : s.cautions()) {
            out.printf("  %s [%s] %s (basis: %s)%n", c.severity(), c.code(), c.message(), c.basis());
        }
    }

    private static void row(PrintWriter out, String name, String value, String source) {
        out.printf("  %-20s %-14s %s%n", name, value, source.isEmpty() ? "" : "[" + source + "]");
    }

    /** The JSON object of one state; keys are part of the command's contract. */
    static String json(FluidState s) {
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = mapper.createObjectNode();
        root.put("density_kg_per_m3", s.density());
        root.put("dynamic_viscosity_pa_s", s.dynamicViscosity());
        root.put("kinematic_viscosity_m2_per_s", s.kinematicViscosity());
        if (s.vapourPressure().isPresent()) {
            root.put("vapour_pressure_pa", s.vapourPressure().getAsDouble());
        } else {
            root.putNull("vapour_pressure_pa");
        }
        ObjectNode source = root.putObject("source");
        source.put("density", s.densitySource());
        source.put("viscosity", s.viscositySource());
        if (s.vapourPressure().isPresent()) {
            source.put("vapour_pressure", s.vapourPressureSource());
        } else {
            source.putNull("vapour_pressure");
        }
        ArrayNode cautions = root.putArray("cautions");
        for (Caution c : s.cautions()) {
            ObjectNode node = cautions.addObject();
            node.put("code", c.code());
            node.put("severity", c.severity().name().toLowerCase(java.util.Locale.ROOT));
            node.put("message", c.message());
            node.put("basis", c.basis());
        }
        try {
            return mapper.writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write JSON", e);
        }
    }
}
