package spoolwork.model;

import java.util.Objects;

/**
 * What an actuator does in an operating state: free to move, or held at one end of its stroke, and its load.
 *
 * <p>Sign convention: for a cylinder the load is a force in newtons and a positive value opposes extension
 * (a weight on a rod pointing up); for a motor it is a torque in N·m and a positive value opposes forward
 * rotation (A to B). A {@link LoadKind#CONSTANT} load acts whatever the motion and can overrun the actuator;
 * a {@link LoadKind#RESISTIVE} load only opposes motion, with the given magnitude, like friction.
 */
public record ActuatorState(Mode mode, LoadKind loadKind, double load) {
    public ActuatorState {
        Objects.requireNonNull(mode);
        Objects.requireNonNull(loadKind);
    }

    /** Free with no load: one value, as a state is asked for it once per actuator it leaves unset. */
    private static final ActuatorState FREE = new ActuatorState(Mode.FREE, LoadKind.CONSTANT, 0);

    public static ActuatorState free() {
        return FREE;
    }

    public enum Mode {
        FREE("free"), HELD_RETRACTED("held_retracted"), HELD_EXTENDED("held_extended");

        private final String key;

        Mode(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }

        public static java.util.Optional<Mode> byKey(String k) {
            for (Mode m : values()) {
                if (m.key.equals(k)) {
                    return java.util.Optional.of(m);
                }
            }
            return java.util.Optional.empty();
        }
    }

    public enum LoadKind {
        CONSTANT("constant"), RESISTIVE("resistive");

        private final String key;

        LoadKind(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }

        public static java.util.Optional<LoadKind> byKey(String k) {
            for (LoadKind m : values()) {
                if (m.key.equals(k)) {
                    return java.util.Optional.of(m);
                }
            }
            return java.util.Optional.empty();
        }
    }
}
