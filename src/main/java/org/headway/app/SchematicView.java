package org.headway.app;

import java.awt.image.BufferedImage;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import javafx.scene.canvas.Canvas;
import javafx.scene.input.MouseButton;
import javafx.scene.layout.Pane;
import javax.imageio.ImageIO;
import org.headway.project.AtomicFiles;
import org.jfree.fx.FXGraphics2D;
import org.jfree.svg.SVGGraphics2D;

/**
 * The schematic pane: the painter's drawing on a canvas that follows the pane's size. Drag to pan,
 * wheel to zoom about the cursor, double-click to fit; a click selects the node or link under the
 * cursor (and so its table row); the selection made in a table is drawn with its halo.
 */
final class SchematicView extends Pane {

    /** Exported drawing size (px). */
    static final int EXPORT_WIDTH = 1600;

    static final int EXPORT_HEIGHT = 1000;

    private final NetworkEditor editor;
    private final Canvas canvas = new Canvas();
    private final FXGraphics2D g2;
    private SchematicLayout layout;
    private SchematicPainter.View view;
    /** Whether the engineer panned or zoomed; until then the drawing follows the pane's size. */
    private boolean moved;

    private double dragX;
    private double dragY;
    private boolean dragged;

    SchematicView(NetworkEditor editor) {
        this.editor = editor;
        setId("network-schematic");
        getStyleClass().add("schematic");
        getChildren().add(canvas);
        setMinSize(200, 160);
        g2 = new FXGraphics2D(canvas.getGraphicsContext2D());
        widthProperty().addListener((o, a, b) -> resized());
        heightProperty().addListener((o, a, b) -> resized());
        editor.draftProperty().addListener((o, a, b) -> relayout(a, b));
        editor.solutionProperty().addListener((o, a, b) -> redraw());
        editor.staleProperty().addListener((o, a, b) -> redraw());
        editor.selectionProperty().addListener((o, a, b) -> redraw());
        editor.unitSystemProperty().addListener((o, a, b) -> redraw());
        layout = SchematicLayout.of(editor.draft());
        setOnMousePressed(e -> {
            dragX = e.getX();
            dragY = e.getY();
            dragged = false;
        });
        setOnMouseDragged(e -> {
            if (view != null) {
                dragged = dragged || Math.hypot(e.getX() - dragX, e.getY() - dragY) > 2;
                panBy(e.getX() - dragX, e.getY() - dragY);
                dragX = e.getX();
                dragY = e.getY();
            }
        });
        setOnMouseClicked(e -> {
            if (e.getButton() != MouseButton.PRIMARY || dragged || view == null) {
                return;
            }
            if (e.getClickCount() == 2) {
                fit();
                return;
            }
            select(e.getX(), e.getY());
        });
        setOnScroll(e -> {
            if (e.getDeltaY() != 0) {
                zoomBy(Math.pow(1.0015, e.getDeltaY()), e.getX(), e.getY());
            }
        });
    }

    /** Pans the drawing by a distance in the pane (px), as a drag does. */
    void panBy(double dx, double dy) {
        if (view != null) {
            view = view.panned(dx, dy);
            moved = true;
            redraw();
        }
    }

    /** Zooms by a factor about a point of the pane, as the wheel does. */
    void zoomBy(double factor, double x, double y) {
        if (view != null) {
            view = view.zoomed(factor, x, y);
            moved = true;
            redraw();
        }
    }

    private long lastPaintNanos;

    /** How long the last redraw took (ns), for the redraw benchmark. */
    long lastPaintNanos() {
        return lastPaintNanos;
    }

    /** Selects what is under a point of the pane; true when something was there. */
    boolean select(double x, double y) {
        int node = SchematicPainter.nodeAt(layout, view, x, y);
        if (node >= 0) {
            editor.selectionProperty().set(new NetworkEditor.Selection(NetworkEditor.Part.NODE, node));
            return true;
        }
        int link = SchematicPainter.linkAt(layout, view, x, y);
        if (link >= 0) {
            editor.selectionProperty().set(new NetworkEditor.Selection(NetworkEditor.Part.LINK, link));
            return true;
        }
        return false;
    }

