package spoolwork.solver;

/**
 * Results of one line.
 *
 * @param flow          flow from the line's start to its end, m³/s (negative: the other way)
 * @param pressureStart gauge pressure at the start, Pa
 * @param pressureEnd   gauge pressure at the end, Pa
 * @param velocity      mean velocity in the start-to-end sense, m/s
 * @param reynolds      Reynolds number |v|·D/ν
 * @param powerLoss     friction loss, W
 */
public record LineResult(String id, double flow, double pressureStart, double pressureEnd, double velocity,
                         double reynolds, double powerLoss) {
}
