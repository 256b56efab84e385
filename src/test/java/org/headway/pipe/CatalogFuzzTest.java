package org.headway.pipe;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Random;
import org.headway.Fuzz;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Catalog files fuzzed: 10,000 generated files per run, each a mutated copy of one bundled catalog
 * CSV (deleted, duplicated and swapped lines and columns, nasty numbers, BOM and CRLF, long lines,
 * random text and bytes), read both as a complete folder ({@link Catalog#load}) and as a user folder
 * over the bundled data ({@link Catalog#withUserFolder}). Each gives a catalog whose roughnesses,
 * diameters and loss coefficients are finite, or an {@link InputException} naming the file — never
 * another exception, never NaN, never a hang.
 */
class CatalogFuzzTest {

    static final int INPUTS = 10_000;
    static final long SEED = 8_505L;
    static final long PER_INPUT_BUDGET_MS = 2_000;

    private static final String MINI_MATERIALS = "# source: test data\n"
            + "id,name,roughness_mm,roughness_low_mm,roughness_high_mm,condition,size_table,source\n"
            + "steel,Steel,0.046,0.03,0.09,new,mini,test\n"
            + "plastic,Plastic,0.0015,0.001,0.002,new,,test\n";
    private static final String MINI_FITTINGS = "# source: test data\n"
            + "id,description,method,k,k1,k_inf,k_d,source\n"
            + "valve,Valve,fixed,2.5,,,,test\n"
            + "elbow,Elbow,2-k,,800,0.25,,test\n"
            + "tee,Tee,3-k,,500,0.15,4.0,test\n";
    private static final String MINI_SIZES =
            "# source: test data\nnominal,schedule,od_mm,wall_mm\n1,40,33.4,3.38\n2,40,60.3,3.91\n";

    @Test
    void everyFileGivesAFiniteCatalogOrALocatedError(@TempDir Path root) throws Exception {
        Map<String, String> bundled = new LinkedHashMap<>();
        for (String name : Catalog.BUNDLED_FILES) {
            try (InputStream in = getClass().getResourceAsStream("/fluids-data/catalog/" + name)) {
                bundled.put(name, new String(in.readAllBytes(), StandardCharsets.UTF_8));
            }
        }
        // Catalog.load reads a whole folder: small valid companions beside the one mutated file keep
        // each case cheap.
        Path full = Files.createDirectory(root.resolve("folder"));
        Map<String, String> companions = Map.of(
                Catalog.MATERIALS_FILE,
                MINI_MATERIALS,
                Catalog.FITTINGS_FILE,
                MINI_FITTINGS,
                "sizes-mini.csv",
                MINI_SIZES);
        for (Map.Entry<String, String> e : companions.entrySet()) {
            Files.writeString(full.resolve(e.getKey()), e.getValue(), StandardCharsets.UTF_8);
        }
        Random random = new Random(SEED);
        int rejected = 0;
        int loaded = 0;
        String[] names = bundled.keySet().toArray(String[]::new);
        for (int i = 0; i < INPUTS; i++) {
            String name = names[random.nextInt(names.length)];
            String base = bundled.get(name);
            if (name.equals(Catalog.MATERIALS_FILE)) {
                // Point the bundled materials at the small table, so the folder needs no other table.
                base = base.replaceAll(",(asme|astm)-[a-z0-9.]+,", ",mini,");
            }
            String input = generate(random, base);
            boolean asUserFolder = random.nextInt(8) == 0;
            Path dir = full;
            if (asUserFolder) {
                dir = Files.createDirectory(root.resolve("user-" + i));
            }
            Path file = dir.resolve(name);
            Files.writeString(file, input, StandardCharsets.UTF_8);
            long start = System.nanoTime();
            try {
                Catalog catalog = asUserFolder ? Catalog.withUserFolder(dir) : Catalog.load(dir);
                checkFinite(catalog, i);
                loaded++;
            } catch (InputException e) {
                rejected++;
                Fuzz.assertLocated(e, name, SEED, i);
            } catch (RuntimeException | StackOverflowError e) {
                fail(
                        "case " + i + " (seed " + SEED + ") threw " + e + " for " + name + ":\n"
                                + Fuzz.abbreviate(input),
                        e);
            }
            long ms = (System.nanoTime() - start) / 1_000_000;
            assertTrue(ms < PER_INPUT_BUDGET_MS, "case " + i + " (seed " + SEED + ") took " + ms + " ms");
            if (asUserFolder) {
                Files.delete(file);
                Files.delete(dir);
            } else {
                if (name.startsWith(Catalog.SIZES_PREFIX)) {
                    Files.delete(file);
                } else {
                    Files.writeString(file, companions.get(name), StandardCharsets.UTF_8);
                }
            }
        }
        org.headway.Fuzz.summary("catalog files fuzz: " + INPUTS + " files, " + rejected
                + " rejected with a located error, " + loaded + " loaded");
        assertTrue(rejected > 0 && loaded > 0, "both outcomes must be exercised");
    }

    private static void checkFinite(Catalog catalog, int i) {
        String m = "case " + i + " (seed " + SEED + "): ";
        for (Material material : catalog.materials()) {
            assertTrue(Double.isFinite(material.roughness()) && material.roughness() >= 0, m + material);
        }
        for (String table : catalog.tables()) {
            for (PipeSize size : catalog.sizes(table, null)) {
                assertTrue(Double.isFinite(size.innerDiameter()) && size.innerDiameter() > 0, m + size);
            }
        }
        for (Fitting fitting : catalog.fittings()) {
            for (double re : new double[] {1.0, 1.0e5}) {
                double k = fitting.lossCoefficient(re, 0.05);
                assertTrue(Double.isFinite(k) && k >= 0, m + fitting.id() + " K = " + k);
            }
        }
    }

    private static String generate(Random random, String valid) {
        return switch (random.nextInt(14)) {
            case 0 -> Fuzz.randomText(random, "0123456789,.-e \n#\"abc:source", 300);
            case 1 -> Fuzz.randomBytesAsText(random, 300);
            case 2 -> "\uFEFF" + valid.replace("\n", "\r\n");
            case 3 -> valid + "x" + ",1".repeat(random.nextInt(random.nextInt(50) == 0 ? 100_000 : 400)) + "\n";
            case 4 -> valid.replace("\n", "\r");
            case 5 -> Fuzz.mutateLines(random, valid);
            case 6 -> Fuzz.mutateColumns(random, valid);
            case 7, 8, 9 -> Fuzz.replaceCell(random, valid);
            default -> Fuzz.mutate(random, valid, 1 + random.nextInt(3));
        };
    }
}
