package org.kneepoint.fitter.model.knee;

import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.DemagnetizationBranch;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;

/**
 * Fits the knee model to a curve's descending branch: unweighted least squares on J (every merged
 * point counts once) over the points from the top of the data down to J = 0, Levenberg–Marquardt
 * ({@link KneeLeastSquares}) with the analytic Jacobian, bounded to Br in (0, 3 T], μrec in [1, 2], HcJ &gt; 0 and w in
 * [10⁻⁴, 2]·HcJ, started from the characterization (Br, μrec, HcJ, and w from Hk). The curve must
 * reach its knee; a curve that stops before HcJ is fitted, its HcJ then being the model's
 * extrapolation (flagged by the caller from the data range).
 */
public final class KneeFitter {

    /** A fit whose RMS residual exceeds this share of Br describes no demagnetization curve. */
    private static final double WORST_RELATIVE_RESIDUAL = 0.05;

    private KneeFitter() {
    }

    public static KneeFit fit(DemagnetizationCurve curve) {
        Characterization c = CurveCharacterizer.characterize(curve);
        if (c.hk() == null) {
            throw new BadInputException("the curve stops before its knee (J never falls to 0.9·Br), so the knee model has nothing to fit;"
                    + " measure or digitize the curve past the knee");
        }
        DemagnetizationBranch branch = DemagnetizationBranch.of(curve);
        double lowest = c.hcj() != null ? -c.hcj() : branch.lowestH();
        double[][] data = branch.measuredBetween(lowest, branch.highestH());
        if (data[0].length < 5) {
            throw new BadInputException("the knee model has 4 parameters and needs at least 5 points above HcJ, got " + data[0].length);
        }
        double hcjStart = c.hcj() != null ? c.hcj() : 1.05 * -branch.lowestH();
        double muRecStart = Math.min(1.9, Math.max(1.0, c.muRec()));
        double[] start = {c.br(), muRecStart, hcjStart, startWidth(c, muRecStart, hcjStart)};
        KneeLeastSquares.Solution solution = new KneeLeastSquares(data[0], data[1], new KneeLeastSquares.Bounds(1e-3 * hcjStart))
                .solve(start);
        double[] p = solution.parameters();
        LinearRecoilKnee model = new LinearRecoilKnee(p[0], p[1], p[2], p[3]);
        if (solution.rms() > WORST_RELATIVE_RESIDUAL * model.remanence()) {
            throw new BadInputException(String.format(java.util.Locale.ROOT,
                    "the knee model leaves residuals of %.1f %% of Br; the data do not have the shape of a demagnetization curve with one knee",
                    100 * solution.rms() / model.remanence()));
        }
        int n = data[0].length;
        double variance = solution.rms() * solution.rms() * n / Math.max(1, n - 4);
        double[] errors = new double[4];
        double[][] correlation = new double[4][4];
        double[][] covariance = solution.inverseNormalMatrix();
        for (int i = 0; i < 4; i++) {
            errors[i] = Math.sqrt(covariance[i][i] * variance);
            for (int k = 0; k < 4; k++) {
                correlation[i][k] = covariance[i][k] / Math.sqrt(covariance[i][i] * covariance[k][k]);
            }
        }
        double hk = -model.kneeField().orElseThrow();
        return new KneeFit(model, errors, correlation, solution.rms(), solution.iterations(), solution.evaluations(),
                n, data[0][0], data[0][n - 1], hk, ModelEnergyProduct.maximum(model), curve.temperatureK());
    }

    private static double startWidth(Characterization c, double muRec, double hcj) {
        try {
            return LinearRecoilKnee.withKneeField(c.br(), muRec, hcj, Math.min(c.hk(), 0.999 * hcj)).kneeWidth();
        } catch (BadInputException e) {
            return 0.05 * hcj;
        }
    }

}
