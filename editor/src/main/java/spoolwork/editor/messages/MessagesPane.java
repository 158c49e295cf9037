package spoolwork.editor.messages;

import java.util.ArrayList;
import java.util.List;

import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.layout.BorderPane;

import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.Line;
import spoolwork.model.PortSpec;

/**
 * The messages panel: drawing checks (ports left open) recomputed on every change, and notices from
 * files and editing. Calculation results will report here too.
 */
public final class MessagesPane extends BorderPane {
    /** How much a message matters. */
    public enum Level { NOTE, CHECK, ERROR }

    /** One line in the panel; {@code place} is the tag or id it is about, or empty. */
    public record Message(Level level, String place, String text) {
        @Override
        public String toString() {
            return (place.isEmpty() ? "" : place + ": ") + text;
        }
    }

    private final ObservableList<Message> checks = FXCollections.observableArrayList();
    private final ObservableList<Message> notices = FXCollections.observableArrayList();
    private final ObservableList<Message> all = FXCollections.observableArrayList();
    private final ListView<Message> list = new ListView<>(all);
    private java.util.function.Consumer<String> onPick = p -> { };

    public MessagesPane() {
        getStyleClass().add("messages");
        Label title = new Label("Messages");
        title.getStyleClass().add("panel-title");
        setTop(title);
        setCenter(list);
        list.setId("messages-list");
        list.setPlaceholder(new Label("No messages"));
        list.setOnMouseClicked(e -> {
            Message m = list.getSelectionModel().getSelectedItem();
            if (m != null && !m.place().isEmpty()) {
                onPick.accept(m.place());
            }
        });
        list.setCellFactory(v -> new ListCell<>() {
            @Override
            protected void updateItem(Message m, boolean empty) {
                super.updateItem(m, empty);
                getStyleClass().removeAll("msg-note", "msg-check", "msg-error");
                if (empty || m == null) {
                    setText(null);
                } else {
                    setText(m.toString());
                    getStyleClass().add("msg-" + m.level().name().toLowerCase());
                }
            }
        });
    }

    /** What to do when the user clicks a message about a place (a component tag). */
    public void setOnPick(java.util.function.Consumer<String> pick) {
        onPick = pick;
    }

    /** Adds a notice (file opened, edit refused …), newest first, keeping the last fifty. */
    public void notice(Level level, String place, String text) {
        notices.add(0, new Message(level, place, text));
        if (notices.size() > 50) {
            notices.remove(50, notices.size());
        }
        rebuild();
    }

    /** Recomputes the drawing checks for the circuit. */
    public void check(Circuit c) {
        checks.setAll(openPorts(c));
        rebuild();
    }

    public List<Message> messages() {
        return List.copyOf(all);
    }

    /** Ports with no line: a drawing check, since an open working port usually means a forgotten line. */
    public static List<Message> openPorts(Circuit c) {
        List<Message> out = new ArrayList<>();
        java.util.Set<String> used = new java.util.HashSet<>();
        for (Line l : c.lines()) {
            used.add(l.from().toString());
            used.add(l.to().toString());
        }
        for (Component k : c.components()) {
            List<String> open = new ArrayList<>();
            for (PortSpec p : k.type().ports()) {
                if (!p.mechanical() && !used.contains(k.id() + "." + p.name())) {
                    open.add(p.name());
                }
            }
            // Each reservoir symbol on a drawing is the same tank drawn where a line needs it, so one
            // connected port is enough.
            if (k.type() == spoolwork.model.ComponentType.RESERVOIR && open.size() < k.type().ports().size()) {
                continue;
            }
            if (!open.isEmpty()) {
                out.add(new Message(Level.CHECK, k.tag(), (open.size() == 1 ? "port " : "ports ")
                        + String.join(", ", open) + " not connected"));
            }
        }
        return out;
    }

    private void rebuild() {
        List<Message> m = new ArrayList<>(notices);
        m.addAll(checks);
        all.setAll(m);
    }
}
