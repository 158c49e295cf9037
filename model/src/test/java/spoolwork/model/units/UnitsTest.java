package spoolwork.model.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import spoolwork.model.Quantity;

class UnitsTest {

    private static double si(String text, Quantity q) {
        return Units.parse(text, q, UnitSystem.SI);
    }

    @Test
    void nistFactors() {
        // NIST SP 811 (2008), Appendix B.8/B.9
        assertEquals(6894.757, si("1 psi", Quantity.PRESSURE), 1e-3);
        assertEquals(3.785411784e-3, si("1 gal", Quantity.VOLUME), 1e-15);
        assertEquals(745.699872, si("1 hp", Quantity.POWER), 1e-6);
        assertEquals(4.4482216152605, si("1 lbf", Quantity.FORCE), 1e-12);
        assertEquals(0.0254, si("1 in", Quantity.LENGTH), 0);
    }

    @Test
    void parsesTheTradesUsualSpellings() {
        assertEquals(120e5, si("120 bar", Quantity.PRESSURE), 1e-6);
        assertEquals(1740 * 6894.757293168, si("1740 psi", Quantity.PRESSURE), 1e-6);
        assertEquals(30e-3 / 60, si("30 L/min", Quantity.FLOW), 1e-15);
        assertEquals(30e-3 / 60, si("30lpm", Quantity.FLOW), 1e-15);
        assertEquals(8 * 3.785411784e-3 / 60, si("8 gpm", Quantity.FLOW), 1e-15);
        assertEquals(0.063, si("63 mm", Quantity.LENGTH), 1e-15);
        assertEquals(0.0635, si("2.5 in", Quantity.LENGTH), 1e-15);
        assertEquals(0.0635, si("2,5\"", Quantity.LENGTH), 1e-15);
        assertEquals(1450.0 / 60, si("1450 rpm", Quantity.SPEED), 1e-12);
        assertEquals(16e-6, si("16 cc", Quantity.DISPLACEMENT), 1e-18);
        assertEquals(50, si("122 °F", Quantity.TEMPERATURE), 1e-9);
    }

    @Test
    void bareNumbersTakeTheDisplayUnit() {
        assertEquals(120e5, Units.parse("120", Quantity.PRESSURE, UnitSystem.SI), 1e-6);
        assertEquals(1000 * 6894.757293168, Units.parse("1000", Quantity.PRESSURE, UnitSystem.US), 1e-6);
    }

    @Test
    void refusesNonsenseWithAMessageForTheUser() {
        UnitParseException e = assertThrows(UnitParseException.class, () -> si("120 parsecs", Quantity.PRESSURE));
        assertTrue(e.getMessage().startsWith("'parsecs' is not a unit of pressure; try Pa, bar"), e.getMessage());
        assertThrows(UnitParseException.class, () -> si("abc", Quantity.PRESSURE));
        assertThrows(UnitParseException.class, () -> si("", Quantity.PRESSURE));
        assertThrows(UnitParseException.class, () -> si("1e400 bar", Quantity.PRESSURE));
    }

    @Test
    void formatsInTheChosenSystem() {
        assertEquals("120 bar", Units.format(120e5, Quantity.PRESSURE, UnitSystem.SI));
        assertEquals("1740 psi", Units.format(1740 * Units.PSI, Quantity.PRESSURE, UnitSystem.US));
        assertEquals("30 L/min", Units.format(30e-3 / 60, Quantity.FLOW, UnitSystem.SI));
        // hp = gpm·psi/1714 (fluid-power form of P = Q·Δp): 20 gpm at 1500 psi → 17.50 hp
        double watts = (20 * Units.US_GALLON / 60) * (1500 * Units.PSI);
        assertEquals("17.5 hp", Units.format(watts, Quantity.POWER, UnitSystem.US));
        assertEquals(20 * 1500 / 1714.2857142857, watts / Units.HORSEPOWER, 1e-9);
    }

    @Test
    void everyQuantityHasDisplayUnitsThatRoundTrip() {
        for (Quantity q : Quantity.values()) {
            for (UnitSystem s : UnitSystem.values()) {
                Unit u = Units.displayUnit(q, s);
                double v = u.toSi(12.5);
                assertEquals(v, Units.parse(Units.format(v, u), q, u), Math.abs(v) * 1e-3 + 1e-12, q + " " + s);
            }
        }
    }
}
