package spoolwork.model;

/** Trade categories used to group the component catalogue. */
public enum Category {
    SUPPLY("Supply"),
    PUMPS_AND_MOTORS("Pumps and motors"),
    CYLINDERS("Cylinders"),
    PRESSURE_VALVES("Pressure valves"),
    FLOW_VALVES("Flow valves"),
    DIRECTIONAL_VALVES("Directional valves"),
    CHECK_VALVES("Check valves"),
    CONDITIONING("Conditioning"),
    MEASUREMENT("Measurement");

    private final String label;

    Category(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
