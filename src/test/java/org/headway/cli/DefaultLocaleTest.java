package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * Output does not depend on the platform's default locale: every command here prints the same bytes
 * under German and French (decimal comma), Turkish (dotless i in case mapping) and Arabic (Egypt:
 * Arabic-Indic digits) as under the root locale. Numbers a script reads back must not turn into
 * {@code 0,0092881} or Arabic digits on a colleague's machine.
 */
class DefaultLocaleTest {

    static final List<Locale> LOCALES =
            List.of(Locale.GERMANY, Locale.FRANCE, Locale.forLanguageTag("tr-TR"), Locale.forLanguageTag("ar-EG"));

    static final List<String[]> COMMANDS = List.of(
            new String[] {"solve", "fluids-data/examples/gravity-spring-line.json"},
            new String[] {"solve", "fluids-data/examples/gravity-spring-line.json", "--format", "json"},
            new String[] {"solve", "fluids-data/examples/coil-branch.json", "--mode", "flow"},
            new String[] {"solve", "fluids-data/examples/demo-orchard-booster.json", "--format", "json"},
            new String[] {"solve", "fluids-data/examples/demo-orchard-booster.json", "--units", "us"},
            new String[] {"solve", "fluids-data/examples/size-chilled-water-riser.json", "--mode", "size"},
            new String[] {
                "network",
                "--nodes",
                "fluids-data/examples/network/hillcrest-nodes.csv",
                "--links",
                "fluids-data/examples/network/hillcrest-links.csv"
            },
            new String[] {"friction", "--re", "1e5", "--relative-roughness", "1e-4", "--format", "json"},
            new String[] {"fluid", "water", "--temperature", "25 degC"});

    @Test
    void everyCommandPrintsTheSameUnderEveryDefaultLocale() {
        Locale saved = Locale.getDefault();
        try {
            for (String[] args : COMMANDS) {
                Locale.setDefault(Locale.ROOT);
                CliRun reference = CliRun.of(args);
                for (Locale l : LOCALES) {
                    Locale.setDefault(l);
                    CliRun r = CliRun.of(args);
                    assertEquals(reference.exitCode(), r.exitCode(), String.join(" ", args) + " under " + l);
                    assertEquals(reference.out(), r.out(), String.join(" ", args) + " under " + l);
                    assertEquals(reference.err(), r.err(), String.join(" ", args) + " under " + l);
                }
            }
        } finally {
            Locale.setDefault(saved);
        }
    }
}
