package org.kneepoint.fitter.model.ja;

import org.kneepoint.fitter.error.BadInputException;

/**
 * Simulates any history of applied field: starts demagnetized (H = 0, M = 0), moves to the first
 * field and then through the rest in order, restarting the integration at every point, so every
 * reversal of H starts a new branch (docs/design.md §4). Covers the initial curve, major and minor loops
 * and recoil from any point.
 */
public final class HysteresisSimulator {

    private final BranchSolver solver;

    public HysteresisSimulator(BranchSolver solver) {
        this.solver = solver;
    }

    /** The adaptive simulator at the default tolerance. */
    public static HysteresisSimulator adaptive(JilesAthertonParameters parameters) {
        return new HysteresisSimulator(new AdaptiveBranchSolver(new JilesAthertonModel(parameters)));
    }

    /**
     * @param fieldHistory applied field H in order, A/m; at least one finite value
     * @return M at each field of the history
     */
    public Trajectory simulate(double[] fieldHistory) {
        if (fieldHistory.length == 0) {
            throw new BadInputException("the field history is empty; expected at least one H value");
        }
        double[] m = new double[fieldHistory.length];
        double h = 0;
        double magnetization = 0;
        for (int i = 0; i < fieldHistory.length; i++) {
            double next = fieldHistory[i];
            if (!Double.isFinite(next)) {
                throw new BadInputException("field history value " + (i + 1) + " is " + next + "; expected a finite H in A/m");
            }
            magnetization = solver.advance(h, magnetization, next);
            m[i] = magnetization;
            h = next;
        }
        return new Trajectory(fieldHistory, m);
    }
}
