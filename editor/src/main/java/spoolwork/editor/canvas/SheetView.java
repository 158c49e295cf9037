package spoolwork.editor.canvas;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;

import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.geometry.Point2D;
import javafx.geometry.VPos;
import javafx.scene.Cursor;
import javafx.scene.Group;
import javafx.scene.Node;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.input.DragEvent;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.scene.input.ScrollEvent;
import javafx.scene.input.TransferMode;
import javafx.scene.layout.Region;
import javafx.scene.paint.Color;
import javafx.scene.shape.Circle;
import javafx.scene.shape.Polyline;
import javafx.scene.shape.Rectangle;
import javafx.scene.shape.StrokeLineCap;
import javafx.scene.shape.StrokeLineJoin;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.Text;
import javafx.scene.transform.Scale;
import javafx.scene.transform.Translate;

import spoolwork.editor.commands.Command;
import spoolwork.editor.commands.Edits;
import spoolwork.editor.document.EditorDocument;
import spoolwork.editor.document.Selection;
import spoolwork.editor.geometry.SheetGeometry;
import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Junction;
import spoolwork.model.Line;
import spoolwork.model.ModelException;
import spoolwork.model.Note;
import spoolwork.model.Point;
import spoolwork.model.PortSpec;
import spoolwork.model.TitleBlock;
import spoolwork.symbols.Box;
import spoolwork.symbols.routing.Router;

/**
 * The drawing sheet: a zoomable, pannable view of the circuit with a grid, the title block, lines,
 * symbols, notes, an overlay layer for calculated values and the pointer tools.
 *
 * <p>The view follows the document: on every revision it updates only the nodes whose element changed.
 * A drag previews by moving the dragged nodes and the lines that hang on them, and commits one command on
 * release, so a large drawing is never rebuilt per pointer event. Hit testing works on the model's
 * geometry in grid units, not on node picking.
 */
public final class SheetView extends Region {
    /** Pixels per grid unit at 100 % zoom. */
    public static final double PX = 12;
    /** Default sheet size, grid units: A3 landscape at 2.5 mm per grid unit is 168 × 119; this is a smaller working sheet of the same shape. */
    public static final double SHEET_W = 140;
    public static final double SHEET_H = 99;
    private static final double TITLE_W = 52;
    private static final double TITLE_H = 13;
    private static final double PICK = 0.7;

    private final EditorDocument doc;
    private final Selection selection;
    private final Edits edits;
    private final SheetGeometry geometry;
    private final ComponentArt art;
    private final Consumer<String> refused;

    private final Canvas gridCanvas = new Canvas();
    private final Group world = new Group();
    private final Group frameLayer = new Group();
    private final Group lineLayer = new Group();
    private final Group symbolLayer = new Group();
    private final Group junctionLayer = new Group();
    private final Group noteLayer = new Group();
    private final OverlayLayer overlay = new OverlayLayer();
    private final Group selectLayer = new Group();
    private final Group toolLayer = new Group();
    private final Scale scale = new Scale(1, 1);
    private final Translate pan = new Translate(0, 0);

    private final Map<String, CompView> comps = new HashMap<>();
    private final Map<String, LineView> lines = new HashMap<>();
    private final Map<String, JunctionView> junctions = new HashMap<>();
    private final Map<String, NoteView> notes = new HashMap<>();
    private final Map<String, Node> selectionMarks = new HashMap<>();
    private TitleBlock frameTitle;
    private Box frameBox;

    private final ObjectProperty<ComponentType> armed = new SimpleObjectProperty<>(this, "armed");
    private final ObjectProperty<Tool> tool = new SimpleObjectProperty<>(this, "tool", Tool.SELECT);
    private final ReadOnlyDoubleWrapper zoom = new ReadOnlyDoubleWrapper(this, "zoom", 1);
    private final ReadOnlyObjectWrapper<Point> pointer = new ReadOnlyObjectWrapper<>(this, "pointer");
    private final ReadOnlyStringWrapper hint = new ReadOnlyStringWrapper(this, "hint", "");

    private Gesture gesture;
    private boolean spaceDown;
    private Node ghost;
    private ComponentType ghostType;
    private final Group portMarks = new Group();

    /** What a primary press does on the sheet. */
    public enum Tool { SELECT, PLACE, NOTE }

    /** Removes from the layer, and forgets, every view whose element is no longer in the drawing. */
    private static <V> void dropStale(Map<String, V> views, Set<String> seen, Group layer,
                                      java.util.function.Function<V, Node> node) {
        views.keySet().removeIf(id -> {
            if (!seen.contains(id)) {
                layer.getChildren().remove(node.apply(views.get(id)));
                return true;
            }
            return false;
        });
    }

    private record CompView(Component value, Group node) {
    }

    private record LineView(Line value, List<Point> points, Group node, Polyline main, Polyline inner) {
    }

    private record JunctionView(Junction value, Circle node) {
    }

    private record NoteView(Note value, Text node) {
    }

