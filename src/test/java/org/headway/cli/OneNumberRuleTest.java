package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import org.headway.rig.UncertaintySource;
import org.headway.units.Decimals;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * One number rule for every data file (plain decimals only: no Java {@code f}/{@code d} suffixes,
 * hexadecimal floats or decimal commas), rig files that name their data file, and rig JSON in a
 * stable order.
 */
class OneNumberRuleTest {

    @TempDir
    Path dir;

    @Test
    void thePlainDecimalRule() {
        for (String ok : new String[] {"1", "-1.5", "+.5", "5.", "1e5", "1.5E-3", " 2 ", "0.013868"}) {
            assertTrue(Decimals.isPlainDecimal(ok), ok);
        }
        // Double.parseDouble takes all of these; a data file should not.
        for (String bad :
                new String[] {"0.013868f", "1d", "0x1p3", "NaN", "Infinity", "1,5", "1e", ".", "-", "", "1 000"}) {
            assertFalse(Decimals.isPlainDecimal(bad), bad);
        }
        assertEquals(-1.5e-3, Decimals.parseDecimal("-1.5e-3"));
    }

    private Path rig(String dataText) throws Exception {
        Path examples = Path.of("fluids-data", "examples");
        Files.copy(examples.resolve("demo-rig.json"), dir.resolve("rig.json"));
        Files.writeString(dir.resolve("demo-rig-points.csv"), dataText);
        return dir.resolve("rig.json");
    }

    @Test
    void aJavaSuffixInRigDataIsRefusedWithItsCell() throws Exception {
        String data = Files.readString(Path.of("fluids-data", "examples", "demo-rig-points.csv"));
        String bad = data.replaceFirst("(\\n[0-9.]+,)([0-9.]+)(,)", "$1$2f$3");
        assertTrue(!bad.equals(data));
        CliRun r = CliRun.of("rig", rig(bad).toString());
        assertEquals(2, r.exitCode(), r.out());
        assertTrue(r.err().contains("demo-rig-points.csv line") && r.err().contains("f'"), r.err());
    }

    @Test
    void rigDataWithoutRowsNamesTheFileNotTheTitle() throws Exception {
        CliRun r = CliRun.of("rig", rig("flow [L/s],dp [kPa],T [degC],run\n").toString());
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("demo-rig-points.csv: has no data rows"), r.err());
        assertFalse(r.err().contains("Demo rig"), r.err());
    }

    @Test
    void varianceSharesAreListedInTheSourcesDeclaredOrder() throws Exception {
        String data = Files.readString(Path.of("fluids-data", "examples", "demo-rig-points.csv"));
        CliRun r = CliRun.of("rig", rig(data).toString(), "--format", "json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode shares =
                new ObjectMapper().readTree(r.out()).get("uncertainty").get("variance_shares_f");
        List<String> keys = new ArrayList<>();
        for (Iterator<String> it = shares.fieldNames(); it.hasNext(); ) {
            keys.add(it.next());
        }
        assertTrue(keys.size() > 1, keys.toString());
        List<String> declared = new ArrayList<>();
        for (UncertaintySource s : UncertaintySource.values()) {
            if (keys.contains(s.label())) {
                declared.add(s.label());
            }
        }
        assertEquals(declared, keys);
    }
}
