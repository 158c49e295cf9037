package spoolwork.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import spoolwork.editor.cli.Cli;
import spoolwork.model.Circuit;
import spoolwork.model.io.CircuitFormat;

/**
 * Each example file is what the model's writer makes of the circuit drawn in {@link DemoCircuits}, and
 * {@code solve --all-states} on it gives the hand-calculated numbers. Formulas used: F = p·A and v = Q/A
 * (continuity), motor n = Q/D and T = Δp·D·ηm/2π, P = Q·Δp (any fluid power text).
 */
class DemoCircuitsTest {
    static final double LPM = 1.0 / 60000;
    @TempDir
    Path tmp;

    Path copy(String name) throws Exception {
        Path f = tmp.resolve(name);
        try (InputStream in = DemoCircuits.class.getResourceAsStream("/spoolwork/demo/" + name)) {
            Files.copy(in, f);
        }
        return f;
    }

    JsonNode solve(String name, String... extra) throws Exception {
        Path f = copy(name);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        String[] args = new String[3 + extra.length];
        args[0] = "solve";
        args[1] = f.toString();
        args[2] = "--all-states";
        System.arraycopy(extra, 0, args, 3, extra.length);
        int code = Cli.run(args, new PrintWriter(out), new PrintWriter(err));
        assertEquals(0, code, () -> "exit code; stderr: " + err);
        if (extra.length == 0) {
            return null;
        }
        JsonNode all = new ObjectMapper().readTree(out.toString());
        for (JsonNode s : all) {
            assertTrue(s.get("converged").asBoolean(), s.get("state").asText());
            JsonNode p = s.get("power_w");
            double input = p.get("pump_input").asDouble();
            double parts = p.get("pump_loss").asDouble() + p.get("useful").asDouble() + p.get("relief_loss").asDouble()
                    + p.get("throttle_loss").asDouble() + p.get("line_loss").asDouble() + p.get("leakage_loss").asDouble()
                    + p.get("valve_loss").asDouble() + p.get("actuator_loss").asDouble();
            assertEquals(input, parts, 1e-6 * input, "power balance of " + s.get("state").asText());
        }
        return all;
    }

    static JsonNode state(JsonNode all, String name) {
        for (JsonNode s : all) {
            if (s.get("state").asText().equals(name)) {
                return s;
            }
        }
        throw new AssertionError("no state " + name);
    }

    static double v(JsonNode s, String tag, String key) {
        return s.get("components").get(tag).get(key).asDouble();
    }

    static double p(JsonNode s, String tag, String port) {
        return s.get("components").get(tag).get("ports").get(port).get("pressure_pa").asDouble();
    }

    @Test
    void filesAreWhatTheWriterMakesOfTheDrawings() throws Exception {
        for (int i = 0; i < DemoCircuits.FILES.size(); i++) {
            String name = DemoCircuits.FILES.get(i);
            Circuit drawn = DemoCircuits.all().get(i);
            String text;
            try (InputStream in = DemoCircuits.class.getResourceAsStream("/spoolwork/demo/" + name)) {
                text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            }
            assertEquals(drawn, CircuitFormat.read(text, name), name);
        }
    }

    @Test
    void textReportCarriesTheCaution() throws Exception {
        for (String name : DemoCircuits.FILES) {
            Path f = copy(name);
            StringWriter out = new StringWriter();
            int code = Cli.run(new String[]{"solve", f.toString(), "--all-states", "--units", "us"},
                    new PrintWriter(out), new PrintWriter(new StringWriter()));
            assertEquals(0, code);
            assertTrue(out.toString().contains("ISO 4413") && out.toString().contains("competent person"));
            assertTrue(out.toString().contains("psi") && out.toString().contains("gpm"));
        }
    }

