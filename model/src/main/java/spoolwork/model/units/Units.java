package spoolwork.model.units;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import spoolwork.model.Quantity;

/**
 * Parsing and formatting of quantities with units. Values inside the program are always SI
 * ({@link Quantity#siSymbol()}); users type and read them in the units of the trade.
 *
 * <p>Factors: 1 psi = 6894.757293168 Pa, 1 US gal = 3.785411784e-3 m³, 1 in = 0.0254 m, 1 lbf =
 * 4.4482216152605 N, 1 hp (550 ft·lbf/s) = 745.69987158227 W, 1 lbf·ft = 1.3558179483314 N·m —
 * NIST SP 811 (2008), Appendix B.
 */
public final class Units {
    public static final double PSI = 6894.757293168;
    public static final double BAR = 1e5;
    public static final double US_GALLON = 3.785411784e-3;
    public static final double INCH = 0.0254;
    public static final double FOOT = 0.3048;
    public static final double POUND_FORCE = 4.4482216152605;
    public static final double HORSEPOWER = 745.69987158227;
    public static final double LITRE = 1e-3;
    public static final double MINUTE = 60;

    private static final Map<Quantity, List<Unit>> UNITS = new EnumMap<>(Quantity.class);
    private static final Map<Quantity, Unit> SI_DISPLAY = new EnumMap<>(Quantity.class);
    private static final Map<Quantity, Unit> US_DISPLAY = new EnumMap<>(Quantity.class);

    private static final Pattern VALUE = Pattern.compile(
            "\\s*([-+]?(?:\\d+(?:[.,]\\d*)?|[.,]\\d+)(?:[eE][-+]?\\d+)?)\\s*(.*?)\\s*");

