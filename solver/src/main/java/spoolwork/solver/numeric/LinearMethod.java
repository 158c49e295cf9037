package spoolwork.solver.numeric;

/** How the Newton step's linear system is solved. */
public enum LinearMethod {
    /**
     * Sparse: branch flows condensed out, then the project's sparse LU on a minimum degree numbering
     * (EJML's sparse LU when the system cannot be condensed).
     */
    SPARSE,
    /** EJML dense LU; fine for small systems, the reference for the benchmark. */
    DENSE,
    /** Dense below {@link #DENSE_LIMIT} unknowns, sparse above. */
    AUTO;

    public static final int DENSE_LIMIT = 100;
}
