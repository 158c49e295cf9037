package spoolwork.solver;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.OperatingState;
import spoolwork.model.netlist.Netlist;
import spoolwork.solver.elements.Branch;
import spoolwork.solver.elements.Element;
import spoolwork.solver.elements.Network;
import spoolwork.solver.elements.PowerKind;
import spoolwork.solver.elements.Report;
import spoolwork.solver.numeric.Newton;
import spoolwork.solver.topology.TopologyCheck;

/**
 * Computes the steady operating point of a whole circuit in one operating state.
 *
 * <p>First a topology check; an error there stops the solve with its diagnostic. Then Newton's method on
 * the whole system from rest; if it fails, a leaky start (two steps with a conductance from every node to
 * the reservoir, then plain Newton), then gmin stepping (that conductance stepped down to nothing), then
 * source stepping (pump flow raised from 10 % to full). Time and iteration
 * limits apply throughout; a failure is reported with the rows furthest from balance.
 */
public final class SteadyStateSolver {
    /** Standard atmosphere, Pa, for absolute pressures. */
    public static final double ATMOSPHERE = 101_325;

    private final SolverOptions options;

    public SteadyStateSolver() {
        this(SolverOptions.defaults());
    }

    public SteadyStateSolver(SolverOptions options) {
        this.options = options;
    }

    /** Solves every operating state of the circuit, in order. */
    public List<Solution> solveAll(Circuit circuit) {
        List<Solution> out = new ArrayList<>();
        for (OperatingState s : circuit.states()) {
            out.add(solve(circuit, s));
        }
        return out;
    }

    /** Solves the circuit in the given operating state. Never throws for a valid circuit; never NaN. */
    public Solution solve(Circuit circuit, OperatingState state) {
        long start = System.nanoTime();
        long deadline = start + (long) (options.timeLimit() * 1e9);
        Netlist netlist = new Netlist(circuit, state);
        List<Diagnostic> diagnostics = new ArrayList<>(new TopologyCheck(circuit, state, netlist).run());
        if (diagnostics.stream().anyMatch(d -> d.severity() == Severity.ERROR)) {
            return Solution.failed(state.name(), 0, diagnostics);
        }
        CircuitEquations eq = new CircuitEquations(circuit, state, netlist, options);
        Network net = eq.net;
        int n = net.size();
        Newton newton = new Newton(options.linearMethod(), options.maxIterations());
        double[] x0 = net.initialGuess();
        Newton.Result r = newton.solve(net, x0, deadline);
        int iterations = r.iterations();
        if (!r.converged() && options.continuation()) {
            Newton.Result w = leakyStart(net, deadline);
            iterations += w.iterations();
            if (w.converged()) {
                r = w;
            }
        }
        if (!r.converged() && options.continuation()) {
            Newton.Result g = gminStepping(net, newton, deadline);
            iterations += g.iterations();
            if (!g.converged()) {
                Newton.Result s = sourceStepping(net, newton, deadline);
                iterations += s.iterations();
                r = s.converged() ? s : r;
            } else {
                r = g;
            }
        }
        net.setExtraConductance(0);
        net.setSourceScale(1);
        if (!r.converged()) {
            diagnostics.add(failure(eq, r));
            return Solution.failed(state.name(), iterations, diagnostics);
        }
        return results(eq, state, r.x(), iterations, diagnostics);
    }

    /** Conductance to the reservoir, per unit of flowRef/pressureRef, in the first steps of a leaky start. */
    private static final double LEAKY_START_CONDUCTANCE = 0.1;
    private static final int LEAKY_START_ITERATIONS = 2;

    /**
     * Second try: two Newton steps with a leak from every node to the reservoir, so that the first linear
     * model of a circuit whose valves all start shut puts every pressure near the circuit's settings
     * instead of at the absurd values a dead-headed pump would give; then plain Newton from there.
     */
    private Newton.Result leakyStart(Network net, long deadline) {
        net.setExtraConductance(LEAKY_START_CONDUCTANCE * net.flowRef() / net.pressureRef());
        Newton.Result w = new Newton(options.linearMethod(), LEAKY_START_ITERATIONS)
                .solve(net, net.initialGuess(), deadline);
        net.setExtraConductance(0);
        Newton.Result r = new Newton(options.linearMethod(), options.maxIterations()).solve(net, w.x(), deadline);
        return new Newton.Result(r.x(), r.converged(), w.iterations() + r.iterations(), r.failure(), r.worstRow());
    }

