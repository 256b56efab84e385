package org.headway.app.tools;

import java.lang.management.ManagementFactory;
import javafx.animation.AnimationTimer;
import javafx.application.Application;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;

/**
 * A measurement aid, not a test: the yardstick for the window start-up benchmark
 * ({@code src/jmh/run-window-start-bench.sh}). A plain JavaFX window with none of Headway's code
 * or data — a menu bar, a form of labels and text fields, a table and a tab pane, at Headway's
 * window size — that prints when its first frame is drawn the way {@code HeadwayApp} does with
 * {@code -Dheadway.reportStartup=true}: on the second pulse after show, in ms since JVM start.
 * With {@code -Dheadway.exitAfterFirstFrame=true} it ends there.
 */
public final class PlainWindowPeer extends Application {

    /** Headway's initial window size (px), repeated here so the peer needs no Headway class. */
    static final double WIDTH = 1400;

    static final double HEIGHT = 880;

    /** Started through {@link Start}: a class that extends Application cannot be the main class of a plain classpath. */
    public static final class Start {
        private Start() {}

        public static void main(String[] args) {
            Application.launch(PlainWindowPeer.class, args);
        }
    }

    /** One table row: a few text cells. */
    record Row(String number, String name, String length, String size, String loss) {}

    @Override
    public void start(Stage stage) {
        BorderPane root = new BorderPane();
        root.setTop(menus());
        SplitPane split = new SplitPane(left(), tabs());
        split.setOrientation(Orientation.HORIZONTAL);
        split.setDividerPositions(0.44);
        root.setCenter(split);
        Label status = new Label("Ready");
        status.setPadding(new Insets(4, 10, 4, 10));
        root.setBottom(status);
        stage.setScene(new Scene(root, WIDTH, HEIGHT));
        stage.setTitle("Plain window");
        reportFirstFrame();
        stage.show();
    }

    private static MenuBar menus() {
        MenuBar bar = new MenuBar();
        String[][] menus = {
            {"File", "New", "Open…", "Save", "Save as…", "Close"},
            {"Edit", "Undo", "Redo"},
            {"View", "First", "Second", "Third"},
            {"Units", "Metric", "Imperial"},
            {"Help", "Shortcuts", "About"}
        };
        for (String[] m : menus) {
            Menu menu = new Menu(m[0]);
            for (int i = 1; i < m.length; i++) {
                menu.getItems().add(new MenuItem(m[i]));
            }
            bar.getMenus().add(menu);
        }
        return bar;
    }

    private static VBox left() {
        GridPane form = new GridPane();
        form.setHgap(8);
        form.setVgap(6);
        form.setPadding(new Insets(10));
        String[] labels = {"Title", "Fluid", "Temperature", "Flow", "Method", "Length", "Size"};
        for (int i = 0; i < labels.length; i++) {
            form.add(new Label(labels[i]), 0, i);
            form.add(new TextField(), 1, i);
        }
        return new VBox(10, form, table());
    }

    private static TableView<Row> table() {
        TableView<Row> table = new TableView<>();
        table.getColumns().add(column("#", Row::number));
        table.getColumns().add(column("Name", Row::name));
        table.getColumns().add(column("Length", Row::length));
        table.getColumns().add(column("Size", Row::size));
        table.getColumns().add(column("Loss", Row::loss));
        ObservableList<Row> rows = FXCollections.observableArrayList();
        for (int i = 1; i <= 8; i++) {
            rows.add(new Row(String.valueOf(i), "Part " + i, 10 * i + " m", "DN " + (25 * i), "0." + i + " m"));
        }
        table.setItems(rows);
        return table;
    }

    private static TableColumn<Row, String> column(String title, java.util.function.Function<Row, String> cell) {
        TableColumn<Row, String> c = new TableColumn<>(title);
        c.setCellValueFactory(d -> new ReadOnlyStringWrapper(cell.apply(d.getValue())));
        return c;
    }

    private static TabPane tabs() {
        TabPane tabs = new TabPane();
        String[] titles = {"One", "Two", "Three", "Four", "Five", "Six", "Seven"};
        for (String t : titles) {
            tabs.getTabs().add(new Tab(t, new Label("Contents of " + t)));
        }
        tabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        return tabs;
    }

    private static void reportFirstFrame() {
        new AnimationTimer() {
            private int frames;

            @Override
            public void handle(long now) {
                // The same rule as HeadwayApp: the second pulse is the first one drawn with content.
                if (++frames == 2) {
                    long ms = System.currentTimeMillis()
                            - ManagementFactory.getRuntimeMXBean().getStartTime();
                    // The CPU split is the one measurement aid shared with Headway's window (one small class).
                    System.err.println(
                            "peer: first frame " + ms + " ms after JVM start; " + org.headway.app.StartupCpu.summary());
                    stop();
                    if (Boolean.getBoolean("headway.exitAfterFirstFrame")) {
                        Runtime.getRuntime().halt(0);
                    }
                }
            }
        }.start();
    }
}
