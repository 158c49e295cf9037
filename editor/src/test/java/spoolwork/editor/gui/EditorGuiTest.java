package spoolwork.editor.gui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.prefs.Preferences;

import javafx.geometry.Point2D;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.scene.input.MouseButton;
import javafx.stage.Stage;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

import spoolwork.editor.geometry.Box;
import spoolwork.editor.inspector.UnitField;
import spoolwork.editor.settings.EditorSettings;
import spoolwork.editor.window.EditorWindow;
import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Line;
import spoolwork.model.Point;
import spoolwork.model.io.CircuitFiles;
import spoolwork.model.units.UnitSystem;

/** The editor driven through its window with the pointer and keys, headless. */
@ExtendWith(ApplicationExtension.class)
class EditorGuiTest {
    private EditorWindow window;
    private final FakeDialogs dialogs = new FakeDialogs();
    private Preferences prefs;

    @TempDir
    Path dir;

    @Start
    void start(Stage stage) {
        prefs = Preferences.userRoot().node("spoolwork/test-" + System.nanoTime());
        window = new EditorWindow(stage, new EditorSettings(prefs), dialogs);
        stage.setWidth(1240);
        stage.setHeight(780);
        stage.show();
        window.sheet().fitSheet();
    }

    @AfterEach
    void forget() throws Exception {
        prefs.removeNode();
    }

    private Circuit circuit() {
        return window.document().getCircuit();
    }

    private Point2D screen(double x, double y) {
        return window.sheet().toScreen(new Point(x, y));
    }

    private final FxRobot robot = new FxRobot();

    /** Puts the pointer straight at the point: the stepwise travel of the test robot adds nothing here. */
    private void jump(Point2D p) {
        robot.robotContext().getBaseRobot().moveMouse(p);
        WaitForAsyncUtils.waitForFxEvents();
    }

    private void click(double x, double y) {
        jump(screen(x, y));
        robot.clickOn(MouseButton.PRIMARY);
    }

    private void typeInto(TextField f, String text) {
        robot.clickOn(f);
        robot.interact(f::selectAll);
        robot.write(text).type(KeyCode.ENTER);
    }

    private String placeWithPalette(FxRobot robot, String search, ComponentType type, double x, double y) {
        TextField box = robot.lookup("#palette-search").queryAs(TextField.class);
        robot.interact(() -> box.setText(search));
        robot.clickOn("#palette-" + type.key());
        String id = circuit().freshId("c");
        click(x, y);
        assertTrue(circuit().component(id).isPresent(), type + " placed");
        return id;
    }

    private Point port(String componentId, String port) {
        return window.edits().position(circuit(), Endpoint.port(componentId, port));
    }

    private void drag(FxRobot robot, Point from, Point to) {
        jump(screen(from.x(), from.y()));
        robot.press(MouseButton.PRIMARY);
        Point2D a = screen(from.x(), from.y());
        Point2D b = screen(to.x(), to.y());
        for (int i = 1; i <= 4; i++) {
            jump(a.add(b.subtract(a).multiply(i / 4.0)));
        }
        robot.release(MouseButton.PRIMARY);
    }

    private Point centre(String componentId) {
        Component k = circuit().component(componentId).orElseThrow();
        Box b = window.edits().geometry().bounds(k);
        return b.centre();
    }