    @Test
    void benchPress() throws Exception {
        JsonNode all = solve("bench_press.spool.json", "--format", "json");
        // Pressing: pump 16 cm³/rev · 1450 rpm = 23.2 L/min, 7 % leakage at 200 bar → 22.39 L/min at the
        // 100 bar relief. F1 meters 10 L/min into the cap: v = 10/60000/(π/4·0.063²) = 0.05347 m/s.
        // Relief: 22.39 − 10 = 12.39 L/min (less the spool leakage). Cap pressure F/A = 15000/3.1173e-3
        // = 48.12 bar plus the rod side's back pressure through B→T (6.7 L/min at 5 bar per 40 L/min,
        // 0.14 bar × A_ann/A_cap = 0.09 bar) → 48.21 bar.
        JsonNode s = state(all, "Pressing");
        assertEquals(100e5, p(s, "P1", "P"), 1);
        assertEquals(0.05347, v(s, "C1", "velocity_mps"), 5e-5);
        assertEquals(12.39 * LPM, v(s, "V1", "bypass_flow_m3s"), 0.02 * LPM);
        assertEquals(48.21e5, p(s, "C1", "A"), 0.02e5);
        // Return: the pump's ~23 L/min goes into the annulus π/4·(0.063² − 0.036²) = 2.0994e-3 m²
        // → v ≈ −23.05/60000/2.0994e-3 = −0.183 m/s; the cap oil leaves through check K1.
        s = state(all, "Return");
        assertEquals(-0.183, v(s, "C1", "velocity_mps"), 0.002);
        // Pressed home: the ram is at its stop, all pump flow over the relief: 100 bar · 22.39 L/min = 3.73 kW.
        s = state(all, "Pressed home");
        assertEquals(3731, s.get("power_w").get("relief_loss").asDouble(), 5);
        assertEquals(0, v(s, "C1", "velocity_mps"), 1e-9);
        // Idle: tandem centre unloads the pump: 23.2 L/min through P→T, 5 bar·(23.2/40)² = 1.68 bar.
        s = state(all, "Idle");
        assertEquals(1.68e5, p(s, "P1", "P"), 0.02e5);
        assertTrue(s.get("diagnostics").toString().contains("hydraulically locked"));
    }

    @Test
    void logSplitter() throws Exception {
        JsonNode all = solve("log_splitter.spool.json", "--format", "json");
        // Fast approach with regeneration: v = Q/A_rod, A_rod = π/4·0.056² = 2.4630e-3 m²; the pump
        // (8 cm³/rev at 3000 rpm = 24 L/min, 7 % leakage at 200 bar) gives Q = 23.78 L/min at the low
        // approach pressure → v = 23.78/60000/2.4630e-3 = 0.1609 m/s.
        JsonNode s = state(all, "Fast approach");
        double q = v(s, "P1", "flow_m3s");
        // (the spool leakage of both valves, about 1e-14 m³/(s·Pa) per path, takes a few 1e-7 m³/s off Q)
        assertEquals(q / (Math.PI / 4 * 0.056 * 0.056), v(s, "C1", "velocity_mps"), 1e-4);
        assertEquals(0.1609, v(s, "C1", "velocity_mps"), 5e-4);
        // Splitting at 90 kN: v = Q/A_cap = 23.02/60000/7.854e-3 = 0.0488 m/s; cap pressure ≥ F/A = 114.6 bar.
        s = state(all, "Splitting");
        assertEquals(v(s, "P1", "flow_m3s") / (Math.PI / 4 * 0.1 * 0.1), v(s, "C1", "velocity_mps"), 1e-4);
        assertTrue(p(s, "C1", "A") > 114.6e5);
        // A knot needing 180 kN: the relief allows 200 bar · 7.854e-3 m² = 157.1 kN, so the ram stalls and
        // the whole pump flow goes over the relief.
        s = state(all, "Knot");
        assertEquals(0, v(s, "C1", "velocity_mps"), 1e-9);
        assertEquals(157.08e3, v(s, "C1", "force_n"), 200);
        assertEquals(v(s, "P1", "flow_m3s"), v(s, "V1", "bypass_flow_m3s"), 1e-6);
    }

