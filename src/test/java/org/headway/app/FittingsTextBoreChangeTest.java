package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.project.Project;
import org.junit.jupiter.api.Test;

/** The fittings line reads and writes a reducer or enlarger at the pipe's outlet. */
class FittingsTextBoreChangeTest {

    private final Catalog catalog = Catalog.bundled();

    @Test
    void readsAndWritesABoreChange() {
        List<Project.FittingSpec> list =
                FittingsText.parse("elbow-90-standard x2, bore-change to 73.6 mm cone 30°", catalog);
        assertEquals(2, list.size());
        Project.FittingSpec change = list.get(1);
        assertEquals("bore-change", change.kind());
        assertEquals("73.6 mm", change.toDiameter());
        assertEquals("30", change.includedAngleDegrees());
        assertEquals("elbow-90-standard ×2, bore-change to 73.6 mm cone 30", FittingsText.format(list));
        assertEquals(list, FittingsText.parse(FittingsText.format(list), catalog));
        Project.FittingSpec sudden =
                FittingsText.parse("bore-change to 90 mm", catalog).get(0);
        assertEquals("", sudden.includedAngleDegrees());
    }

    @Test
    void aBoreChangeWithoutItsBoreIsRefused() {
        InputException e = assertThrows(InputException.class, () -> FittingsText.parse("exit, bore-change", catalog));
        assertEquals("fittings item 2", e.where());
        assertTrue(e.getMessage().contains("bore-change to 73.6 mm"), e.getMessage());
    }
}
