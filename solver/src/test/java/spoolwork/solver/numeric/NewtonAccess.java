package spoolwork.solver.numeric;

import spoolwork.solver.elements.Network;

/** Runs the solver's Newton on a network from its initial guess, with continuation in gmin if needed. */
public final class NewtonAccess {
    private NewtonAccess() {
    }

    public static double[] solve(Network net) {
        Newton.Result r = new Newton(LinearMethod.DENSE, 200).solve(net, net.initialGuess(), Long.MAX_VALUE);
        if (!r.converged()) {
            for (double g = 1e-9; g > 1e-16; g /= 10) {
                net.setExtraConductance(g);
                r = new Newton(LinearMethod.DENSE, 200).solve(net, r.x(), Long.MAX_VALUE);
            }
            net.setExtraConductance(0);
            r = new Newton(LinearMethod.DENSE, 200).solve(net, r.x(), Long.MAX_VALUE);
        }
        return r.x();
    }
}
