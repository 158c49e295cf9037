/** Properties of the working fluid at its working temperature: viscosity (ASTM D341, D2270) and density. */
package spoolwork.solver.fluid;