    static {
        Quantity q = Quantity.PRESSURE;
        unit(q, "Pa", 1, "pa");
        Unit bar = unit(q, "bar", BAR);
        unit(q, "kPa", 1e3);
        unit(q, "MPa", 1e6, "N/mm²", "N/mm2");
        unit(q, "mbar", 100);
        Unit psi = unit(q, "psi", PSI, "lbf/in²", "lbf/in2", "psig");
        unit(q, "ksi", 1000 * PSI);
        display(q, bar, psi);

        q = Quantity.FLOW;
        unit(q, "m³/s", 1, "m3/s");
        Unit lpm = unit(q, "L/min", LITRE / MINUTE, "l/min", "lpm", "litre/min", "liter/min", "dm³/min", "dm3/min");
        unit(q, "L/s", LITRE, "l/s");
        unit(q, "cm³/s", 1e-6, "cm3/s", "cc/s");
        unit(q, "cm³/min", 1e-6 / MINUTE, "cm3/min", "cc/min");
        unit(q, "m³/h", 1.0 / 3600, "m3/h");
        Unit gpm = unit(q, "gpm", US_GALLON / MINUTE, "gal/min", "usgpm", "us gpm");
        unit(q, "in³/min", INCH * INCH * INCH / MINUTE, "in3/min", "cu in/min");
        display(q, lpm, gpm);

        q = Quantity.LENGTH;
        unit(q, "m", 1);
        Unit mm = unit(q, "mm", 1e-3);
        unit(q, "cm", 1e-2);
        Unit in = unit(q, "in", INCH, "\"", "inch", "inches");
        unit(q, "ft", FOOT, "'", "feet", "foot");
        display(q, mm, in);

        q = Quantity.AREA;
        unit(q, "m²", 1, "m2");
        Unit cm2 = unit(q, "cm²", 1e-4, "cm2");
        unit(q, "mm²", 1e-6, "mm2");
        Unit in2 = unit(q, "in²", INCH * INCH, "in2", "sq in");
        display(q, cm2, in2);

        q = Quantity.VOLUME;
        unit(q, "m³", 1, "m3");
        Unit litre = unit(q, "L", LITRE, "l", "litre", "liter", "dm³", "dm3");
        unit(q, "cm³", 1e-6, "cm3", "cc", "ml", "mL");
        Unit gal = unit(q, "gal", US_GALLON, "us gal", "gallon", "gallons");
        unit(q, "in³", INCH * INCH * INCH, "in3", "cu in");
        display(q, litre, gal);

        q = Quantity.DISPLACEMENT;
        unit(q, "m³/rev", 1, "m3/rev");
        Unit ccr = unit(q, "cm³/rev", 1e-6, "cm3/rev", "cc/rev", "cc", "cm³", "cm3", "ml/rev");
        Unit cir = unit(q, "in³/rev", INCH * INCH * INCH, "in3/rev", "cir", "cu in/rev");
        display(q, ccr, cir);

        q = Quantity.SPEED;
        unit(q, "rev/s", 1, "r/s", "rps", "1/s", "hz");
        Unit rpm = unit(q, "rpm", 1.0 / MINUTE, "r/min", "rev/min", "1/min", "min⁻¹");
        unit(q, "rad/s", 1 / (2 * Math.PI));
        display(q, rpm, rpm);

        q = Quantity.POWER;
        unit(q, "W", 1, "w");
        Unit kw = unit(q, "kW", 1e3, "kw");
        Unit hp = unit(q, "hp", HORSEPOWER, "bhp");
        display(q, kw, hp);

        q = Quantity.FORCE;
        unit(q, "N", 1, "n");
        Unit kn = unit(q, "kN", 1e3, "kn");
        Unit lbf = unit(q, "lbf", POUND_FORCE, "lb");
        unit(q, "kip", 1000 * POUND_FORCE);
        display(q, kn, lbf);

        q = Quantity.TORQUE;
        Unit nm = unit(q, "N·m", 1, "Nm", "N m", "N*m", "N.m");
        Unit lbft = unit(q, "lbf·ft", POUND_FORCE * FOOT, "lbf ft", "lbf*ft", "lb ft", "lb-ft", "ft·lbf", "ft lbf", "ft-lb");
        unit(q, "lbf·in", POUND_FORCE * INCH, "lbf in", "lb in", "lb-in", "in-lb");
        display(q, nm, lbft);

        q = Quantity.VELOCITY;
        Unit mps = unit(q, "m/s", 1);
        unit(q, "mm/s", 1e-3);
        unit(q, "m/min", 1.0 / MINUTE);
        Unit fps = unit(q, "ft/s", FOOT, "fps");
        unit(q, "in/s", INCH, "ips");
        display(q, mps, fps);

        q = Quantity.TIME;
        Unit s = unit(q, "s", 1, "sec");
        unit(q, "ms", 1e-3);
        unit(q, "min", MINUTE);
        unit(q, "h", 3600);
        display(q, s, s);

        q = Quantity.TEMPERATURE;
        Unit c = unit(q, "°C", 1, 0, "c", "degc", "deg c");
        Unit f = unit(q, "°F", 5.0 / 9, -32 * 5.0 / 9, "f", "degf", "deg f");
        unit(q, "K", 1, -273.15, "k");
        display(q, c, f);

        q = Quantity.DENSITY;
        Unit kgm3 = unit(q, "kg/m³", 1, "kg/m3");
        unit(q, "g/cm³", 1000, "g/cm3", "g/cc");
        Unit lbft3 = unit(q, "lb/ft³", 0.45359237 / (FOOT * FOOT * FOOT), "lb/ft3");
        display(q, kgm3, lbft3);

        q = Quantity.CONDUCTANCE;
        unit(q, "m³/(s·Pa)", 1, "m3/(s.pa)", "m3/s/pa");
        Unit ccmb = unit(q, "cm³/min/bar", 1e-6 / MINUTE / BAR, "cm3/min/bar", "cc/min/bar");
        Unit cimp = unit(q, "in³/min/psi", INCH * INCH * INCH / MINUTE / PSI, "in3/min/psi");
        display(q, ccmb, cimp);

        q = Quantity.STIFFNESS;
        unit(q, "N/m", 1);
        Unit nmm = unit(q, "N/mm", 1e3);
        unit(q, "kN/m", 1e3);
        Unit lbin = unit(q, "lbf/in", POUND_FORCE / INCH, "lb/in");
        display(q, nmm, lbin);

        q = Quantity.RATIO;
        Unit one = unit(q, "", 1);
        unit(q, "%", 0.01);
        display(q, one, one);
    }

    private Units() {
    }

    private static Unit unit(Quantity q, String symbol, double factor, String... aliases) {
        return unit(q, symbol, factor, 0, aliases);
    }