    private Newton.Result gminStepping(Network net, Newton newton, long deadline) {
        double g = 10 * net.flowRef() / net.pressureRef();
        double[] x = net.initialGuess();
        int its = 0;
        double factor = 10;
        while (true) {
            net.setExtraConductance(g);
            Newton.Result r = newton.solve(net, x, deadline);
            its += r.iterations();
            if (!r.converged()) {
                if (factor < 1.5 || System.nanoTime() > deadline || x == null) {
                    return new Newton.Result(r.x(), false, its, "gmin stepping stalled", r.worstRow());
                }
                g = g * factor;
                factor = Math.sqrt(factor);
                g = g / factor;
                continue;
            }
            x = r.x();
            if (g == 0) {
                return new Newton.Result(x, true, its, null, -1);
            }
            g = g < 1e-9 * net.flowRef() / net.pressureRef() ? 0 : g / factor;
        }
    }

    private Newton.Result sourceStepping(Network net, Newton newton, long deadline) {
        net.setExtraConductance(0);
        double[] x = net.initialGuess();
        double lambda = 0;
        double step = 0.1;
        int its = 0;
        while (lambda < 1) {
            double next = Math.min(1, lambda + step);
            net.setSourceScale(next);
            Newton.Result r = newton.solve(net, x, deadline);
            its += r.iterations();
            if (r.converged()) {
                x = r.x();
                lambda = next;
                step = Math.min(0.5, step * 2);
            } else {
                step /= 4;
                if (step < 1e-3 || System.nanoTime() > deadline) {
                    return new Newton.Result(x, false, its, "source stepping stalled at " + lambda, r.worstRow());
                }
            }
        }
        return new Newton.Result(x, true, its, null, -1);
    }

    private Diagnostic failure(CircuitEquations eq, Newton.Result r) {
        List<String> where = new ArrayList<>();
        String detail = "";
        if (r.worstRow() >= 0) {
            String owner = eq.net.owner(r.worstRow());
            where.add(owner);
            detail = "; the largest imbalance is at " + owner + " ("
                    + (eq.net.kind(r.worstRow()) == Network.Kind.PRESSURE ? "flow balance of the node" : "its own law")
                    + ")";
        }
        return new Diagnostic(Severity.ERROR, "the circuit did not solve: " + r.failure() + detail
                + ". Check settings and loads near the elements named", where);
    }

    private static int capacity(int entries) {
        return (int) (entries / 0.75f) + 1;
    }

    /** By component type: its hydraulic port names, the key array shared by the port maps of its results. */
    private static final Object[][] PORT_KEYS = new Object[ComponentType.values().length][];

    static {
        for (ComponentType t : ComponentType.values()) {
            PORT_KEYS[t.ordinal()] = t.hydraulicPorts().toArray();
        }
    }

    private static final Object[] NONE = {};

