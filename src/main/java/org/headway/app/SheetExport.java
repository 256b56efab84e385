package org.headway.app;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;
import org.headway.report.CsvSheetWriter;
import org.headway.report.HeadLossSheet;
import org.headway.report.PdfSheetWriter;
import org.headway.report.WorkbookSheetWriter;
import org.headway.units.UnitSystem;

/**
 * Writes the head-loss sheet three ways (PDF, workbook, CSV) next to each other, reporting
 * progress and stopping between files when cancelled. A cancelled export removes the files it
 * had already written, so a folder never holds half a set.
 */
public final class SheetExport {

    /** Receives progress: files done, of files in all, and what is being written. */
    @FunctionalInterface
    public interface Progress {
        void update(int done, int total, String what);
    }

    /** Thrown when the export was cancelled. */
    public static final class Cancelled extends RuntimeException {
        Cancelled() {
            super("export cancelled; no files kept");
        }
    }

    private SheetExport() {}

    /** The three files for a chosen PDF name: same folder and base name, .pdf .xlsx .csv. */
    public static List<Path> targets(Path chosen) {
        String name = chosen.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String base = dot > 0 ? name.substring(0, dot) : name;
        return List.of(
                chosen.resolveSibling(base + ".pdf"),
                chosen.resolveSibling(base + ".xlsx"),
                chosen.resolveSibling(base + ".csv"));
    }

    /**
     * @param sheet the sheet content
     * @param chosen file name chosen by the user (its extension is replaced)
     * @param units unit system of the PDF
     * @param progress progress receiver
     * @param cancelled polled between files
     * @return the files written
     * @throws Cancelled when cancelled (files written so far are removed)
     */
    public static List<Path> write(
            HeadLossSheet sheet, Path chosen, UnitSystem units, Progress progress, BooleanSupplier cancelled) {
        List<Path> targets = targets(chosen);
        List<Path> written = new ArrayList<>();
        String[] what = {"PDF sheet", "workbook", "CSV table"};
        for (int i = 0; i < targets.size(); i++) {
            if (cancelled.getAsBoolean()) {
                removeAll(written);
                throw new Cancelled();
            }
            progress.update(i, targets.size(), "writing the " + what[i]);
            Path t = targets.get(i);
            switch (i) {
                case 0 -> PdfSheetWriter.write(sheet, t, true, units);
                case 1 -> WorkbookSheetWriter.write(sheet, t, true);
                default -> CsvSheetWriter.write(sheet, t, true);
            }
            written.add(t);
        }
        if (cancelled.getAsBoolean()) {
            removeAll(written);
            throw new Cancelled();
        }
        progress.update(targets.size(), targets.size(), "done");
        return written;
    }

    private static void removeAll(List<Path> files) {
        for (Path p : files) {
            try {
                Files.deleteIfExists(p);
            } catch (IOException ignored) {
                // Best effort: the user asked to stop, and a leftover file is named plainly.
            }
        }
    }
}
