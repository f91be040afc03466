package org.kneepoint.fitter.model.ja;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.hipparchus.stat.correlation.SpearmansCorrelation;
import org.kneepoint.fitter.error.BadInputException;

/**
 * Refuses data no hysteresis model can be identified from: a single branch offered as a loop, a
 * second-quadrant curve whose H is not monotone or lies above its magnetizing field, a history
 * that never reaches positive H and M (the sample is magnetized along +), and noise
 * with no response to H (B must rise with H along the branches: a length-weighted Spearman rank
 * correlation of at least {@value #MINIMUM_RANK_CORRELATION}; C. Spearman, Am. J. Psychol. 15,
 * 72–101, 1904). Runs in O(n log n).
 */
final class LoopShapeCheck {

    static final double MINIMUM_RANK_CORRELATION = 0.8;
    private static final int MINIMUM_BRANCH_POINTS = 5;

    private LoopShapeCheck() {
    }

    static void requireLoop(MeasuredLoop loop) {
        List<BranchRun> runs = BranchRun.split(loop.field());
        boolean rising = runs.stream().anyMatch(r -> r.direction() > 0 && r.length() >= MINIMUM_BRANCH_POINTS);
        boolean falling = runs.stream().anyMatch(r -> r.direction() < 0 && r.length() >= MINIMUM_BRANCH_POINTS);
        if (!rising || !falling) {
            throw new BadInputException("the data are a single branch of H (" + runs.size() + " run"
                    + (runs.size() == 1 ? "" : "s") + "); a loop fit expects falling and rising branches of at least "
                    + MINIMUM_BRANCH_POINTS + " points each; fit a single falling branch as a second-quadrant curve");
        }
        requireResponse(loop, runs);
    }

    static void requireSecondQuadrantCurve(MeasuredLoop curve) {
        double[] h = curve.field();
        double[] prior = curve.priorField();
        if (prior.length == 0) {
            throw new BadInputException("a second-quadrant curve needs the magnetizing field it was measured after");
        }
        for (int i = 1; i < h.length; i++) {
            if (h[i] > h[i - 1]) {
                throw new BadInputException("H rises at point " + (i + 1) + " (" + h[i - 1] + " → " + h[i]
                        + " A/m); a second-quadrant curve expects H falling monotonically");
            }
        }
        double magnetizing = prior[prior.length - 1];
        if (!(magnetizing > 0 && magnetizing > h[0])) {
            throw new BadInputException("magnetizing field " + magnetizing + " A/m must be positive and above the first H "
                    + h[0] + " A/m of the curve");
        }
        requireResponse(curve, BranchRun.split(h));
    }

    private static void requireResponse(MeasuredLoop loop, List<BranchRun> runs) {
        double[] h = loop.field();
        double[] b = loop.fluxDensity();
        double highestField = Math.max(Arrays.stream(h).max().orElseThrow(),
                Arrays.stream(loop.priorField()).max().orElse(Double.NEGATIVE_INFINITY));
        if (!(highestField > 0) || !(Arrays.stream(loop.magnetization()).max().orElseThrow() > 0)) {
            throw new BadInputException("the history never reaches positive H and M (highest H " + highestField
                    + " A/m); expected a sample magnetized along + (docs/design.md §4)");
        }
        SpearmansCorrelation spearman = new SpearmansCorrelation();
        double weighted = 0;
        int counted = 0;
        for (BranchRun run : runs) {
            if (run.length() < MINIMUM_BRANCH_POINTS) {
                continue;
            }
            double[] hRun = Arrays.copyOfRange(h, run.first(), run.last() + 1);
            double[] bRun = Arrays.copyOfRange(b, run.first(), run.last() + 1);
            double rho = spearman.correlation(hRun, bRun);
            weighted += (Double.isNaN(rho) ? 0 : rho) * run.length();
            counted += run.length();
        }
        if (counted == 0 || weighted / counted < MINIMUM_RANK_CORRELATION) {
            throw new BadInputException(String.format(Locale.ROOT,
                    "B does not follow H along the branches (rank correlation %.2f); expected at least %.2f — the data"
                    + " look like noise or are not a B–H loop", counted == 0 ? 0 : weighted / counted,
                    MINIMUM_RANK_CORRELATION));
        }
    }
}
