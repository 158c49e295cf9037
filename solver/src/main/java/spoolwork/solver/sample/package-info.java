/** Generated circuits for benchmarks and robustness checks. */
package spoolwork.solver.sample;
