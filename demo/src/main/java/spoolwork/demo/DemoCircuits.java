package spoolwork.demo;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import spoolwork.model.ActuatorState;
import spoolwork.model.ActuatorState.LoadKind;
import spoolwork.model.ActuatorState.Mode;
import spoolwork.model.Circuit;
import spoolwork.model.ComponentType;
import spoolwork.model.Fluid;
import spoolwork.model.LineKind;
import spoolwork.model.OperatingState;
import spoolwork.model.TitleBlock;
import spoolwork.model.io.CircuitFiles;

/**
 * The example circuits, machines of our own invention, drawn in code so that the files in the resources
 * are always what the model's writer makes of them. Run {@link #main} with a directory to rewrite them.
 */
public final class DemoCircuits {
    /** Resource names of the examples, under spoolwork/demo/. */
    public static final List<String> FILES = List.of("bench_press.spool.json", "log_splitter.spool.json",
            "capstan_winch.spool.json");

    private DemoCircuits() {
    }

    static ActuatorState load(Mode mode, LoadKind kind, double value) {
        return new ActuatorState(mode, kind, value);
    }

    /**
     * A small bench press: fixed pump with an ideal 100 bar relief, tandem-centre 4/3 valve, meter-in
     * pressure-compensated flow control (10 L/min) with a free-return check, 63/36 mm cylinder.
     */
    public static Circuit benchPress() {
        Sketch s = new Sketch()
                .place("C1", ComponentType.DOUBLE_ACTING_CYLINDER, 40, 10, "bore", 0.063, "rod", 0.036,
                        "stroke", 0.25)
                .place("K1", ComponentType.CHECK_VALVE, 30, 22).turned(90)
                .place("F1", ComponentType.FLOW_CONTROL, 36, 22, "set_flow", 10.0 / 60000).turned(270)
                .place("D1", ComponentType.DIRECTIONAL_4_3, 37, 34, "centre", "tandem")
                .place("T3", ComponentType.RESERVOIR, 43, 41, "volume", 0.06)
                .place("G1", ComponentType.PRESSURE_GAUGE, 27, 40)
                .place("V1", ComponentType.RELIEF_VALVE, 48, 47, "cracking_pressure", 100e5, "override", 0.0)
                .turned(180)
                .place("T2", ComponentType.RESERVOIR, 47, 55, "volume", 0.06)
                .place("M1", ComponentType.PRIME_MOVER, 24, 50, "rated_power", 5500.0)
                .place("P1", ComponentType.FIXED_PUMP, 36, 50)
                .place("T1", ComponentType.RESERVOIR, 37, 58, "volume", 0.06)
                .junction("JP", 36, 42).junction("JA1", 36, 28).junction("JA2", 36, 16)
                .shaft("M1.shaft", "P1.shaft")
                .ideal("T1.S", "P1.S", LineKind.SUCTION)
                .ideal("P1.P", "JP", LineKind.PRESSURE)
                .ideal("JP", "V1.P", LineKind.PRESSURE)
                .ideal("JP", "G1.P", LineKind.PILOT)
                .ideal("JP", "D1.P", LineKind.PRESSURE)
                .ideal("V1.T", "T2.T", LineKind.RETURN)
                .ideal("D1.T", "T3.T", LineKind.RETURN)
                .ideal("D1.A", "JA1", LineKind.PRESSURE)
                .ideal("JA1", "F1.A", LineKind.PRESSURE)
                .ideal("F1.B", "JA2", LineKind.PRESSURE)
                .ideal("JA2", "C1.A", LineKind.PRESSURE)
                .ideal("JA2", "K1.A", LineKind.PRESSURE)
                .ideal("K1.B", "JA1", LineKind.PRESSURE)
                .ideal("D1.B", "C1.B", LineKind.PRESSURE)
                .note(56, 8, "Meter-in: F1 sets the pressing speed whatever the load;\nK1 lets the return oil bypass it.\n"
                        + "T1, T2 and T3 are the one reservoir.");
        String d = s.id("D1");
        String c = s.id("C1");
        List<OperatingState> states = List.of(
                new OperatingState("Pressing", "spool to a, 15 kN on the ram", java.util.Map.of(d, "a"),
                        java.util.Map.of(c, load(Mode.FREE, LoadKind.CONSTANT, 15000)), java.util.Map.of()),
                new OperatingState("Return", "spool to b, 2 kN of drag", java.util.Map.of(d, "b"),
                        java.util.Map.of(c, load(Mode.FREE, LoadKind.RESISTIVE, 2000)), java.util.Map.of()),
                new OperatingState("Idle", "spool centred, pump unloaded through the tandem centre",
                        java.util.Map.of(), java.util.Map.of(c, load(Mode.FREE, LoadKind.CONSTANT, 3000)),
                        java.util.Map.of()),
                new OperatingState("Pressed home", "spool to a, ram at the end of its stroke", java.util.Map.of(d, "a"),
                        java.util.Map.of(c, load(Mode.HELD_EXTENDED, LoadKind.CONSTANT, 15000)), java.util.Map.of()));
        return s.build(new TitleBlock("Bench press with meter-in speed control", "SW-DEMO-001", "A", "Spoolwork",
                "2026-12-01"), Fluid.standard(), states);
    }