    private Solution results(CircuitEquations eq, OperatingState state, double[] x, int iterations,
                             List<Diagnostic> diagnostics) {
        Circuit circuit = eq.circuit;
        Network net = eq.net;
        // absorbed power by kind, summed in the same order as the reports come
        double[] power = new double[PowerKind.values().length];
        Report nodeReport = new Report();
        eq.nodes.report(x, net, nodeReport);
        for (Branch b : eq.lineBranch) {
            if (b != null) {
                b.report(x, net, nodeReport);
            }
        }
        for (int k = 0; k < power.length; k++) {
            power[k] += nodeReport.power[k];
        }
        List<Component> components = circuit.components();
        int count = components.size();
        // every component's report and port results; the maps of its result are made once all are final
        Report[] reports = new Report[count];
        PortResult[][] portResults = new PortResult[count][];
        int[] firstNode = new int[count];
        // flow into its component at every port, by netlist node number: component ports come first, in
        // drawing order and port order
        double[] portFlowInto = new double[eq.netlist.nodeCount()];
        int node = 0;
        double pumpInput = 0;
        double pumpHydraulic = 0;
        Map<String, Double> inputByPump = new HashMap<>();
        // cavitation warnings, in drawing order; they follow the prime movers' warnings
        List<Diagnostic> cavitation = new ArrayList<>();
        for (int ci = 0; ci < count; ci++) {
            Component c = components.get(ci);
            Report rep = new Report(c.type().hydraulicPorts());
            List<Element> elements = eq.componentElements.get(ci);
            for (int k = 0; k < elements.size(); k++) {
                elements.get(k).report(x, net, rep);
            }
            for (int k = 0; k < power.length; k++) {
                power[k] += rep.power[k];
            }
            firstNode[ci] = node;
            PortResult[] ports = new PortResult[c.type().hydraulicPortCount()];
            for (int k = 0; k < ports.length; k++) {
                int i = eq.nodeAt[node];
                double q = rep.flowAt(k);
                ports[k] = new PortResult(i < 0 ? 0 : x[i], q);
                portFlowInto[node] = q;
                node++;
            }
            extras(c, ports, rep);
            if (c.type().isPump()) {
                double input = rep.valueOf("input_power_w");
                pumpInput += input;
                pumpHydraulic += rep.valueOf("hydraulic_power_w");
                inputByPump.put(c.id(), input);
                // only a pump reports its inlet's absolute pressure
                if (rep.hasValue("inlet_pressure_abs_pa")) {
                    double abs = rep.valueOf("inlet_pressure_abs_pa");
                    if (abs < 0.8e5) {
                        cavitation.add(new Diagnostic(Severity.WARNING, String.format(java.util.Locale.ROOT,
                                "pump %s inlet is at %.2f bar absolute, below about 0.8 bar (common practice): risk of cavitation",
                                c.tag(), abs / 1e5), List.of(c.tag())));
                    }
                }
            }
            reports[ci] = rep;
            portResults[ci] = ports;
        }
        for (int ci = 0; ci < count; ci++) {
            Component c = components.get(ci);
            if (c.type() != ComponentType.PRIME_MOVER) {
                continue;
            }
            double load = 0;
            for (Map.Entry<String, String> d : eq.netlist.drivers().entrySet()) {
                if (d.getValue().equals(c.id())) {
                    load += inputByPump.getOrDefault(d.getKey(), 0.0);
                }
            }
            Report rep = reports[ci];
            double speed = state.speeds().getOrDefault(c.id(), c.param("speed"));
            rep.setValue("speed_rpm", speed * 60);
            rep.setValue("shaft_power_w", load);
            rep.setValue("rated_power_w", c.param("rated_power"));
            rep.setValue("load_ratio", load / c.param("rated_power"));
            if (speed > 0) {
                rep.setValue("torque_nm", load / (2 * Math.PI * speed));
            }
            if (load > c.param("rated_power")) {
                diagnostics.add(new Diagnostic(Severity.WARNING, String.format(java.util.Locale.ROOT,
                        "prime mover %s is loaded to %.0f %% of its rating in state %s", c.tag(),
                        100 * load / c.param("rated_power"), state.name()), List.of(c.tag())));
            }
        }
        LineResult[] byLine = new LineResult[eq.lineStart.length];
        LinkedHashMap<String, LineResult> lines = lineResults(eq, x, portFlowInto, byLine);
        reservoirPortFlows(eq, byLine, firstNode, portResults);
        LinkedHashMap<String, ComponentResult> comps = new LinkedHashMap<>(capacity(count));
        for (int ci = 0; ci < count; ci++) {
            Component c = components.get(ci);
            PortResult[] ports = portResults[ci];
            Map<String, PortResult> portMap = Frozen.of(PORT_KEYS[c.type().ordinal()], ports, ports.length);
            comps.put(c.tag(), new ComponentResult(c.id(), c.tag(), c.type(), portMap, values(reports[ci])));
        }
        double pumpLoss = pumpInput - pumpHydraulic;
        PowerBalance balance = new PowerBalance(pumpInput, pumpHydraulic, power[PowerKind.USEFUL.ordinal()],
                power[PowerKind.RELIEF.ordinal()], power[PowerKind.THROTTLE.ordinal()],
                power[PowerKind.LINE.ordinal()], power[PowerKind.LEAKAGE.ordinal()], power[PowerKind.VALVE.ordinal()],
                power[PowerKind.ACTUATOR.ordinal()], pumpLoss);
        diagnostics.addAll(cavitation);
        return new Solution(state.name(), true, iterations, diagnostics, Frozen.own(comps), Frozen.own(lines),
                balance);
    }

    /** A component's reported values as its result's map, in the order first reported. */
    private static Map<String, Double> values(Report rep) {
        int n = rep.valueCount();
        if (n == 0) {
            return Frozen.of(NONE, NONE, 0);
        }
        Object[] keys = new Object[n];
        Object[] values = new Object[n];
        for (int i = 0; i < n; i++) {
            keys[i] = rep.valueKey(i);
            values[i] = rep.valueAt(i);
        }
        return Frozen.of(keys, values, n);
    }

    private static PortResult port(Component c, PortResult[] ports, String name) {
        return ports[c.type().hydraulicPortIndex(name)];
    }

