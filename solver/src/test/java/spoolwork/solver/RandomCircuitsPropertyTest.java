package spoolwork.solver;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.Random;

import org.junit.jupiter.api.Test;

import spoolwork.model.Circuit;
import spoolwork.solver.sample.CircuitGenerator;

/**
 * A few thousand random valid circuits (random sizes, settings, spool positions and loads): each either
 * converges with its power balance holding to 1e-6 and every number finite, or returns an error
 * diagnostic; none throws, and none runs past the solver's time limit.
 */
class RandomCircuitsPropertyTest {
    @Test
    void everyRandomCircuitSolvesOrSaysWhyNot() {
        Random sizes = new Random(20261201);
        SteadyStateSolver solver = new SteadyStateSolver();
        int converged = 0;
        int total = 2000;
        StringBuilder failures = new StringBuilder();
        for (int i = 0; i < total; i++) {
            int size = 8 + sizes.nextInt(30);
            Circuit c = CircuitGenerator.generate(size, i);
            long t0 = System.nanoTime();
            Solution s;
            try {
                s = solver.solve(c, c.states().get(0));
            } catch (RuntimeException e) {
                fail("seed " + i + " threw " + e, e);
                return;
            }
            double seconds = (System.nanoTime() - t0) / 1e9;
            // a hang guard, not a speed target: the solver stops itself at 0.8 s
            assertTrue(seconds < 1.0, "seed " + i + " took " + seconds + " s");
            if (s.converged()) {
                converged++;
                assertTrue(s.power().relativeImbalance() <= 1e-6, "seed " + i + " power " + s.power());
                s.components().values().forEach(r -> {
                    r.values().forEach((k, v) -> assertTrue(Double.isFinite(v), k + " not finite"));
                    r.ports().values().forEach(p -> assertTrue(Double.isFinite(p.pressure()) && Double.isFinite(p.flow())));
                });
                s.lines().values().forEach(l -> assertTrue(Double.isFinite(l.flow()) && Double.isFinite(l.reynolds())));
            } else {
                assertTrue(s.diagnostics().stream().anyMatch(d -> d.severity() == Severity.ERROR),
                        "seed " + i + " failed without an error diagnostic");
                if (failures.length() < 2000) {
                    failures.append(i).append(": ").append(s.diagnostics().get(s.diagnostics().size() - 1).message())
                            .append('\n');
                }
            }
        }
        System.out.println("random circuits converged: " + converged + " of " + total + "\n" + failures);
        assertTrue(converged >= 0.97 * total, "only " + converged + " of " + total + " converged:\n" + failures);
    }
}