    /**
     * A log splitter: engine-driven 8 cm³/rev pump with a 200 bar relief, tandem-centre 4/3 valve and a
     * 3/2 valve that sends the rod-end oil back into the cap end for a fast regenerative approach;
     * 100/56 mm cylinder.
     */
    public static Circuit logSplitter() {
        Sketch s = new Sketch()
                .place("C1", ComponentType.DOUBLE_ACTING_CYLINDER, 40, 10, "bore", 0.1, "rod", 0.056, "stroke", 0.6)
                .place("D2", ComponentType.DIRECTIONAL_3_2, 50, 24, "rated_flow", 80.0 / 60000)
                .place("D1", ComponentType.DIRECTIONAL_4_3, 37, 34, "centre", "tandem", "actuation", "manual")
                .place("T3", ComponentType.RESERVOIR, 43, 41, "volume", 0.04)
                .place("V1", ComponentType.RELIEF_VALVE, 48, 47, "cracking_pressure", 200e5, "override", 0.0)
                .turned(180)
                .place("T2", ComponentType.RESERVOIR, 47, 55, "volume", 0.04)
                .place("E1", ComponentType.PRIME_MOVER, 24, 50, "kind", "engine", "speed", 50.0, "rated_power", 9000.0)
                .place("P1", ComponentType.FIXED_PUMP, 36, 50, "displacement", 8e-6)
                .place("T1", ComponentType.RESERVOIR, 37, 58, "volume", 0.04)
                .junction("JP", 36, 42).junction("JA", 36, 22)
                .shaft("E1.shaft", "P1.shaft")
                .ideal("T1.S", "P1.S", LineKind.SUCTION)
                .ideal("P1.P", "JP", LineKind.PRESSURE)
                .ideal("JP", "V1.P", LineKind.PRESSURE)
                .ideal("JP", "D1.P", LineKind.PRESSURE)
                .ideal("V1.T", "T2.T", LineKind.RETURN)
                .ideal("D1.T", "T3.T", LineKind.RETURN)
                .ideal("D1.A", "JA", LineKind.PRESSURE)
                .ideal("JA", "C1.A", LineKind.PRESSURE)
                .ideal("JA", "D2.P", LineKind.PRESSURE)
                .ideal("C1.B", "D2.A", LineKind.PRESSURE)
                .ideal("D2.T", "D1.B", LineKind.PRESSURE)
                .note(60, 8, "D2 at a: rod-end oil joins the pump flow (regeneration),\nspeed = Q/A_rod.\n"
                        + "T1, T2 and T3 are the one reservoir.");
        String d1 = s.id("D1");
        String d2 = s.id("D2");
        String c = s.id("C1");
        List<OperatingState> states = List.of(
                new OperatingState("Fast approach", "regeneration, 5 kN until the wedge meets the log",
                        java.util.Map.of(d1, "a", d2, "a"),
                        java.util.Map.of(c, load(Mode.FREE, LoadKind.CONSTANT, 5000)), java.util.Map.of()),
                new OperatingState("Splitting", "full force, 90 kN of wood resistance", java.util.Map.of(d1, "a"),
                        java.util.Map.of(c, load(Mode.FREE, LoadKind.RESISTIVE, 90000)), java.util.Map.of()),
                new OperatingState("Knot", "the log needs more than the relief allows", java.util.Map.of(d1, "a"),
                        java.util.Map.of(c, load(Mode.FREE, LoadKind.RESISTIVE, 180000)), java.util.Map.of()),
                new OperatingState("Return", "wedge back, 1.5 kN of drag", java.util.Map.of(d1, "b"),
                        java.util.Map.of(c, load(Mode.FREE, LoadKind.RESISTIVE, 1500)), java.util.Map.of()));
        return s.build(new TitleBlock("Log splitter with regenerative approach", "SW-DEMO-002", "A", "Spoolwork",
                "2026-12-01"), Fluid.standard(), states);
    }

