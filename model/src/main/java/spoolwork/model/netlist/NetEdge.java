package spoolwork.model.netlist;

import java.util.Objects;

/**
 * An edge of the netlist graph: either a drawn line, or a path inside a component joining two of its ports
 * in the operating state the netlist was built for. Edges are compared by identity so that parallel lines
 * stay distinct in JGraphT's multigraph.
 */
public sealed interface NetEdge permits NetEdge.LineEdge, NetEdge.InternalEdge {

    /** A drawn line, by id. */
    final class LineEdge implements NetEdge {
        private final String lineId;

        public LineEdge(String lineId) {
            this.lineId = Objects.requireNonNull(lineId);
        }

        public String lineId() {
            return lineId;
        }

        @Override
        public String toString() {
            return "line " + lineId;
        }
    }

    /** A path inside a component from one port to another. */
    final class InternalEdge implements NetEdge {
        private final String componentId;
        private final String fromPort;
        private final String toPort;

        public InternalEdge(String componentId, String fromPort, String toPort) {
            this.componentId = Objects.requireNonNull(componentId);
            this.fromPort = Objects.requireNonNull(fromPort);
            this.toPort = Objects.requireNonNull(toPort);
        }

        public String componentId() {
            return componentId;
        }

        public String fromPort() {
            return fromPort;
        }

        public String toPort() {
            return toPort;
        }

        @Override
        public String toString() {
            return componentId + " " + fromPort + "–" + toPort;
        }
    }
}