    public SheetView(EditorDocument doc, Selection selection, Edits edits, ComponentArt art, Consumer<String> refused) {
        this.doc = doc;
        this.selection = selection;
        this.edits = edits;
        this.geometry = edits.geometry();
        this.art = art;
        this.refused = refused;
        getStyleClass().add("sheet-view");
        setId("sheet");
        setFocusTraversable(true);
        Rectangle clip = new Rectangle();
        clip.widthProperty().bind(widthProperty());
        clip.heightProperty().bind(heightProperty());
        setClip(clip);
        world.getTransforms().addAll(pan, scale);
        world.getChildren().addAll(frameLayer, lineLayer, symbolLayer, junctionLayer, noteLayer, overlay, selectLayer,
                toolLayer);
        toolLayer.getChildren().add(portMarks);
        toolLayer.setMouseTransparent(true);
        getChildren().addAll(gridCanvas, world);
        gridCanvas.setMouseTransparent(true);

        doc.revisionProperty().addListener((o, a, b) -> {
            selection.retainIn(doc.getCircuit());
            sync();
        });
        selection.revisionProperty().addListener((o, a, b) -> markSelection());
        armed.addListener((o, a, b) -> {
            tool.set(b == null ? Tool.SELECT : Tool.PLACE);
            clearGhost();
        });
        tool.addListener((o, a, b) -> {
            if (b != Tool.PLACE) {
                armed.set(null);
            }
            updateHint();
        });

        addEventHandler(MouseEvent.MOUSE_PRESSED, this::pressed);
        addEventHandler(MouseEvent.MOUSE_DRAGGED, this::dragged);
        addEventHandler(MouseEvent.MOUSE_RELEASED, this::released);
        addEventHandler(MouseEvent.MOUSE_MOVED, this::moved);
        addEventHandler(MouseEvent.MOUSE_EXITED, e -> {
            clearGhost();
            portMarks.getChildren().clear();
        });
        addEventHandler(ScrollEvent.SCROLL, this::scrolled);
        addEventHandler(KeyEvent.KEY_PRESSED, this::keyPressed);
        addEventHandler(KeyEvent.KEY_RELEASED, e -> {
            if (e.getCode() == KeyCode.SPACE) {
                spaceDown = false;
                setCursor(Cursor.DEFAULT);
            }
        });
        setOnDragOver(e -> {
            if (e.getDragboard().hasString() && e.getDragboard().getString().startsWith(DRAG_PREFIX)) {
                e.acceptTransferModes(TransferMode.COPY);
            }
            e.consume();
        });
        setOnDragDropped(this::dropped);
        sync();
        updateHint();
    }

    /** Text a palette entry puts on the drag board, followed by the type key. */
    public static final String DRAG_PREFIX = "spoolwork-type:";

    /** The component type the next click places, or null. */
    public ObjectProperty<ComponentType> armedProperty() {
        return armed;
    }

    public ObjectProperty<Tool> toolProperty() {
        return tool;
    }

    public ReadOnlyDoubleProperty zoomProperty() {
        return zoom.getReadOnlyProperty();
    }

    /** Pointer position on the sheet, grid units, or null when outside. */
    public ReadOnlyObjectProperty<Point> pointerProperty() {
        return pointer.getReadOnlyProperty();
    }

    /** What the pointer would do now, in a few words, for the status bar. */
    public ReadOnlyStringProperty hintProperty() {
        return hint.getReadOnlyProperty();
    }

    public OverlayLayer overlay() {
        return overlay;
    }

    /** The sheet point (grid units) at a position in this view's coordinates. */
    public Point toSheet(double vx, double vy) {
        double z = scale.getX();
        return new Point((vx - pan.getX()) / z / PX, (vy - pan.getY()) / z / PX);
    }

    /** The position in this view's coordinates of a sheet point (grid units). */
    public Point2D toView(Point p) {
        double z = scale.getX();
        return new Point2D(p.x() * PX * z + pan.getX(), p.y() * PX * z + pan.getY());
    }

    /** The position on screen of a sheet point, for tests that drive the pointer. */
    public Point2D toScreen(Point p) {
        Point2D v = toView(p);
        return localToScreen(v.getX(), v.getY());
    }

    @Override
    protected void layoutChildren() {
        gridCanvas.setWidth(getWidth());
        gridCanvas.setHeight(getHeight());
        drawGrid();
    }

    public void zoomBy(double factor, double vx, double vy) {
        double z = clampZoom(scale.getX() * factor);
        Point at = toSheet(vx, vy);
        scale.setX(z);
        scale.setY(z);
        pan.setX(vx - at.x() * PX * z);
        pan.setY(vy - at.y() * PX * z);
        zoom.set(z);
        drawGrid();
    }

    public void zoomIn() {
        zoomBy(1.25, getWidth() / 2, getHeight() / 2);
    }

    public void zoomOut() {
        zoomBy(1 / 1.25, getWidth() / 2, getHeight() / 2);
    }

    /** Fits the drawing (or the empty sheet) into the view. */
    public void fit() {
        Box b = contentBounds();
        if (b == null) {
            b = frameBox != null ? frameBox : new Box(0, 0, SHEET_W, SHEET_H);
        } else {
            b = b.grow(4);
        }
        double w = getWidth() > 0 ? getWidth() : 900;
        double h = getHeight() > 0 ? getHeight() : 600;
        double z = clampZoom(Math.min(w / (b.width() * PX), h / (b.height() * PX)));
        scale.setX(z);
        scale.setY(z);
        pan.setX(w / 2 - b.centre().x() * PX * z);
        pan.setY(h / 2 - b.centre().y() * PX * z);
        zoom.set(z);
        drawGrid();
    }

    /** Fits the whole sheet with its title block into the view. */
    public void fitSheet() {
        Box b = frameBox != null ? frameBox : new Box(0, 0, SHEET_W, SHEET_H);
        double w = getWidth() > 0 ? getWidth() : 900;
        double h = getHeight() > 0 ? getHeight() : 600;
        double z = clampZoom(Math.min(w / ((b.width() + 4) * PX), h / ((b.height() + 4) * PX)));
        scale.setX(z);
        scale.setY(z);
        pan.setX(w / 2 - b.centre().x() * PX * z);
        pan.setY(h / 2 - b.centre().y() * PX * z);
        zoom.set(z);
        drawGrid();
    }

    private static double clampZoom(double z) {
        return Math.max(0.1, Math.min(8, z));
    }

    private void panBy(double dx, double dy) {
        pan.setX(pan.getX() + dx);
        pan.setY(pan.getY() + dy);
        drawGrid();
    }

