package spoolwork.solver.sample;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

import spoolwork.model.ActuatorState;
import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Fluid;
import spoolwork.model.Junction;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.OperatingState;
import spoolwork.model.TitleBlock;

/**
 * Synthetic but valid circuits of a chosen size for benchmarks and robustness checks: a motor-driven pump
 * with its relief valve feeding a pressure header of real lines, and along it stations of directional
 * valve, actuator and assorted valves, returning through a return header, filter and cooler to the
 * reservoir. Settings, loads and spool positions are drawn from plausible ranges.
 */
public final class CircuitGenerator {
    private final Random rnd;
    private final List<Component> comps = new ArrayList<>();
    private final List<Junction> junctions = new ArrayList<>();
    private final List<Line> lines = new ArrayList<>();
    private final Map<String, String> positions = new LinkedHashMap<>();
    private final Map<String, ActuatorState> actuators = new LinkedHashMap<>();
    private int ids;
    private double relief;

    public CircuitGenerator(long seed) {
        this.rnd = new Random(seed);
    }

    /** A circuit of about the given number of components (at least 8) with one random operating state. */
    public static Circuit generate(int components, long seed) {
        return new CircuitGenerator(seed).build(components);
    }

    private String add(ComponentType t, double x, double y, Object... settings) {
        String id = "c" + (++ids);
        comps.add(Component.of(id, t.tagPrefix() + ids, t, x, y, settings));
        return id;
    }

    private String junction(double x, double y) {
        String id = "j" + (++ids);
        junctions.add(new Junction(id, x, y));
        return id;
    }

    private static Endpoint at(String s) {
        int dot = s.indexOf('.');
        return dot < 0 ? Endpoint.junction(s) : Endpoint.port(s.substring(0, dot), s.substring(dot + 1));
    }

    private void line(String from, String to, LineKind kind) {
        boolean ideal = rnd.nextDouble() < 0.3;
        double d = new double[]{0.008, 0.010, 0.012, 0.016}[rnd.nextInt(4)];
        lines.add(new Line("l" + (++ids), at(from), at(to), List.of(), d, 0.3 + 3 * rnd.nextDouble(), kind, ideal));
    }

    private void header(String from, String to, LineKind kind, double d) {
        lines.add(new Line("l" + (++ids), at(from), at(to), List.of(), d, 0.5, kind, false));
    }

    private double range(double lo, double hi) {
        return lo + (hi - lo) * rnd.nextDouble();
    }

    private ActuatorState load(double maxForce) {
        double f = range(-0.3, 0.9) * maxForce;
        ActuatorState.LoadKind k = rnd.nextBoolean() ? ActuatorState.LoadKind.CONSTANT : ActuatorState.LoadKind.RESISTIVE;
        ActuatorState.Mode m = ActuatorState.Mode.FREE;
        double r = rnd.nextDouble();
        if (r < 0.1) {
            m = ActuatorState.Mode.HELD_EXTENDED;
        } else if (r < 0.2) {
            m = ActuatorState.Mode.HELD_RETRACTED;
        }
        return new ActuatorState(m, k, k == ActuatorState.LoadKind.RESISTIVE ? Math.abs(f) : f);
    }

    private Circuit build(int target) {
        int stations = Math.max(1, (target - 8) / 3);
        relief = range(100e5, 250e5);
        String tank = add(ComponentType.RESERVOIR, 0, 40);
        String motor = add(ComponentType.PRIME_MOVER, -8, 30, "rated_power", 5e5);
        double flow = stations * range(5, 20) / 60000;
        double speed = 1450.0 / 60;
        boolean compensated = rnd.nextDouble() < 0.3;
        String pump = compensated
                ? add(ComponentType.COMPENSATED_PUMP, 0, 30, "displacement", Math.min(1e-2, flow / speed),
                "compensator_setting", relief - 10e5)
                : add(ComponentType.FIXED_PUMP, 0, 30, "displacement", Math.min(1e-2, flow / speed));
        lines.add(new Line("l" + (++ids), Endpoint.port(motor, "shaft"), Endpoint.port(pump, "shaft"), List.of(), 0, 0,
                LineKind.SHAFT, true));
        String rv = add(ComponentType.RELIEF_VALVE, 6, 30, "cracking_pressure", relief,
                "override", rnd.nextBoolean() ? 0.0 : range(2e5, 15e5), "rated_flow", Math.min(1, flow * 1.2));
        String filter = add(ComponentType.FILTER, 12, 36, "rated_flow", Math.min(1, flow * 1.5));
        String cooler = add(ComponentType.COOLER, 6, 36, "rated_flow", Math.min(1, flow * 1.5));
        String gauge = add(ComponentType.PRESSURE_GAUGE, 4, 26);
        double headerD = Math.max(0.02, Math.sqrt(4 * flow / (Math.PI * 4)));
        line(tank + ".S", pump + ".S", LineKind.SUCTION);
        if (compensated) {
            line(pump + ".L", tank + ".T", LineKind.DRAIN);
        }
        String j0 = junction(2, 24);
        header(pump + ".P", j0, LineKind.PRESSURE, headerD);
        line(j0, rv + ".P", LineKind.PRESSURE);
        line(rv + ".T", tank + ".T", LineKind.RETURN);
        line(j0, gauge + ".P", LineKind.PILOT);
        String r0 = junction(14, 30);
        header(r0, filter + ".A", LineKind.RETURN, headerD);
        header(filter + ".B", cooler + ".A", LineKind.RETURN, headerD);
        header(cooler + ".B", tank + ".T", LineKind.RETURN, headerD);
        String supply = j0;
        String ret = r0;
        for (int k = 0; k < stations; k++) {
            double x = 10 + 12 * k;
            String js = junction(x, 24);
            String jr = junction(x + 2, 30);
            header(supply, js, LineKind.PRESSURE, headerD);
            header(jr, ret, LineKind.RETURN, headerD);
            supply = js;
            ret = jr;
            station(js, jr, x);
        }
        OperatingState state = new OperatingState("Random", "generated", positions, actuators, Map.of());
        return new Circuit(new TitleBlock("Generated circuit", "", "", "", ""), Fluid.standard(), comps, junctions,
                lines, List.of(), List.of(state));
    }