    @Test
    void drawAConnectedCircuitThenUndoToEmptyAndRedoToTheSameDocument(FxRobot robot) {
        Circuit empty = circuit();
        String tank = placeWithPalette(robot, "reservoir", ComponentType.RESERVOIR, 20, 62);
        String pump = placeWithPalette(robot, "fixed", ComponentType.FIXED_PUMP, 20, 48);
        String relief = placeWithPalette(robot, "relief", ComponentType.RELIEF_VALVE, 40, 44);
        String valve = placeWithPalette(robot, "4/3", ComponentType.DIRECTIONAL_4_3, 30, 28);
        String cyl = placeWithPalette(robot, "double-acting", ComponentType.DOUBLE_ACTING_CYLINDER, 30, 12);
        assertEquals(List.of("T1", "P1", "V1", "V2", "C1"), circuit().components().stream().map(Component::tag).toList());

        drag(robot, port(tank, "S"), port(pump, "S"));
        drag(robot, port(pump, "P"), port(valve, "P"));
        drag(robot, port(valve, "A"), port(cyl, "A"));
        drag(robot, port(valve, "B"), port(cyl, "B"));
        drag(robot, port(valve, "T"), port(tank, "T"));
        assertEquals(5, circuit().lines().size(), "five lines drawn port to port");

        // The relief valve branches off the supply line: dropping on the line makes a junction.
        Line supply = circuit().lines().stream().filter(l -> l.from().equals(Endpoint.port(pump, "P"))).findFirst().orElseThrow();
        List<Point> pts = window.edits().polyline(circuit(), supply);
        Point onLine = new Point((pts.get(1).x() + pts.get(2).x()) / 2, (pts.get(1).y() + pts.get(2).y()) / 2);
        drag(robot, port(relief, "P"), onLine);
        assertEquals(1, circuit().junctions().size(), "a junction where the relief line meets the supply line");
        assertEquals(7, circuit().lines().size());

        // Move the cylinder five grid steps right: one undo step, lines follow.
        long rev = window.document().getRevision();
        Point c = centre(cyl);
        drag(robot, c, new Point(c.x() + 5, c.y()));
        assertEquals(rev + 1, window.document().getRevision(), "a whole drag is one change");
        assertEquals(35, circuit().component(cyl).orElseThrow().x());
        assertEquals(port(cyl, "A"), last(window.edits().polyline(circuit(), lineAt(cyl, "A"))));

        // Rotate and mirror with keys, then delete.
        click(centre(relief).x(), centre(relief).y());
        robot.type(KeyCode.R);
        assertEquals(90, circuit().component(relief).orElseThrow().rotation());
        robot.type(KeyCode.M);
        assertTrue(circuit().component(relief).orElseThrow().mirrored());
        robot.type(KeyCode.DELETE);
        assertTrue(circuit().component(relief).isEmpty());
        assertTrue(circuit().junctions().isEmpty(), "the junction goes with its branch");
        Circuit end = circuit();
        assertTrue(window.stage().getTitle().startsWith("• "), "dirty marker in the title: " + window.stage().getTitle());

        while (window.document().canUndoProperty().get()) {
            robot.press(KeyCode.CONTROL).type(KeyCode.Z).release(KeyCode.CONTROL);
        }
        assertEquals(empty, circuit());
        assertFalse(window.stage().getTitle().startsWith("• "));
        int redone = 0;
        while (window.document().canRedoProperty().get()) {
            if (redone++ % 2 == 0) {
                robot.press(KeyCode.CONTROL).type(KeyCode.Y).release(KeyCode.CONTROL);
            } else {
                robot.press(KeyCode.CONTROL, KeyCode.SHIFT).type(KeyCode.Z).release(KeyCode.SHIFT, KeyCode.CONTROL);
            }
        }
        assertEquals(end, circuit());
    }

    private Line lineAt(String comp, String port) {
        Endpoint e = Endpoint.port(comp, port);
        return circuit().lines().stream().filter(l -> l.from().equals(e) || l.to().equals(e)).findFirst().orElseThrow();
    }

    private static Point last(List<Point> pts) {
        return pts.get(pts.size() - 1);
    }

    @Test
    void parameterAcceptsUnitsAndRefusesBadValuesWithoutChangingTheDocument(FxRobot robot) {
        String relief = placeWithPalette(robot, "relief", ComponentType.RELIEF_VALVE, 30, 30);
        TextField f = robot.lookup("#param-cracking_pressure").queryAs(TextField.class);
        assertEquals("160 bar", f.getText());
        typeInto(f, "120 bar");
        assertEquals(120e5, circuit().component(relief).orElseThrow().param("cracking_pressure"), 1e-6);

        robot.interact(() -> window.settings().setUnitSystem(UnitSystem.US));
        f = robot.lookup("#param-cracking_pressure").queryAs(TextField.class);
        assertTrue(f.getText().endsWith("psi"), f.getText());
        typeInto(f, "1800 psi");
        // 1 psi = 6894.757 Pa (NIST SP 811, Appendix B).
        assertEquals(1800 * 6894.757293168, circuit().component(relief).orElseThrow().param("cracking_pressure"), 1e-3);

        long rev = window.document().getRevision();
        Circuit before = circuit();
        f = robot.lookup("#param-cracking_pressure").queryAs(TextField.class);
        typeInto(f, "lots");
        UnitField uf = (UnitField) f.getParent();
        assertTrue(uf.hasError(), "an inline error for text that is no value");
        assertTrue(uf.errorLabel().getText().contains("not a number"), uf.errorLabel().getText());
        typeInto(f, "20000 psi");
        assertTrue(uf.hasError());
        assertTrue(uf.errorLabel().getText().startsWith("must be between"), uf.errorLabel().getText());
        typeInto(f, "30 L/min");
        assertTrue(uf.hasError(), "a flow is not a pressure");
        assertEquals(rev, window.document().getRevision(), "refused values change nothing");
        assertEquals(before, circuit());

        robot.type(KeyCode.ESCAPE);
        assertFalse(uf.hasError());
        TextField flow = robot.lookup("#param-rated_flow").queryAs(TextField.class);
        typeInto(flow, "8 gpm");
        // 1 US gal = 3.785411784 L (NIST SP 811, Appendix B).
        assertEquals(8 * 3.785411784e-3 / 60, circuit().component(relief).orElseThrow().param("rated_flow"), 1e-12);
        robot.interact(() -> window.settings().setUnitSystem(UnitSystem.SI));
    }

