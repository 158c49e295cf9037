package spoolwork.solver.numeric;

/** Receives Jacobian entries ∂F[row]/∂x[col]; entries for the same place add up. Negative indices are ignored. */
public interface Jacobian {
    void add(int row, int col, double value);
}
