package org.kneepoint.server.web;

import java.util.List;
import java.util.Locale;
import org.kneepoint.fitter.error.KneepointException;
import org.kneepoint.fitter.library.FitRecord;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.model.knee.KneeFit;
import org.kneepoint.fitter.model.knee.TemperatureFit;
import org.kneepoint.server.app.grades.GradeCurves;
import org.kneepoint.server.app.wording.Temperatures;

/**
 * The Grade page's fitted models (template {@code gradeModels.jte}): the temperature model (α of Br, β of HcJ,
 * and the knee fit at each measured temperature), or why there is none, and the fits stored for the grade.
 */
final class GradeModelSection {

    private GradeModelSection() {
    }

    /** The section: the temperature model or, when there is none, {@code problem} saying why; and the stored fits. */
    record View(TemperatureModel model, String problem, List<StoredFit> storedFits) {
    }

    /** The temperature coefficients relative to the reference temperature, and the knee fit at each temperature. */
    record TemperatureModel(String reference, String alpha, String beta, List<KneeRow> knees, boolean approximate) {
    }

    /** One knee fit, formatted in the units of the table's headers. */
    record KneeRow(String temperature, String br, String muRec, String hcj, String width, String hk, String rms) {
    }

    /** One stored fit of the grade. */
    record StoredFit(String model, String curve, String parameters, String fittedAt) {
    }

    static View of(String grade, List<LibraryCurve> curves, List<FitRecord> storedFits) {
        List<StoredFit> own = storedFits.stream().filter(fit -> grade.equals(fit.grade()))
                .map(fit -> new StoredFit(fit.model(), fit.curveTemperatureK() == null ? "all"
                        : fit.curveKind() + " at " + Temperatures.celsius(fit.curveTemperatureK()), fit.parametersJson(),
                        fit.fittedAt().toString())).toList();
        try {
            return new View(model(GradeCurves.temperatureModel(grade, curves)), null, own);
        } catch (KneepointException e) {
            return new View(null, e.getMessage(), own);
        }
    }

    private static TemperatureModel model(TemperatureFit fit) {
        List<KneeRow> knees = fit.fits().stream().map(knee -> new KneeRow(Temperatures.celsius(knee.temperatureK()),
                format("%.4f", knee.model().remanence()), format("%.4f", knee.model().recoilPermeability()),
                format("%.1f", knee.model().intrinsicCoercivity() / 1e3), format("%.2f", knee.model().kneeWidth() / 1e3),
                format("%.1f", knee.hk() / 1e3), format("%.3f", knee.rmsJ() * 1e3))).toList();
        return new TemperatureModel(Temperatures.celsius(fit.referenceTemperatureK()), format("%.4g", 100 * fit.alpha()),
                format("%.4g", 100 * fit.beta()), knees, fit.fits().stream().anyMatch(KneeFit::approximate));
    }

    private static String format(String pattern, double value) {
        return String.format(Locale.ROOT, pattern, value);
    }
}
