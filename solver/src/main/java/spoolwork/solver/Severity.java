package spoolwork.solver;

/** How serious a diagnostic is. */
public enum Severity {
    /** The circuit cannot be solved as drawn, or the solution failed; no numbers are given. */
    ERROR("error"),
    /** Solved, but something needs the designer's attention. */
    WARNING("warning"),
    /** Worth knowing. */
    INFO("info");

    private final String key;

    Severity(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }
}
