package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;
import picocli.CommandLine.Model.OptionSpec;

/**
 * The options several commands share are declared once (picocli mixins): every command that has
 * them shows the same name, label, default and wording, and the names and defaults are those the
 * commands had before (issue 18; a command line is a contract with the user's scripts).
 */
class SharedOptionsTest {

    private static final Map<String, List<String>> SHARED = Map.of(
            "--catalog", List.of("catalog", "network", "sheet", "solve"),
            "--force", List.of("fit", "friction", "network", "sheet"),
            "--units", List.of("network", "solve"),
            "--format", List.of("fit", "groups"));

    private static OptionSpec option(String command, String name) {
        CommandLine root = HeadwayCommand.commandLine();
        CommandLine sub = root.getSubcommands().get(command);
        assertNotNull(sub, command);
        OptionSpec option = sub.getCommandSpec().findOption(name);
        assertNotNull(option, command + " " + name);
        return option;
    }

    @Test
    void eachSharedOptionReadsTheSameInEveryCommand() {
        for (Map.Entry<String, List<String>> e : SHARED.entrySet()) {
            OptionSpec first = option(e.getValue().get(0), e.getKey());
            for (String command : e.getValue()) {
                OptionSpec o = option(command, e.getKey());
                assertArrayEquals(first.description(), o.description(), command + " " + e.getKey());
                assertEquals(first.paramLabel(), o.paramLabel(), command + " " + e.getKey());
                assertEquals(first.defaultValue(), o.defaultValue(), command + " " + e.getKey());
            }
        }
    }

    @Test
    void namesLabelsAndDefaultsAreThoseBeforeTheMixins() {
        // Values as the commands declared them before issue 18 (git history of the cli package).
        assertEquals("DIR", option("solve", "--catalog").paramLabel());
        assertEquals(null, option("solve", "--catalog").defaultValue());
        assertTrue(option("sheet", "--force").arity().max() == 0, "--force is a flag");
        assertEquals("si", option("network", "--units").defaultValue());
        assertEquals("<units>", option("network", "--units").paramLabel());
        assertEquals("text", option("fit", "--format").defaultValue());
        assertEquals("text", option("groups", "--format").defaultValue());
    }

    @Test
    void helpStillListsTheSharedOptionsWithTheirDefaults() {
        CliRun run = CliRun.of("solve", "--help");
        assertEquals(0, run.exitCode(), run.err());
        String help = run.out();
        assertTrue(help.contains("[--catalog=DIR]"), help);
        assertTrue(help.contains("[--units=<units>]"), help);
        assertTrue(help.contains("(default si)"), help);
    }

    @Test
    void aSharedOptionStillReachesItsCommand() {
        CliRun run = CliRun.of("groups", "--format", "xml", "--var", "Q=m^3/s", "--var", "D=m");
        assertEquals(HeadwayCommand.EXIT_BAD_INPUT, run.exitCode(), run.err());
        assertTrue(run.err().contains("--format: must be text or json, got 'xml'"), run.err());
    }
}
