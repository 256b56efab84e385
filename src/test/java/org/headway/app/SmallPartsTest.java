package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;
import javax.imageio.ImageIO;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.project.Project;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.headway.report.HeadLossSheet;
import org.headway.report.SheetCharts;
import org.headway.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Fittings text, recent files, display detection, chart files and the sheet export job. */
class SmallPartsTest {

    @TempDir
    Path dir;

    @Test
    void fittingsTextRoundTrips() {
        Catalog catalog = Catalog.bundled();
        List<Project.FittingSpec> list = FittingsText.parse("exit, elbow-45-long-radius x4, tee-branch K=1.3", catalog);
        assertEquals(
                List.of(
                        new Project.FittingSpec("exit", 1, ""),
                        new Project.FittingSpec("elbow-45-long-radius", 4, ""),
                        new Project.FittingSpec("tee-branch", 1, "1.3")),
                list);
        assertEquals("exit, elbow-45-long-radius ×4, tee-branch K=1.3", FittingsText.format(list));
        assertEquals(list, FittingsText.parse(FittingsText.format(list), catalog));
        assertEquals("6 fittings", FittingsText.summary(list));
        assertTrue(FittingsText.parse("  ", catalog).isEmpty());
    }

    @Test
    void badFittingsTextNamesTheItem() {
        Catalog catalog = Catalog.bundled();
        InputException unknown =
                assertThrows(InputException.class, () -> FittingsText.parse("exit, valve-of-dreams", catalog));
        assertEquals("fittings item 2", unknown.where());
        assertTrue(unknown.problem().contains("valve-of-dreams"), unknown.problem());
        InputException zero = assertThrows(InputException.class, () -> FittingsText.parse("exit ×0", catalog));
        assertTrue(zero.problem().contains("at least 1"), zero.problem());
        InputException empty = assertThrows(InputException.class, () -> FittingsText.parse("exit,,exit", catalog));
        assertTrue(empty.problem().contains("empty item"), empty.problem());
        InputException k = assertThrows(InputException.class, () -> FittingsText.parse("exit K=-2", catalog));
        assertTrue(k.problem().contains("≥ 0"), k.problem());
    }

    @Test
    void recentFilesKeepTheNewestFirstAndSurviveARestart() {
        Path store = dir.resolve("data/recent.txt");
        RecentFiles recent = new RecentFiles(store);
        for (int i = 0; i < RecentFiles.MAX_ENTRIES + 3; i++) {
            recent.add(dir.resolve("p" + i + ".json"));
        }
        recent.add(dir.resolve("p4.json"));
        assertEquals(RecentFiles.MAX_ENTRIES, recent.entries().size());
        assertEquals(dir.resolve("p4.json").toAbsolutePath(), recent.entries().get(0));
        assertEquals(dir.resolve("p10.json").toAbsolutePath(), recent.entries().get(1));
        RecentFiles again = new RecentFiles(store);
        assertEquals(recent.entries(), again.entries());
        again.remove(dir.resolve("p4.json"));
        assertFalse(
                new RecentFiles(store).entries().contains(dir.resolve("p4.json").toAbsolutePath()));
    }

    @Test
    void aDisplayIsDetectedFromTheEnvironment() {
        assertFalse(DesktopLauncher.displayAvailable("Linux", Map.of(), false));
        assertFalse(DesktopLauncher.displayAvailable("Linux", Map.of("DISPLAY", " "), false));
        assertTrue(DesktopLauncher.displayAvailable("Linux", Map.of("DISPLAY", ":0"), false));
        assertTrue(DesktopLauncher.displayAvailable("Linux", Map.of("WAYLAND_DISPLAY", "wayland-0"), false));
        assertFalse(DesktopLauncher.displayAvailable("Linux", Map.of("DISPLAY", ":0"), true));
        assertTrue(DesktopLauncher.displayAvailable("Windows 11", Map.of(), false));
        assertFalse(DesktopLauncher.displayAvailable("Windows 11", Map.of(), true));
    }

    private HeadLossSheet demoSheet() throws Exception {
        Path demo = Demo.copyTo(dir);
        return HeadLossSheet.of(ProjectResolver.resolve(ProjectFile.load(demo), Catalog.bundled(), dir), "test");
    }

    @Test
    void chartsExportAsPngAndSvg() throws Exception {
        HeadLossSheet sheet = demoSheet();
        Path png = dir.resolve("friction.png");
        ChartFiles.write(SheetCharts.friction(sheet), png);
        byte[] head = java.util.Arrays.copyOf(Files.readAllBytes(png), 8);
        // PNG signature, ISO/IEC 15948 section 5.2.
        assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G', 0x0D, 0x0A, 0x1A, 0x0A}, head);
        BufferedImage image = ImageIO.read(png.toFile());
        assertEquals(ChartFiles.WIDTH, image.getWidth());
        assertEquals(ChartFiles.HEIGHT, image.getHeight());
        Path svg = dir.resolve("system.svg");
        ChartFiles.write(SheetCharts.system(sheet, UnitSystem.SI), svg);
        String text = Files.readString(svg);
        assertTrue(text.contains("<svg") && text.contains("</svg>"), "an SVG document");
    }

    @Test
    void sheetExportWritesThreeFilesWithProgress() throws Exception {
        HeadLossSheet sheet = demoSheet();
        List<String> steps = new ArrayList<>();
        List<Path> written = SheetExport.write(
                sheet,
                dir.resolve("out/sheet.pdf"),
                UnitSystem.SI,
                (done, total, what) -> steps.add(done + "/" + total),
                () -> false);
        assertEquals(
                List.of(dir.resolve("out/sheet.pdf"), dir.resolve("out/sheet.xlsx"), dir.resolve("out/sheet.csv")),
                written);
        for (Path p : written) {
            assertTrue(Files.size(p) > 0, p.toString());
        }
        byte[] pdf = java.util.Arrays.copyOf(Files.readAllBytes(dir.resolve("out/sheet.pdf")), 5);
        // Every PDF starts with the "%PDF-" header (ISO 32000-1, 7.5.2).
        assertArrayEquals("%PDF-".getBytes(java.nio.charset.StandardCharsets.US_ASCII), pdf);
        assertEquals(List.of("0/3", "1/3", "2/3", "3/3"), steps);
    }

    @Test
    void cancelledSheetExportKeepsNoFiles() throws Exception {
        HeadLossSheet sheet = demoSheet();
        AtomicInteger polls = new AtomicInteger();
        // Cancelled after the first file: the PDF written so far must be removed.
        assertThrows(
                SheetExport.Cancelled.class,
                () -> SheetExport.write(
                        sheet,
                        dir.resolve("c/sheet.pdf"),
                        UnitSystem.SI,
                        (d, t, w) -> {},
                        () -> polls.incrementAndGet() > 1));
        assertFalse(Files.exists(dir.resolve("c/sheet.pdf")));
        assertFalse(Files.exists(dir.resolve("c/sheet.xlsx")));
    }
}