    private void extras(Component c, PortResult[] ports, Report rep) {
        switch (c.type()) {
            case DOUBLE_ACTING_CYLINDER, SINGLE_ACTING_CYLINDER, DOUBLE_ROD_CYLINDER -> {
                double v = rep.valueOf("velocity_mps");
                if (Math.abs(v) > 1e-9) {
                    rep.setValue("stroke_time_s", c.param("stroke") / Math.abs(v));
                }
            }
            case ACCUMULATOR -> {
                double p1 = port(c, ports, "P").pressure() + ATMOSPHERE;
                double p0 = c.param("precharge") + ATMOSPHERE;
                double v0 = c.param("volume");
                double isoGas = p1 > p0 ? v0 * p0 / p1 : v0;
                double adGas = p1 > p0 ? v0 * Math.pow(p0 / p1, 1 / 1.4) : v0;
                rep.setValue("stored_volume_isothermal_m3", v0 - isoGas);
                rep.setValue("stored_volume_adiabatic_m3", v0 - adGas);
                rep.setValue("gas_energy_isothermal_j", p1 > p0 ? p0 * v0 * Math.log(p1 / p0) : 0);
                rep.setValue("gas_energy_adiabatic_j", p1 > p0 ? (p1 * adGas - p0 * v0) / 0.4 : 0);
            }
            case PRESSURE_GAUGE -> rep.setValue("pressure_pa", port(c, ports, "P").pressure());
            case ORIFICE, THROTTLE, FILTER, COOLER, CHECK_VALVE, PILOT_CHECK_VALVE, SEQUENCE_VALVE, REDUCING_VALVE,
                    COUNTERBALANCE_VALVE, FLOW_METER -> {
                rep.setValueIfAbsent("power_loss_w", rep.totalPower());
                String in = c.type().ports().get(0).name();
                rep.setValueIfAbsent("flow_m3s", port(c, ports, in).flow());
            }
            case DIRECTIONAL_2_2, DIRECTIONAL_3_2, DIRECTIONAL_4_2, DIRECTIONAL_4_3 -> {
                rep.setValue("power_loss_w", rep.totalPower());
            }
            default -> {
            }
        }
    }

    /**
     * A reservoir has no element law (its ports are the reference pressure), so the flow into each of its
     * ports is what its lines carry to it: a line's flow counts positive towards its end.
     *
     * @param firstNode   netlist number of every component's first hydraulic port, in drawing order
     * @param portResults every component's port results, replaced here for the reservoirs
     */
    private static void reservoirPortFlows(CircuitEquations eq, LineResult[] byLine, int[] firstNode,
                                           PortResult[][] portResults) {
        // flow in at every netlist node, summed over the lines in drawing order
        double[] in = null;
        List<Component> components = eq.circuit.components();
        for (int ci = 0; ci < components.size(); ci++) {
            if (components.get(ci).type() != ComponentType.RESERVOIR) {
                continue;
            }
            if (in == null) {
                in = new double[eq.netlist.nodeCount()];
                for (int li = 0; li < byLine.length; li++) {
                    LineResult lr = byLine[li];
                    if (lr == null) {
                        continue;
                    }
                    in[eq.lineEnd[li]] += lr.flow();
                    in[eq.lineStart[li]] -= lr.flow();
                }
            }
            PortResult[] ports = portResults[ci];
            for (int k = 0; k < ports.length; k++) {
                ports[k] = new PortResult(ports[k].pressure(), in[firstNode[ci] + k]);
            }
        }
    }

    private LinkedHashMap<String, LineResult> lineResults(CircuitEquations eq, double[] x, double[] portFlowInto,
                                                          LineResult[] byLine) {
        Circuit circuit = eq.circuit;
        double[] idealFlows = IdealLineFlows.compute(eq, x, portFlowInto);
        LinkedHashMap<String, LineResult> out = new LinkedHashMap<>(capacity(circuit.lines().size()));
        double nu = eq.fluid.kinematicViscosity();
        int li = -1;
        for (Line l : circuit.lines()) {
            li++;
            if (l.kind() == LineKind.SHAFT) {
                continue;
            }
            int a = eq.nodeAt[eq.lineStart[li]];
            int b = eq.nodeAt[eq.lineEnd[li]];
            double pa = a < 0 ? 0 : x[a];
            double pb = b < 0 ? 0 : x[b];
            double q = l.ideal() ? idealFlows[li] : eq.lineBranch[li].flow(x);
            double area = Math.PI * l.diameter() * l.diameter() / 4;
            double v = area > 0 ? q / area : 0;
            double re = l.diameter() > 0 ? Math.abs(v) * l.diameter() / nu : 0;
            LineResult r = new LineResult(l.id(), q, pa, pb, v, re, l.ideal() ? 0 : q * (pa - pb));
            out.put(l.id(), r);
            byLine[li] = r;
        }
        return out;
    }
}
