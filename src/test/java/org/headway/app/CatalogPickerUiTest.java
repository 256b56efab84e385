package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.TableView;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.headway.pipe.Catalog;
import org.headway.pipe.Fitting;
import org.headway.project.Project;
import org.headway.project.ProjectResolver;
import org.headway.system.HeadLossCalculator;
import org.headway.system.PipeRun;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The searchable catalog lists: their filter, and picking a fitting and a material through the real window. */
@ExtendWith(ApplicationExtension.class)
class CatalogPickerUiTest {

    static {
        WindowFixture.prepareScreen();
    }

    private WindowFixture fx;

    @Start
    void start(Stage stage) throws Exception {
        fx = new WindowFixture(stage);
    }

    @Test
    void theListsHoldTheCatalogAndTheFilterKeepsWhatMatchesEveryWord() {
        Catalog c = Catalog.bundled();
        assertEquals(
                c.fittings().stream().map(Fitting::id).toList(),
                CatalogPicker.fittings(c).stream().map(CatalogPicker.Entry::id).toList());
        assertEquals(c.materials().size(), CatalogPicker.materials(c).size());
        // The filter against a count made here over the catalog's own ids and descriptions.
        for (String q : List.of("elbow 90", "VALVE", "tee", "zzz-none")) {
            long expected = c.fittings().stream()
                    .filter(f -> {
                        String hay = (f.id() + " " + f.description() + " — " + f.method()).toLowerCase(Locale.ROOT);
                        for (String w : q.toLowerCase(Locale.ROOT).split(" ")) {
                            if (!hay.contains(w)) {
                                return false;
                            }
                        }
                        return true;
                    })
                    .count();
            assertEquals(
                    expected, CatalogPicker.filter(CatalogPicker.fittings(c), q).size(), q);
        }
        assertTrue(CatalogPicker.filter(CatalogPicker.fittings(c), "zzz-none").isEmpty());
        assertEquals(
                c.fittings().size(),
                CatalogPicker.filter(CatalogPicker.fittings(c), "  ").size());
        // The id is shown beside the name.
        CatalogPicker.Entry first = CatalogPicker.materials(c).get(0);
        assertTrue(first.toString().contains("[" + first.id() + "]"), first.toString());
    }

    @Test
    void aFittingPickedByTypingIsAddedAndTheTotalIsTheEngines(FxRobot robot) throws Exception {
        fx.awaitResults();
        TableView<?> table = robot.lookup("#segment-table").queryAs(TableView.class);
        robot.interact(() -> table.getSelectionModel().select(1));
        WaitForAsyncUtils.waitForFxEvents();
        int before = fx.editor.project().segments().get(1).fittings().size();
        robot.clickOn("#segment-add-fitting");
        WaitForAsyncUtils.waitForFxEvents();
        robot.write("gate");
        WaitForAsyncUtils.waitForFxEvents();
        @SuppressWarnings("unchecked")
        ListView<CatalogPicker.Entry> list = robot.lookup("#picker-list").queryAs(ListView.class);
        assertFalse(list.getItems().isEmpty(), "the bundled catalog has a gate valve");
        String wanted = list.getItems().get(0).id();
        assertTrue(list.getItems().stream().allMatch(e -> CatalogPicker.matches(e, "gate")));
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        List<Project.FittingSpec> after = fx.editor.project().segments().get(1).fittings();
        assertEquals(before + 1, after.size());
        assertEquals(wanted, after.get(after.size() - 1).kind());
        // The total shown is the engine's on the project as it now stands.
        WaitForAsyncUtils.waitFor(
                20, TimeUnit.SECONDS, () -> !fx.results.computingProperty().get());
        fx.awaitResults();
        PipeRun run = ProjectResolver.resolve(fx.editor.project(), Catalog.bundled(), fx.dir)
                .run();
        String engine = Quantities.format(
                HeadLossCalculator.solve(run, run.designFlow()).totals().headLoss(), QuantityKind.HEAD, UnitSystem.SI);
        WaitForAsyncUtils.waitFor(
                20,
                TimeUnit.SECONDS,
                () -> engine.equals(robot.lookup("#total-total-head-loss")
                        .tryQuery()
                        .map(n -> ((Label) n).getText())
                        .orElse("")));
    }

    @Test
    void aMaterialIsPickedForANetworkLinkByItsName(FxRobot robot) throws Exception {
        robot.interact(() -> {
            fx.window.showNetwork(true);
            fx.window.network().selectionProperty().set(new NetworkEditor.Selection(NetworkEditor.Part.LINK, 0));
        });
        WaitForAsyncUtils.waitForFxEvents();
        robot.clickOn("#form-material-find");
        WaitForAsyncUtils.waitForFxEvents();
        robot.write("pvc");
        WaitForAsyncUtils.waitForFxEvents();
        @SuppressWarnings("unchecked")
        ListView<CatalogPicker.Entry> list = robot.lookup("#picker-list").queryAs(ListView.class);
        String wanted = list.getItems().get(0).id();
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(wanted, fx.window.network().cell(NetworkEditor.Part.LINK, 0, "material"));
    }
}