    @Test
    void saveReopenEqualAndAskBeforeLosingWork(FxRobot robot) throws Exception {
        placeWithPalette(robot, "fixed", ComponentType.FIXED_PUMP, 20, 40);
        placeWithPalette(robot, "reservoir", ComponentType.RESERVOIR, 20, 54);
        String pump = circuit().componentByTag("P1").orElseThrow().id();
        String tank = circuit().componentByTag("T1").orElseThrow().id();
        drag(robot, port(tank, "S"), port(pump, "S"));
        Circuit drawn = circuit();
        Path file = dir.resolve("press.spool.json");
        dialogs.nextSave = file;
        robot.press(KeyCode.CONTROL).type(KeyCode.S).release(KeyCode.CONTROL);
        assertTrue(Files.exists(file));
        assertFalse(window.document().isDirty());
        assertEquals("press.spool.json — Spoolwork", window.stage().getTitle());
        assertEquals(drawn, CircuitFiles.load(file));

        // New with unsaved work asks first; Cancel keeps the drawing.
        click(centre(pump).x(), centre(pump).y());
        robot.type(KeyCode.R);
        assertTrue(window.document().isDirty());
        dialogs.answer = FakeDialogs.Unsaved.CANCEL;
        robot.press(KeyCode.CONTROL).type(KeyCode.N).release(KeyCode.CONTROL);
        assertEquals(1, dialogs.asked.size());
        assertEquals(3, circuit().components().size() + circuit().lines().size());
        dialogs.answer = FakeDialogs.Unsaved.DISCARD;
        robot.press(KeyCode.CONTROL).type(KeyCode.N).release(KeyCode.CONTROL);
        assertEquals(Circuit.empty(), circuit());

        // Open it again from the recent list's record, then through the command line path.
        assertEquals(file.toAbsolutePath().normalize(), window.settings().recentFiles().get(0));
        robot.interact(() -> window.files().openRecent(file));
        assertEquals(drawn, circuit());
        assertFalse(window.document().isDirty());
        robot.interact(() -> window.files().newDocument());
        robot.interact(() -> window.openOnStart(List.of(file.toString())));
        assertEquals(drawn, circuit());

        // A broken file is reported and the open drawing stays.
        Path bad = dir.resolve("broken.spool.json");
        Files.writeString(bad, "{\"format\": \"spoolwork-circuit\", \"version\": 2, \"components\": [ {\"id\": 3} ]}");
        robot.interact(() -> window.files().load(bad));
        assertEquals(drawn, circuit());
        assertEquals(1, dialogs.errors.size());
        assertTrue(dialogs.errors.get(0).contains("broken.spool.json"), dialogs.errors.get(0));
    }

    @Test
    void selectionCopyPasteAndRubberBand(FxRobot robot) {
        String pump = placeWithPalette(robot, "fixed", ComponentType.FIXED_PUMP, 20, 40);
        String tank = placeWithPalette(robot, "reservoir", ComponentType.RESERVOIR, 20, 54);
        drag(robot, port(tank, "S"), port(pump, "S"));
        // Rubber band around both and the line.
        Box b = window.edits().geometry().bounds(circuit().component(pump).orElseThrow())
                .union(window.edits().geometry().bounds(circuit().component(tank).orElseThrow())).grow(2);
        drag(robot, new Point(b.minX(), b.minY()), new Point(b.maxX(), b.maxY()));
        assertEquals(3, window.selection().size());
        robot.press(KeyCode.CONTROL).type(KeyCode.C).release(KeyCode.CONTROL);
        robot.press(KeyCode.CONTROL).type(KeyCode.V).release(KeyCode.CONTROL);
        assertEquals(4, circuit().components().size());
        assertEquals(2, circuit().lines().size());
        assertTrue(circuit().componentByTag("P2").isPresent());
        robot.press(KeyCode.CONTROL).type(KeyCode.D).release(KeyCode.CONTROL);
        assertEquals(6, circuit().components().size());
        // Shift-click adds to the selection.
        click(centre(pump).x(), centre(pump).y());
        robot.press(KeyCode.SHIFT);
        click(centre(tank).x(), centre(tank).y());
        robot.release(KeyCode.SHIFT);
        assertEquals(2, window.selection().size());
        robot.press(KeyCode.CONTROL).type(KeyCode.X).release(KeyCode.CONTROL);
        assertEquals(4, circuit().components().size());
        robot.press(KeyCode.CONTROL).type(KeyCode.A).release(KeyCode.CONTROL);
        assertEquals(circuit().components().size() + circuit().lines().size() + circuit().junctions().size(),
                window.selection().size());
    }

