package spoolwork.solver.numeric;

/** Receives Jacobian entries ∂F[row]/∂x[col]; entries for the same place add up. Negative indices are ignored. */
public interface Jacobian {
    void add(int row, int col, double value);

    /** A receiver that keeps its entries in the order they arrived, so that values can be rewritten in place. */
    interface Kept extends Jacobian {
        /** How many entries have been added so far. */
        int size();

        /** Overwrites the value of entry number {@code index} (counted as by {@link #size()}). */
        void set(int index, double value);
    }
}
