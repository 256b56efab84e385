package org.headway.pipe;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class CatalogBundledTest {

    private static final double MM = 1.0e-3;
    private static final double MM_PER_INCH = 25.4;

    private final Catalog catalog = Catalog.bundled();

    @Test
    void bundledIsCachedAndHoldsEveryFile() {
        assertSame(catalog, Catalog.bundled());
        assertEquals(14, catalog.materials().size());
        assertEquals(
                List.of("asme-b36.10m", "asme-b36.19m", "astm-b88", "astm-d1785", "en-10255", "en-545", "iso-4427"),
                catalog.tables());
        Set<String> methods =
                catalog.fittings().stream().map(Fitting::method).collect(Collectors.toCollection(TreeSet::new));
        assertEquals(Set.of("fixed K", "2-K (Hooper 1981)", "3-K (Darby 2001)"), methods);
    }

    /** The jar lists its files by name; a file added to fluids-data/catalog must be listed too. */
    @Test
    void everyFileInTheDataFolderIsBundled() throws IOException {
        // surefire runs in the project folder, where fluids-data/ is the one source of truth
        try (Stream<Path> files = Files.list(Path.of("fluids-data", "catalog"))) {
            Set<String> onDisk =
                    files.map(p -> p.getFileName().toString()).collect(Collectors.toCollection(TreeSet::new));
            assertEquals(new TreeSet<>(Catalog.BUNDLED_FILES), onDisk);
        }
    }

    @Test
    void loadingTheDataFolderDirectlyGivesTheSameCatalog() {
        Catalog fromFolder = Catalog.load(Path.of("fluids-data", "catalog"));
        assertEquals(catalog.materials(), fromFolder.materials());
        assertEquals(catalog.tables(), fromFolder.tables());
        assertEquals(catalog.sizes("asme-b36.10m", null), fromFolder.sizes("asme-b36.10m", null));
    }

    @Test
    void materialRoughnessIsStoredInMetres() {
        // Moody (1944) Fig. 1: commercial steel 0.00015 ft = 0.046 mm (from memory)
        Material steel = catalog.material("steel-commercial-new");
        assertEquals(0.046 * MM, steel.roughness(), 1e-12);
        assertEquals("asme-b36.10m", steel.sizeTable());
        for (Material m : catalog.materials()) {
            assertTrue(m.roughnessLow() <= m.roughness() && m.roughness() <= m.roughnessHigh(), m.id());
            assertFalse(m.source().isBlank(), m.id());
        }
    }

    /**
     * Darby's 90° elbow rows: each row's description names the bend radius of the coefficients it
     * carries. SOURCE: Darby, R., Chemical Engineering Fluid Mechanics, 2nd ed. (2001), 3-K table
     * (Table 7-3, table number from memory), 90° elbows, from memory: r/D = 1 threaded 800, 0.14,
     * 4.0; r/D = 1 flanged/welded 800, 0.091, 4.0; long radius r/D = 1.5 800, 0.071, 4.2;
     * flanged/welded bend r/D = 2 800, 0.056, 3.9.
     */
    @ParameterizedTest
    @CsvSource({
        "darby-elbow-90-standard-threaded, r/D = 1, 800, 0.14, 4.0",
        "darby-elbow-90-standard-flanged, r/D = 1, 800, 0.091, 4.0",
        "darby-elbow-90-long-radius, r/D = 1.5, 800, 0.071, 4.2",
        "darby-elbow-90-bend-r2, r/D = 2, 800, 0.056, 3.9"
    })
    void darbyNinetyDegreeElbowsCarryTheCoefficientsOfTheirRadius(
            String id, String radius, double k1, double ki, double kd) {
        Darby2001ThreeK elbow = (Darby2001ThreeK) catalog.fitting(id);
        assertTrue(elbow.description().contains("(" + radius + ")"), elbow.description());
        assertEquals(k1, elbow.laminarCoefficient(), 0.0, id);
        assertEquals(ki, elbow.turbulentCoefficient(), 0.0, id);
        assertEquals(kd, elbow.sizeCoefficient(), 0.0, id);
    }

    /**
     * The nominal diameter Darby's 3-K size term takes. SOURCE: NPS is the size in inches and DN the
     * size in millimetres (ISO 6708 for DN; ASME B36.10M for NPS; from memory); NPS 1/2 has OD 21.3
     * mm, copper tube 1/2 has OD 5/8 in (ASTM B88, from memory).
     */
    @ParameterizedTest(name = "{0} with OD {1} mm is {2} mm nominal")
    @CsvSource({
        "1/2,     21.3,   12.7",
        "1-1/2,   48.3,   38.1",
        "1 1/2,   48.3,   38.1",
        "2,       60.3,   50.8",
        "24,      610,    609.6",
        "DN 50,   60.3,   50",
        "dn15,    21.3,   15",
        "50,      60.3,   50",
        "1/2,     15.875, 12.7"
    })
    void nominalSizesReadAsInchesOrDn(String nominal, double outsideMillimetres, double expectedMillimetres) {
        PipeSize size = new PipeSize("t", nominal, "40", outsideMillimetres * MM, 0.002, 0.01, "test");
        assertEquals(expectedMillimetres * MM, size.nominalDiameter().getAsDouble(), 1e-12);
    }

    @ParameterizedTest
    @ValueSource(strings = {"large", "", "80", "1-1"})
    void nominalSizeWithNoPlausibleReadingIsUnknown(String nominal) {
        // "80" beside an OD of 21.3 mm is neither 80 in nor DN 80
        PipeSize size = new PipeSize("t", nominal, "40", 21.3 * MM, 0.002, 0.0173, "test");
        assertTrue(size.nominalDiameter().isEmpty(), nominal);
    }

    @Test
    void everyBundledSizeHasANominalDiameter() {
        for (String table : catalog.tables()) {
            for (PipeSize size : catalog.sizes(table, null)) {
                assertTrue(size.nominalDiameter().isPresent(), table + " " + size.nominal());
            }
        }
    }

    @Test
    void unknownMaterialNamesCloseIds() {
        InputException e = assertThrows(InputException.class, () -> catalog.material("steel-comercial-new"));
        assertEquals("material", e.where());
        assertTrue(e.getMessage().contains("unknown material 'steel-comercial-new'"), e.getMessage());
        assertTrue(e.getMessage().contains("steel-commercial-new"), e.getMessage());
    }

    @Test
    void unknownFittingNamesCloseIds() {
        InputException e = assertThrows(InputException.class, () -> catalog.fitting("elbow-90"));
        assertTrue(e.getMessage().contains("elbow-90-standard"), e.getMessage());
        assertTrue(e.getMessage().contains("elbow-90-long-radius"), e.getMessage());
    }

    /**
     * Computed inner diameter (OD − 2 wall) against the standards' tabulated inside diameters.
     * Reference values and tolerance: see the header of the CSV (from memory). JUnit skips the
     * comment lines itself; numLinesToSkip drops the header row only.
     */
    @ParameterizedTest(name = "{0} NPS {1} {2}")
    @CsvFileSource(resources = "pipe-inner-diameters.csv", numLinesToSkip = 1)
    void innerDiameterMatchesTabulatedValue(
            String table, String nominal, String schedule, double insideInches, double toleranceMm) {
        Material material = catalog.materials().stream()
                .filter(m -> m.sizeTable().equals(table))
                .findFirst()
                .orElseThrow();
        PipeSize size = catalog.size(material, nominal, schedule);
        assertEquals(insideInches * MM_PER_INCH, size.innerDiameter() / MM, toleranceMm);
        assertEquals(size.outsideDiameter() - 2 * size.wallThickness(), size.innerDiameter(), 1e-12);
    }

    @Test
    void namedSpotValues() {
        Material steel = catalog.material("steel-commercial-new");
        // ASME B36.10M: NPS 2 Sch 40 ID 2.067 in = 52.50 mm; NPS 4 Sch 40 ID 4.026 in = 102.26 mm;
        // NPS 6 Sch 80 ID 5.761 in = 146.33 mm (from memory); SI columns round OD to 0.1 mm
        assertEquals(52.50, catalog.size(steel, "2", "40").innerDiameter() / MM, 0.065);
        assertEquals(102.26, catalog.size(steel, "4", "40").innerDiameter() / MM, 0.065);
        assertEquals(146.33, catalog.size(steel, "6", "80").innerDiameter() / MM, 0.065);
        // nominal written with a space and schedule in lower case find the same row
        assertSame(catalog.size(steel, "1-1/2", "STD"), catalog.size(steel, "1 1/2", "std"));
    }

    @Test
    void sizesAreSortedByInnerDiameter() {
        for (String table : catalog.tables()) {
            for (String schedule : catalog.schedules(table)) {
                List<PipeSize> sizes = catalog.sizes(table, schedule);
                for (int i = 1; i < sizes.size(); i++) {
                    assertTrue(
                            sizes.get(i - 1).innerDiameter() <= sizes.get(i).innerDiameter(),
                            table + " " + schedule + " at " + sizes.get(i).nominal());
                }
            }
            List<PipeSize> all = catalog.sizes(table, null);
            for (int i = 1; i < all.size(); i++) {
                assertTrue(all.get(i - 1).innerDiameter() <= all.get(i).innerDiameter());
            }
        }
    }

    /** Heavier schedules of one nominal size keep the OD and thicken the wall (common practice, no source). */
    @Test
    void wallGrowsWithScheduleAtFixedOutsideDiameter() {
        assertWallOrder("asme-b36.10m", List.of("10", "40", "80", "160"));
        assertWallOrder("asme-b36.10m", List.of("STD", "XS"));
        assertWallOrder("asme-b36.19m", List.of("5S", "10S", "40S"));
        assertWallOrder("astm-b88", List.of("M", "L", "K"));
        assertWallOrder("astm-d1785", List.of("40", "80"));
    }

    private void assertWallOrder(String table, List<String> lightToHeavy) {
        Map<String, PipeSize> previous = new HashMap<>();
        for (String schedule : lightToHeavy) {
            for (PipeSize s : catalog.sizes(table, schedule)) {
                PipeSize lighter = previous.get(s.nominal());
                if (lighter != null) {
                    assertEquals(lighter.outsideDiameter(), s.outsideDiameter(), 0.0, table + " " + s.nominal());
                    assertTrue(
                            s.wallThickness() > lighter.wallThickness(),
                            table + " " + s.nominal() + " " + schedule + " vs " + lighter.schedule());
                }
                previous.put(s.nominal(), s);
            }
        }
    }

    /** ASME B36.19M uses the outside diameters of B36.10M, and 40S equals Sch 40 to NPS 10 (from memory). */
    @Test
    void stainlessSharesSteelOutsideDiametersAnd40SWalls() {
        Material steel = catalog.material("steel-commercial-new");
        for (PipeSize s : catalog.sizes("asme-b36.19m", null)) {
            PipeSize carbon = catalog.size(steel, s.nominal(), "40");
            assertEquals(carbon.outsideDiameter(), s.outsideDiameter(), 1e-12, s.nominal());
        }
        for (PipeSize s : catalog.sizes("asme-b36.19m", "40S")) {
            if (!s.nominal().equals("12")) {
                assertEquals(catalog.size(steel, s.nominal(), "40").wallThickness(), s.wallThickness(), 1e-12);
            }
        }
    }

    /** ASTM D1785 PVC uses the iron-pipe-size ODs of B36.10M (from memory); SI OD rounding 0.05 mm. */
    @Test
    void pvcSharesSteelOutsideDiameters() {
        Material steel = catalog.material("steel-commercial-new");
        for (PipeSize s : catalog.sizes("astm-d1785", "40")) {
            assertEquals(
                    catalog.size(steel, s.nominal(), "40").outsideDiameter() / MM,
                    s.outsideDiameter() / MM,
                    0.051,
                    s.nominal());
        }
    }

    /** ASTM B88: copper tube OD is the nominal size plus 1/8 in (from memory). */
    @ParameterizedTest
    @ValueSource(strings = {"1/4", "3/8", "1/2", "3/4", "1", "1-1/4", "1-1/2", "2", "2-1/2", "4", "6", "12"})
    void copperOutsideDiameterIsNominalPlusAnEighth(String nominal) {
        PipeSize tube = catalog.size(catalog.material("copper-drawn"), nominal, "L");
        double inches = parseNominal(nominal) + 0.125;
        assertEquals(inches * MM_PER_INCH, tube.outsideDiameter() / MM, 1e-9);
    }

    private static double parseNominal(String nominal) {
        String[] whole = nominal.split("-");
        double value = 0;
        for (String part : whole) {
            if (part.contains("/")) {
                String[] f = part.split("/");
                value += Double.parseDouble(f[0]) / Double.parseDouble(f[1]);
            } else {
                value += Double.parseDouble(part);
            }
        }
        return value;
    }

    @Test
    void missingSizeNamesTableNominalScheduleAndWhatExists() {
        Material steel = catalog.material("steel-commercial-new");
        InputException e = assertThrows(InputException.class, () -> catalog.size(steel, "3-1/2", "160"));
        assertEquals(
                "size: table asme-b36.10m has no nominal 3-1/2 in schedule 160; schedules for nominal 3-1/2:"
                        + " 10, 40, STD, 80, XS",
                e.getMessage());
        InputException noNominal = assertThrows(InputException.class, () -> catalog.size(steel, "7", "40"));
        assertTrue(noNominal.getMessage().contains("no nominal 7 in schedule 40"), noNominal.getMessage());
        assertTrue(noNominal.getMessage().contains("1/8, 1/4"), noNominal.getMessage());
        InputException noTable =
                assertThrows(InputException.class, () -> catalog.size(catalog.material("concrete"), "2", "40"));
        assertTrue(noTable.getMessage().contains("material concrete has no size table"), noTable.getMessage());
        InputException badSchedule = assertThrows(InputException.class, () -> catalog.sizes("astm-b88", "40"));
        assertEquals("schedule: table astm-b88 has no schedule 40; schedules: K, L, M", badSchedule.getMessage());
        InputException badTable = assertThrows(InputException.class, () -> catalog.sizes("asme-b36.10", "40"));
        assertTrue(badTable.getMessage().contains("did you mean asme-b36.10m"), badTable.getMessage());
    }
}
