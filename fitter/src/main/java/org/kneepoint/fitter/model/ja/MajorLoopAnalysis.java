package org.kneepoint.fitter.model.ja;

import java.util.Arrays;
import java.util.Comparator;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.units.MagneticConstant;

/**
 * Measures {@link LoopMetrics} of the loop 0 → +Hmax → −Hmax → +Hmax. Coercivities are roots of
 * M and of H + M on the descending branch (Brent's method, each trial integrated from H = 0).
 * The loss is ∮H dB = μ0·∫(M↓ − M↑) dH over [−Hmax, Hmax] (integration by parts of the closed
 * cycle, since ∮H dH = 0), by composite 5-point Gauss–Legendre quadrature on both branches.
 */
public final class MajorLoopAnalysis {

    private static final int PANELS = 200;
    private static final int NODES_PER_PANEL = 5;

    private final BranchSolver solver;

    public MajorLoopAnalysis(BranchSolver solver) {
        this.solver = solver;
    }

    /** Analysis with the adaptive solver at the default tolerance. */
    public static MajorLoopAnalysis adaptive(JilesAthertonParameters parameters) {
        return new MajorLoopAnalysis(new AdaptiveBranchSolver(new JilesAthertonModel(parameters)));
    }

    public LoopMetrics measure(double hMax) {
        if (!(hMax > 0) || Double.isInfinite(hMax)) {
            throw new BadInputException("Hmax = " + hMax + " A/m is out of range; expected a finite field > 0");
        }
        double mMax = solver.advance(0, 0, hMax);
        double mr = solver.advance(hMax, mMax, 0);
        double mBottom = solver.advance(0, mr, -hMax);
        double hc = 0;
        double hcb = 0;
        if (mr > 0 && mBottom < 0) {
            UnivariateFunction descending = h -> solver.advance(0, mr, h);
            hc = -root(descending, -hMax, 0, hMax);
            hcb = -root(h -> h + descending.value(h), -hc, 0, hMax);
        }
        double loss = MagneticConstant.MU0 * (areaUnder(hMax, mMax, -1) - areaUnder(-hMax, mBottom, +1));
        return new LoopMetrics(hMax, hc, mr, MagneticConstant.MU0 * mr, hc, hcb, mMax,
                MagneticConstant.MU0 * (hMax + mMax), loss);
    }

    private static double root(UnivariateFunction f, double low, double high, double hMax) {
        BrentSolver brent = new BrentSolver(1e-14, 1e-12 * hMax);
        return brent.solve(200, f, low, high);
    }

    /** ∫ M dH over [−Hmax, Hmax] along the branch that starts at (start, mStart), visiting nodes in order. */
    private double areaUnder(double start, double mStart, double direction) {
        double[][] rule = unitRule();
        double width = 2 * Math.abs(start) / PANELS;
        double h = start;
        double m = mStart;
        double sum = 0;
        for (int panel = 0; panel < PANELS; panel++) {
            for (int j = 0; j < NODES_PER_PANEL; j++) {
                double hNode = start + direction * width * (panel + rule[j][0]);
                m = solver.advance(h, m, hNode);
                h = hNode;
                sum += width * rule[j][1] * m;
            }
        }
        return sum;
    }

    /** Gauss–Legendre nodes on [0, 1] with their weights, nodes in ascending order. */
    private static double[][] unitRule() {
        GaussIntegrator rule = new GaussIntegratorFactory().legendre(NODES_PER_PANEL, 0, 1);
        double[][] nodes = new double[NODES_PER_PANEL][];
        for (int i = 0; i < NODES_PER_PANEL; i++) {
            nodes[i] = new double[] {rule.getPoint(i), rule.getWeight(i)};
        }
        Arrays.sort(nodes, Comparator.comparingDouble(node -> node[0]));
        return nodes;
    }
}
