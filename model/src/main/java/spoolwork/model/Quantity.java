package spoolwork.model;

/**
 * The physical quantity of a parameter or a result, with the SI unit every value in the model is stored in.
 * Speeds are stored in revolutions per second and displacements in cubic metres per revolution, so that
 * flow = displacement × speed holds without a factor of 2π.
 */
public enum Quantity {
    PRESSURE("Pa"),
    FLOW("m³/s"),
    LENGTH("m"),
    AREA("m²"),
    VOLUME("m³"),
    DISPLACEMENT("m³/rev"),
    SPEED("rev/s"),
    POWER("W"),
    FORCE("N"),
    TORQUE("N·m"),
    VELOCITY("m/s"),
    TIME("s"),
    TEMPERATURE("°C"),
    DENSITY("kg/m³"),
    /** Leakage conductance: flow per unit pressure difference. */
    CONDUCTANCE("m³/(s·Pa)"),
    STIFFNESS("N/m"),
    RATIO("1");

    private final String siSymbol;

    Quantity(String siSymbol) {
        this.siSymbol = siSymbol;
    }

    /** The symbol of the SI unit values of this quantity are stored in. */
    public String siSymbol() {
        return siSymbol;
    }
}