    private void drawGrid() {
        GraphicsContext g = gridCanvas.getGraphicsContext2D();
        double w = gridCanvas.getWidth();
        double h = gridCanvas.getHeight();
        g.setFill(Color.web("#dfe2e6"));
        g.fillRect(0, 0, w, h);
        Box sheet = frameBox != null ? frameBox : new Box(0, 0, SHEET_W, SHEET_H);
        Point2D a = toView(new Point(sheet.minX(), sheet.minY()));
        Point2D b = toView(new Point(sheet.maxX(), sheet.maxY()));
        g.setFill(Color.web("#fbfbf8"));
        g.fillRect(a.getX(), a.getY(), b.getX() - a.getX(), b.getY() - a.getY());
        double step = PX * scale.getX();
        int every = 1;
        while (step * every < 7) {
            every *= 5;
        }
        double r = step * every >= 14 ? 1.2 : 0.9;
        g.setFill(Color.web("#c4c8ce"));
        int x0 = (int) Math.ceil(Math.max(sheet.minX(), toSheet(0, 0).x()) / every) * every;
        int y0 = (int) Math.ceil(Math.max(sheet.minY(), toSheet(0, 0).y()) / every) * every;
        double x1 = Math.min(sheet.maxX(), toSheet(w, h).x());
        double y1 = Math.min(sheet.maxY(), toSheet(w, h).y());
        for (int gx = x0; gx <= x1; gx += every) {
            for (int gy = y0; gy <= y1; gy += every) {
                Point2D p = toView(new Point(gx, gy));
                g.fillRect(p.getX() - r / 2, p.getY() - r / 2, r, r);
            }
        }
    }

    /** Brings the nodes up to date with the circuit, touching only elements that changed. */
    public void sync() {
        Circuit c = doc.getCircuit();
        Set<String> seen = new HashSet<>();
        // Lines are looked at again only when they or one of their ends changed.
        Set<String> changedOwners = new HashSet<>();
        for (Component k : c.components()) {
            seen.add(k.id());
            CompView v = comps.get(k.id());
            if (v != null && v.value.equals(k)) {
                continue;
            }
            changedOwners.add(k.id());
            if (v != null && v.value.at(0, 0).equals(k.at(0, 0))) {
                v.node.setLayoutX(k.x() * PX);
                v.node.setLayoutY(k.y() * PX);
                comps.put(k.id(), new CompView(k, v.node));
                continue;
            }
            if (v != null) {
                symbolLayer.getChildren().remove(v.node);
            }
            Group g = componentNode(k);
            symbolLayer.getChildren().add(g);
            comps.put(k.id(), new CompView(k, g));
        }
        comps.keySet().removeIf(id -> {
            if (!seen.contains(id)) {
                changedOwners.add(id);
                symbolLayer.getChildren().remove(comps.get(id).node);
                return true;
            }
            return false;
        });

        for (Junction j : c.junctions()) {
            JunctionView v = junctions.get(j.id());
            if (v == null || !v.value.equals(j)) {
                changedOwners.add(j.id());
            }
        }
        junctions.keySet().forEach(id -> {
            if (c.junction(id).isEmpty()) {
                changedOwners.add(id);
            }
        });
        seen.clear();
        for (Line l : c.lines()) {
            seen.add(l.id());
            LineView v = lines.get(l.id());
            if (v != null && v.value.equals(l) && !changedOwners.contains(l.from().ownerId())
                    && !changedOwners.contains(l.to().ownerId())) {
                continue;
            }
            List<Point> pts = edits.polyline(c, l);
            if (v != null && v.value.equals(l) && v.points.equals(pts)) {
                continue;
            }
            if (v != null && v.value.kind() == l.kind()) {
                setPoints(v, pts);
                lines.put(l.id(), new LineView(l, pts, v.node, v.main, v.inner));
                continue;
            }
            if (v != null) {
                lineLayer.getChildren().remove(v.node);
            }
            LineView nv = lineNode(l, pts);
            lineLayer.getChildren().add(nv.node);
            lines.put(l.id(), nv);
        }
        dropStale(lines, seen, lineLayer, v -> v.node);

        seen.clear();
        for (Junction j : c.junctions()) {
            seen.add(j.id());
            JunctionView v = junctions.get(j.id());
            if (v != null && v.value.equals(j)) {
                continue;
            }
            Circle dot = v != null ? v.node : new Circle(0.32 * PX);
            dot.getStyleClass().setAll("junction");
            dot.setCenterX(j.x() * PX);
            dot.setCenterY(j.y() * PX);
            if (v == null) {
                junctionLayer.getChildren().add(dot);
            }
            junctions.put(j.id(), new JunctionView(j, dot));
        }
        dropStale(junctions, seen, junctionLayer, v -> v.node);

        seen.clear();
        for (Note n : c.notes()) {
            seen.add(n.id());
            NoteView v = notes.get(n.id());
            if (v != null && v.value.equals(n)) {
                continue;
            }
            Text t = v != null ? v.node : new Text();
            t.getStyleClass().setAll("note");
            t.setFont(Font.font("SansSerif", 1.25 * PX));
            t.setTextOrigin(VPos.TOP);
            t.setText(n.text().isEmpty() ? "(empty note)" : n.text());
            t.setX(n.x() * PX);
            t.setY(n.y() * PX);
            if (v == null) {
                noteLayer.getChildren().add(t);
            }
            notes.put(n.id(), new NoteView(n, t));
        }
        dropStale(notes, seen, noteLayer, v -> v.node);
        syncFrame(c);
        placeOverlay();
        markSelection();
    }

