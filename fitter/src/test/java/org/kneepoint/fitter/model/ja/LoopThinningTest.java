package org.kneepoint.fitter.model.ja;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

class LoopThinningTest {

    @Test
    void thinning_keeps_the_turning_fields_and_about_the_target_count() {
        int n = 1200;
        double[] h = new double[n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            h[i] = 5000 * Math.cos(2 * Math.PI * 3 * i / (n - 1) + 0.3);
            b[i] = 1e-4 * h[i] + 0.1 * Math.sin(i);
        }
        MeasuredLoop thinned = LoopThinning.thin(MeasuredLoop.ofFluxDensity(h, b));
        assertTrue(thinned.size() <= LoopThinning.TARGET_POINTS + 10, "size " + thinned.size());
        double[] kept = thinned.field();
        assertEquals(Arrays.stream(h).max().orElseThrow(), Arrays.stream(kept).max().orElseThrow());
        assertEquals(Arrays.stream(h).min().orElseThrow(), Arrays.stream(kept).min().orElseThrow());
        assertEquals(BranchRun.split(h).size(), BranchRun.split(kept).size());
        assertEquals(h[n - 1], kept[kept.length - 1]);
    }

    @Test
    void a_short_loop_is_not_thinned() {
        double[] h = new double[100];
        double[] b = new double[100];
        for (int i = 0; i < 100; i++) {
            h[i] = Math.cos(i / 10.0);
            b[i] = h[i];
        }
        MeasuredLoop loop = MeasuredLoop.ofFluxDensity(h, b);
        assertSame(loop, LoopThinning.thin(loop));
    }
}
