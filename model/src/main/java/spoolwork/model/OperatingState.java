package spoolwork.model;

import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;

/**
 * A named operating state of the circuit: the spool position of each directional valve, the mode and load
 * of each actuator, and prime mover speeds. All maps are keyed by component id. A valve missing from
 * {@code valvePositions} is at rest ("0"); an actuator missing from {@code actuators} is free with no load;
 * a prime mover missing from {@code speeds} runs at its own speed parameter.
 *
 * @param speeds prime mover speeds, rev/s
 */
public record OperatingState(String name, String description, Map<String, String> valvePositions,
                             Map<String, ActuatorState> actuators, Map<String, Double> speeds) {
    public OperatingState {
        Objects.requireNonNull(name);
        Objects.requireNonNull(description);
        valvePositions = java.util.Collections.unmodifiableMap(new TreeMap<>(valvePositions));
        actuators = java.util.Collections.unmodifiableMap(new TreeMap<>(actuators));
        speeds = java.util.Collections.unmodifiableMap(new TreeMap<>(speeds));
    }

    public static OperatingState named(String name) {
        return new OperatingState(name, "", Map.of(), Map.of(), Map.of());
    }

    /** The position of a valve in this state, "0" when not set. */
    public String positionOf(String valveId) {
        return valvePositions.getOrDefault(valveId, SpoolPosition.REST);
    }

    /** The actuator's state, free with no load when not set. */
    public ActuatorState actuatorOf(String actuatorId) {
        return actuators.getOrDefault(actuatorId, ActuatorState.free());
    }

    public OperatingState withPosition(String valveId, String position) {
        Map<String, String> m = new TreeMap<>(valvePositions);
        m.put(valveId, position);
        return new OperatingState(name, description, m, actuators, speeds);
    }

    public OperatingState withActuator(String actuatorId, ActuatorState s) {
        Map<String, ActuatorState> m = new TreeMap<>(actuators);
        m.put(actuatorId, s);
        return new OperatingState(name, description, valvePositions, m, speeds);
    }

    public OperatingState withSpeed(String primeMoverId, double speed) {
        Map<String, Double> m = new TreeMap<>(speeds);
        m.put(primeMoverId, speed);
        return new OperatingState(name, description, valvePositions, actuators, m);
    }

    public OperatingState renamed(String newName) {
        return new OperatingState(newName, description, valvePositions, actuators, speeds);
    }

    /** This state with every reference to the given component id dropped. */
    public OperatingState without(String componentId) {
        Map<String, String> v = new TreeMap<>(valvePositions);
        Map<String, ActuatorState> a = new TreeMap<>(actuators);
        Map<String, Double> s = new TreeMap<>(speeds);
        v.remove(componentId);
        a.remove(componentId);
        s.remove(componentId);
        return new OperatingState(name, description, v, a, s);
    }
}
