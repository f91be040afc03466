package org.kneepoint.fitter.model.knee;

import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.model.MatrixCopy;

/**
 * A knee-model fit and what it is worth: the model, standard errors of its four parameters (from
 * the Jacobian at the optimum, scaled by the residual variance), their correlation, the RMS of the
 * J residuals, the work done and the H range of the data used. Hk and (BH)max are the model's.
 *
 * @param model          the fitted curve
 * @param errors         standard errors of Br (T), μrec, HcJ (A/m), w (A/m)
 * @param correlation    4 × 4 correlation matrix in the order Br, μrec, HcJ, w
 * @param rmsJ           RMS of J residuals, T
 * @param iterations     Levenberg–Marquardt iterations
 * @param evaluations    model evaluations
 * @param points         points used
 * @param lowestH        lowest H used, A/m
 * @param highestH       highest H used, A/m
 * @param hk             the model's knee field (J = 0.9·Br), A/m, positive
 * @param bhMax          the model's (BH)max, J/m³
 * @param temperatureK   temperature of the fitted curve, K, or null
 */
public record KneeFit(LinearRecoilKnee model, double[] errors, double[][] correlation, double rmsJ, int iterations,
        int evaluations, int points, double lowestH, double highestH, double hk, double bhMax, Double temperatureK) {

    public KneeFit {
        errors = errors.clone();
        correlation = MatrixCopy.of(correlation);
    }

    /** A fit whose RMS residual exceeds this share of Br follows the curve only approximately. */
    public static final double APPROXIMATE_RESIDUAL = 0.005;

    /**
     * True when the model follows the curve only approximately (RMS residual above 0.5 % of Br):
     * typically rounded curves such as cast AlNiCo, whose knee the exponential shape cannot bend to.
     */
    public boolean approximate() {
        return rmsJ > APPROXIMATE_RESIDUAL * model.remanence();
    }

    @Override
    public double[] errors() {
        return errors.clone();
    }

    @Override
    public double[][] correlation() {
        return MatrixCopy.of(correlation);
    }
}
