package org.kneepoint.fitter.model.knee;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import org.apache.commons.math3.exception.ConvergenceException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.DemagnetizationBranch;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.NumericalFailureException;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;

/**
 * Fits the knee model to a curve's descending branch: unweighted least squares on J (every merged
 * point counts once) over the points from the top of the data down to J = 0, Levenberg–Marquardt
 * with the analytic Jacobian, bounded to Br in (0, 3 T], μrec in [1, 2], HcJ &gt; 0 and w in
 * [10⁻⁴, 2]·HcJ, started from the characterization (Br, μrec, HcJ, and w from Hk). The curve must
 * reach its knee; a curve that stops before HcJ is fitted, its HcJ then being the model's
 * extrapolation (flagged by the caller from the data range).
 */
public final class KneeFitter {

    private static final int MAX_ITERATIONS = 200;
    /** A fit whose RMS residual exceeds this share of Br describes no demagnetization curve. */
    private static final double WORST_RELATIVE_RESIDUAL = 0.1;

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
        LeastSquaresOptimizer.Optimum optimum = optimize(data, start);
        RealVector point = optimum.getPoint();
        LinearRecoilKnee model = new LinearRecoilKnee(point.getEntry(0), point.getEntry(1), point.getEntry(2), point.getEntry(3));
        if (optimum.getRMS() > WORST_RELATIVE_RESIDUAL * model.remanence()) {
            throw new BadInputException(String.format(java.util.Locale.ROOT,
                    "the knee model leaves residuals of %.1f %% of Br; the data do not have the shape of a demagnetization curve with one knee",
                    100 * optimum.getRMS() / model.remanence()));
        }
        int n = data[0].length;
        double variance = optimum.getRMS() * optimum.getRMS() * n / Math.max(1, n - 4);
        double[] errors = new double[4];
        double[][] correlation = new double[4][4];
        covariance(optimum, variance, errors, correlation);
        double hk = -model.kneeField().orElseThrow();
        return new KneeFit(model, errors, correlation, optimum.getRMS(), optimum.getIterations(), optimum.getEvaluations(),
                n, data[0][0], data[0][n - 1], hk, ModelEnergyProduct.maximum(model), curve.temperatureK());
    }

    private static double startWidth(Characterization c, double muRec, double hcj) {
        try {
            return LinearRecoilKnee.withKneeField(c.br(), muRec, hcj, Math.min(c.hk(), 0.999 * hcj)).kneeWidth();
        } catch (BadInputException e) {
            return 0.05 * hcj;
        }
    }

    private static LeastSquaresOptimizer.Optimum optimize(double[][] data, double[] start) {
        double hcjScale = start[2];
        try {
            return new LevenbergMarquardtOptimizer().optimize(new LeastSquaresBuilder()
                    .start(start)
                    .model(new KneeResidual(data[0]))
                    .target(data[1])
                    .parameterValidator(p -> bounded(p, hcjScale))
                    .maxIterations(MAX_ITERATIONS)
                    .maxEvaluations(4 * MAX_ITERATIONS)
                    .build());
        } catch (TooManyEvaluationsException | ConvergenceException e) {
            throw new NumericalFailureException("the knee model did not converge on this curve within " + MAX_ITERATIONS
                    + " iterations; the curve may not have the shape of a recoil line with one knee");
        }
    }

    private static RealVector bounded(RealVector p, double hcjScale) {
        double br = Math.min(3.0, Math.max(1e-3, p.getEntry(0)));
        double muRec = Math.min(2.0, Math.max(1.0, p.getEntry(1)));
        double hcj = Math.max(1e-3 * hcjScale, p.getEntry(2));
        double width = Math.min(2 * hcj, Math.max(1e-4 * hcj, p.getEntry(3)));
        double maxMuRec = 1 + 0.999 * br / (MU0 * hcj);
        return new ArrayRealVector(new double[] {br, Math.min(muRec, maxMuRec), hcj, width}, false);
    }

    private static void covariance(LeastSquaresOptimizer.Optimum optimum, double variance, double[] errors, double[][] correlation) {
        RealMatrix covariance;
        try {
            covariance = optimum.getCovariances(1e-14);
        } catch (RuntimeException singular) {
            java.util.Arrays.fill(errors, Double.POSITIVE_INFINITY);
            return;
        }
        for (int i = 0; i < 4; i++) {
            errors[i] = Math.sqrt(covariance.getEntry(i, i) * variance);
        }
        for (int i = 0; i < 4; i++) {
            for (int k = 0; k < 4; k++) {
                correlation[i][k] = covariance.getEntry(i, k) / Math.sqrt(covariance.getEntry(i, i) * covariance.getEntry(k, k));
            }
        }
    }
}
