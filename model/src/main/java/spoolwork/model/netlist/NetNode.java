package spoolwork.model.netlist;

import java.util.Objects;

/** A node of the netlist graph: a component's hydraulic port, or a junction. */
public sealed interface NetNode permits NetNode.Port, NetNode.Junction {

    /** A component's port. */
    record Port(String componentId, String port) implements NetNode {
        public Port {
            Objects.requireNonNull(componentId);
            Objects.requireNonNull(port);
        }

        @Override
        public String toString() {
            return componentId + "." + port;
        }
    }

    /** A junction. */
    record Junction(String junctionId) implements NetNode {
        public Junction {
            Objects.requireNonNull(junctionId);
        }

        @Override
        public String toString() {
            return junctionId;
        }
    }
}
