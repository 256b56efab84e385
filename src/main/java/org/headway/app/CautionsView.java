package org.headway.app;

import java.util.function.IntConsumer;
import javafx.collections.ListChangeListener;
import javafx.scene.control.Hyperlink;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.TitledPane;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.HBox;

/**
 * The cautions panel: open whenever the run raises cautions, each in plain words; clicking one
 * that concerns a segment selects that segment. The design-review note is always listed last, so
 * it stays reachable with the panel folded.
 */
final class CautionsView extends TitledPane {

    CautionsView(ResultsModel model, IntConsumer selectSegment) {
        setId("cautions");
        getStyleClass().add("cautions");
        ListView<ResultsModel.CautionItem> list = new ListView<>(model.cautions());
        list.setId("caution-list");
        list.setPrefHeight(130);
        list.setCellFactory(v -> new ListCell<>() {
            @Override
            protected void updateItem(ResultsModel.CautionItem item, boolean empty) {
                super.updateItem(item, empty);
                getStyleClass().removeAll("note", "warning", "serious");
                if (empty || item == null) {
                    setText(null);
                    setGraphic(null);
                    setTooltip(null);
                    return;
                }
                Label tag = new Label(item.severityWords());
                tag.getStyleClass().addAll("severity", item.severity().name().toLowerCase(java.util.Locale.ROOT));
                tag.setMinWidth(58);
                Label text = new Label(item.message());
                text.setWrapText(true);
                text.maxWidthProperty().bind(v.widthProperty().subtract(110));
                HBox box = new HBox(8, tag, text);
                if (item.segmentIndex() >= 0) {
                    Hyperlink go = new Hyperlink("show");
                    go.setOnAction(e -> selectSegment.accept(item.segmentIndex()));
                    box.getChildren().add(go);
                }
                setGraphic(box);
                setText(null);
                setTooltip(new Tooltip("Basis: " + item.basis()));
            }
        });
        list.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null && b.segmentIndex() >= 0) {
                selectSegment.accept(b.segmentIndex());
            }
        });
        setContent(list);
        model.cautions().addListener((ListChangeListener<ResultsModel.CautionItem>) c -> update(model));
        update(model);
    }

    private void update(ResultsModel model) {
        long n = model.specificCautionCount();
        if (n == 0) {
            setText("Cautions: none for this run (open for the design-review note)");
            setExpanded(false);
        } else {
            setText("Cautions: " + n + (n == 1 ? " item" : " items") + " to review, plus the design-review note");
            setExpanded(true);
        }
    }
}