    private static Unit unit(Quantity q, String symbol, double factor, double offset, String... aliases) {
        Unit u = new Unit(q, symbol, factor, offset, List.of(aliases));
        UNITS.computeIfAbsent(q, k -> new ArrayList<>()).add(u);
        return u;
    }

    private static void display(Quantity q, Unit si, Unit us) {
        SI_DISPLAY.put(q, si);
        US_DISPLAY.put(q, us);
    }

    /** Every unit known for the quantity, display units first among them as declared. */
    public static List<Unit> unitsOf(Quantity q) {
        return List.copyOf(UNITS.get(q));
    }

    /** The unit values of the quantity are shown in, in the given system. */
    public static Unit displayUnit(Quantity q, UnitSystem system) {
        return system == UnitSystem.US ? US_DISPLAY.get(q) : SI_DISPLAY.get(q);
    }

    /** Finds a unit of the quantity by symbol or alias (ignoring case and spaces). */
    public static java.util.Optional<Unit> find(Quantity q, String text) {
        String want = squash(text);
        for (Unit u : UNITS.get(q)) {
            if (squash(u.symbol()).equals(want)) {
                return java.util.Optional.of(u);
            }
        }
        for (Unit u : UNITS.get(q)) {
            for (String a : u.aliases()) {
                if (squash(a).equals(want)) {
                    return java.util.Optional.of(u);
                }
            }
        }
        return java.util.Optional.empty();
    }

    private static String squash(String s) {
        return s.replace(" ", "").replace("\u00a0", "").toLowerCase(Locale.ROOT);
    }

    /**
     * Parses text such as "120 bar", "8 gpm" or "2.5 in" to an SI value of the quantity. A number without a
     * unit is taken in {@code bareUnit}.
     *
     * @throws UnitParseException with a message for the user when the text is not a number with a known unit
     */
    public static double parse(String text, Quantity q, Unit bareUnit) {
        if (text == null || text.isBlank()) {
            throw new UnitParseException("enter a value");
        }
        Matcher m = VALUE.matcher(text);
        if (!m.matches()) {
            throw new UnitParseException("'" + text.strip() + "' is not a number");
        }
        double v;
        try {
            v = Double.parseDouble(m.group(1).replace(',', '.'));
        } catch (NumberFormatException e) {
            throw new UnitParseException("'" + m.group(1) + "' is not a number");
        }
        String unitText = m.group(2);
        Unit u;
        if (unitText.isEmpty()) {
            u = bareUnit;
        } else {
            u = find(q, unitText).orElseThrow(() -> new UnitParseException("'" + unitText + "' is not a unit of "
                    + q.name().toLowerCase(Locale.ROOT) + "; try " + examples(q)));
        }
        double si = u.toSi(v);
        if (!Double.isFinite(si)) {
            throw new UnitParseException("value too large");
        }
        return si;
    }

    /** Parses with bare numbers taken in the display unit of the given system. */
    public static double parse(String text, Quantity q, UnitSystem system) {
        return parse(text, q, displayUnit(q, system));
    }

    private static String examples(Quantity q) {
        StringBuilder sb = new StringBuilder();
        for (Unit u : UNITS.get(q)) {
            if (u.symbol().isEmpty()) {
                continue;
            }
            if (sb.length() > 0) {
                sb.append(", ");
            }
            sb.append(u.symbol());
        }
        return sb.toString();
    }

    /** The value in the display unit of the system, four significant digits, e.g. "120 bar". */
    public static String format(double si, Quantity q, UnitSystem system) {
        return format(si, displayUnit(q, system));
    }

    /** The value in the given unit, four significant digits, with the unit symbol. */
    public static String format(double si, Unit u) {
        String n = number(u.fromSi(si), 4);
        return u.symbol().isEmpty() ? n : n + " " + u.symbol();
    }

    /** A number with the given significant digits, plain notation for everyday magnitudes, no trailing zeros. */
    public static String number(double v, int significant) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        if (v == 0) {
            return "0";
        }
        double a = Math.abs(v);
        if (a >= 1e7 || a < 1e-4) {
            return String.format(Locale.ROOT, "%." + (significant - 1) + "e", v);
        }
        java.math.BigDecimal bd = new java.math.BigDecimal(v).round(new java.math.MathContext(significant));
        String s = bd.stripTrailingZeros().toPlainString();
        return s.equals("-0") ? "0" : s;
    }
}
