package org.kneepoint.fitter.model.ja;

import java.util.ArrayList;
import java.util.List;

/**
 * A maximal run of measured points over which H moves one way (steps of zero length are ignored).
 *
 * @param first     index of the first point
 * @param last      index of the last point, inclusive
 * @param direction +1 rising, −1 falling
 */
record BranchRun(int first, int last, int direction) {

    int length() {
        return last - first + 1;
    }

    static List<BranchRun> split(double[] h) {
        List<BranchRun> runs = new ArrayList<>();
        int start = 0;
        int direction = 0;
        for (int i = 1; i < h.length; i++) {
            int step = (int) Math.signum(h[i] - h[i - 1]);
            if (step == 0) {
                continue;
            }
            if (direction != 0 && step != direction) {
                runs.add(new BranchRun(start, i - 1, direction));
                start = i - 1;
            }
            direction = step;
        }
        if (direction != 0) {
            runs.add(new BranchRun(start, h.length - 1, direction));
        }
        return runs;
    }
}