    private Group componentNode(Component k) {
        Node sym = art.paint(k, PX);
        Component at0 = k.at(0, 0);
        Box b = geometry.bounds(at0);
        Text tag = new Text(k.tag());
        tag.getStyleClass().add("tag");
        tag.setFont(Font.font("SansSerif", FontWeight.BOLD, 1.2 * PX));
        // The tag goes to the corner of the symbol farthest from its ports, where lines are least likely to run.
        double[][] corners = {{b.maxX(), b.minY()}, {b.minX(), b.minY()}, {b.maxX(), b.maxY()}, {b.minX(), b.maxY()}};
        int best = 0;
        double bestD = -1;
        for (int i = 0; i < corners.length; i++) {
            double d = Double.MAX_VALUE;
            for (PortSpec ps : k.type().ports()) {
                Point p = geometry.port(at0, ps.name());
                d = Math.min(d, Math.hypot(p.x() - corners[i][0], p.y() - corners[i][1]));
            }
            if (d > bestD + 1e-9) {
                bestD = d;
                best = i;
            }
        }
        boolean right = best == 0 || best == 2;
        boolean top = best < 2;
        tag.setTextOrigin(top ? VPos.BOTTOM : VPos.TOP);
        double w = tag.getLayoutBounds().getWidth();
        tag.setX(right ? corners[best][0] * PX + 0.3 * PX : corners[best][0] * PX - 0.3 * PX - w);
        tag.setY(top ? corners[best][1] * PX + 0.2 * PX : corners[best][1] * PX - 0.2 * PX);
        Group g = new Group(sym, tag);
        g.getStyleClass().add("component");
        g.setLayoutX(k.x() * PX);
        g.setLayoutY(k.y() * PX);
        g.setUserData(k.id());
        return g;
    }

    private LineView lineNode(Line l, List<Point> pts) {
        Polyline main = new Polyline();
        main.getStyleClass().addAll("line", "line-" + l.kind().key());
        main.setStrokeLineJoin(StrokeLineJoin.MITER);
        main.setStrokeLineCap(StrokeLineCap.BUTT);
        main.setFill(null);
        Polyline inner = null;
        Group g = new Group(main);
        switch (l.kind()) {
            case PILOT -> main.getStrokeDashArray().addAll(0.8 * PX, 0.3 * PX);
            case DRAIN -> main.getStrokeDashArray().addAll(0.3 * PX, 0.25 * PX);
            case SHAFT -> {
                inner = new Polyline();
                inner.getStyleClass().add("shaft-inner");
                inner.setFill(null);
                g.getChildren().add(inner);
            }
            default -> {
            }
        }
        g.setUserData(l.id());
        LineView v = new LineView(l, pts, g, main, inner);
        setPoints(v, pts);
        return v;
    }

    private static void setPoints(LineView v, List<Point> pts) {
        Double[] xy = new Double[pts.size() * 2];
        for (int i = 0; i < pts.size(); i++) {
            xy[2 * i] = pts.get(i).x() * PX;
            xy[2 * i + 1] = pts.get(i).y() * PX;
        }
        v.main.getPoints().setAll(xy);
        if (v.inner != null) {
            v.inner.getPoints().setAll(xy);
        }
    }

    private void syncFrame(Circuit c) {
        Box content = contentBounds();
        double minX = 0;
        double minY = 0;
        double maxX = SHEET_W;
        double maxY = SHEET_H;
        if (content != null) {
            // The sheet grows in steps of ten grid units so it does not jitter while drawing at its edge.
            minX = Math.min(0, Math.floor((content.minX() - 4) / 10) * 10);
            minY = Math.min(0, Math.floor((content.minY() - 4) / 10) * 10);
            maxX = Math.max(SHEET_W, Math.ceil((content.maxX() + 4) / 10) * 10);
            maxY = Math.max(SHEET_H, Math.ceil((content.maxY() + TITLE_H + 4) / 10) * 10);
        }
        Box box = new Box(minX, minY, maxX, maxY);
        if (box.equals(frameBox) && c.title().equals(frameTitle)) {
            return;
        }
        frameBox = box;
        frameTitle = c.title();
        frameLayer.getChildren().setAll(SheetFrame.nodes(box, c.title(), TITLE_W, TITLE_H, PX));
        drawGrid();
    }

    private Box contentBounds() {
        Circuit c = doc.getCircuit();
        Box b = null;
        for (Component k : c.components()) {
            b = b == null ? geometry.bounds(k) : b.union(geometry.bounds(k));
        }
        for (LineView v : lines.values()) {
            for (Point p : v.points) {
                Box pb = new Box(p.x(), p.y(), p.x(), p.y());
                b = b == null ? pb : b.union(pb);
            }
        }
        for (NoteView n : notes.values()) {
            Box nb = noteBox(n);
            b = b == null ? nb : b.union(nb);
        }
        return b;
    }

    private Box noteBox(NoteView n) {
        var lb = n.node.getLayoutBounds();
        return new Box(lb.getMinX() / PX, lb.getMinY() / PX, lb.getMaxX() / PX, lb.getMaxY() / PX);
    }

    private void placeOverlay() {
        Circuit c = doc.getCircuit();
        overlay.componentEntries().forEach((tag, node) -> c.componentByTag(tag).ifPresentOrElse(k -> {
            Box b = geometry.bounds(k);
            node.setVisible(true);
            node.setLayoutX(b.maxX() * PX + 0.5 * PX);
            node.setLayoutY(b.centre().y() * PX);
        }, () -> node.setVisible(false)));
        overlay.lineEntries().forEach((id, node) -> {
            LineView v = lines.get(id);
            if (v == null) {
                node.setVisible(false);
                return;
            }
            Point best = v.points.get(0);
            double len = -1;
            for (int i = 0; i + 1 < v.points.size(); i++) {
                Point a = v.points.get(i);
                Point b = v.points.get(i + 1);
                double d = Math.abs(a.x() - b.x()) + Math.abs(a.y() - b.y());
                if (d > len) {
                    len = d;
                    best = new Point((a.x() + b.x()) / 2, (a.y() + b.y()) / 2);
                }
            }
            node.setVisible(true);
            node.setLayoutX(best.x() * PX);
            node.setLayoutY(best.y() * PX);
        });
    }

