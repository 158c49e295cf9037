/**
 * Newton's method with step limits, non-monotone line search and the sparse or dense linear step.
 * Unknowns and rows are scaled by the system's own typical sizes before any linear algebra.
 */
package spoolwork.solver.numeric;
