package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import javafx.scene.control.TabPane;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.headway.friction.FrictionMethods;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The Help menu through the real window, headless under Monocle. */
@ExtendWith(ApplicationExtension.class)
class HelpMenuUiTest {

    static {
        WindowFixture.prepareScreen();
    }

    private WindowFixture fx;

    @Start
    void start(Stage stage) throws Exception {
        fx = new WindowFixture(stage);
    }

    @Test
    void f1ListsTheShortcutsTheWindowAnswersTo(FxRobot robot) throws Exception {
        robot.press(KeyCode.F1).release(KeyCode.F1);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, fx.dialogs.texts.size(), "F1 opens the shortcuts page");
        String page = fx.dialogs.texts.get(0);
        List<HelpContent.Shortcut> listed = fx.window.shortcuts();
        for (HelpContent.Shortcut s : listed) {
            assertTrue(page.contains(s.keys()) && page.contains(s.command()), s.toString());
        }
        // Against the user documentation (desktop-app.md, written by hand): every "Ctrl+…" key it
        // names is one the window lists, so neither can drift without this failing.
        String doc = Files.readString(Path.of("src/site/docs/desktop-app.md"), StandardCharsets.UTF_8);
        Matcher m = Pattern.compile("Ctrl\\+(Shift\\+)?([A-Z0-9]|Enter)\\b").matcher(doc);
        Set<String> documented = new TreeSet<>();
        while (m.find()) {
            documented.add(normal(m.group()));
        }
        Set<String> inWindow =
                listed.stream().map(s -> normal(s.keys())).collect(Collectors.toCollection(TreeSet::new));
        for (String d : documented) {
            assertTrue(inWindow.contains(d), "documented " + d + " is not in the window's list " + inWindow);
        }
        assertTrue(documented.size() >= 12, "the page names its keys: " + documented);
        // A listed key does what the list says: Ctrl+D (Workspace › Design studies) opens the tab.
        assertTrue(page.contains("Workspace › Design studies"), page);
        robot.press(KeyCode.CONTROL, KeyCode.D).release(KeyCode.D, KeyCode.CONTROL);
        WaitForAsyncUtils.waitForFxEvents();
        TabPane tabs = robot.lookup("#workspace-side-tabs").queryAs(TabPane.class);
        assertEquals("tab-design", tabs.getSelectionModel().getSelectedItem().getId());
    }

    /** Keys as a sorted set of their parts ("Ctrl+Shift+S" and "Shift+Ctrl+S" alike). */
    private static String normal(String keys) {
        return new TreeSet<>(List.of(keys.strip().split("\\+"))).toString();
    }

    @Test
    void methodsAboutAndPagesAreShown(FxRobot robot) throws Exception {
        robot.clickOn("Help").clickOn("#help-methods");
        WaitForAsyncUtils.waitForFxEvents();
        String methods = fx.dialogs.texts.get(0);
        // Every friction method the engine registers is listed with its own citation.
        for (var f : FrictionMethods.all()) {
            assertTrue(methods.contains(f.id()) && methods.contains(f.citation()), f.id());
        }
        assertTrue(methods.contains("IEC 60534-2-1") && methods.contains("Todini & Pilati"), methods);

        robot.clickOn("Help").clickOn("#help-about");
        WaitForAsyncUtils.waitForFxEvents();
        String about = fx.dialogs.texts.get(1);
        assertTrue(about.contains("Headway " + HeadwayApp.version()), about);
        // Every direct runtime dependency in pom.xml has a licence row (the project's own build file,
        // read here as text).
        String pom = Files.readString(Path.of("pom.xml"), StandardCharsets.UTF_8);
        int start = pom.indexOf("<dependencies>", pom.indexOf("</dependencyManagement>"));
        String deps = pom.substring(start, pom.indexOf("</dependencies>", start));
        Matcher d = Pattern.compile(
                        "<dependency>\\s*<groupId>([^<]+)</groupId>\\s*<artifactId>([^<]+)</artifactId>(.*?)</dependency>",
                        Pattern.DOTALL)
                .matcher(deps);
        int checked = 0;
        while (d.find()) {
            if (d.group(3).contains("<scope>test</scope>")) {
                continue;
            }
            String artifact = d.group(2);
            assertTrue(
                    HelpContent.libraries().stream().anyMatch(l -> l.artifacts().contains(artifact)),
                    d.group(1) + ":" + artifact + " has no licence row in bundled-libraries.csv");
            checked++;
        }
        assertTrue(checked >= 12, "runtime dependencies read from pom.xml: " + checked);
        for (HelpContent.Library l : HelpContent.libraries()) {
            assertTrue(about.contains(l.library()) && about.contains(l.licence()), l.library());
            assertTrue(
                    !l.licence().isBlank()
                            && !l.from().isBlank()
                            && !l.checked().isBlank(),
                    l.library());
        }
        assertTrue(about.contains("JavaFX") && about.contains("GPL v2 with the Classpath Exception"), about);
    }

    @Test
    void everyDocsPageIsPackagedAndOpens(FxRobot robot) throws Exception {
        Set<String> source;
        try (var files = Files.list(Path.of("src/site/docs"))) {
            source = files.map(p -> p.getFileName().toString())
                    .filter(n -> n.endsWith(".md"))
                    .collect(Collectors.toCollection(TreeSet::new));
        }
        assertEquals(source, new TreeSet<>(HelpContent.PAGES), "HelpContent.PAGES lists src/site/docs");
        for (String page : HelpContent.PAGES) {
            String packaged = HelpContent.page(page).orElseThrow(() -> new AssertionError(page + " not packaged"));
            assertEquals(Files.readString(Path.of("src/site/docs", page), StandardCharsets.UTF_8), packaged, page);
        }
        // The nested menu's item, fired as a click on it would (a popup submenu is not in the scene).
        javafx.scene.control.MenuBar bar = robot.lookup("#menus").queryAs(javafx.scene.control.MenuBar.class);
        javafx.scene.control.Menu pages =
                (javafx.scene.control.Menu) bar.getMenus().stream()
                        .filter(x -> x.getText().equals("Help"))
                        .findFirst()
                        .orElseThrow()
                        .getItems()
                        .stream()
                        .filter(x -> "help-pages".equals(x.getId()))
                        .findFirst()
                        .orElseThrow();
        robot.interact(() -> pages.getItems().stream()
                .filter(x -> x.getText().equals("network"))
                .findFirst()
                .orElseThrow()
                .fire());
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(fx.dialogs.texts.get(0).startsWith("Reference: network.md"), fx.dialogs.texts.get(0));
    }
}