    @Test
    void capstanWinch() throws Exception {
        JsonNode all = solve("capstan_winch.spool.json", "--format", "json");
        // Haul in at 80 N·m: the motor needs Δp = 2π·T/(ηm·D) = 2π·80/(0.9·50e-6) = 111.7 bar across it
        // (T = Δp·D·ηm/2π). Its leakage 0.07·50e-6·24.17/200e5 = 4.23e-12 m³/(s·Pa) takes 2.83 L/min of the
        // pump's 27.8 L/min, so n = (27.8 − 2.83)/60000/50e-6 = 8.32 rev/s = 499 rpm (n = Q/D).
        JsonNode s = state(all, "Haul in");
        assertEquals(2 * Math.PI * 80 / (0.9 * 50e-6), p(s, "H1", "A") - p(s, "H1", "B"), 100);
        assertEquals(499, v(s, "H1", "speed_rpm"), 1.5);
        assertTrue(s.get("lines").get("hoseA").get("reynolds").asDouble() > 1000);
        // Snagged at 200 N·m: the relief allows 0.9·160e5·50e-6/2π = 114.6 N·m, so the drum stalls and
        // all flow goes over the relief. The stalled motor still leaks 4.23e-12·160e5 = 6.8e-5 m³/s (4.1 L/min)
        // through the valve paths (2 × 5 bar·(4.1/40)² = 0.1 bar) and the laminar hoses (2 × 0.1 bar), so
        // Δp ≈ 159.7 bar and T = 0.9·159.7e5·50e-6/2π = 114.4 N·m.
        s = state(all, "Snagged");
        assertEquals(0, v(s, "H1", "speed_rpm"), 1e-6);
        assertEquals(114.4, v(s, "H1", "torque_nm"), 0.1);
    }

    @Test
    void illPosedCircuitExitsWithOneAndSaysWhy() throws Exception {
        // The bench press without its relief valve: the fixed pump would dead-head against the stop.
        Circuit press = DemoCircuits.benchPress();
        Circuit broken = press.withoutComponent(press.componentByTag("V1").orElseThrow().id());
        Path f = tmp.resolve("no_relief.spool.json");
        spoolwork.model.io.CircuitFiles.save(broken, f);
        StringWriter out = new StringWriter();
        int code = Cli.run(new String[]{"solve", f.toString(), "--state", "Pressed home", "--format", "json"},
                new PrintWriter(out), new PrintWriter(new StringWriter()));
        assertEquals(1, code);
        JsonNode s = new ObjectMapper().readTree(out.toString());
        assertTrue(!s.get("converged").asBoolean());
        assertTrue(s.get("diagnostics").get(0).get("message").asText().contains("relief"));
        assertEquals("P1", s.get("diagnostics").get(0).get("elements").get(0).asText());
    }

    @Test
    void badArgumentsAndUnreadableFilesExitWithTwo() throws Exception {
        StringWriter err = new StringWriter();
        int code = Cli.run(new String[]{"solve", tmp.resolve("missing.spool.json").toString()},
                new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertEquals(2, code);
        assertTrue(err.toString().contains("missing.spool.json"));
        Path broken = tmp.resolve("broken.spool.json");
        Files.writeString(broken, "{ \"format\": ");
        err = new StringWriter();
        assertEquals(2, Cli.run(new String[]{"solve", broken.toString()}, new PrintWriter(new StringWriter()),
                new PrintWriter(err)));
        assertTrue(err.toString().contains("broken.spool.json"), err.toString());
        Path f = copy("bench_press.spool.json");
        assertEquals(2, Cli.run(new String[]{"solve", f.toString(), "--state", "Nope"},
                new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter())));
        assertEquals(2, Cli.run(new String[]{"solve", f.toString(), "--format", "xml"},
                new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter())));
        byte[] before = Files.readAllBytes(f);
        Cli.run(new String[]{"solve", f.toString(), "--all-states"}, new PrintWriter(new StringWriter()),
                new PrintWriter(new StringWriter()));
        assertEquals(new String(before, StandardCharsets.UTF_8),
                new String(Files.readAllBytes(f), StandardCharsets.UTF_8), "solving never touches the file");
    }
}