    private void markSelection() {
        selectLayer.getChildren().clear();
        selectionMarks.clear();
        for (LineView v : lines.values()) {
            boolean sel = selection.contains(v.value.id());
            if (sel != v.main.getStyleClass().contains("selected")) {
                if (sel) {
                    v.main.getStyleClass().add("selected");
                } else {
                    v.main.getStyleClass().remove("selected");
                }
            }
        }
        Circuit c = doc.getCircuit();
        for (String id : selection.ordered()) {
            Node mark = null;
            var k = c.component(id);
            if (k.isPresent()) {
                Box b = geometry.bounds(k.get()).grow(0.45);
                mark = rect(b);
            }
            var j = c.junction(id);
            if (j.isPresent()) {
                Circle ring = new Circle(j.get().x() * PX, j.get().y() * PX, 0.8 * PX);
                ring.getStyleClass().add("selection-mark");
                mark = ring;
            }
            NoteView n = notes.get(id);
            if (n != null) {
                mark = rect(noteBox(n).grow(0.3));
            }
            if (mark != null) {
                selectLayer.getChildren().add(mark);
                selectionMarks.put(id, mark);
            }
        }
    }

    private static Rectangle rect(Box b) {
        Rectangle r = new Rectangle(b.minX() * PX, b.minY() * PX, b.width() * PX, b.height() * PX);
        r.getStyleClass().add("selection-mark");
        r.setArcWidth(0.6 * PX);
        r.setArcHeight(0.6 * PX);
        return r;
    }

    /** What lies under a sheet point: the most specific thing first. */
    public sealed interface Hit permits PortHit, JunctionHit, ComponentHit, NoteHit, LineHit {
    }

    public record PortHit(String componentId, String port, Point at) implements Hit {
    }

    public record JunctionHit(String id, Point at) implements Hit {
    }

    public record ComponentHit(String id) implements Hit {
    }

    public record NoteHit(String id) implements Hit {
    }

    public record LineHit(String id, int segment, Point at) implements Hit {
    }

    /** The item at a sheet point, or null. */
    public Hit hit(Point p) {
        Circuit c = doc.getCircuit();
        PortHit port = nearestPort(c, p, PICK);
        if (port != null) {
            return port;
        }
        for (Junction j : c.junctions()) {
            if (Math.hypot(j.x() - p.x(), j.y() - p.y()) <= PICK) {
                return new JunctionHit(j.id(), new Point(j.x(), j.y()));
            }
        }
        List<Component> list = new ArrayList<>(c.components());
        for (int i = list.size() - 1; i >= 0; i--) {
            if (geometry.hits(list.get(i), p)) {
                return new ComponentHit(list.get(i).id());
            }
        }
        for (NoteView n : notes.values()) {
            if (noteBox(n).grow(0.2).contains(p.x(), p.y())) {
                return new NoteHit(n.value.id());
            }
        }
        LineHit best = null;
        double bestD = 0.5;
        for (LineView v : lines.values()) {
            for (int i = 0; i + 1 < v.points.size(); i++) {
                double d = distance(v.points.get(i), v.points.get(i + 1), p);
                if (d <= bestD) {
                    bestD = d;
                    best = new LineHit(v.value.id(), i, p);
                }
            }
        }
        return best;
    }

    private PortHit nearestPort(Circuit c, Point p, double within) {
        PortHit best = null;
        double bestD = within;
        for (Component k : c.components()) {
            if (!geometry.bounds(k).grow(within).contains(p.x(), p.y())) {
                continue;
            }
            for (PortSpec ps : k.type().ports()) {
                Point at = geometry.port(k, ps.name());
                double d = Math.hypot(at.x() - p.x(), at.y() - p.y());
                if (d <= bestD) {
                    bestD = d;
                    best = new PortHit(k.id(), ps.name(), at);
                }
            }
        }
        return best;
    }

