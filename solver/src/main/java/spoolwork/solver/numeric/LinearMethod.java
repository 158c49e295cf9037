package spoolwork.solver.numeric;

/** How the Newton step's linear system is solved. */
public enum LinearMethod {
    /** EJML sparse LU on a reverse Cuthill–McKee numbering of the unknowns. */
    SPARSE,
    /** EJML dense LU; fine for small systems, the reference for the benchmark. */
    DENSE,
    /** Dense below {@link #DENSE_LIMIT} unknowns, sparse above. */
    AUTO;

    public static final int DENSE_LIMIT = 100;
}
