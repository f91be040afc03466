package org.kneepoint.fitter.model.knee;

import java.util.ArrayList;
import java.util.List;
import org.kneepoint.fitter.model.MatrixCopy;

/**
 * A knee-model fit and what it is worth: the model, standard errors of its parameters (from the
 * Jacobian at the optimum, scaled by the residual variance) in the order of {@link #parameterNames()},
 * their correlation, the RMS of the J residuals beside the scatter of the points about a smooth curve
 * ({@link PointScatter}), the work done and the H range of the data used. Hk and (BH)max are the model's.
 *
 * @param model          the fitted curve
 * @param errors         standard errors of Br (T), μline, HcJ (A/m) and the shape's parameters
 * @param correlation    correlation matrix in the same order
 * @param rmsJ           RMS of J residuals, T
 * @param scatterJ       scatter of the points about a smooth curve through them, T
 * @param kneeWidthError standard error of the knee width HcJ − Hk, A/m (propagated from the covariance)
 * @param iterations     Levenberg–Marquardt iterations (of the kept form)
 * @param evaluations    model evaluations (all forms tried)
 * @param points         points used
 * @param lowestH        lowest H used, A/m
 * @param highestH       highest H used, A/m
 * @param hk             the model's knee field (J = 0.9·Br), A/m, positive
 * @param bhMax          the model's (BH)max, J/m³
 * @param temperatureK   temperature of the fitted curve, K, or null
 */
public record KneeFit(KneeCurve model, double[] errors, double[][] correlation, double rmsJ, double scatterJ,
        double kneeWidthError, int iterations, int evaluations, int points, double lowestH, double highestH, double hk,
        double bhMax, Double temperatureK) {

    /** The fit follows the data within their noise when its RMS is at most this multiple of the scatter. */
    public static final double WITHIN_SCATTER = 1.5;

    /** Below this share of Br an RMS residual is within the rounding of printed data, whatever the scatter. */
    public static final double ROUNDING_RESIDUAL = 2e-4;

    public KneeFit {
        errors = errors.clone();
        correlation = MatrixCopy.of(correlation);
    }

    /** RMS over scatter, or null when the points show no scatter at all (noise-free data). */
    public Double rmsOverScatter() {
        return scatterJ > 0 ? rmsJ / scatterJ : null;
    }

    /**
     * True when the model follows the curve only approximately: its RMS residual is above
     * {@value #WITHIN_SCATTER}× the scatter of the points and above {@value #ROUNDING_RESIDUAL} of Br.
     */
    public boolean approximate() {
        return rmsJ > WITHIN_SCATTER * scatterJ && rmsJ > ROUNDING_RESIDUAL * model.remanence();
    }

    /** Names of the fitted parameters, as in JSON: br, muLine, hcj, then the shape's. */
    public List<String> parameterNames() {
        List<String> names = new ArrayList<>(List.of("br", "muLine", "hcj"));
        names.addAll(model.shape().parameterNames());
        return names;
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