    private static double distance(Point a, Point b, Point p) {
        double vx = b.x() - a.x();
        double vy = b.y() - a.y();
        double len2 = vx * vx + vy * vy;
        double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((p.x() - a.x()) * vx + (p.y() - a.y()) * vy) / len2));
        return Math.hypot(a.x() + t * vx - p.x(), a.y() + t * vy - p.y());
    }

    private sealed interface Gesture permits MoveGesture, ConnectGesture, BandGesture, SegmentGesture, PanGesture {
    }

    private static final class MoveGesture implements Gesture {
        Point start;
        Set<String> ids;
        List<Node> nodes = new ArrayList<>();
        List<LineView> carried = new ArrayList<>();
        List<LineView> hanging = new ArrayList<>();
        List<Router.End[]> hangingEnds = new ArrayList<>();
        List<boolean[]> hangingMoves = new ArrayList<>();
        double dx;
        double dy;
    }

    private static final class ConnectGesture implements Gesture {
        Endpoint from;
        Router.End fromEnd;
        Polyline preview;
        Circle target;
        Hit over;
    }

    private static final class BandGesture implements Gesture {
        Point start;
        Rectangle rect;
        boolean add;
    }

    private static final class SegmentGesture implements Gesture {
        LineView line;
        int segment;
        Point start;
        double offset;
    }

    private static final class PanGesture implements Gesture {
        double x;
        double y;
    }

    private Point snap(Point p) {
        return new Point(Math.round(p.x()), Math.round(p.y()));
    }

    private void pressed(MouseEvent e) {
        requestFocus();
        Point p = toSheet(e.getX(), e.getY());
        if (e.getButton() == MouseButton.MIDDLE || (e.getButton() == MouseButton.PRIMARY && spaceDown)) {
            PanGesture g = new PanGesture();
            g.x = e.getX();
            g.y = e.getY();
            gesture = g;
            setCursor(Cursor.CLOSED_HAND);
            e.consume();
            return;
        }
        if (e.getButton() != MouseButton.PRIMARY) {
            return;
        }
        if (tool.get() == Tool.PLACE && armed.get() != null) {
            placeAt(armed.get(), p);
            if (!e.isShiftDown()) {
                armed.set(null);
            }
            return;
        }
        if (tool.get() == Tool.NOTE) {
            Point s = snap(p);
            Circuit before = doc.getCircuit();
            String id = before.freshId("n");
            if (run(Edits.addNote(s.x(), s.y(), "Note"))) {
                selection.set(List.of(id));
            }
            tool.set(Tool.SELECT);
            return;
        }
        Hit h = hit(p);
        if (h instanceof PortHit ph) {
            startConnect(Endpoint.port(ph.componentId(), ph.port()), ph.at());
        } else if (h instanceof JunctionHit jh) {
            if (e.isShiftDown()) {
                selection.toggle(jh.id());
            } else if (selection.contains(jh.id())) {
                startMove(p);
            } else {
                startConnect(Endpoint.junction(jh.id()), jh.at());
            }
        } else if (h instanceof ComponentHit || h instanceof NoteHit) {
            String id = h instanceof ComponentHit ch ? ch.id() : ((NoteHit) h).id();
            if (e.isShiftDown()) {
                selection.toggle(id);
                return;
            }
            if (!selection.contains(id)) {
                selection.set(List.of(id));
            }
            startMove(p);
        } else if (h instanceof LineHit lh) {
            if (e.isShiftDown()) {
                selection.toggle(lh.id());
                return;
            }
            selection.set(List.of(lh.id()));
            SegmentGesture g = new SegmentGesture();
            g.line = lines.get(lh.id());
            g.segment = lh.segment();
            g.start = p;
            gesture = g;
        } else {
            BandGesture g = new BandGesture();
            g.start = p;
            g.add = e.isShiftDown();
            g.rect = new Rectangle();
            g.rect.getStyleClass().add("rubber-band");
            toolLayer.getChildren().add(g.rect);
            gesture = g;
            if (!g.add) {
                selection.clear();
            }
        }
    }

    /** Places a component with its origin at the grid point nearest to p, and selects it. */
    public void placeAt(ComponentType type, Point p) {
        Point s = snap(p);
        String id = doc.getCircuit().freshId("c");
        if (run(edits.place(type, s.x(), s.y()))) {
            selection.set(List.of(id));
        }
    }

    private void startMove(Point p) {
        MoveGesture g = new MoveGesture();
        g.start = p;
        Circuit c = doc.getCircuit();
        g.ids = new LinkedHashSet<>();
        Set<String> owners = new HashSet<>();
        for (String id : selection.ordered()) {
            if (comps.containsKey(id)) {
                g.ids.add(id);
                owners.add(id);
                g.nodes.add(comps.get(id).node);
            } else if (junctions.containsKey(id)) {
                g.ids.add(id);
                owners.add(id);
                g.nodes.add(junctions.get(id).node);
            } else if (notes.containsKey(id)) {
                g.ids.add(id);
                g.nodes.add(notes.get(id).node);
            }
            Node mark = selectionMarks.get(id);
            if (mark != null && g.ids.contains(id)) {
                g.nodes.add(mark);
            }
        }
        for (Line l : c.lines()) {
            boolean a = owners.contains(l.from().ownerId());
            boolean b = owners.contains(l.to().ownerId());
            LineView v = lines.get(l.id());
            if (a && b) {
                g.carried.add(v);
            } else if (a || b) {
                g.hanging.add(v);
                g.hangingEnds.add(new Router.End[] {end(c, l.from()), end(c, l.to())});
                g.hangingMoves.add(new boolean[] {a, b});
            }
        }
        gesture = g;
    }

    private Router.End end(Circuit c, Endpoint e) {
        if (e instanceof Endpoint.PortRef pr) {
            Component k = c.component(pr.componentId()).orElseThrow();
            return new Router.End(geometry.port(k, pr.port()), geometry.exitDirection(k, pr.port()));
        }
        Junction j = c.junction(e.ownerId()).orElseThrow();
        return new Router.End(new Point(j.x(), j.y()), null);
    }

    private void startConnect(Endpoint from, Point at) {
        ConnectGesture g = new ConnectGesture();
        g.from = from;
        g.fromEnd = end(doc.getCircuit(), from);
        g.preview = new Polyline();
        g.preview.getStyleClass().add("line-preview");
        g.target = new Circle(0.55 * PX);
        g.target.getStyleClass().add("port-target");
        g.target.setVisible(false);
        toolLayer.getChildren().addAll(g.preview, g.target);
        gesture = g;
    }

    private void dragged(MouseEvent e) {
        Point p = toSheet(e.getX(), e.getY());
        pointer.set(p);
        if (gesture instanceof PanGesture g) {
            panBy(e.getX() - g.x, e.getY() - g.y);
            g.x = e.getX();
            g.y = e.getY();
        } else if (gesture instanceof MoveGesture g) {
            double dx = Math.round(p.x() - g.start.x());
            double dy = Math.round(p.y() - g.start.y());
            if (dx == g.dx && dy == g.dy) {
                return;
            }
            g.dx = dx;
            g.dy = dy;
            for (Node n : g.nodes) {
                n.setTranslateX(dx * PX);
                n.setTranslateY(dy * PX);
            }
            for (LineView v : g.carried) {
                v.node.setTranslateX(dx * PX);
                v.node.setTranslateY(dy * PX);
            }
            for (int i = 0; i < g.hanging.size(); i++) {
                Router.End[] ends = g.hangingEnds.get(i);
                boolean[] moves = g.hangingMoves.get(i);
                Router.End a = moves[0] ? shift(ends[0], dx, dy) : ends[0];
                Router.End b = moves[1] ? shift(ends[1], dx, dy) : ends[1];
                LineView v = g.hanging.get(i);
                List<Point> kept = Router.stretch(v.points, moves[0], dx, dy, moves[0] ? a.exit() : b.exit());
                List<Point> pts = Router.polyline(a.at(), kept != null ? kept : Router.quick(a, b), b.at());
                setPoints(v, pts);
            }
        } else if (gesture instanceof ConnectGesture g) {
            Hit h = hit(p);
            Point to = snap(p);
            Router.End toEnd = new Router.End(to, null);
            g.over = null;
            g.target.setVisible(false);
            if (h instanceof PortHit ph && !Endpoint.port(ph.componentId(), ph.port()).equals(g.from)) {
                Component k = doc.getCircuit().component(ph.componentId()).orElseThrow();
                toEnd = new Router.End(ph.at(), geometry.exitDirection(k, ph.port()));
                g.over = h;
            } else if (h instanceof JunctionHit jh && !Endpoint.junction(jh.id()).equals(g.from)) {
                toEnd = new Router.End(jh.at(), null);
                g.over = h;
            } else if (h instanceof LineHit lh) {
                toEnd = new Router.End(to, null);
                g.over = h;
            }
            if (g.over != null) {
                g.target.setCenterX(toEnd.at().x() * PX);
                g.target.setCenterY(toEnd.at().y() * PX);
                g.target.setVisible(true);
            }
            List<Point> pts = Router.polyline(g.fromEnd.at(), Router.quick(g.fromEnd, toEnd), toEnd.at());
            Double[] xy = new Double[pts.size() * 2];
            for (int i = 0; i < pts.size(); i++) {
                xy[2 * i] = pts.get(i).x() * PX;
                xy[2 * i + 1] = pts.get(i).y() * PX;
            }
            g.preview.getPoints().setAll(xy);
        } else if (gesture instanceof BandGesture g) {
            Box b = Box.around(g.start.x(), g.start.y(), p.x(), p.y());
            g.rect.setX(b.minX() * PX);
            g.rect.setY(b.minY() * PX);
            g.rect.setWidth(b.width() * PX);
            g.rect.setHeight(b.height() * PX);
        } else if (gesture instanceof SegmentGesture g) {
            List<Point> pts = g.line.points;
            Point a = pts.get(g.segment);
            Point b = pts.get(g.segment + 1);
            boolean horizontal = a.y() == b.y();
            double off = Math.round(horizontal ? p.y() - g.start.y() : p.x() - g.start.x());
            if (off == g.offset) {
                return;
            }
            g.offset = off;
            Circuit c = doc.getCircuit();
            List<Point> bends = edits.shiftedSegment(c, g.line.value, g.segment, off);
            setPoints(g.line, Router.polyline(pts.get(0), bends, pts.get(pts.size() - 1)));
        }
    }

    private static Router.End shift(Router.End e, double dx, double dy) {
        return new Router.End(new Point(e.at().x() + dx, e.at().y() + dy), e.exit());
    }

    private void released(MouseEvent e) {
        Gesture g = gesture;
        gesture = null;
        if (g instanceof PanGesture) {
            setCursor(spaceDown ? Cursor.OPEN_HAND : Cursor.DEFAULT);
        } else if (g instanceof MoveGesture m) {
            for (Node n : m.nodes) {
                n.setTranslateX(0);
                n.setTranslateY(0);
            }
            for (LineView v : m.carried) {
                v.node.setTranslateX(0);
                v.node.setTranslateY(0);
            }
            for (LineView v : m.hanging) {
                setPoints(v, v.points);
            }
            if (m.dx != 0 || m.dy != 0) {
                run(edits.move(m.ids, m.dx, m.dy));
            }
            markSelection();
        } else if (g instanceof ConnectGesture cg) {
            toolLayer.getChildren().removeAll(cg.preview, cg.target);
            Hit h = cg.over;
            Command cmd = null;
            if (h instanceof PortHit ph) {
                cmd = edits.connect(cg.from, Endpoint.port(ph.componentId(), ph.port()));
            } else if (h instanceof JunctionHit jh) {
                cmd = edits.connect(cg.from, Endpoint.junction(jh.id()));
            } else if (h instanceof LineHit lh) {
                cmd = edits.connectToLine(cg.from, lh.id(), lh.at());
            }
            if (cmd != null) {
                String id = doc.getCircuit().freshId("l");
                if (run(cmd) && doc.getCircuit().line(id).isPresent()) {
                    selection.set(List.of(id));
                }
            }
        } else if (g instanceof BandGesture b) {
            toolLayer.getChildren().remove(b.rect);
            Point p = toSheet(e.getX(), e.getY());
            Box box = Box.around(b.start.x(), b.start.y(), p.x(), p.y());
            if (box.width() > 0.2 || box.height() > 0.2) {
                List<String> inside = inside(box);
                if (b.add) {
                    selection.add(inside);
                } else {
                    selection.set(inside);
                }
            }
        } else if (g instanceof SegmentGesture s) {
            setPoints(s.line, s.line.points);
            if (s.offset != 0) {
                run(edits.moveSegment(s.line.value.id(), s.segment, s.offset));
            }
        }
    }

    /** Ids of the elements lying wholly inside the box (grid units). */
    public List<String> inside(Box box) {
        Circuit c = doc.getCircuit();
        List<String> out = new ArrayList<>();
        for (Component k : c.components()) {
            Box b = geometry.bounds(k);
            if (box.contains(b.minX(), b.minY()) && box.contains(b.maxX(), b.maxY())) {
                out.add(k.id());
            }
        }
        for (Junction j : c.junctions()) {
            if (box.contains(j.x(), j.y())) {
                out.add(j.id());
            }
        }
        for (NoteView n : notes.values()) {
            Box b = noteBox(n);
            if (box.contains(b.minX(), b.minY()) && box.contains(b.maxX(), b.maxY())) {
                out.add(n.value.id());
            }
        }
        for (LineView v : lines.values()) {
            if (v.points.stream().allMatch(p -> box.contains(p.x(), p.y()))) {
                out.add(v.value.id());
            }
        }
        return out;
    }

    private void moved(MouseEvent e) {
        Point p = toSheet(e.getX(), e.getY());
        pointer.set(p);
        if (tool.get() == Tool.PLACE && armed.get() != null) {
            showGhost(armed.get(), snap(p));
            return;
        }
        Hit h = hit(p);
        portMarks.getChildren().clear();
        Circuit c = doc.getCircuit();
        String over = h instanceof PortHit ph ? ph.componentId() : h instanceof ComponentHit ch ? ch.id() : null;
        if (over != null) {
            Component k = c.component(over).orElseThrow();
            for (PortSpec ps : k.type().ports()) {
                Point at = geometry.port(k, ps.name());
                Circle m = new Circle(at.x() * PX, at.y() * PX, 0.3 * PX);
                m.getStyleClass().add(h instanceof PortHit php && php.port().equals(ps.name()) ? "port-target" : "port-mark");
                portMarks.getChildren().add(m);
            }
        }
        String text;
        if (h instanceof PortHit ph) {
            Component k = c.component(ph.componentId()).orElseThrow();
            text = k.tag() + " port " + ph.port() + " (" + k.type().port(ph.port()).map(PortSpec::meaning).orElse("")
                    + "): drag to another port or onto a line to connect";
        } else if (h instanceof ComponentHit ch) {
            Component k = c.component(ch.id()).orElseThrow();
            text = k.tag() + ", " + k.type().label().toLowerCase() + ": drag to move, R turns, M mirrors";
        } else if (h instanceof JunctionHit) {
            text = "Junction: drag to connect another line";
        } else if (h instanceof LineHit) {
            text = "Line: click to select, drag a run sideways to move it";
        } else {
            text = null;
        }
        setCursor(spaceDown ? Cursor.OPEN_HAND : h instanceof PortHit || h instanceof JunctionHit ? Cursor.CROSSHAIR
                : h instanceof ComponentHit ? Cursor.MOVE : Cursor.DEFAULT);
        if (text != null) {
            hint.set(text);
        } else {
            updateHint();
        }
    }

    private void showGhost(ComponentType type, Point at) {
        if (ghost == null || ghostType != type) {
            clearGhost();
            ghost = art.paint(Component.of("ghost", "", type, 0, 0), PX);
            ghost.setOpacity(0.45);
            ghost.setMouseTransparent(true);
            ghostType = type;
            toolLayer.getChildren().add(ghost);
        }
        ghost.setLayoutX(at.x() * PX);
        ghost.setLayoutY(at.y() * PX);
    }

    private void clearGhost() {
        if (ghost != null) {
            toolLayer.getChildren().remove(ghost);
            ghost = null;
            ghostType = null;
        }
    }

    private void updateHint() {
        hint.set(switch (tool.get()) {
            case PLACE -> armed.get() == null ? "" : "Click on the sheet to place the " + armed.get().label().toLowerCase()
                    + " (Shift keeps placing, Esc stops)";
            case NOTE -> "Click on the sheet where the note goes";
            default -> "Drag from a port to draw a line; drag on the sheet to select an area; wheel zooms";
        });
    }

    private void scrolled(ScrollEvent e) {
        if (e.getDeltaY() == 0) {
            return;
        }
        zoomBy(Math.pow(1.1, e.getDeltaY() / 40.0), e.getX(), e.getY());
        e.consume();
    }

    private void keyPressed(KeyEvent e) {
        if (e.getCode() == KeyCode.SPACE) {
            spaceDown = true;
            setCursor(Cursor.OPEN_HAND);
            e.consume();
        } else if (e.getCode() == KeyCode.ESCAPE) {
            tool.set(Tool.SELECT);
            armed.set(null);
            selection.clear();
            e.consume();
        } else if (e.getCode().isArrowKey() && !selection.isEmpty() && !e.isShortcutDown()) {
            int step = e.isShiftDown() ? 5 : 1;
            double dx = e.getCode() == KeyCode.LEFT ? -step : e.getCode() == KeyCode.RIGHT ? step : 0;
            double dy = e.getCode() == KeyCode.UP ? -step : e.getCode() == KeyCode.DOWN ? step : 0;
            run(edits.move(selection.ids(), dx, dy));
            e.consume();
        }
    }

    private void dropped(DragEvent e) {
        String s = e.getDragboard().getString();
        boolean ok = false;
        if (s != null && s.startsWith(DRAG_PREFIX)) {
            var type = ComponentType.byKey(s.substring(DRAG_PREFIX.length()));
            if (type.isPresent()) {
                placeAt(type.get(), toSheet(e.getX(), e.getY()));
                requestFocus();
                ok = true;
            }
        }
        e.setDropCompleted(ok);
        e.consume();
    }

    private boolean run(Command c) {
        try {
            return doc.execute(c);
        } catch (ModelException | IllegalArgumentException ex) {
            refused.accept(ex.getMessage());
            return false;
        }
    }

    /** The polyline of a drawn line as shown now (grid units), for tests. */
    public List<Point> shownPoints(String lineId) {
        LineView v = lines.get(lineId);
        return v == null ? List.of() : v.points;
    }

    /** Number of component nodes on the sheet, for tests. */
    public int componentNodeCount() {
        return comps.size();
    }

    /** The node drawing a component, for tests that check a drag moves it without rebuilding it. */
    public Node componentNode(String id) {
        CompView v = comps.get(id);
        return v == null ? null : v.node;
    }
}
