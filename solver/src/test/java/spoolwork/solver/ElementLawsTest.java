package spoolwork.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import spoolwork.model.Circuit;
import spoolwork.model.ComponentType;
import spoolwork.model.Fluid;
import spoolwork.model.units.Units;
import spoolwork.solver.elements.DropLaw;
import spoolwork.solver.elements.LineLaw;
import spoolwork.solver.fluid.FluidProperties;

/** Element laws against published formulas and values; each check names its source. */
class ElementLawsTest {
    static final double LPM = 1.0 / 60000;

    @Test
    void sharpEdgedOrificeFlow() {
        // Q = Cd·A·√(2Δp/ρ), Cd ≈ 0.61 for a sharp-edged orifice (common practice; π/(π+2) = 0.611, from memory):
        // d = 2 mm, Δp = 50 bar, ρ = 870 → Q = 0.61·3.1416e-6·√(2·50e5/870) = 2.0546e-4 m³/s = 12.33 L/min.
        double qt = Math.PI * 0.002 * 32e-6 * 10 / 4;
        DropLaw law = DropLaw.orifice(0.61, 0.002, 870, qt);
        assertEquals(50e5, law.drop(12.33 * LPM, new double[1]), 50e5 * 1e-3);
        assertEquals(-50e5, law.drop(-12.33 * LPM, new double[1]), 50e5 * 1e-3);
    }

    @Test
    void hagenPoiseuilleInLaminarFlow() {
        // Darcy–Weisbach with f = 64/Re (= Hagen–Poiseuille): 40 L/min, D = 16 mm, ν = 32 mm²/s, ρ = 870:
        // v = 3.316 m/s, Re = 1658, f = 0.03860, Δp = 11.54 kPa per metre.
        LineLaw l = new LineLaw(0.016, 1, 870, 32e-6, 0);
        double q = 40 * LPM;
        assertEquals(3.316, l.velocity(q), 1e-3);
        assertEquals(1658, l.reynolds(q), 1);
        assertEquals(0.03860, l.frictionFactor(l.reynolds(q)), 1e-5);
        assertEquals(11.54e3, l.drop(q, new double[1]), 10);
    }

    @Test
    void turbulentFrictionFactorsAgreeWithMoodyChartValues() {
        // Haaland (1983) explicit form: Re = 1e5, ε/D = 1e-4 → 0.018265; Re = 1e4 smooth → 0.030886.
        // Colebrook (1939) gives 0.018514 and 0.030883: Haaland stays within about 1.5 % of it.
        // Blasius 0.316·Re^-0.25 (smooth, 4e3 < Re < 1e5) gives 0.0316 at Re = 1e4.
        assertEquals(0.018265, LineLaw.haaland(1e5, 1e-4, new double[1]), 2e-6);
        assertEquals(0.030886, LineLaw.haaland(1e4, 0, new double[1]), 2e-6);
        assertEquals(0.018514, LineLaw.haaland(1e5, 1e-4, new double[1]), 0.015 * 0.018514);
        assertEquals(0.316 * Math.pow(1e4, -0.25), LineLaw.haaland(1e4, 0, new double[1]), 0.03 * 0.0316);
        // Above Re = 4000 the blended factor is the turbulent one alone.
        LineLaw l = new LineLaw(0.01, 1, 870, 1e-6, 1e-6);
        assertEquals(LineLaw.haaland(1e5, 1e-4, new double[1]), l.frictionFactor(1e5), 1e-12);
    }

    @Test
    void isoGradesAt40Celsius() {
        // ISO 3448: the grade is the kinematic viscosity in mm²/s at 40 °C (VG32 28.8–35.2, VG46 41.4–50.6,
        // VG68 61.2–74.8 as bands; the mid-point by definition).
        for (double vg : new double[]{32, 46, 68}) {
            FluidProperties f = new FluidProperties(new Fluid(vg, 100, 40, 870));
            assertEquals(vg, f.viscosityMm2s(40), vg * 1e-9);
            assertEquals(vg * 1e-6, f.kinematicViscosity(), vg * 1e-15);
        }
    }

