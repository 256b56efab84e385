package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

class FluidCommandTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        CommandLine cl = HeadwayCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    @Test
    void printsJsonWithTheAgreedKeys() throws Exception {
        int code = run("fluid", "water", "--temperature", "25degC", "--pressure", "101.325kPa", "--format", "json");
        assertEquals(0, code, err.toString());
        JsonNode json = new ObjectMapper().readTree(out.toString());
        List<String> keys = new ArrayList<>();
        json.fieldNames().forEachRemaining(keys::add);
        assertEquals(
                List.of(
                        "density_kg_per_m3",
                        "dynamic_viscosity_pa_s",
                        "kinematic_viscosity_m2_per_s",
                        "vapour_pressure_pa",
                        "source",
                        "cautions"),
                keys);
        // IAPWS-95 at 25 °C, 1 atm (water-iapws95-1atm.csv): 997.047637 kg/m³, 0.000890022489 Pa·s, 3169.82 Pa.
        assertEquals(997.047637, json.get("density_kg_per_m3").asDouble(), 997.047637 * 5e-5);
        assertEquals(0.000890022489, json.get("dynamic_viscosity_pa_s").asDouble(), 0.000890022489 * 5e-5);
        assertEquals(3169.82449, json.get("vapour_pressure_pa").asDouble(), 3169.82449 * 2.5e-4);
        assertTrue(json.get("source").get("density").asText().contains("IF97"));
        assertEquals(0, json.get("cautions").size());
    }

    @Test
    void printsTextWithSources() {
        assertEquals(0, run("fluid", "seawater:40", "-t", "15 degC"), err.toString());
        String text = out.toString();
        assertTrue(text.startsWith("Seawater, 40 g/kg (Sharqawy et al. 2010)"), text);
        assertTrue(text.contains("at 15.00 °C, 101.3 kPa"), text);
        assertTrue(text.contains("Sharqawy, Lienhard & Zubair 2010"), text);
    }

    @Test
    void printsUsCustomaryUnits() {
        assertEquals(0, run("fluid", "water", "-t", "68 degF", "--units", "us"), err.toString());
        assertTrue(out.toString().contains("at 68.00 °F, 14.70 psi"), out.toString());
        assertTrue(out.toString().contains("62.32 lb/ft³"), out.toString());
    }

    @Test
    void listsTheFluids() {
        assertEquals(0, run("fluid", "--list"));
        String text = out.toString();
        for (String id :
                List.of("water", "seawater", "ethylene-glycol-30", "propylene-glycol-40", "hydraulic-oil-vg46")) {
            assertTrue(text.lines().anyMatch(l -> l.startsWith(id + " ")), id);
        }
    }

    @Test
    void badInputExitsWithTwoAndOneLine() {
        assertEquals(2, run("fluid", "water", "-t", "68 F"));
        assertEquals(
                "headway: --temperature: unit \"F\" in \"68 F\" is ambiguous (farad or Fahrenheit?): write °F or degF",
                err.toString().strip());
    }

    @Test
    void boilingStateExitsWithTwo() {
        assertEquals(2, run("fluid", "water", "-t", "120degC", "--format", "json"));
        assertEquals(
                "headway: pressure: water boils at 393.15 K (120 °C): pressure 101325 Pa is below the vapour pressure"
                        + " 198665 Pa",
                err.toString().strip());
        assertEquals("", out.toString());
    }

    @Test
    void thePressureIsAbsoluteAndAGaugeReadingIsRefused() {
        // Water boils at 120 °C below 198.67 kPa (IAPWS-IF97 Region 4, from memory): 2 bara keeps it liquid.
        assertEquals(
                0, run("fluid", "water", "-t", "120degC", "--pressure", "2 bara", "--format", "json"), err.toString());
        StringWriter fresh = new StringWriter();
        CommandLine cl = HeadwayCommand.commandLine();
        cl.setOut(new PrintWriter(new StringWriter()));
        cl.setErr(new PrintWriter(fresh));
        assertEquals(2, cl.execute("fluid", "water", "-t", "120degC", "--pressure", "1 barg"));
        assertEquals(
                "headway: --pressure: \"1 barg\" is a gauge reading, but the fluid's pressure is absolute; give it in"
                        + " kPa, bara or psia (a project converts gauge readings with its site's barometric pressure)",
                fresh.toString().strip());
    }

    @Test
    void unknownFluidAndMissingTemperatureExitWithTwo() {
        assertEquals(2, run("fluid", "mercury", "-t", "20degC"));
        assertTrue(
                err.toString().startsWith("headway: fluid: unknown fluid \"mercury\"; known: water,"), err.toString());
        StringWriter fresh = new StringWriter();
        CommandLine cl = HeadwayCommand.commandLine();
        cl.setErr(new PrintWriter(fresh));
        assertEquals(2, cl.execute("fluid", "water"));
        assertTrue(fresh.toString().startsWith("headway: Missing required option: '--temperature'"), fresh.toString());
    }
}
