package org.headway.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import javafx.collections.FXCollections;
import javafx.collections.transformation.FilteredList;
import javafx.geometry.Bounds;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.VBox;
import javafx.stage.Popup;
import org.headway.pipe.Catalog;
import org.headway.pipe.Fitting;
import org.headway.pipe.Material;
import org.headway.pipe.PipeSize;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;

/**
 * A searchable list of catalog entries (materials, sizes, fittings, fluids): type to filter, the id
 * shown beside the name, Enter or a double click to take one. The lists come from {@link Catalog}
 * (bundled or with the user's folder) and the fluid registry.
 */
final class CatalogPicker {

    private CatalogPicker() {}

    /** One entry: the id written into the project or the cell, and the words shown. */
    record Entry(String id, String name) {
        @Override
        public String toString() {
            return name.isEmpty() || name.equals(id) ? id : name + "   [" + id + "]";
        }
    }

    /** The catalog's materials. */
    static List<Entry> materials(Catalog catalog) {
        List<Entry> out = new ArrayList<>();
        for (Material m : catalog.materials()) {
            out.add(new Entry(m.id(), m.name()));
        }
        return out;
    }

    /** The catalog's fittings, with their loss method. */
    static List<Entry> fittings(Catalog catalog) {
        List<Entry> out = new ArrayList<>();
        for (Fitting f : catalog.fittings()) {
            out.add(new Entry(f.id(), f.description() + " — " + f.method()));
        }
        return out;
    }

    /** The sizes of a material's table (in one schedule, or all when blank), with their bores. */
    static List<Entry> sizes(Catalog catalog, String material, String schedule, UnitSystem units) {
        List<Entry> out = new ArrayList<>();
        String table = catalog.material(material).sizeTable();
        if (table == null || table.isEmpty()) {
            return out;
        }
        for (PipeSize z : catalog.sizes(table, schedule == null || schedule.isBlank() ? null : schedule)) {
            out.add(new Entry(
                    z.nominal(),
                    z.nominal() + (z.schedule().isEmpty() ? "" : " " + z.schedule()) + ", bore "
                            + Quantities.format(z.innerDiameter(), QuantityKind.DIAMETER, units)));
        }
        return out;
    }

    /** The registered fluids. */
    static List<Entry> fluids() {
        return org.headway.fluid.Fluids.ids().stream()
                .map(id -> new Entry(id, id))
                .toList();
    }

    /**
     * The entries matching a query: every word of it (case ignored) found in the id or the name, so
     * "elb 90" finds {@code elbow-90-standard}.
     */
    static List<Entry> filter(List<Entry> entries, String query) {
        return entries.stream().filter(e -> matches(e, query)).toList();
    }

    static boolean matches(Entry e, String query) {
        if (query == null || query.isBlank()) {
            return true;
        }
        String hay = (e.id() + " " + e.name()).toLowerCase(Locale.ROOT);
        for (String word : query.toLowerCase(Locale.ROOT).strip().split("\\s+")) {
            if (!hay.contains(word)) {
                return false;
            }
        }
        return true;
    }

    /** The popup last shown (tests). */
    static Popup lastShown;

    /**
     * Shows the list under a control; the search field has the keyboard.
     *
     * @param anchor the control it drops from
     * @param heading what is picked
     * @param entries the entries
     * @param picked called with the entry taken
     */
    static Popup show(Node anchor, String heading, List<Entry> entries, Consumer<Entry> picked) {
        Popup popup = new Popup();
        popup.setAutoHide(true);
        popup.setHideOnEscape(true);
        TextField search = new TextField();
        search.setId("picker-search");
        search.setPromptText("type to filter (id or name)");
        FilteredList<Entry> shown = new FilteredList<>(FXCollections.observableArrayList(entries));
        ListView<Entry> list = new ListView<>(shown);
        list.setId("picker-list");
        list.setPrefSize(540, 300);
        Label count = new Label();
        count.getStyleClass().add("hint");
        Runnable recount = () -> count.setText(shown.size() + " of " + entries.size());
        search.textProperty().addListener((o, a, b) -> {
            shown.setPredicate(e -> matches(e, b));
            list.getSelectionModel().selectFirst();
            recount.run();
        });
        recount.run();
        list.getSelectionModel().selectFirst();
        Runnable take = () -> {
            Entry e = list.getSelectionModel().getSelectedItem();
            if (e != null) {
                popup.hide();
                picked.accept(e);
            }
        };
        search.setOnKeyPressed(k -> {
            if (k.getCode() == KeyCode.ENTER) {
                take.run();
            } else if (k.getCode() == KeyCode.DOWN) {
                list.requestFocus();
            }
        });
        list.setOnKeyPressed(k -> {
            if (k.getCode() == KeyCode.ENTER) {
                take.run();
            }
        });
        list.setOnMouseClicked(m -> {
            if (m.getClickCount() == 2) {
                take.run();
            }
        });
        Label title = new Label(heading);
        title.getStyleClass().add("subheading");
        VBox box = new VBox(6, title, search, list, count);
        box.setPadding(new Insets(8));
        box.setId("catalog-picker");
        box.setStyle("-fx-background-color: white; -fx-border-color: #8A99A8; -fx-effect: dropshadow(gaussian,"
                + " rgba(0,0,0,0.25), 8, 0, 0, 2);");
        if (anchor.getScene() != null && anchor.getScene().getStylesheets() != null) {
            box.getStylesheets().addAll(anchor.getScene().getStylesheets());
        }
        popup.getContent().add(box);
        Bounds b = anchor.localToScreen(anchor.getBoundsInLocal());
        popup.show(anchor, b == null ? 0 : b.getMinX(), b == null ? 0 : b.getMaxY());
        search.requestFocus();
        lastShown = popup;
        return popup;
    }
}
