package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.pipe.Material;
import org.headway.pipe.PipeSize;
import org.junit.jupiter.api.Test;

/**
 * The catalog lookups the run editor shares with the resolver: a segment's bore and roughness as a
 * run takes them, and the size nearest a bore when a schedule or material changes.
 */
class ProjectResolverLookupsTest {

    /** The catalog's bores are OD − 2 × wall of values given to 0.01 mm; this is round-off only. */
    private static final double ARITHMETIC = 1e-12;

    private static final Catalog CATALOG = Catalog.bundled();

    private static Project.SegmentSpec segment(Optional<Project.PipeSpec> pipe, String bore, String roughness) {
        return new Project.SegmentSpec("s", "10 m", pipe, bore, roughness, List.of(), "", "");
    }

    private static final Optional<Project.PipeSpec> STEEL_2_40 =
            Optional.of(new Project.PipeSpec("steel-commercial-new", "2", "40"));

    @Test
    void aCatalogPipeTakesItsTableBoreAndMaterialRoughness() {
        Project.SegmentSpec s = segment(STEEL_2_40, "", "");
        // ASME B36.10M Table 1 (from memory, as the catalog file says): NPS 2 Sch 40 is OD 60.3 mm, wall
        // 3.91 mm, so the bore is 60.3 − 2 × 3.91 = 52.48 mm.
        assertEquals(0.05248, ProjectResolver.innerDiameter(s, CATALOG), ARITHMETIC);
        // New commercial steel 0.046 mm (Moody 1944 Fig. 1, 0.00015 ft; from memory, as materials.csv says).
        assertEquals(0.046e-3, ProjectResolver.roughness(s, CATALOG), ARITHMETIC);
        // The same numbers the resolver builds the run's pipe from.
        Project p = Project.of(
                "lookups",
                Project.TitleBlock.EMPTY,
                new Project.FluidSpec("water", "20 degC", "", "", "", ""),
                "3 L/s",
                "",
                "auto",
                List.of(s),
                Project.EndsSpec.OPEN,
                Optional.empty(),
                Project.LimitsSpec.NONE,
                Optional.empty(),
                Optional.empty());
        var pipe = ProjectResolver.resolve(p, CATALOG, Path.of("."))
                .run()
                .segments()
                .get(0);
        assertEquals(pipe.innerDiameter(), ProjectResolver.innerDiameter(s, CATALOG), 0.0);
        assertEquals(pipe.roughness(), ProjectResolver.roughness(s, CATALOG), 0.0);
    }

    @Test
    void valuesGivenInTheProjectOverrideTheCatalog() {
        Project.SegmentSpec s = segment(STEEL_2_40, "50 mm", "0.1 mm");
        assertEquals(0.050, ProjectResolver.innerDiameter(s, CATALOG), ARITHMETIC);
        assertEquals(0.1e-3, ProjectResolver.roughness(s, CATALOG), ARITHMETIC);
    }

    @Test
    void missingOrUnknownValuesAreRefusedNamingTheField() {
        Project.SegmentSpec bare = segment(Optional.empty(), "", "");
        InputException bore = assertThrows(InputException.class, () -> ProjectResolver.innerDiameter(bare, CATALOG));
        assertEquals("innerDiameter", bore.where());
        InputException rough = assertThrows(InputException.class, () -> ProjectResolver.roughness(bare, CATALOG));
        assertEquals("roughness", rough.where());
        Project.SegmentSpec unknown = segment(Optional.of(new Project.PipeSpec("unobtainium", "2", "40")), "", "");
        InputException material =
                assertThrows(InputException.class, () -> ProjectResolver.innerDiameter(unknown, CATALOG));
        assertTrue(material.where().startsWith("pipe.material"), material.where());
        Project.SegmentSpec noSize =
                segment(Optional.of(new Project.PipeSpec("steel-commercial-new", "2-3/4", "40")), "", "");
        InputException size = assertThrows(InputException.class, () -> ProjectResolver.innerDiameter(noSize, CATALOG));
        assertTrue(size.where().startsWith("pipe.size"), size.where());
    }

    @Test
    void theNearestSizeIsTakenByRatio() {
        Material steel = CATALOG.material("steel-commercial-new");
        // ASME B36.10M Table 1 (from memory), Sch 80 bores: NPS 1-1/2 48.3 − 2 × 5.08 = 38.14 mm, NPS 2
        // 60.3 − 2 × 5.54 = 49.22 mm, NPS 2-1/2 73.0 − 2 × 7.01 = 58.98 mm. From the Sch 40 NPS 2 bore of
        // 52.48 mm, ln(52.48/49.22) = 0.064 against ln(58.98/52.48) = 0.117: NPS 2.
        PipeSize two = ProjectResolver.nearestSize(CATALOG, steel, "80", 0.05248);
        assertEquals("2", two.nominal());
        assertEquals("80", two.schedule());
        // 54 mm lies nearer 49.22 mm by difference (4.78 against 4.98 mm) but nearer 58.98 mm by ratio
        // (ln 1.0922 = 0.088 against ln 1.0971 = 0.093): the ratio rule picks NPS 2-1/2.
        assertEquals(
                "2-1/2",
                ProjectResolver.nearestSize(CATALOG, steel, "80", 0.054).nominal());
    }
}
