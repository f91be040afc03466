package org.kneepoint.server.app.fits;

import com.fasterxml.jackson.annotation.JsonUnwrapped;
import java.util.List;
import java.util.Locale;
import org.kneepoint.fitter.model.curieweiss.CurieWeissFit;
import org.kneepoint.server.app.grades.SusceptibilityData;

/**
 * A Curie–Weiss fit ({@code kneepoint fit curie-weiss --json}, {@code GET /api/fit/curie-weiss}): the parameters, the
 * behaviour of the measured χ and whether the Curie–Weiss term is significant, standard errors and the correlation
 * in the order C, θ, χ0 (null where the data do not determine a value), the RMS residual, the data's temperature
 * range (K), the profile evaluations, then where the data came from and whether the fit was saved.
 *
 * @param behaviour {@code paramagnetic}, {@code diamagnetic}, ... in lower case with hyphens
 * @param form      the form the susceptibility was stored in: {@code volume}, {@code mass} or {@code molar}
 */
public record CurieWeissFitDocument(@JsonUnwrapped CurieWeissFitParameters parameters, String behaviour,
        boolean curieWeissSignificant, StandardErrors standardErrors, List<List<Double>> correlation, double rmsResidual, int points,
        double temperatureMinK, double temperatureMaxK, int evaluations, String source, String material, String form, boolean saved) {

    /** The standard errors of C (K), θ (K) and χ0, or null where the data do not bound them. */
    public record StandardErrors(Double curieConstant, Double weissTemperatureK, Double chi0) {
    }

    /** The document of a fit to {@code data}. */
    public static CurieWeissFitDocument of(SusceptibilityData data, CurieWeissFit fit, boolean saved) {
        return new CurieWeissFitDocument(CurieWeissFitParameters.of(fit.parameters()), behaviour(fit), fit.curieWeissSignificant(),
                new StandardErrors(fit.curieConstantError(), fit.weissTemperatureError(), fit.temperatureIndependentError()),
                Matrices.rows(fit.correlation()), fit.rmsResidual(), fit.points(), fit.temperatureMin(), fit.temperatureMax(),
                fit.evaluations(), data.source(), data.material(), data.form().name().toLowerCase(Locale.ROOT), saved);
    }

    /** The fit's behaviour in the document's words, e.g. {@code temperature-independent}. */
    public static String behaviour(CurieWeissFit fit) {
        return fit.behaviour().name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
