/**
 * The steady-state solver: {@link spoolwork.solver.SteadyStateSolver} turns a circuit and one operating
 * state into an immutable {@link spoolwork.solver.Solution}.
 *
 * <p>Units and signs: SI throughout. Pressures are gauge, relative to the reservoir (0 Pa); absolute values
 * add 101,325 Pa. A port's flow is positive into the component. A line's flow is positive from its start
 * to its end. A cylinder's velocity is positive extending (oil into port A); a motor's speed is positive
 * turning forward (oil in at A, out at B). Loads follow {@link spoolwork.model.ActuatorState}: a positive
 * load opposes extension or forward rotation. Power terms are positive when they take power from the oil;
 * useful power is negative when an overrunning load drives the actuator.
 */
package spoolwork.solver;
