package org.kneepoint.fitter.model.ja;

import java.util.Arrays;
import java.util.List;

/**
 * A thinned copy of a measured loop for the cheap stages of a fit (starting values and global
 * search): every n-th point, plus every point where H reverses and the last point, so the
 * history keeps its turning fields. The local least-squares stage always uses every point.
 */
final class LoopThinning {

    /** Loops with more points than this are thinned to about this many. */
    static final int TARGET_POINTS = 300;

    private LoopThinning() {
    }

    static MeasuredLoop thin(MeasuredLoop loop) {
        int n = loop.size();
        if (n <= TARGET_POINTS) {
            return loop;
        }
        int stride = (int) Math.ceil((double) n / TARGET_POINTS);
        boolean[] keep = new boolean[n];
        for (int i = 0; i < n; i += stride) {
            keep[i] = true;
        }
        keep[n - 1] = true;
        double[] h = loop.field();
        List<BranchRun> runs = BranchRun.split(h);
        for (BranchRun run : runs) {
            keep[run.first()] = true;
            keep[run.last()] = true;
        }
        double[] b = loop.fluxDensity();
        double[] thinH = new double[n];
        double[] thinB = new double[n];
        int kept = 0;
        for (int i = 0; i < n; i++) {
            if (keep[i]) {
                thinH[kept] = h[i];
                thinB[kept] = b[i];
                kept++;
            }
        }
        return new MeasuredLoop(Arrays.copyOf(thinH, kept), Arrays.copyOf(thinB, kept), loop.priorField(),
                loop.settlingPasses());
    }
}
