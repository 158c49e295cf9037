/** Connectivity checks run before the numbers: ill-posed circuits are reported, not solved into nonsense. */
package spoolwork.solver.topology;