    @Test
    void draggingInALargeDrawingMovesNodesAndCommitsOnceOnRelease(FxRobot robot) {
        List<Component> many = new ArrayList<>();
        for (int i = 0; i < 500; i++) {
            ComponentType t = ComponentType.values()[i % ComponentType.values().length];
            many.add(Component.of("c" + (i + 1), t.tagPrefix() + (i + 1), t, 8 + (i % 25) * 9, 8 + (i / 25) * 9));
        }
        Circuit big = new Circuit(Circuit.empty().title(), Circuit.empty().fluid(), many, List.of(), List.of(), List.of(),
                Circuit.empty().states());
        robot.interact(() -> {
            window.document().replace(big, null);
            window.sheet().fitSheet();
        });
        assertEquals(500, window.sheet().componentNodeCount());
        String id = "c6";
        javafx.scene.Node node = window.sheet().componentNode(id);
        assertNotNull(node);
        long rev = window.document().getRevision();
        Point c = centre(id);
        jump(screen(c.x(), c.y()));
        robot.press(MouseButton.PRIMARY);
        for (int i = 1; i <= 10; i++) {
            jump(screen(c.x() + i, c.y() + i / 2.0));
        }
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(rev, window.document().getRevision(), "no change to the document while dragging");
        assertTrue(node.getTranslateX() > 0, "the dragged node itself moves");
        robot.release(MouseButton.PRIMARY);
        assertEquals(rev + 1, window.document().getRevision(), "one change on release");
        assertSame(node, window.sheet().componentNode(id), "the node is moved, not rebuilt");
        assertEquals(0, node.getTranslateX());
        assertEquals(many.get(5).x() + 10, circuit().component(id).orElseThrow().x());
        robot.press(KeyCode.CONTROL).type(KeyCode.Z).release(KeyCode.CONTROL);
        assertEquals(big, circuit());
    }

