package org.kneepoint.fitter.limits;

import java.util.Optional;

/**
 * The area a loop encloses in the (H, J) plane, by the shoelace formula over its points in
 * measurement order, closed from the last point back to the first (measured from the first point, so that no
 * precision is lost far from the origin). ∮ J dH equals ∮ B dH, since
 * ∮ μ0·H dH = 0; a loop with B = 0 everywhere, or one that retraces its own path, encloses none.
 */
final class LoopArea {

    private LoopArea() {
    }

    static Optional<CurvePlausibility.Finding> check(double[] h, double[] j) {
        double area = 0;
        double hMin = h[0];
        double hMax = h[0];
        double jMin = j[0];
        double jMax = j[0];
        for (int i = 0; i < h.length; i++) {
            int next = (i + 1) % h.length;
            area += (h[i] - h[0]) * (j[next] - j[0]) - (h[next] - h[0]) * (j[i] - j[0]);
            hMin = Math.min(hMin, h[i]);
            hMax = Math.max(hMax, h[i]);
            jMin = Math.min(jMin, j[i]);
            jMax = Math.max(jMax, j[i]);
        }
        double box = (hMax - hMin) * (jMax - jMin);
        if (Math.abs(area / 2) > CurvePlausibility.LOOP_AREA_FRACTION * box) {
            return Optional.empty();
        }
        return Optional.of(new CurvePlausibility.Finding(-1, -1, CurvePlausibility.Part.CURVE,
                "the loop encloses no area (its points go and come back along one path, or B is 0 everywhere);"
                        + " a hysteresis loop has a descending and an ascending branch"));
    }
}