    private void station(String supply, String ret, double x) {
        int kind = rnd.nextInt(6);
        String[] centres = {"closed", "open", "tandem", "float"};
        double bore = new double[]{0.032, 0.04, 0.05, 0.063, 0.08}[rnd.nextInt(5)];
        double rod = bore * range(0.45, 0.7);
        double area = Math.PI * bore * bore / 4;
        double rated = range(20, 80) / 60000;
        String pos = new String[]{"a", "0", "b"}[rnd.nextInt(3)];
        switch (kind) {
            case 0, 4, 5 -> {
                String v = add(ComponentType.DIRECTIONAL_4_3, x, 16, "centre", centres[rnd.nextInt(4)], "rated_flow", rated);
                String c = add(ComponentType.DOUBLE_ACTING_CYLINDER, x, 4, "bore", bore, "rod", rod,
                        "friction", range(0, 0.03) * relief * area);
                positions.put(v, pos);
                actuators.put(c, load(relief * area));
                String feed = supply;
                if (kind == 5) {
                    String rdv = add(ComponentType.REDUCING_VALVE, x - 3, 20, "setting", range(0.3, 0.8) * relief);
                    line(supply, rdv + ".P", LineKind.PRESSURE);
                    feed = rdv + ".A";
                }
                line(feed, v + ".P", LineKind.PRESSURE);
                line(v + ".T", ret, LineKind.RETURN);
                if (kind == 4) {
                    String fc = add(ComponentType.FLOW_CONTROL, x - 2, 10, "set_flow", rated * range(0.2, 0.8));
                    line(v + ".A", fc + ".A", LineKind.PRESSURE);
                    line(fc + ".B", c + ".A", LineKind.PRESSURE);
                } else {
                    line(v + ".A", c + ".A", LineKind.PRESSURE);
                }
                line(v + ".B", c + ".B", LineKind.PRESSURE);
            }
            case 1 -> {
                String v = add(ComponentType.DIRECTIONAL_4_3, x, 16, "centre", centres[rnd.nextInt(4)], "rated_flow", rated);
                double disp = range(8e-6, 60e-6);
                String m = add(ComponentType.HYDRAULIC_MOTOR, x, 4, "displacement", disp);
                String th = add(ComponentType.THROTTLE, x + 3, 10, "diameter", range(0.002, 0.006));
                positions.put(v, pos);
                actuators.put(m, load(relief * disp / (2 * Math.PI)));
                line(supply, v + ".P", LineKind.PRESSURE);
                line(v + ".T", ret, LineKind.RETURN);
                line(v + ".A", m + ".A", LineKind.PRESSURE);
                line(m + ".B", th + ".A", LineKind.PRESSURE);
                line(th + ".B", v + ".B", LineKind.PRESSURE);
            }
            case 2 -> {
                String v = add(ComponentType.DIRECTIONAL_4_2, x, 16, "rated_flow", rated);
                String c = add(ComponentType.DOUBLE_ACTING_CYLINDER, x, 4, "bore", bore, "rod", rod);
                String cb = add(ComponentType.COUNTERBALANCE_VALVE, x + 3, 10, "setting", range(0.5, 0.9) * relief);
                positions.put(v, rnd.nextBoolean() ? "a" : "0");
                actuators.put(c, load(0.5 * relief * area));
                line(supply, v + ".P", LineKind.PRESSURE);
                line(v + ".T", ret, LineKind.RETURN);
                String ja = junction(x - 2, 10);
                line(v + ".A", ja, LineKind.PRESSURE);
                line(ja, c + ".A", LineKind.PRESSURE);
                line(ja, cb + ".X", LineKind.PILOT);
                line(c + ".B", cb + ".A", LineKind.PRESSURE);
                line(cb + ".B", v + ".B", LineKind.PRESSURE);
            }
            default -> {
                String v = add(ComponentType.DIRECTIONAL_3_2, x, 16, "rated_flow", rated);
                String c = add(ComponentType.SINGLE_ACTING_CYLINDER, x, 4, "bore", bore, "rod", rod);
                String ck = add(ComponentType.CHECK_VALVE, x - 3, 12);
                positions.put(v, rnd.nextBoolean() ? "a" : "0");
                actuators.put(c, load(0.5 * relief * area));
                line(supply, ck + ".A", LineKind.PRESSURE);
                line(ck + ".B", v + ".P", LineKind.PRESSURE);
                line(v + ".T", ret, LineKind.RETURN);
                line(v + ".A", c + ".A", LineKind.PRESSURE);
            }
        }
    }
}