    @Test
    void tagsNotesLinesAndTheViewAreEditedInPlace(FxRobot robot) {
        String valve = placeWithPalette(robot, "4/3", ComponentType.DIRECTIONAL_4_3, 30, 30);
        String cyl = placeWithPalette(robot, "double-acting", ComponentType.DOUBLE_ACTING_CYLINDER, 30, 14);
        // Renaming: a used tag is refused with an inline error; a free one is taken.
        TextField tag = robot.lookup("#field-tag").queryAs(TextField.class);
        typeInto(tag, "V1");
        assertEquals("C1", circuit().component(cyl).orElseThrow().tag());
        typeInto(tag, "C12");
        assertEquals("C12", circuit().component(cyl).orElseThrow().tag());
        // Keys typed into a field belong to the field: R does not rotate the selection.
        TextField tag2 = robot.lookup("#field-tag").queryAs(TextField.class);
        robot.clickOn(tag2).type(KeyCode.END).type(KeyCode.R);
        assertEquals(0, circuit().component(cyl).orElseThrow().rotation());
        assertEquals("C12r", tag2.getText());
        robot.type(KeyCode.ESCAPE);
        assertEquals("C12", tag2.getText(), "Escape puts the tag back");

        drag(robot, port(valve, "A"), port(cyl, "A"));
        String line = circuit().lines().iterator().next().id();
        Point mid = window.edits().polyline(circuit(), circuit().line(line).orElseThrow()).get(0);
        Point next = window.edits().polyline(circuit(), circuit().line(line).orElseThrow()).get(1);
        click((mid.x() + next.x()) / 2, (mid.y() + next.y()) / 2);
        assertEquals(List.of(line), window.selection().ordered());
        TextField dia = robot.lookup("#line-diameter").queryAs(TextField.class);
        typeInto(dia, "0.75 in");
        // 1 in = 25.4 mm exactly (NIST SP 811, Appendix B).
        assertEquals(0.75 * 0.0254, circuit().line(line).orElseThrow().diameter(), 1e-12);

        // A note goes where the sheet is clicked and its text is edited in the inspector.
        click(80, 60);
        robot.type(KeyCode.N);
        click(60, 20);
        assertEquals(1, circuit().notes().size());
        javafx.scene.control.TextArea text = robot.lookup("#note-text").queryAs(javafx.scene.control.TextArea.class);
        robot.clickOn(text);
        robot.interact(text::selectAll);
        robot.write("Clamp: extend on a").press(KeyCode.CONTROL).type(KeyCode.ENTER).release(KeyCode.CONTROL);
        assertEquals("Clamp: extend on a", circuit().notes().iterator().next().text());

        // Title block fields with nothing selected.
        robot.interact(() -> window.selection().clear());
        TextField title = robot.lookup("#title-0").queryAs(TextField.class);
        typeInto(title, "Clamp unit");
        assertEquals("Clamp unit", circuit().title().title());

        // The wheel zooms about the pointer; Ctrl+0 fits.
        double z = window.sheet().zoomProperty().get();
        jump(screen(30, 30));
        robot.scroll(3, javafx.geometry.VerticalDirection.UP);
        assertTrue(window.sheet().zoomProperty().get() != z, "wheel changes the zoom");
        robot.press(KeyCode.CONTROL).type(KeyCode.DIGIT0).release(KeyCode.CONTROL);
        double fitted = window.sheet().zoomProperty().get();
        assertTrue(fitted > z, "fitting a small drawing zooms in: " + fitted);
        // Middle-drag pans: the sheet point under the pointer moves with it.
        Point2D at = screen(30, 30);
        jump(at);
        robot.press(MouseButton.MIDDLE);
        jump(at.add(60, 40));
        robot.release(MouseButton.MIDDLE);
        Point2D moved = screen(30, 30);
        assertEquals(at.getX() + 60, moved.getX(), 1.5);
        assertEquals(at.getY() + 40, moved.getY(), 1.5);
    }

    @Test
    void aLineRunIsDraggedSidewaysAndAMessageLeadsToItsPart(FxRobot robot) {
        String pump = placeWithPalette(robot, "fixed", ComponentType.FIXED_PUMP, 20, 50);
        String valve = placeWithPalette(robot, "4/3", ComponentType.DIRECTIONAL_4_3, 40, 26);
        drag(robot, port(pump, "P"), port(valve, "P"));
        Line l = circuit().lines().iterator().next();
        List<Point> before = window.edits().polyline(circuit(), l);
        int seg = -1;
        for (int i = 1; i + 2 < before.size(); i++) {
            seg = i;
        }
        if (seg < 0) {
            seg = 0;
        }
        Point a = before.get(seg);
        Point b = before.get(seg + 1);
        Point mid = new Point((a.x() + b.x()) / 2, (a.y() + b.y()) / 2);
        boolean horizontal = a.y() == b.y();
        long rev = window.document().getRevision();
        drag(robot, mid, horizontal ? new Point(mid.x(), mid.y() - 3) : new Point(mid.x() + 3, mid.y()));
        assertEquals(rev + 1, window.document().getRevision(), "one step for the dragged run");
        List<Point> after = window.edits().polyline(circuit(), circuit().line(l.id()).orElseThrow());
        assertEquals(before.get(0), after.get(0));
        assertEquals(last(before), last(after));
        assertTrue(after.stream().anyMatch(p -> horizontal ? p.y() == a.y() - 3 : p.x() == a.x() + 3), after.toString());

        // The valve's open ports are listed; clicking the message selects the valve.
        robot.interact(() -> window.selection().clear());
        javafx.scene.control.ListView<?> list = robot.lookup("#messages-list").queryAs(javafx.scene.control.ListView.class);
        int row = -1;
        for (int i = 0; i < list.getItems().size(); i++) {
            if (list.getItems().get(i).toString().startsWith("V1:")) {
                row = i;
            }
        }
        assertTrue(row >= 0, list.getItems().toString());
        final int r = row;
        robot.interact(() -> list.getSelectionModel().select(r));
        javafx.scene.Node cell = robot.lookup(".list-cell").match(n -> ((javafx.scene.control.ListCell<?>) n).getIndex() == r)
                .query();
        robot.clickOn(cell);
        assertEquals(List.of(valve), window.selection().ordered());
    }
}
