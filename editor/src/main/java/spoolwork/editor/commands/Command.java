package spoolwork.editor.commands;

import java.util.Objects;
import java.util.function.UnaryOperator;

import spoolwork.model.Circuit;

/**
 * One user-visible change to the document, as a function from the circuit before to the circuit after.
 * Because circuits are immutable values, undo needs nothing from the command but the value it replaced.
 *
 * @param description what the change did, in words shown in the Edit menu ("Move 3 items")
 */
public record Command(String description, UnaryOperator<Circuit> change) {
    public Command {
        Objects.requireNonNull(description);
        Objects.requireNonNull(change);
    }

    /** A command that runs this one and then the next, as one undo step. */
    public Command then(Command next) {
        return new Command(description, c -> next.change().apply(change.apply(c)));
    }
}