    /**
     * A capstan winch: electric motor, 20 cm³/rev pump, 160 bar relief, tandem-centre 4/3 valve and a
     * 50 cm³/rev motor on 3 m hoses of 12 mm bore.
     */
    public static Circuit capstanWinch() {
        Sketch s = new Sketch()
                .place("H1", ComponentType.HYDRAULIC_MOTOR, 37, 18, "displacement", 50e-6).turned(270)
                .place("D1", ComponentType.DIRECTIONAL_4_3, 37, 34, "centre", "tandem")
                .place("V1", ComponentType.RELIEF_VALVE, 48, 47, "cracking_pressure", 160e5, "override", 0.0,
                        "rated_flow", 40.0 / 60000).turned(180)
                .place("X1", ComponentType.FILTER, 58, 54)
                .place("T2", ComponentType.RESERVOIR, 65, 59, "volume", 0.1)
                .place("M1", ComponentType.PRIME_MOVER, 24, 50, "rated_power", 11000.0)
                .place("P1", ComponentType.FIXED_PUMP, 36, 50, "displacement", 20e-6)
                .place("T1", ComponentType.RESERVOIR, 37, 58, "volume", 0.1)
                .junction("JP", 36, 42).junction("JT", 48, 54)
                .shaft("M1.shaft", "P1.shaft")
                .ideal("T1.S", "P1.S", LineKind.SUCTION)
                .ideal("P1.P", "JP", LineKind.PRESSURE)
                .ideal("JP", "V1.P", LineKind.PRESSURE)
                .ideal("JP", "D1.P", LineKind.PRESSURE)
                .ideal("V1.T", "JT", LineKind.RETURN)
                .ideal("D1.T", "JT", LineKind.RETURN)
                .ideal("JT", "X1.A", LineKind.RETURN)
                .ideal("X1.B", "T2.T", LineKind.RETURN)
                .pipe("hoseA", "D1.A", "H1.A", 0.012, 3, LineKind.PRESSURE)
                .pipe("hoseB", "H1.B", "D1.B", 0.012, 3, LineKind.PRESSURE)
                .note(60, 12, "Return oil passes filter X1; T1 and T2 are the one reservoir.");
        String d = s.id("D1");
        String h = s.id("H1");
        List<OperatingState> states = List.of(
                new OperatingState("Haul in", "spool to a, 80 N·m on the drum", java.util.Map.of(d, "a"),
                        java.util.Map.of(h, load(Mode.FREE, LoadKind.CONSTANT, 80)), java.util.Map.of()),
                new OperatingState("Snagged", "the line is caught: 200 N·m needed", java.util.Map.of(d, "a"),
                        java.util.Map.of(h, load(Mode.FREE, LoadKind.RESISTIVE, 200)), java.util.Map.of()),
                new OperatingState("Pay out", "spool to b, 30 N·m of drag", java.util.Map.of(d, "b"),
                        java.util.Map.of(h, load(Mode.FREE, LoadKind.RESISTIVE, 30)), java.util.Map.of()),
                new OperatingState("Idle", "spool centred, drum held by the blocked motor ports",
                        java.util.Map.of(), java.util.Map.of(h, load(Mode.FREE, LoadKind.RESISTIVE, 10)),
                        java.util.Map.of()));
        return s.build(new TitleBlock("Capstan winch", "SW-DEMO-003", "A", "Spoolwork", "2026-12-01"),
                Fluid.standard(), states);
    }

    /** The example circuits in the order of {@link #FILES}. */
    public static List<Circuit> all() {
        return List.of(benchPress(), logSplitter(), capstanWinch());
    }

    /** Writes the examples into the given directory with the model's writer. */
    public static void main(String[] args) throws IOException {
        Path dir = Path.of(args.length > 0 ? args[0] : "demo/src/main/resources/spoolwork/demo");
        List<Circuit> all = all();
        for (int i = 0; i < all.size(); i++) {
            CircuitFiles.save(all.get(i), dir.resolve(FILES.get(i)));
        }
    }
}
