package spoolwork.solver.numeric;

/** Receives Jacobian entries ∂F[row]/∂x[col]; entries for the same place add up. Negative indices are ignored. */
public interface Jacobian {
    void add(int row, int col, double value);

    /** How many entries have been added so far, or −1 when the receiver does not keep them in order. */
    default int size() {
        return -1;
    }

    /** Overwrites the value of entry number {@code index} (counted as by {@link #size()}). */
    default void set(int index, double value) {
        throw new UnsupportedOperationException("this Jacobian does not keep its entries");
    }
}
