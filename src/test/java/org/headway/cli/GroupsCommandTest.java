package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.Map;
import org.headway.caution.InputException;
import org.headway.dimensional.Dimension;
import org.headway.dimensional.DimensionalVariable;
import org.headway.units.DimensionParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** {@code headway groups} and the unit → dimension reader. */
class GroupsCommandTest {

    @Test
    void pipeFlowGroupsAsJson() throws Exception {
        // Pipe pressure drop: 4 groups from 7 variables (White, Fluid Mechanics, ch. 5–6, from memory).
        CliRun run = CliRun.of(
                "groups",
                "--var",
                "dp=Pa",
                "--var",
                "rho=kg/m^3",
                "--var",
                "V=m/s",
                "--var",
                "D=m",
                "--var",
                "mu=Pa*s",
                "--var",
                "eps=mm",
                "--var",
                "L=m",
                "--format",
                "json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode json = new ObjectMapper().readTree(run.out());
        assertEquals(3, json.get("rank").intValue());
        assertEquals(4, json.get("groups").size());
        JsonNode re = json.get("groups").get(1);
        assertEquals("Reynolds number", re.get("name").asText());
        assertEquals(1, re.get("exponents").get("rho").intValue());
        assertEquals(-1, re.get("exponents").get("mu").intValue());
    }

    /**
     * Q²/(gD⁵) with D a pipe diameter is not the weir discharge group: that group is defined on the
     * head H over the crest (White, Fluid Mechanics, ch. 10, weirs, from memory). With H also given,
     * the group on D gets no familiar name; the same variables with H repeating do name it.
     */
    @Test
    void familiarNameOnlyWhenTheVariablesAreThoseItIsDefinedOn() throws Exception {
        CliRun onDiameter = CliRun.of(
                "groups", "--var", "Q=m3/h", "--var", "D=m", "--var", "g=m/s^2", "--var", "H=m", "--format", "json");
        assertEquals(0, onDiameter.exitCode(), onDiameter.err());
        JsonNode groups = new ObjectMapper().readTree(onDiameter.out()).get("groups");
        JsonNode first = groups.get(0);
        assertEquals(2, first.get("exponents").get("Q").intValue(), first.toString());
        assertEquals(-5, first.get("exponents").get("D").intValue(), first.toString());
        assertTrue(first.get("name").asText().startsWith("π"), first.toString());
        assertTrue(!onDiameter.out().contains("weir"), onDiameter.out());

        CliRun onHead = CliRun.of(
                "groups",
                "--var",
                "Q=m^3/s",
                "--var",
                "g=m/s^2",
                "--var",
                "H=m",
                "--var",
                "b=m",
                "--repeating",
                "g,H",
                "--format",
                "json");
        assertEquals(0, onHead.exitCode(), onHead.err());
        assertTrue(onHead.out().contains("weir discharge group squared"), onHead.out());
    }

    @Test
    void dependentRepeatingVariablesAreBadInputWithExplanation() {
        CliRun run = CliRun.of(
                "groups",
                "--var",
                "dp=Pa",
                "--var",
                "rho=kg/m^3",
                "--var",
                "V=m/s",
                "--var",
                "D=m",
                "--var",
                "L=m",
                "--repeating",
                "rho,D,L");
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("not independent"), run.err());
    }

    @Test
    void unknownUnitIsBadInput() {
        CliRun run = CliRun.of("groups", "--var", "dp=psi", "--var", "rho=kg/m^3");
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("--var dp: unknown unit symbol 'psi' at character 1"), run.err());
    }

    @ParameterizedTest
    @CsvSource(
            delimiter = ';',
            value = {
                // unit; M; L; T — SI Brochure, 9th ed. (2019), table 4 derived units (from memory)
                "kg/m^3; 1; -3; 0",
                "Pa*s; 1; -1; -1",
                "m/s; 0; 1; -1",
                "N·m; 1; 2; -2",
                "kW; 1; 2; -3",
                "m³/h; 0; 3; -1",
                "m3/h; 0; 3; -1",
                "kg/m3; 1; -3; 0",
                "mm2/s; 0; 2; -1",
                "L/min; 0; 3; -1",
                "m^2/s; 0; 2; -1",
                "kg/(m*s); 1; -1; -1",
                "m s^-2; 0; 1; -2",
                "mm^(-1); 0; -1; 0",
                "kPa; 1; -1; -2",
                "Hz; 0; 0; -1",
                "J/kg; 0; 2; -2",
                "µm; 0; 1; 0",
                "1; 0; 0; 0",
                "-; 0; 0; 0"
            })
    void unitsBecomeDimensionExponents(String unit, int mass, int length, int time) {
        Map<Dimension, Integer> e = DimensionalVariable.ofExponents("x", DimensionParser.parse(unit, "test"))
                .exponents();
        assertEquals(mass, e.getOrDefault(Dimension.MASS, 0), unit);
        assertEquals(length, e.getOrDefault(Dimension.LENGTH, 0), unit);
        assertEquals(time, e.getOrDefault(Dimension.TIME, 0), unit);
    }

    @Test
    void temperatureAndAmountAreBaseDimensions() {
        assertEquals(
                Map.of(Dimension.MASS, 1, Dimension.LENGTH, 2, Dimension.TIME, -2, Dimension.TEMPERATURE, -1),
                DimensionalVariable.ofExponents("x", DimensionParser.parse("J/K", "x"))
                        .exponents());
        assertEquals(
                Map.of(Dimension.AMOUNT, 1, Dimension.LENGTH, -3),
                DimensionalVariable.ofExponents("x", DimensionParser.parse("mol/L", "x"))
                        .exponents());
    }

    @Test
    void syntaxErrorsNameThePosition() {
        InputException e = assertThrows(InputException.class, () -> DimensionParser.parse("kg/(m*s", "--var mu"));
        assertEquals("--var mu", e.where());
        assertTrue(e.problem().contains("expected ')' at character 8"), e.getMessage());
        InputException exp = assertThrows(InputException.class, () -> DimensionParser.parse("m^x", "--var a"));
        assertTrue(exp.problem().contains("integer exponent"), exp.getMessage());
    }
}
