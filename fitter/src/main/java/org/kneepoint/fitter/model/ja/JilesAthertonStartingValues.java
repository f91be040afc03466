package org.kneepoint.fitter.model.ja;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BrentSolver;

/**
 * Starting values from the parameter-extraction relations of D. C. Jiles, J. B. Thoelke,
 * M. K. Devine, IEEE Trans. Magn. 28(1), 27–35 (1992), re-derived for the docs/design.md §4 form
 * (docs/references.md §5a, from memory). Where the irreversible term acts, X = |Man − M|/k + c·dMan/dHe
 * and X = χ/(1 + α·χ) for a measured slope χ, so: at coercivity k = |Man(−Hc)|/(X − c·dMan);
 * at remanence Mr = Man(α·Mr) + k·(X − c·dMan), solved for α; at the tip
 * Ms = (Mm + k·X)/(L + k·c·L'/a). Just after the tip reversal only the reversible term acts,
 * so c = X/dMan there (our own addition). The anhysteretic slope JTD take from a measured
 * anhysteretic is not in a loop, so a is scanned over a logarithmic grid, the other four are
 * iterated for each a, and the a whose loop fits best is kept. A curve measured after a prior
 * field shows no tip, so there the Ms start is also scanned, 1.5 to 6.5 times the largest M.
 */
final class JilesAthertonStartingValues {

    private static final int GRID = 16;
    private static final int ITERATIONS = 12;

    private JilesAthertonStartingValues() {
    }

    static JilesAthertonParameters estimate(LoopFeatures f, LoopResidual residual) {
        boolean tipMeasured = Double.isFinite(f.tipMagnetization());
        double mTop = tipMeasured ? f.tipMagnetization() : f.largestMagnetization();
        double hc = Double.isFinite(f.coercivity()) ? f.coercivity() : 0.1 * f.tipField();
        double[] saturationFactors = tipMeasured ? new double[] {1.15} : new double[] {1.5, 2.5, 4, 6.5};
        double lowest = hc / 10;
        double highest = 20 * f.tipField();
        JilesAthertonParameters best = null;
        double bestScore = Double.POSITIVE_INFINITY;
        for (double factor : saturationFactors) {
            double msStart = factor * Math.max(mTop, f.largestMagnetization());
            for (int i = 0; i <= GRID; i++) {
                double a = lowest * Math.pow(highest / lowest, (double) i / GRID);
                JilesAthertonParameters candidate = iterate(f, a, Math.max(mTop, 1e-3 * f.tipField()), hc, msStart);
                double score = residual.sumOfSquares(FitParameterization.toCoordinates(candidate));
                if (score < bestScore) {
                    bestScore = score;
                    best = candidate;
                }
            }
        }
        return best;
    }

    private static JilesAthertonParameters iterate(LoopFeatures f, double a, double mTop, double hc, double msStart) {
        double ms = msStart;
        double c = 0.2;
        double k = hc;
        double alpha = 0;
        double heTip = f.tipField();
        for (int n = 0; n < ITERATIONS; n++) {
            JilesAthertonModel model = new JilesAthertonModel(new JilesAthertonParameters(ms, a, k, c, alpha));
            heTip = f.tipField() + alpha * mTop;
            double xReversal = reduced(f.reversalSlope(), alpha);
            if (Double.isFinite(xReversal)) {
                c = clamp(xReversal / model.anhystereticSlope(heTip), 0.01, 0.95);
            }
            double xCoercive = reduced(f.coercivitySlope(), alpha);
            double pinning = xCoercive - c * model.anhystereticSlope(-hc);
            k = clamp(Double.isFinite(pinning) && pinning > 0 ? Math.abs(model.anhysteretic(-hc)) / pinning : hc,
                    1e-3 * hc, 1e3 * hc);
            alpha = coupling(f, a, ms, k, c, alpha);
            double xTip = reduced(f.tipSlope(), alpha);
            double x = heTip / a;
            double tipMs = (mTop + k * xTip) / (LangevinFunction.value(x) + k * c * LangevinFunction.derivative(x) / a);
            if (Double.isFinite(tipMs)) {
                ms = clamp(tipMs, 1.001 * f.largestMagnetization(), 5 * f.largestMagnetization());
            }
            alpha = Math.min(alpha, 0.9 * 3 * a / ms);
        }
        return new JilesAthertonParameters(ms, a, k, c, alpha);
    }

    /** α from the remanence relation, or the previous α when the relation has no root. */
    private static double coupling(LoopFeatures f, double a, double ms, double k, double c, double previous) {
        double mr = f.remanence();
        if (!(mr > 0) || !Double.isFinite(f.remanenceSlope())) {
            return previous;
        }
        double upper = 0.99 * 3 * a / ms;
        JilesAthertonModel shape = new JilesAthertonModel(new JilesAthertonParameters(ms, a, k, c, 0));
        UnivariateFunction g = alpha -> shape.anhysteretic(alpha * mr)
                + k * (reduced(f.remanenceSlope(), alpha) - c * shape.anhystereticSlope(alpha * mr)) - mr;
        double low = g.value(0);
        double high = g.value(upper);
        if (!(low * high < 0)) {
            return previous;
        }
        return new BrentSolver(1e-10, 1e-12 * upper).solve(100, g, 0, upper);
    }

    /** X = χ/(1 + α·χ): the susceptibility with respect to He. */
    private static double reduced(double slope, double alpha) {
        return slope / (1 + alpha * slope);
    }

    private static double clamp(double value, double low, double high) {
        return Math.min(Math.max(value, low), high);
    }
}
