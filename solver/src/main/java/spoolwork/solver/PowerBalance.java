package spoolwork.solver;

/**
 * Where the power goes, W. Pump input = pump loss + pump hydraulic power, and pump hydraulic power =
 * useful + relief + throttle + line + leakage + valve + actuator losses, up to {@link #imbalance()}.
 *
 * @param useful        work done on actuator loads (negative when a load overruns)
 * @param relief        heat in relief valves
 * @param throttle      heat in orifices, throttles and flow controls
 * @param line          line friction
 * @param leakage       internal leakage of valves and motors
 * @param valve         drops in directional, check and pressure-control valves, filters, coolers, meters
 * @param actuator      cylinder seal friction and motor mechanical losses
 * @param pumpLoss      pump input less pump hydraulic power
 */
public record PowerBalance(double pumpInput, double pumpHydraulic, double useful, double relief, double throttle,
                           double line, double leakage, double valve, double actuator, double pumpLoss) {
    /** Sum of every loss and the useful power, W. */
    public double accounted() {
        return useful + relief + throttle + line + leakage + valve + actuator;
    }

    /** Pump hydraulic power not accounted for by the parts, W (zero up to the solver's tolerance). */
    public double imbalance() {
        return pumpHydraulic - accounted();
    }

    /** |imbalance| relative to the larger of pump input and the largest term (1 W floor). */
    public double relativeImbalance() {
        double ref = Math.max(1, Math.max(Math.abs(pumpInput), Math.max(Math.abs(useful), Math.abs(relief))));
        return Math.abs(imbalance()) / ref;
    }

    /** Every heat-producing loss (all but useful power), W. */
    public double heat() {
        return pumpLoss + relief + throttle + line + leakage + valve + actuator;
    }
}
