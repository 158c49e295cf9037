package spoolwork.editor.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import spoolwork.model.Circuit;
import spoolwork.model.OperatingState;
import spoolwork.model.Quantity;
import spoolwork.model.io.CircuitFileException;
import spoolwork.model.io.CircuitFiles;
import spoolwork.model.units.UnitSystem;
import spoolwork.model.units.Units;
import spoolwork.solver.ComponentResult;
import spoolwork.solver.Diagnostic;
import spoolwork.solver.LineResult;
import spoolwork.solver.PortResult;
import spoolwork.solver.PowerBalance;
import spoolwork.solver.Solution;
import spoolwork.solver.SteadyStateSolver;

/**
 * Solves a circuit file headless and prints the steady operating point: a readable report in SI or US
 * units, or JSON in SI base units for scripts. Exit 0 solved, 1 not converged or ill-posed (diagnostics
 * still printed), 2 bad arguments or an unreadable file.
 */
@Command(name = "solve", mixinStandardHelpOptions = true,
        description = "Calculate the steady-state pressures, flows, actuator motion and power of a circuit file.")
public final class SolveCommand implements Callable<Integer> {
    /** The caution carried by every report. */
    public static final String CAUTION = "CAUTION: steady-state estimates only. Follow ISO 4413 and local codes; "
            + "a competent person verifies the circuit before building or servicing it.";

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "circuit file (.spool.json)")
    Path file;

    @Option(names = "--state", paramLabel = "NAME", description = "operating state to solve (default: the first)")
    String state;

    @Option(names = "--all-states", description = "solve every operating state")
    boolean allStates;

    @Option(names = "--format", paramLabel = "text|json", defaultValue = "text",
            description = "output format: text (default) or json (SI base units)")
    String format;

    @Option(names = "--units", paramLabel = "si|us", defaultValue = "si",
            description = "units of the text report: si (bar, L/min; default) or us (psi, gpm)")
    String units;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (!format.equals("text") && !format.equals("json")) {
            err.println("error: --format must be text or json, not '" + format + "'");
            return 2;
        }
        UnitSystem system = UnitSystem.byKey(units).orElse(null);
        if (system == null) {
            err.println("error: --units must be si or us, not '" + units + "'");
            return 2;
        }
        if (allStates && state != null) {
            err.println("error: give either --state or --all-states, not both");
            return 2;
        }
        Circuit circuit;
        try {
            circuit = CircuitFiles.load(file);
        } catch (CircuitFileException e) {
            err.println("error: " + e.getMessage());
            return 2;
        }
        List<OperatingState> states = new ArrayList<>();
        if (allStates) {
            states.addAll(circuit.states());
        } else if (state != null) {
            OperatingState s = circuit.state(state).orElse(null);
            if (s == null) {
                List<String> names = circuit.states().stream().map(OperatingState::name).toList();
                err.println("error: " + file.getFileName() + " has no operating state '" + state + "'; it has " + names);
                return 2;
            }
            states.add(s);
        } else if (!circuit.states().isEmpty()) {
            states.add(circuit.states().get(0));
        }
        if (states.isEmpty()) {
            err.println("error: " + file.getFileName() + " has no operating state to solve");
            return 2;
        }
        SteadyStateSolver solver = new SteadyStateSolver();
        List<Solution> solutions = new ArrayList<>();
        for (OperatingState s : states) {
            solutions.add(solver.solve(circuit, s));
        }
        if (format.equals("json")) {
            out.println(json(solutions, allStates));
        } else {
            out.print(text(circuit, solutions, system));
        }
        out.flush();
        return solutions.stream().allMatch(Solution::ok) ? 0 : 1;
    }

    static String json(List<Solution> solutions, boolean list) {
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ArrayNode all = mapper.createArrayNode();
        for (Solution s : solutions) {
            all.add(json(mapper, s));
        }
        try {
            return mapper.writeValueAsString(list ? all : all.get(0));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    private static ObjectNode json(ObjectMapper mapper, Solution s) {
        ObjectNode o = mapper.createObjectNode();
        o.put("state", s.state());
        o.put("converged", s.converged());
        o.put("iterations", s.iterations());
        o.put("caution", CAUTION);
        ArrayNode diags = o.putArray("diagnostics");
        for (Diagnostic d : s.diagnostics()) {
            ObjectNode dn = diags.addObject();
            dn.put("severity", d.severity().key());
            dn.put("message", d.message());
            ArrayNode el = dn.putArray("elements");
            d.elements().forEach(el::add);
        }
        ObjectNode comps = o.putObject("components");
        for (ComponentResult c : s.components().values()) {
            ObjectNode cn = comps.putObject(c.tag());
            cn.put("type", c.type().key());
            ObjectNode ports = cn.putObject("ports");
            for (Map.Entry<String, PortResult> p : c.ports().entrySet()) {
                ObjectNode pn = ports.putObject(p.getKey());
                pn.put("pressure_pa", p.getValue().pressure());
                pn.put("flow_m3s", p.getValue().flow());
            }
            c.values().forEach(cn::put);
        }
        ObjectNode lines = o.putObject("lines");
        for (LineResult l : s.lines().values()) {
            ObjectNode ln = lines.putObject(l.id());
            ln.put("flow_m3s", l.flow());
            ln.put("pressure_start_pa", l.pressureStart());
            ln.put("pressure_end_pa", l.pressureEnd());
            ln.put("velocity_mps", l.velocity());
            ln.put("reynolds", l.reynolds());
            ln.put("power_loss_w", l.powerLoss());
        }
        PowerBalance p = s.power();
        if (p != null) {
            ObjectNode pw = o.putObject("power_w");
            pw.put("pump_input", p.pumpInput());
            pw.put("pump_hydraulic", p.pumpHydraulic());
            pw.put("useful", p.useful());
            pw.put("relief_loss", p.relief());
            pw.put("throttle_loss", p.throttle());
            pw.put("line_loss", p.line());
            pw.put("leakage_loss", p.leakage());
            pw.put("valve_loss", p.valve());
            pw.put("actuator_loss", p.actuator());
            pw.put("pump_loss", p.pumpLoss());
            pw.put("imbalance", p.imbalance());
        } else {
            o.putNull("power_w");
        }
        return o;
    }

    static String text(Circuit circuit, List<Solution> solutions, UnitSystem u) {
        StringBuilder sb = new StringBuilder();
        String title = circuit.title().title().isBlank() ? "(untitled circuit)" : circuit.title().title();
        sb.append("Spoolwork steady-state report: ").append(title).append('\n');
        sb.append(CAUTION).append("\n");
        for (Solution s : solutions) {
            sb.append("\n=== State \"").append(s.state()).append("\" — ")
                    .append(s.converged() ? "solved in " + s.iterations() + " iterations" : "NOT SOLVED").append('\n');
            for (Diagnostic d : s.diagnostics()) {
                sb.append("  [").append(d.severity().key()).append("] ").append(d.message()).append('\n');
            }
            if (!s.converged()) {
                continue;
            }
            sb.append("Components\n");
            for (ComponentResult c : s.components().values()) {
                sb.append(String.format(Locale.ROOT, "  %-6s %s%n", c.tag(), c.type().label()));
                if (!c.ports().isEmpty()) {
                    sb.append("         ");
                    for (Map.Entry<String, PortResult> p : c.ports().entrySet()) {
                        sb.append(' ').append(p.getKey()).append(": ")
                                .append(shown(p.getValue().pressure(), Quantity.PRESSURE, u)).append(", ")
                                .append(shown(p.getValue().flow(), Quantity.FLOW, u)).append(" in;");
                    }
                    sb.setLength(sb.length() - 1);
                    sb.append('\n');
                }
                List<String> vals = new ArrayList<>();
                c.values().forEach((k, v) -> vals.add(label(k) + " " + value(k, v, u)));
                if (!vals.isEmpty()) {
                    sb.append("          ").append(String.join(", ", vals)).append('\n');
                }
            }
            sb.append("Lines (flow positive from start to end)\n");
            for (LineResult l : s.lines().values()) {
                sb.append(String.format(Locale.ROOT, "  %-6s %s, %s → %s, %s, Re %s%n", l.id(),
                        shown(l.flow(), Quantity.FLOW, u), shown(l.pressureStart(), Quantity.PRESSURE, u),
                        shown(l.pressureEnd(), Quantity.PRESSURE, u),
                        shown(l.velocity(), Quantity.VELOCITY, u), Units.number(Math.abs(l.reynolds()) < 1e-3 ? 0 : l.reynolds(), 4)));
            }
            PowerBalance p = s.power();
            sb.append("Power\n");
            sb.append("  pump input ").append(w(p.pumpInput(), u)).append(" = pump loss ").append(w(p.pumpLoss(), u))
                    .append(" + pump hydraulic ").append(w(p.pumpHydraulic(), u)).append('\n');
            sb.append("  pump hydraulic = useful ").append(w(p.useful(), u)).append(" + relief ").append(w(p.relief(), u))
                    .append(" + throttle ").append(w(p.throttle(), u)).append(" + line ").append(w(p.line(), u))
                    .append(" + leakage ").append(w(p.leakage(), u)).append(" + valves ").append(w(p.valve(), u))
                    .append(" + actuator losses ").append(w(p.actuator(), u)).append('\n');
            sb.append("  heat into the oil ").append(w(p.heat(), u)).append("; balance off by ")
                    .append(Units.number(p.relativeImbalance(), 2)).append(" of input\n");
        }
        sb.append('\n').append(CAUTION).append('\n');
        return sb.toString();
    }

    private static String w(double watts, UnitSystem u) {
        return shown(watts, Quantity.POWER, u);
    }

    /**
     * Round-off within the solver's tolerances around zero (a shut valve's 1e-13 m³/s, the heat it then
     * makes) reads as zero; the floors lie far below anything a gauge or flow meter could show.
     */
    static String shown(double v, Quantity q, UnitSystem u) {
        double floor = switch (q) {
            case FLOW -> 1e-10;
            case PRESSURE -> 1e-2;
            case VELOCITY -> 1e-8;
            case POWER -> 1e-6;
            default -> 0;
        };
        return Units.format(Math.abs(v) < floor ? 0 : v, q, u);
    }

    private static String label(String key) {
        String k = key;
        for (String suffix : List.of("_pa", "_m3s", "_mps", "_nm", "_n", "_rpm", "_w", "_s", "_m3", "_j")) {
            if (k.endsWith(suffix)) {
                k = k.substring(0, k.length() - suffix.length());
                break;
            }
        }
        return k.replace("_abs", " (absolute)").replace('_', ' ');
    }

    private static String value(String key, double v, UnitSystem u) {
        Quantity q = null;
        if (key.endsWith("_pa")) {
            q = Quantity.PRESSURE;
        } else if (key.endsWith("_m3s")) {
            q = Quantity.FLOW;
        } else if (key.endsWith("_mps")) {
            q = Quantity.VELOCITY;
        } else if (key.endsWith("_nm")) {
            q = Quantity.TORQUE;
        } else if (key.endsWith("_n")) {
            q = Quantity.FORCE;
        } else if (key.endsWith("_w")) {
            q = Quantity.POWER;
        } else if (key.endsWith("_s")) {
            q = Quantity.TIME;
        } else if (key.endsWith("_m3")) {
            q = Quantity.VOLUME;
        }
        if (q != null) {
            return shown(v, q, u);
        }
        if (key.endsWith("_rpm")) {
            return Units.number(v, 4) + " rpm";
        }
        if (key.endsWith("_j")) {
            return Units.number(v / 1000, 4) + " kJ";
        }
        if (key.endsWith("ratio") || key.equals("stroke")) {
            return Units.number(100 * v, 3) + " %";
        }
        return Units.number(v, 4);
    }
}
