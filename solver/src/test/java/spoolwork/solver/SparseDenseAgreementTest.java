package spoolwork.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import spoolwork.model.Circuit;
import spoolwork.solver.numeric.LinearMethod;
import spoolwork.solver.sample.CircuitGenerator;

/** The condensed sparse step and plain dense LU solve the same equations to the same answer. */
class SparseDenseAgreementTest {
    @Test
    void sameAnswerBothWays() {
        SteadyStateSolver sparse = new SteadyStateSolver(SolverOptions.defaults().withLinearMethod(LinearMethod.SPARSE)
                .withTimeLimit(10));
        SteadyStateSolver dense = new SteadyStateSolver(SolverOptions.defaults().withLinearMethod(LinearMethod.DENSE)
                .withTimeLimit(10));
        for (int seed = 0; seed < 12; seed++) {
            Circuit c = CircuitGenerator.generate(40, seed);
            Solution a = sparse.solve(c, c.states().get(0));
            Solution b = dense.solve(c, c.states().get(0));
            assertTrue(a.converged() && b.converged(), "seed " + seed);
            for (ComponentResult r : a.components().values()) {
                for (var port : r.ports().entrySet()) {
                    assertEquals(b.pressure(r.tag(), port.getKey()), port.getValue().pressure(), 1e-3,
                            "seed " + seed + " " + r.tag() + "." + port.getKey());
                }
            }
        }
    }
}
