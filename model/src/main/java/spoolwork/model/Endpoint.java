package spoolwork.model;

import java.util.Objects;

/** Where a line ends: on a component's port or on a junction. */
public sealed interface Endpoint permits Endpoint.PortRef, Endpoint.JunctionRef {

    /** The id of the component or junction this endpoint refers to. */
    String ownerId();

    static PortRef port(String componentId, String port) {
        return new PortRef(componentId, port);
    }

    static JunctionRef junction(String junctionId) {
        return new JunctionRef(junctionId);
    }

    /** A component's port, by component id and port name. */
    record PortRef(String componentId, String port) implements Endpoint {
        public PortRef {
            Objects.requireNonNull(componentId);
            Objects.requireNonNull(port);
        }

        @Override
        public String ownerId() {
            return componentId;
        }

        @Override
        public String toString() {
            return componentId + "." + port;
        }
    }

    /** A junction, by id. */
    record JunctionRef(String junctionId) implements Endpoint {
        public JunctionRef {
            Objects.requireNonNull(junctionId);
        }

        @Override
        public String ownerId() {
            return junctionId;
        }

        @Override
        public String toString() {
            return junctionId;
        }
    }
}