    @Test
    void astmD341WaltherLine() {
        // ASTM D341: log10(log10(ν + 0.7)) = A − B·log10(T). VG46 with VI 100 has ν(100 °C) ≈ 6.76 mm²/s
        // (ASTM D2270 H values); then A = 9.4555, B = 3.6995, and ν(50 °C) ≈ 29.9, ν(60 °C) ≈ 20.6,
        // ν(80 °C) ≈ 11.05 mm²/s.
        FluidProperties f = new FluidProperties(new Fluid(46, 100, 50, 870));
        assertEquals(6.76, f.viscosityAt100(), 0.01);
        assertEquals(9.4555, f.walterA(), 0.01);
        assertEquals(3.6995, f.walterB(), 0.004);
        assertEquals(29.9, f.viscosityMm2s(50), 0.1);
        assertEquals(20.6, f.viscosityMm2s(60), 0.1);
        assertEquals(11.05, f.viscosityMm2s(80), 0.05);
        assertEquals(29.9e-6, f.kinematicViscosity(), 0.1e-6);
        // A higher index thins less with heat: ν(100 °C) rises with VI at a fixed grade (ASTM D2270).
        assertTrue(FluidProperties.viscosityAt100(46, 150) > FluidProperties.viscosityAt100(46, 100));
    }

    @Test
    void nistConversionFactors() {
        // NIST SP 811 (2008), Appendix B.
        assertEquals(6894.757, Units.PSI, 1e-3);
        assertEquals(3.785411784e-3, Units.US_GALLON, 1e-15);
        assertEquals(745.699872, Units.HORSEPOWER, 1e-6);
        assertEquals(4.4482216152605, Units.POUND_FORCE, 1e-13);
        assertEquals(0.0254, Units.INCH, 0);
    }

    @Test
    void hydraulicPowerInSiAndUsForms() {
        // P = Q·Δp. US form hp = gpm·psi/1714 (fluid-power rule; 1714 = 12000/7 from NIST factors):
        // 20 gpm over a relief at 1500 psi → 17.50 hp. SI form P[kW] = p[bar]·Q[L/min]/600.
        double n = 1450.0 / 60;
        double q = 20 * Units.US_GALLON / 60;
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP, "volumetric_efficiency", 1.0, "displacement", q / n)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 1500 * Units.PSI, "override", 0.0)
                .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T")
                .build();
        Solution s = HandWorkedCircuitsTest.solve(c);
        double watts = s.value("V1", "power_loss_w");
        assertEquals(20.0 * 1500 / 1714, watts / Units.HORSEPOWER, 0.01);
        assertEquals(17.50, watts / Units.HORSEPOWER, 0.01);
        double bar = 1500 * Units.PSI / 1e5;
        double lpm = q / LPM;
        assertEquals(bar * lpm / 600, watts / 1000, 1e-5);
    }

    @Test
    void cylinderForceIsPressureTimesArea() {
        // F = p·A on the cap (and with a back pressure, p_A·A_cap − p_B·A_ann): 50 mm bore at the 80 bar
        // relief setting, held extended: F = 80e5 · π/4 · 0.05² = 15708 N.
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 80e5, "override", 0.0)
                .add("C1", ComponentType.DOUBLE_ACTING_CYLINDER, "bore", 0.05, "rod", 0.028)
                .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T").ideal("P1.P", "C1.A")
                .ideal("C1.B", "T1.T")
                .build(spoolwork.model.OperatingState.named("Clamp").withActuator("C1",
                        new spoolwork.model.ActuatorState(spoolwork.model.ActuatorState.Mode.HELD_EXTENDED,
                                spoolwork.model.ActuatorState.LoadKind.CONSTANT, 0)));
        Solution s = HandWorkedCircuitsTest.solve(c);
        assertEquals(80e5 * Math.PI / 4 * 0.05 * 0.05, s.value("C1", "force_n"), 1);
    }

    @Test
    void retractionSpeedIsFlowOverAnnulus() {
        // v = Q/A_ann when the pump feeds the rod end: 3.8667e-4 m³/s into π/4·(0.063² − 0.036²) = 2.0994e-3 m²
        // → −0.18418 m/s (retracting).
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP, "volumetric_efficiency", 1.0)
                .add("V1", ComponentType.RELIEF_VALVE)
                .add("C1", ComponentType.DOUBLE_ACTING_CYLINDER, "bore", 0.063, "rod", 0.036)
                .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T").ideal("P1.P", "C1.B")
                .ideal("C1.A", "T1.T")
                .build(spoolwork.model.OperatingState.named("Retract").withActuator("C1",
                        new spoolwork.model.ActuatorState(spoolwork.model.ActuatorState.Mode.FREE,
                                spoolwork.model.ActuatorState.LoadKind.RESISTIVE, 2000)));
        Solution s = HandWorkedCircuitsTest.solve(c);
        double ann = Math.PI / 4 * (0.063 * 0.063 - 0.036 * 0.036);
        assertEquals(-3.8667e-4 / ann, s.value("C1", "velocity_mps"), 1e-5);
        assertEquals(2000 / ann, s.pressure("C1", "B"), 20);
    }
}
