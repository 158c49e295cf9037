package spoolwork.model;

/** What a line carries; drawn solid for working lines, dashed for pilot and drain, double for a shaft. */
public enum LineKind {
    PRESSURE("pressure"), RETURN("return"), SUCTION("suction"), PILOT("pilot"), DRAIN("drain"),
    /** A mechanical coupling between a prime mover and a pump; carries no fluid. */
    SHAFT("shaft");

    private final String key;

    LineKind(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    public static java.util.Optional<LineKind> byKey(String key) {
        for (LineKind k : values()) {
            if (k.key.equals(key)) {
                return java.util.Optional.of(k);
            }
        }
        return java.util.Optional.empty();
    }
}
