/**
 * Element laws and their stamps into the system of equations.
 *
 * <p>Sign convention of the equations: a node's row is the sum of the flows into the node (m³/s) and must
 * vanish; an element that draws flow q from node a into node b adds −q to a's row and +q to b's. Element
 * rows are written in their natural unit (Pa for drop laws, m³/s for regulated flows, N or N·m for force
 * and torque balances, dimensionless for complementarity rows). Node index −1 is the reservoir.
 */
package spoolwork.solver.elements;
