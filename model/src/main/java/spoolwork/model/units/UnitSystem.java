package spoolwork.model.units;

/** The unit system values are shown in: SI as used in the trade (bar, L/min, mm) or US customary (psi, gpm, in). */
public enum UnitSystem {
    SI("si"), US("us");

    private final String key;

    UnitSystem(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    public static java.util.Optional<UnitSystem> byKey(String k) {
        for (UnitSystem s : values()) {
            if (s.key.equalsIgnoreCase(k)) {
                return java.util.Optional.of(s);
            }
        }
        return java.util.Optional.empty();
    }
}
