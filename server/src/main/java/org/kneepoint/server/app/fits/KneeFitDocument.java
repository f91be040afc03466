package org.kneepoint.server.app.fits;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonUnwrapped;
import java.util.List;
import org.kneepoint.fitter.model.knee.KneeFit;

/**
 * A knee fit ({@code kneepoint fit knee --json}, {@code GET /api/fit/knee}), SI: the curve's temperature, the model's
 * parameters, Hk and (BH)max of the model, the RMS residual in J against the scatter of the points, standard errors,
 * the correlation matrix (in the order of the fitted parameters: br, muLine, hcj, then the shape's), the work done and
 * the range of H fitted; {@code hcjExtrapolated} says the data stop before J falls to zero.
 *
 * @param hRange the lowest and highest H of the fitted points, A/m
 */
public record KneeFitDocument(Double temperatureK, @JsonUnwrapped KneeFitParameters parameters, double hk, double bhMax, double rmsJ,
        double scatterJ, Double rmsOverScatter, StandardErrors standardErrors, List<List<Double>> correlation, int iterations,
        int evaluations, int points, List<Double> hRange, boolean hcjExtrapolated, boolean approximate) {

    /** The standard errors of the fitted parameters, then of μrec and of the knee width (null where not determined). */
    public record StandardErrors(Double br, Double muLine, Double hcj,
            @JsonInclude(JsonInclude.Include.NON_NULL) Double switchingWidth,
            @JsonInclude(JsonInclude.Include.NON_NULL) Double switchingSkew,
            @JsonInclude(JsonInclude.Include.NON_NULL) Double switchingTail,
            @JsonInclude(JsonInclude.Include.NON_NULL) Double rationalBend,
            @JsonInclude(JsonInclude.Include.NON_NULL) Double rationalCurvature,
            Double muRec, Double kneeWidth) {
    }

    /** The document of one knee fit. */
    public static KneeFitDocument of(KneeFit fit) {
        double[] errors = fit.errors();
        List<String> names = fit.model().shape().parameterNames();
        double[] shapeErrors = new double[names.size()];
        System.arraycopy(errors, 3, shapeErrors, 0, names.size());
        Double[] shape = KneeFitParameters.shapeValues(names, shapeErrors);
        StandardErrors standardErrors = new StandardErrors(errors[0], errors[1], errors[2], shape[0], shape[1], shape[2], shape[3],
                shape[4], errors[1], fit.kneeWidthError());
        return new KneeFitDocument(fit.temperatureK(), KneeFitParameters.of(fit.model()), fit.hk(), fit.bhMax(), fit.rmsJ(),
                fit.scatterJ(), fit.rmsOverScatter(), standardErrors, Matrices.rows(fit.correlation()), fit.iterations(),
                fit.evaluations(), fit.points(), List.of(fit.lowestH(), fit.highestH()),
                fit.lowestH() > -fit.model().intrinsicCoercivity() * (1 + 1e-9), fit.approximate());
    }
}
