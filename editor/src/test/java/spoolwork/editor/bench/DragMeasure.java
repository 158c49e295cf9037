package spoolwork.editor.bench;

import java.util.ArrayList;
import java.util.List;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.event.Event;
import javafx.geometry.Point2D;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.stage.Stage;
import spoolwork.editor.canvas.SheetView;
import spoolwork.editor.commands.Edits;
import spoolwork.editor.files.FxDialogs;
import spoolwork.editor.settings.EditorSettings;
import spoolwork.editor.window.EditorWindow;
import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;

/**
 * Measures a drag in a drawing of 500 components and 250 routed lines: the sheet's handling time per pointer
 * event while dragging (scene preview only), and the time of the release, which commits one command and
 * updates the sheet. Rendering is not included. Run with a display (for example under Xvfb):
 *
 * <pre>
 * mvn -q -B -pl editor -am test-compile &amp;&amp; mvn -q -B -DskipTests package
 * java -cp editor/target/test-classes:editor/target/spoolwork.jar 'spoolwork.editor.bench.DragMeasure$Main'
 * </pre>
 */
public final class DragMeasure extends Application {
    /** Entry point that loads JavaFX only through {@link Application#launch}. */
    public static final class Main {
        public static void main(String[] a) {
            Application.launch(DragMeasure.class, a);
        }
    }
    MouseEvent ev(javafx.event.EventType<MouseEvent> t, SheetView s, Point2D v, boolean down) {
        Point2D sc = s.localToScreen(v); Point2D sn = s.localToScene(v);
        return new MouseEvent(t, sn.getX(), sn.getY(), sc.getX(), sc.getY(), MouseButton.PRIMARY, 1, false, false, false, false, down, false, false, false, false, false, null);
    }
    @Override public void start(Stage stage) {
        EditorWindow w = new EditorWindow(stage, new EditorSettings(java.util.prefs.Preferences.userRoot().node("spoolwork/measure")), new FxDialogs());
        stage.show();
        Edits e = w.edits();
        List<Component> many = new ArrayList<>();
        for (int i = 0; i < 500; i++) {
            ComponentType t = i % 2 == 0 ? ComponentType.CHECK_VALVE : ComponentType.ORIFICE;
            many.add(Component.of("c" + (i + 1), t.tagPrefix() + (i + 1), t, 8 + (i % 25) * 10, 8 + (i / 25) * 10));
        }
        Circuit c = new Circuit(Circuit.empty().title(), Circuit.empty().fluid(), many, List.of(), List.of(), List.of(), Circuit.empty().states());
        long t0 = System.nanoTime();
        for (int i = 0; i + 1 < 500; i += 2) {
            c = e.connect(Endpoint.port("c" + (i + 1), "B"), Endpoint.port("c" + (i + 2), "A")).change().apply(c);
        }
        long t1 = System.nanoTime();
        w.document().replace(c, null);
        long t2 = System.nanoTime();
        System.out.printf("route 250 lines: %.1f ms; load into sheet: %.1f ms%n", (t1 - t0) / 1e6, (t2 - t1) / 1e6);
        Platform.runLater(() -> {
            SheetView s = w.sheet();
            s.fitSheet();
            Component k = w.document().getCircuit().component("c27").get();
            var b = e.geometry().bounds(k).centre();
            Point2D v = s.toView(b);
            Event.fireEvent(s, ev(MouseEvent.MOUSE_PRESSED, s, v, true));
            int n = 400;
            long d0 = System.nanoTime();
            for (int i = 1; i <= n; i++) {
                Event.fireEvent(s, ev(MouseEvent.MOUSE_DRAGGED, s, v.add(i * 0.7, i * 0.3), true));
            }
            long d1 = System.nanoTime();
            Event.fireEvent(s, ev(MouseEvent.MOUSE_RELEASED, s, v.add(n * 0.7, n * 0.3), false));
            long d2 = System.nanoTime();
            System.out.printf("drag: %.3f ms per pointer event over %d events; release (one command, routing, sheet update): %.1f ms%n",
                    (d1 - d0) / 1e6 / n, n, (d2 - d1) / 1e6);
            long u0 = System.nanoTime();
            w.document().undo();
            long u1 = System.nanoTime();
            System.out.printf("moved to x=%.0f; ", w.document().getCircuit().component("c27").get().x()); System.out.printf("undo with sheet update: %.1f ms; revision %d%n", (u1 - u0) / 1e6, w.document().getRevision());
            Platform.exit();
        });
    }
}
