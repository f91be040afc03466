package org.kneepoint.server.app.fits;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.ArrayList;
import java.util.List;
import org.kneepoint.fitter.model.ja.JilesAthertonParameters;
import org.kneepoint.fitter.model.ja.LoopMetrics;
import org.kneepoint.fitter.model.ja.Trajectory;

/**
 * A simulated Jiles–Atherton major loop ({@code kneepoint ja simulate --json}), SI: Hc, Mr, Br, HcJ, HcB, M and B at
 * Hmax, the loss per cycle (J/m³), Hmax, the parameters, and the loop's points as [H, B] pairs when asked for.
 *
 * @param points the loop as [H (A/m), B (T)] pairs, or null (left out) when not asked for
 */
public record JilesAthertonLoopDocument(double hc, double mr, double br, double hcj, double hcb, double mMax, double bMax,
        double lossPerCycle, double hMax, JilesAthertonFitParameters parameters,
        @JsonInclude(JsonInclude.Include.NON_NULL) List<List<Double>> points) {

    /** The document of a loop's metrics; {@code loop} may be null (no points asked for). */
    public static JilesAthertonLoopDocument of(JilesAthertonParameters p, LoopMetrics m, Trajectory loop) {
        List<List<Double>> points = null;
        if (loop != null) {
            double[] h = loop.field();
            double[] b = loop.fluxDensity();
            points = new ArrayList<>();
            for (int i = 0; i < h.length; i++) {
                points.add(List.of(h[i], b[i]));
            }
        }
        return new JilesAthertonLoopDocument(m.hc(), m.mr(), m.br(), m.hcj(), m.hcb(), m.mMax(), m.bMax(), m.lossPerCycle(), m.hMax(),
                JilesAthertonFitParameters.of(p), points);
    }
}
