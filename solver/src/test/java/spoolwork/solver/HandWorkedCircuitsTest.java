package spoolwork.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import spoolwork.model.ActuatorState;
import spoolwork.model.ActuatorState.LoadKind;
import spoolwork.model.ActuatorState.Mode;
import spoolwork.model.Circuit;
import spoolwork.model.ComponentType;
import spoolwork.model.Fluid;
import spoolwork.model.OperatingState;

/** Whole circuits worked by hand; the arithmetic is in the comments. */
class HandWorkedCircuitsTest {
    static final double N = 1450.0 / 60; // rev/s
    static final double LPM = 1.0 / 60000;

    static Solution solve(Circuit c) {
        Solution s = new SteadyStateSolver().solve(c, c.states().get(0));
        assertTrue(s.converged(), () -> "not converged: " + s.diagnostics());
        assertTrue(s.power().relativeImbalance() <= 1e-6, () -> "power balance off: " + s.power());
        return s;
    }

    static ActuatorState constant(double f) {
        return new ActuatorState(Mode.FREE, LoadKind.CONSTANT, f);
    }

    static ActuatorState resistive(double f) {
        return new ActuatorState(Mode.FREE, LoadKind.RESISTIVE, f);
    }

    @Test
    void meterInFlowControlWithReliefBypass() {
        // Pump 16 cm³/rev at 1450 rpm: Qg = 16e-6 · 24.1667 = 3.8667e-4 m³/s (23.2 L/min).
        // Leakage grows linearly to 7 % at 200 bar, so at 100 bar Q = Qg·(1 − 0.07·0.5) = 3.7313e-4 m³/s.
        // Ideal relief at 100 bar holds the pump line; the flow control passes its 10 L/min = 1.6667e-4 m³/s.
        // Cylinder 63 mm bore: A = π/4·0.063² = 3.1173e-3 m²; 15 kN load → p_A = 15000/A = 48.119 bar.
        // v = Q/A (continuity) = 1.6667e-4/3.1173e-3 = 0.053466 m/s.
        // Relief flow 3.7313e-4 − 1.6667e-4 = 2.0647e-4 m³/s → 2064.7 W of heat (P = Q·Δp).
        // Flow control: (100 − 48.119) bar · 1.6667e-4 = 864.7 W. Useful: 15000 · 0.053466 = 802.0 W.
        // Sum 2064.7 + 864.7 + 802.0 = 3731.3 W = pump hydraulic power 100e5 · 3.7313e-4. Input 3731.3/0.85 = 4389.8 W.
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 100e5, "override", 0.0)
                .add("F1", ComponentType.FLOW_CONTROL, "set_flow", 10 * LPM)
                .add("C1", ComponentType.DOUBLE_ACTING_CYLINDER, "bore", 0.063, "rod", 0.036)
                .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T").ideal("P1.P", "F1.A")
                .ideal("F1.B", "C1.A").ideal("C1.B", "T1.T")
                .build(OperatingState.named("Extend").withActuator("C1", constant(15000)));
        Solution s = solve(c);
        double area = Math.PI / 4 * 0.063 * 0.063;
        assertEquals(100e5, s.pressure("P1", "P"), 1);
        assertEquals(15000 / area, s.pressure("C1", "A"), 10); // F = p·A
        assertEquals(1.6667e-4 / area, s.value("C1", "velocity_mps"), 1e-5); // v = Q/A
        assertEquals(3.7313e-4, s.value("P1", "flow_m3s"), 1e-7);
        assertEquals(2.0647e-4, s.value("V1", "bypass_flow_m3s"), 1e-7);
        assertEquals(2064.7, s.power().relief(), 0.5);
        assertEquals(864.7, s.power().throttle(), 0.5);
        assertEquals(802.0, s.power().useful(), 0.5);
        assertEquals(3731.3, s.power().pumpHydraulic(), 0.5);
        assertEquals(4389.8, s.power().pumpInput(), 0.5);
        assertEquals(s.power().pumpHydraulic(), s.power().relief() + s.power().throttle() + s.power().useful()
                + s.power().leakage(), 1e-3);
        assertEquals(0.5 / (1.6667e-4 / area), s.value("C1", "stroke_time_s"), 0.01);
        // Continuity at the reservoir (flow positive into a port): the suction port gives the pump its 3.7313e-4;
        // the return port takes the relief flow plus the rod-end oil A_ann·v = π/4·(0.063² − 0.036²)·0.053466
        // = 1.1225e-4, so 2.0647e-4 + 1.1225e-4 = 3.1872e-4 m³/s.
        assertEquals(-3.7313e-4, s.flow("T1", "S"), 1e-7);
        assertEquals(3.1872e-4, s.flow("T1", "T"), 1e-7);
    }

    @Test
    void regenerativeExtensionRunsAtFlowOverRodArea() {
        // Regeneration: rod-end oil joins the pump flow into the cap end, so Q + A_ann·v = A_cap·v and
        // v = Q/(A_cap − A_ann) = Q/A_rod. Pump ηv = 1: Q = 16e-6·24.1667 = 3.8667e-4 m³/s.
        // Rod 36 mm: A_rod = π/4·0.036² = 1.01788e-3 m² → v = 0.37988 m/s. Load 8 kN acts on the rod area:
        // p = 8000/1.01788e-3 = 78.60 bar, below the 120 bar relief, so the relief stays shut.
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP, "volumetric_efficiency", 1.0)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 120e5)
                .add("C1", ComponentType.DOUBLE_ACTING_CYLINDER, "bore", 0.063, "rod", 0.036)
                .junction("J1")
                .ideal("T1.S", "P1.S").ideal("P1.P", "J1").ideal("J1", "V1.P").ideal("V1.T", "T1.T")
                .ideal("J1", "C1.A").ideal("C1.B", "J1")
                .build(OperatingState.named("Regen").withActuator("C1", constant(8000)));
        Solution s = solve(c);
        double aRod = Math.PI / 4 * 0.036 * 0.036;
        assertEquals(3.8667e-4 / aRod, s.value("C1", "velocity_mps"), 1e-4);
        assertEquals(8000 / aRod, s.pressure("C1", "A"), 50);
        assertEquals(0, s.value("V1", "bypass_flow_m3s"), 1e-12);
    }

    @Test
    void motorWhoseLoadNeedsMoreThanTheReliefStalls() {
        // Motor 32 cm³/rev, ηm = 0.9: the relief at 100 bar gives at most T = ηm·Δp·D/2π
        // = 0.9 · 100e5 · 32e-6 / 2π = 45.8 N·m. A 60 N·m resistive load needs more, so the motor stalls:
        // n = 0 and all pump flow (ηv = 1: 3.8667e-4 m³/s) goes over the relief, 100e5 · 3.8667e-4 = 3866.7 W.
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP, "volumetric_efficiency", 1.0)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 100e5, "override", 0.0)
                .add("M1", ComponentType.HYDRAULIC_MOTOR, "volumetric_efficiency", 1.0)
                .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T").ideal("P1.P", "M1.A")
                .ideal("M1.B", "T1.T")
                .build(OperatingState.named("Stall").withActuator("M1", resistive(60)));
        Solution s = solve(c);
        assertEquals(0, s.value("M1", "speed_rpm"), 1e-6);
        assertEquals(3.8667e-4, s.value("V1", "bypass_flow_m3s"), 1e-8);
        assertEquals(3866.7, s.power().relief(), 0.5);
        assertEquals(100e5, s.pressure("M1", "A"), 1);
    }

    @Test
    void motorSpeedIsFlowOverDisplacementAndTorqueIsPressureTimesDisplacement() {
        // Ideal motor (ηv = ηm = 1), 32 cm³/rev, fed 3.8667e-4 m³/s: n = Q/D = 12.083 rev/s = 725 rpm.
        // Load 40 N·m: Δp = 2π·T/D = 2π·40/32e-6 = 78.54 bar (T = Δp·D/2π).
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP, "volumetric_efficiency", 1.0)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 150e5)
                .add("M1", ComponentType.HYDRAULIC_MOTOR, "volumetric_efficiency", 1.0, "mechanical_efficiency", 1.0)
                .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T").ideal("P1.P", "M1.A")
                .ideal("M1.B", "T1.T")
                .build(OperatingState.named("Run").withActuator("M1", constant(40)));
        Solution s = solve(c);
        assertEquals(725, s.value("M1", "speed_rpm"), 0.01);
        assertEquals(2 * Math.PI * 40 / 32e-6, s.pressure("M1", "A"), 1);
        assertEquals(40, s.value("M1", "torque_nm"), 1e-6);
        // useful power T·ω = 40 · 2π · 12.083 = 3036.9 W = Δp·Q = 78.54e5 · 3.8667e-4
        assertEquals(3036.9, s.power().useful(), 0.5);
    }

    @Test
    void twoCylindersInParallelTheLighterMovesTheOtherHolds() {
        // Both 63 mm bore (A = 3.1173e-3 m²). Resistive loads 10 kN and 30 kN need 32.08 and 96.24 bar.
        // The pump line settles at 32.08 bar: the lighter cylinder takes all 3.8667e-4 m³/s,
        // v = 0.12404 m/s; the heavier one holds still since 32.08 bar cannot overcome its 30 kN.
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP, "volumetric_efficiency", 1.0)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 150e5)
                .add("C1", ComponentType.DOUBLE_ACTING_CYLINDER, "bore", 0.063, "rod", 0.036)
                .add("C2", ComponentType.DOUBLE_ACTING_CYLINDER, "bore", 0.063, "rod", 0.036)
                .junction("J1")
                .ideal("T1.S", "P1.S").ideal("P1.P", "J1").ideal("J1", "V1.P").ideal("V1.T", "T1.T")
                .ideal("J1", "C1.A").ideal("J1", "C2.A").ideal("C1.B", "T1.T").ideal("C2.B", "T1.T")
                .build(OperatingState.named("Both").withActuator("C1", resistive(10000))
                        .withActuator("C2", resistive(30000)));
        Solution s = solve(c);
        double area = Math.PI / 4 * 0.063 * 0.063;
        assertEquals(10000 / area, s.pressure("P1", "P"), 10);
        assertEquals(3.8667e-4 / area, s.value("C1", "velocity_mps"), 1e-5);
        assertEquals(0, s.value("C2", "velocity_mps"), 1e-9);
        assertEquals(0, s.value("V1", "bypass_flow_m3s"), 1e-12);
    }

    @Test
    void compensatedPumpDeadHeadedFallsToLeakageAtItsSetting() {
        // Compensated pump set at 180 bar with a 5 bar band, outlet blocked by a closed 2/2 valve whose
        // spool leaks 1e-14 m³/(s·Pa). Flow falls to what leaks; the pressure sits in the band 180 … 185 bar;
        // with no relief valve there is no relief loss.
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.COMPENSATED_PUMP)
                .add("D1", ComponentType.DIRECTIONAL_2_2)
                .ideal("T1.S", "P1.S").ideal("P1.P", "D1.P").ideal("D1.A", "T1.T").ideal("P1.L", "T1.T")
                .build(OperatingState.named("Standby"));
        Solution s = solve(c);
        double p = s.pressure("P1", "P");
        assertTrue(p > 180e5 && p < 185e5, "pressure " + p);
        assertEquals(1e-14 * p, s.value("P1", "flow_m3s"), 1e-9);
        assertEquals(0, s.power().relief(), 0);
        assertTrue(s.value("P1", "stroke") < 0.1);
    }

    @Test
    void laminarLineDropIsHagenPoiseuille() {
        // VG 32 at 40 °C: ν = 32 mm²/s (ISO 3448); density 870 kg/m³ at 40 °C (884.1 at 15 °C with our
        // expansion of 6.5e-4/K). Pump 40 L/min (ηv = 1, D = 6.6667e-4/24.1667 = 2.7586e-5 m³/rev) through
        // 2 m of 16 mm line to a relief at 50 bar: v = 3.316 m/s, Re = 1658 (laminar, f = 64/Re),
        // Δp = 128·μ·L·Q/(π·D⁴) = 11.54 kPa per metre → 23.08 kPa (Hagen–Poiseuille).
        double rho15 = 870 * (1 + 6.5e-4 * 25);
        Circuit c = new CircuitBuilder()
                .fluid(new Fluid(32, 100, 40, rho15))
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP, "volumetric_efficiency", 1.0, "displacement", 40 * LPM / N)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 50e5, "override", 0.0)
                .ideal("T1.S", "P1.S").line("L1", "P1.P", "V1.P", 0.016, 2).ideal("V1.T", "T1.T")
                .build();
        Solution s = solve(c);
        LineResult l = s.line("L1").orElseThrow();
        assertEquals(40 * LPM, l.flow(), 1e-9);
        assertEquals(3.316, l.velocity(), 1e-3);
        assertEquals(1658, l.reynolds(), 1);
        assertEquals(2 * 11.54e3, l.pressureStart() - l.pressureEnd(), 20);
        assertEquals(50e5, l.pressureEnd(), 1);
        assertEquals(40 * LPM * 2 * 11.54e3, s.power().line(), 0.5);
    }

    @Test
    void compensatedPumpSettlesPartWayThroughItsBand() {
        // Compensator: full stroke up to the 10 bar setting, none at 12 bar, linear between (the usual static
        // characteristic of a pressure compensator, common practice). Load: a filter whose clean element is
        // linear, R = 15e5 Pa / 3.8667e-4 m³/s.
        // Full stroke would give R·D·n = 15 bar > 10 bar, so the pump destrokes:
        // p = R·Q, Q = D·n·(12 bar − p)/2 bar  →  p = R·D·n·12e5/(2e5 + R·D·n) = 15e5·12e5/17e5 = 10.588 bar,
        // stroke k = (12 − 10.588)/2 = 0.70588, Q = 0.70588 · 3.8667e-4 = 2.7294e-4 m³/s; P = Q·Δp = 289.0 W.
        double dn = 16e-6 * N;
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.COMPENSATED_PUMP, "displacement", 16e-6, "volumetric_efficiency", 1.0,
                        "compensator_setting", 10e5, "compensator_band", 2e5)
                .add("X1", ComponentType.FILTER, "clean_drop", 15e5, "rated_flow", dn, "bypass_cracking", 50e5)
                .ideal("T1.S", "P1.S").ideal("P1.P", "X1.A").ideal("X1.B", "T1.T").ideal("P1.L", "T1.T")
                .build(OperatingState.named("Part stroke"));
        Solution s = solve(c);
        assertEquals(15e5 * 12e5 / 17e5, s.pressure("P1", "P"), 1);
        assertEquals((12e5 - 15e5 * 12e5 / 17e5) / 2e5, s.value("P1", "stroke"), 1e-6);
        assertEquals(dn * (12e5 - 15e5 * 12e5 / 17e5) / 2e5, s.value("P1", "flow_m3s"), 1e-9);
        assertEquals(289.0, s.power().pumpHydraulic(), 0.2);
    }

    @Test
    void closedCentreHoldsTheLoadWithACaution() {
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP)
                .add("V1", ComponentType.RELIEF_VALVE)
                .add("D1", ComponentType.DIRECTIONAL_4_3)
                .add("C1", ComponentType.DOUBLE_ACTING_CYLINDER)
                .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T").ideal("P1.P", "D1.P")
                .ideal("D1.T", "T1.T").ideal("D1.A", "C1.A").ideal("D1.B", "C1.B")
                .build(OperatingState.named("Hold").withActuator("C1", constant(20000)));
        Solution s = solve(c);
        assertTrue(s.diagnostics().stream().anyMatch(d -> d.message().contains("hydraulically locked")
                && d.elements().contains("C1")));
        // the trapped oil is reported once, as the lock, not again as a part with no path to the reservoir
        assertTrue(s.diagnostics().stream().noneMatch(d -> d.message().contains("no path to the reservoir")),
                () -> s.diagnostics().toString());
        // Spool leakage 1e-14 m³/(s·Pa) on P→A, P→B, A→T, B→T at about 160 bar moves a few times
        // 1e-7 m³/s, so the piston creeps at most G·p/A_ann ≈ 1e-14·160e5/2e-3 ≈ 1e-4 m/s.
        assertTrue(Math.abs(s.value("C1", "velocity_mps")) < 1e-4, "creeps by leakage only");
        assertEquals(s.value("P1", "flow_m3s"), s.value("V1", "bypass_flow_m3s"), 1e-6);
    }

    @Test
    void fixedPumpWithNoReliefIsAnError() {
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP)
                .add("C1", ComponentType.DOUBLE_ACTING_CYLINDER)
                .ideal("T1.S", "P1.S").ideal("P1.P", "C1.A").ideal("C1.B", "T1.T")
                .build(OperatingState.named("Run").withActuator("C1", new ActuatorState(Mode.HELD_EXTENDED,
                        LoadKind.CONSTANT, 0)));
        Solution s = new SteadyStateSolver().solve(c, c.states().get(0));
        assertFalse(s.ok());
        assertTrue(s.diagnostics().stream().anyMatch(d -> d.severity() == Severity.ERROR
                && d.message().contains("reaches no relief valve") && d.elements().contains("P1")));
        assertTrue(s.components().isEmpty(), "no numbers for an ill-posed circuit");
    }

    @Test
    void cylinderHeldAtItsEndStopPutsAllFlowOverTheRelief() {
        // Held extended, pushed on by the pump: it may only retract, so it stays and the relief takes
        // all 3.8667e-4 m³/s at 100 bar.
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP, "volumetric_efficiency", 1.0)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 100e5, "override", 0.0)
                .add("C1", ComponentType.DOUBLE_ACTING_CYLINDER)
                .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T").ideal("P1.P", "C1.A")
                .ideal("C1.B", "T1.T")
                .build(OperatingState.named("End").withActuator("C1",
                        new ActuatorState(Mode.HELD_EXTENDED, LoadKind.CONSTANT, 5000)));
        Solution s = solve(c);
        assertEquals(0, s.value("C1", "velocity_mps"), 1e-12);
        assertEquals(3.8667e-4, s.value("V1", "bypass_flow_m3s"), 1e-8);
    }

    @Test
    void overrunningLoadDrivesTheCylinderAgainstAMeterOutOrifice() {
        // A 10 kN weight lowers the rod (negative load = pulls outward) through a 2 mm orifice on the
        // rod side, cap side fed from tank via ideal lines. Rod side pressure = F/A_ann with
        // A_ann = π/4·(0.063² − 0.036²) = 2.0994e-3 m²: p_B = 47.63 bar; the orifice flow at that drop is
        // Q = Cd·A·√(2Δp/ρ) = 0.61·3.1416e-6·√(2·47.63e5/ρ(50 °C)); v = Q/A_ann.
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP, "speed", 0.0)
                .add("V1", ComponentType.RELIEF_VALVE)
                .add("O1", ComponentType.ORIFICE)
                .add("C1", ComponentType.DOUBLE_ACTING_CYLINDER, "bore", 0.063, "rod", 0.036)
                .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T").ideal("T1.T", "C1.A")
                .ideal("C1.B", "O1.A").ideal("O1.B", "T1.T")
                .build(OperatingState.named("Lower").withActuator("C1", constant(-10000)));
        Solution s = solve(c);
        double aAnn = Math.PI / 4 * (0.063 * 0.063 - 0.036 * 0.036);
        double rho = 870 / (1 + 6.5e-4 * 35);
        double q = 0.61 * Math.PI * 1e-6 * Math.sqrt(2 * (10000 / aAnn) / rho);
        assertEquals(10000 / aAnn, s.pressure("C1", "B"), 100);
        assertEquals(q / aAnn, s.value("C1", "velocity_mps"), 1e-4 * q / aAnn);
        assertTrue(s.power().useful() < 0, "the load supplies the power");
    }
}
