package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Values no pipe system has are refused with the key and the range, instead of printing Infinity or
 * 10³⁰² m (limits are plausibility bounds, common practice, no source).
 */
class PlausibleInputTest {

    @TempDir
    Path dir;

    private CliRun solveWith(String from, String to) throws Exception {
        String text = Files.readString(Path.of("fluids-data", "examples", "demo-orchard-booster.json"));
        String changed = text.replaceFirst(from, java.util.regex.Matcher.quoteReplacement(to));
        assertTrue(!changed.equals(text), from);
        Path p = dir.resolve("p.json");
        Files.writeString(p, changed);
        return CliRun.of("solve", p.toString());
    }

    @Test
    void aCurveReachingAnImplausibleFlowIsRefused() throws Exception {
        CliRun r = solveWith("\"maximumFlow\"\\s*:\\s*\"18 L/s\"", "\"maximumFlow\": \"1e300 m3/s\"");
        assertEquals(2, r.exitCode(), r.out());
        assertTrue(r.err().contains("curve.maximumFlow") && r.err().contains("plausible"), r.err());
        assertTrue(!r.out().contains("Infinity"));
    }

    @Test
    void anImplausibleDensityOrViscosityIsRefused() throws Exception {
        String fluid = "\"fluid\"\\s*:\\s*\\{[^}]*\\}";
        CliRun thin = solveWith(
                fluid, "\"fluid\": {\"name\": \"thin\", \"density\": \"1e-300 kg/m3\", \"viscosity\": \"1 mPa*s\"}");
        assertEquals(2, thin.exitCode(), thin.out());
        assertTrue(thin.err().contains("fluid.density") && thin.err().contains("plausible"), thin.err());
        CliRun thick = solveWith(
                fluid, "\"fluid\": {\"name\": \"tar\", \"density\": \"1000 kg/m3\", \"viscosity\": \"1e9 Pa*s\"}");
        assertEquals(2, thick.exitCode(), thick.out());
        assertTrue(thick.err().contains("fluid.viscosity"), thick.err());
        CliRun mercury = solveWith(
                fluid, "\"fluid\": {\"name\": \"heavy\", \"density\": \"13534 kg/m3\", \"viscosity\": \"1.5 mPa*s\"}");
        assertEquals(0, mercury.exitCode(), mercury.err());
    }
}