    /** Where a node is drawn, in the pane's coordinates (for tests). */
    double[] nodePoint(int row) {
        return new double[] {view.sx(layout.x()[row]), view.sy(layout.y()[row])};
    }

    /** Where the middle of a link is drawn, in the pane's coordinates (for tests). */
    double[] linkPoint(int row) {
        int a = layout.from()[row];
        int b = layout.to()[row];
        // A quarter of the way along: clear of the symbol and the label at the middle.
        return new double[] {
            view.sx(0.75 * layout.x()[a] + 0.25 * layout.x()[b]), view.sy(0.75 * layout.y()[a] + 0.25 * layout.y()[b])
        };
    }

    SchematicLayout drawnLayout() {
        return layout;
    }

    /** Fits the drawing to the pane. */
    void fit() {
        view = SchematicPainter.View.fit(layout, getWidth(), getHeight());
        moved = false;
        redraw();
    }

    private void resized() {
        canvas.setWidth(getWidth());
        canvas.setHeight(getHeight());
        if (!moved || view == null) {
            fit();
        } else {
            redraw();
        }
    }

    private void relayout(NetworkEditor.Draft before, NetworkEditor.Draft after) {
        SchematicLayout next = SchematicLayout.of(after);
        // Keep the view while only cell values change; a new or moved node refits the drawing.
        boolean sameShape = next.nodeIds().equals(layout.nodeIds())
                && java.util.Arrays.equals(next.x(), layout.x())
                && java.util.Arrays.equals(next.y(), layout.y());
        layout = next;
        if (sameShape && view != null) {
            redraw();
        } else {
            fit();
        }
    }

    private void redraw() {
        double w = getWidth();
        double h = getHeight();
        if (w <= 0 || h <= 0 || view == null) {
            return;
        }
        long t0 = System.nanoTime();
        canvas.getGraphicsContext2D().clearRect(0, 0, w, h);
        SchematicPainter.paint(
                g2,
                editor.draft(),
                layout,
                editor.solutionProperty().get(),
                editor.staleProperty().get(),
                editor.selectionProperty().get(),
                editor.unitSystemProperty().get(),
                view,
                w,
                h);
        lastPaintNanos = System.nanoTime() - t0;
    }

    /**
     * Writes the drawing, fitted to {@value #EXPORT_WIDTH}×{@value #EXPORT_HEIGHT}, as SVG when the
     * name ends in {@code .svg}, else PNG; atomic, replacing an existing file.
     */
    static void export(NetworkEditor editor, Path target) {
        SchematicLayout layout = SchematicLayout.of(editor.draft());
        SchematicPainter.View fit = SchematicPainter.View.fit(layout, EXPORT_WIDTH, EXPORT_HEIGHT);
        NetworkEditor.Selection none = new NetworkEditor.Selection(NetworkEditor.Part.NODE, -1);
        if (target.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".svg")) {
            SVGGraphics2D g = new SVGGraphics2D(EXPORT_WIDTH, EXPORT_HEIGHT);
            SchematicPainter.paint(
                    g,
                    editor.draft(),
                    layout,
                    editor.solutionProperty().get(),
                    editor.staleProperty().get(),
                    none,
                    editor.unitSystemProperty().get(),
                    fit,
                    EXPORT_WIDTH,
                    EXPORT_HEIGHT);
            byte[] bytes = g.getSVGDocument().getBytes(StandardCharsets.UTF_8);
            AtomicFiles.write(target, true, out -> out.write(bytes));
            return;
        }
        BufferedImage image = new BufferedImage(EXPORT_WIDTH, EXPORT_HEIGHT, BufferedImage.TYPE_INT_RGB);
        java.awt.Graphics2D g = image.createGraphics();
        try {
            SchematicPainter.paint(
                    g,
                    editor.draft(),
                    layout,
                    editor.solutionProperty().get(),
                    editor.staleProperty().get(),
                    none,
                    editor.unitSystemProperty().get(),
                    fit,
                    EXPORT_WIDTH,
                    EXPORT_HEIGHT);
        } finally {
            g.dispose();
        }
        AtomicFiles.write(target, true, out -> ImageIO.write(image, "png", out));
    }
}
