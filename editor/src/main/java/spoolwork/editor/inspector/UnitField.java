package spoolwork.editor.inspector;

import java.util.function.DoubleConsumer;

import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.VBox;

import spoolwork.model.ModelException;
import spoolwork.model.Quantity;
import spoolwork.model.units.Unit;
import spoolwork.model.units.UnitParseException;
import spoolwork.model.units.UnitSystem;
import spoolwork.model.units.Units;

/**
 * A text field for one physical value that accepts any known unit ("120 bar", "1740 psi") and shows the
 * value in the chosen unit system. Enter or leaving the field commits; a value that does not parse or is
 * out of range shows an inline error and changes nothing; Escape puts back the current value.
 */
public final class UnitField extends VBox {
    /** Decides whether an SI value is acceptable; returns an error message or null. */
    @FunctionalInterface
    public interface Check {
        String problem(double si);
    }

    private final TextField field = new TextField();
    private final Label error = new Label();
    private final Quantity quantity;
    private final Unit display;
    private final Check check;
    private final DoubleConsumer commit;
    private double value;

    /**
     * @param value  the current value, SI
     * @param commit receives the new SI value; may throw IllegalArgumentException (a model refusal),
     *               whose message is then shown as the error
     */
    public UnitField(Quantity quantity, UnitSystem system, double value, Check check, DoubleConsumer commit) {
        this(quantity, Units.displayUnit(quantity, system), value, check, commit);
    }

    /** A field shown in the given unit; a bare number is taken in that unit too. */
    public UnitField(Quantity quantity, Unit display, double value, Check check, DoubleConsumer commit) {
        this.quantity = quantity;
        this.display = display;
        this.check = check;
        this.commit = commit;
        this.value = value;
        getStyleClass().add("unit-field");
        error.getStyleClass().add("field-error");
        error.setWrapText(true);
        error.setManaged(false);
        error.setVisible(false);
        field.setText(show(value));
        field.setOnAction(e -> apply());
        field.focusedProperty().addListener((o, was, now) -> {
            if (!now) {
                apply();
            }
        });
        field.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ESCAPE) {
                field.setText(show(this.value));
                clearError();
                e.consume();
            }
        });
        getChildren().addAll(field, error);
    }

    public TextField textField() {
        return field;
    }

    public Label errorLabel() {
        return error;
    }

    /** True while an error is shown. */
    public boolean hasError() {
        return error.isVisible();
    }

    private String show(double si) {
        return Units.format(si, display);
    }

    private void apply() {
        String text = field.getText();
        if (text.strip().equals(show(value))) {
            clearError();
            return;
        }
        double si;
        try {
            si = Units.parse(text, quantity, display);
        } catch (UnitParseException e) {
            showError(e.getMessage());
            return;
        }
        String problem = check.problem(si);
        if (problem != null) {
            showError(problem);
            return;
        }
        try {
            commit.accept(si);
            value = si;
            field.setText(show(si));
            clearError();
        } catch (ModelException | IllegalArgumentException e) {
            showError(e.getMessage());
        }
    }

    private void showError(String text) {
        error.setText(text);
        error.setVisible(true);
        error.setManaged(true);
        if (!field.getStyleClass().contains("invalid")) {
            field.getStyleClass().add("invalid");
        }
    }

    private void clearError() {
        error.setVisible(false);
        error.setManaged(false);
        field.getStyleClass().remove("invalid");
    }
}
