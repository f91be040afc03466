package org.kneepoint.fitter.model.ja;

import java.util.Arrays;
import java.util.Comparator;
import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.units.MagneticConstant;

/**
 * Measures {@link LoopMetrics} of the loop 0 → +Hmax → −Hmax → +Hmax. Coercivities are roots of
 * M and of H + M on the descending branch (Brent's method, each trial integrated from H = 0).
 * The loss is ∮H dB = μ0·∫(M↓ − M↑) dH over [−Hmax, Hmax] (integration by parts of the closed
 * cycle, since ∮H dH = 0), by composite 5-point Gauss–Legendre quadrature on both branches. The
 * panels are the union of {@value #PANELS} equal ones and graded ones, H = Hc·sinh(u) with u
 * equally spaced ({@value #GRADED_PANELS_PER_UNIT} per unit of u, at least {@value #PANELS}), which
 * stay narrow around the coercivity however large Hmax is (with equal panels alone, Hmax ≫ Hc left
 * the whole loop inside one panel and the loss came out wrong, even negative).
 */
public final class MajorLoopAnalysis {

    /**
     * Highest Hmax measured, A/m. Far beyond it the two branches differ by less than the
     * integrator's tolerance over a range so long that the loss integral loses its accuracy.
     */
    public static final double HIGHEST_FIELD = 1e7;

    private static final int PANELS = 200;
    private static final int NODES_PER_PANEL = 5;
    /** Graded panels per unit of u = asinh(H/Hc), so their width near Hc stays below Hc/30 for any Hmax. */
    private static final int GRADED_PANELS_PER_UNIT = 60;

    private final BranchSolver solver;

    public MajorLoopAnalysis(BranchSolver solver) {
        this.solver = solver;
    }

    /** Analysis with the adaptive solver at the default tolerance. */
    public static MajorLoopAnalysis adaptive(JilesAthertonParameters parameters) {
        return new MajorLoopAnalysis(new AdaptiveBranchSolver(new JilesAthertonModel(parameters)));
    }

    public LoopMetrics measure(double hMax) {
        if (!(hMax > 0 && hMax <= HIGHEST_FIELD)) {
            throw new BadInputException("Hmax = " + hMax + " A/m is out of range; expected a field > 0 and at most "
                    + HIGHEST_FIELD + " A/m (μ0·H ≈ 12.6 T, above laboratory magnetizing fields)");
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
        double[] edges = panelEdges(hMax, hc);
        double loss = MagneticConstant.MU0 * (areaUnder(edges, mMax, -1) - areaUnder(edges, mBottom, +1));
        return new LoopMetrics(hMax, hc, mr, MagneticConstant.MU0 * mr, hc, hcb, mMax,
                MagneticConstant.MU0 * (hMax + mMax), loss);
    }

    /** Panel edges from −Hmax to +Hmax, ascending: equal panels, and with Hc &gt; 0 also sinh-graded ones. */
    private static double[] panelEdges(double hMax, double hc) {
        double reach = hc > 0 ? asinh(hMax / hc) : 0;
        int graded = hc > 0 ? (int) Math.max(PANELS, Math.ceil(GRADED_PANELS_PER_UNIT * reach)) : 0;
        double[] edges = new double[PANELS + graded + 2];
        int count = 0;
        for (int i = 0; i <= PANELS; i++) {
            edges[count++] = -hMax + 2 * hMax * i / PANELS;
        }
        for (int i = 1; i < graded; i++) {
            edges[count++] = hc * Math.sinh(-reach + 2 * reach * i / graded);
        }
        double[] sorted = Arrays.copyOf(edges, count);
        Arrays.sort(sorted);
        double[] distinct = new double[count];
        int kept = 0;
        for (double edge : sorted) {
            if (kept == 0 || edge - distinct[kept - 1] > 1e-12 * hMax) {
                distinct[kept++] = edge;
            }
        }
        distinct[0] = -hMax;
        distinct[kept - 1] = hMax;
        return Arrays.copyOf(distinct, kept);
    }

    private static double asinh(double x) {
        return Math.log(x + Math.sqrt(x * x + 1));
    }

    private static double root(UnivariateFunction f, double low, double high, double hMax) {
        BrentSolver brent = new BrentSolver(1e-14, 1e-12 * hMax);
        return brent.solve(200, f, low, high);
    }

    /**
     * ∫ M dH over [−Hmax, Hmax] along the branch that starts at the far end ({@code direction} +1:
     * at −Hmax rising; −1: at +Hmax falling) with M = {@code mStart}, visiting nodes in order.
     */
    private double areaUnder(double[] edges, double mStart, double direction) {
        double[][] rule = unitRule();
        int panels = edges.length - 1;
        double h = direction > 0 ? edges[0] : edges[panels];
        double m = mStart;
        double sum = 0;
        for (int p = 0; p < panels; p++) {
            int panel = direction > 0 ? p : panels - 1 - p;
            double low = edges[panel];
            double width = edges[panel + 1] - low;
            for (int j = 0; j < NODES_PER_PANEL; j++) {
                double node = direction > 0 ? rule[j][0] : 1 - rule[j][0];
                double hNode = low + width * node;
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
