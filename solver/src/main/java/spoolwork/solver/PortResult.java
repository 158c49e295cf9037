package spoolwork.solver;

/**
 * @param pressure gauge pressure at the port, Pa
 * @param flow     flow into the component at the port, m³/s
 */
public record PortResult(double pressure, double flow) {
}
