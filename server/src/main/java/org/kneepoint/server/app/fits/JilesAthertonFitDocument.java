package org.kneepoint.server.app.fits;

import com.fasterxml.jackson.annotation.JsonUnwrapped;
import java.util.List;
import java.util.Locale;
import org.kneepoint.fitter.model.ja.JilesAthertonFit;
import org.kneepoint.fitter.model.ja.JilesAthertonStandardErrors;

/**
 * A Jiles–Atherton fit ({@code kneepoint fit ja --json}, the result of a {@code ja-fit} job): the parameters, the RMS
 * residual in B (T), the loop evaluations, standard errors and the correlation in the order Ms, a, k, c, α (null for
 * a value the data do not bound), the least-squares iterations, the points and H range used (A/m), then where the
 * data came from and whether the fit was saved.
 *
 * @param curveKind        {@code loop}, {@code normal} or {@code intrinsic}
 * @param magnetizingField the field the magnet was magnetized at, A/m, for a second-quadrant curve; else null
 */
public record JilesAthertonFitDocument(@JsonUnwrapped JilesAthertonFitParameters parameters, double rmsB, int evaluations,
        StandardErrors standardErrors, List<List<Double>> correlation, int iterations, int points, double fieldMin, double fieldMax,
        String source, String grade, String curveKind, Double temperatureK, Double magnetizingField, boolean saved) {

    /** The standard errors of Ms, a, k (A/m), c and α; null where the data do not bound them. */
    public record StandardErrors(Double ms, Double a, Double k, Double c, Double alpha) {

        static StandardErrors of(JilesAthertonStandardErrors e) {
            return new StandardErrors(e.ms(), e.a(), e.k(), e.c(), e.alpha());
        }
    }

    /** The document of a fit to {@code data}. */
    public static JilesAthertonFitDocument of(JilesAthertonFitData data, JilesAthertonFit fit, boolean saved) {
        return new JilesAthertonFitDocument(JilesAthertonFitParameters.of(fit.parameters()), fit.rmsB(), fit.evaluations(),
                StandardErrors.of(fit.standardErrors()), Matrices.rows(fit.correlation()), fit.iterations(),
                fit.lastPoint() - fit.firstPoint() + 1, fit.fieldMin(), fit.fieldMax(), data.source(), data.grade(),
                data.curve().kind().name().toLowerCase(Locale.ROOT), data.curve().temperatureK(), data.magnetizingField(), saved);
    }
}
