package org.kneepoint.server.app.grades;

import java.util.Locale;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.DemagnetizationCurve;

/**
 * A curve's characterization ({@code kneepoint curve --json}, {@code GET /api/grades/{name}/curve}), SI: where the
 * curve came from, whether it was modeled or extrapolated, then Br, HcB, HcJ, (BH)max and where it lies, Hk, the
 * squareness Hk/HcJ, the recoil permeability and the window its line was fitted on. Null means "not reached".
 *
 * @param source       the grade (or the file) the curve belongs to
 * @param kind         {@code normal}, {@code intrinsic} or {@code loop}
 * @param points       how many points the curve has
 * @param temperatureK the curve's temperature, K, or null when the file does not give one
 */
public record CurveDocument(String source, boolean modeled, boolean extrapolated, String kind, int points, Double temperatureK,
        double br, Double hcb, Double hcj, Double bhMax, Double hAtBhMax, Double bAtBhMax, Double hk, Double squareness,
        double muRec, RecoilWindow recoilWindow) {

    /** The H range (A/m) the recoil line was fitted on and its number of points (0: interpolated). */
    public record RecoilWindow(double from, double to, int points) {
    }

    /** The document of one characterized curve. */
    public static CurveDocument of(GradeCurve gradeCurve, Characterization c) {
        DemagnetizationCurve curve = gradeCurve.curve();
        return new CurveDocument(gradeCurve.grade(), gradeCurve.modeled(), gradeCurve.extrapolated(),
                curve.kind().name().toLowerCase(Locale.ROOT), curve.size(), c.temperatureK(), c.br(), c.hcb(), c.hcj(), c.bhMax(),
                c.hAtBhMax(), c.bAtBhMax(), c.hk(), c.squareness(), c.muRec(),
                new RecoilWindow(c.recoilWindow().from(), c.recoilWindow().to(), c.recoilWindow().points()));
    }
}
