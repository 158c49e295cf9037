package spoolwork.symbols;

/** An axis direction on the sheet (y down), used for the outward direction of a port anchor. */
public enum Direction {
    RIGHT(1, 0), DOWN(0, 1), LEFT(-1, 0), UP(0, -1);

    private final int dx;
    private final int dy;

    Direction(int dx, int dy) {
        this.dx = dx;
        this.dy = dy;
    }

    /** Unit step along x, grid units. */
    public int dx() {
        return dx;
    }

    /** Unit step along y (down positive), grid units. */
    public int dy() {
        return dy;
    }

    public Direction opposite() {
        return of(-dx, -dy);
    }

    static Direction of(double dx, double dy) {
        for (Direction d : values()) {
            if (Math.abs(d.dx - dx) < 1e-9 && Math.abs(d.dy - dy) < 1e-9) {
                return d;
            }
        }
        throw new IllegalArgumentException("not an axis direction: " + dx + ", " + dy);
    }
}
