package org.kneepoint.server.web;

import java.util.List;
import java.util.Locale;
import org.kneepoint.fitter.error.KneepointException;
import org.kneepoint.fitter.library.FitRecord;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.model.knee.KneeFit;
import org.kneepoint.fitter.model.knee.TemperatureFit;
import org.kneepoint.server.library.GradeCurves;
import org.kneepoint.server.text.Temperatures;

/**
 * The Grade page's fitted models: the temperature model (α of Br, β of HcJ, and the knee fit at each
 * measured temperature), or why there is none, and the fits stored for the grade.
 */
final class GradeModelSection {

    private GradeModelSection() {
    }

    static String html(String grade, List<LibraryCurve> curves, List<FitRecord> storedFits) {
        StringBuilder out = new StringBuilder("<h2>Fitted models</h2>");
        try {
            TemperatureFit fit = GradeCurves.temperatureModel(grade, curves);
            out.append("<p>Temperature coefficients relative to ").append(Html.text(Temperatures.celsius(fit.referenceTemperatureK())))
                    .append(": α of Br ").append(Html.text(percent(fit.alpha()))).append(" %/K, β of HcJ ")
                    .append(Html.text(percent(fit.beta()))).append(" %/K (least-squares lines through the knee fits).")
                    .append(" Between the measured temperatures the model interpolates; beyond them it extrapolates, and says so.</p>")
                    .append("<table class=\"numbers\"><thead><tr><th>Temperature</th><th>Br (T)</th><th>μrec</th><th>HcJ (kA/m)</th>")
                    .append("<th>knee width (kA/m)</th><th>Hk (kA/m)</th><th>RMS residual (mT)</th></tr></thead><tbody>");
            for (KneeFit knee : fit.fits()) {
                out.append("<tr><td>").append(Html.text(Temperatures.celsius(knee.temperatureK()))).append("</td>")
                        .append(cell("%.4f", knee.model().remanence())).append(cell("%.4f", knee.model().recoilPermeability()))
                        .append(cell("%.1f", knee.model().intrinsicCoercivity() / 1e3)).append(cell("%.2f", knee.model().kneeWidth() / 1e3))
                        .append(cell("%.1f", knee.hk() / 1e3)).append(cell("%.3f", knee.rmsJ() * 1e3)).append("</tr>");
            }
            out.append("</tbody></table>");
            if (fit.fits().stream().anyMatch(KneeFit::approximate)) {
                out.append("<p class=\"note\">The knee model follows some of these curves only approximately (RMS above 0.5 % of Br):"
                        + " rounded curves such as cast AlNiCo need another knee shape.</p>");
            }
        } catch (KneepointException e) {
            out.append("<p>No temperature model: ").append(Html.text(e.getMessage())).append("</p>");
        }
        List<FitRecord> own = storedFits.stream().filter(fit -> grade.equals(fit.grade())).toList();
        if (!own.isEmpty()) {
            out.append("<h3>Stored fits</h3><table class=\"numbers\"><thead><tr><th>Model</th><th>Curve</th><th>Parameters</th>")
                    .append("<th>Fitted at</th></tr></thead><tbody>");
            for (FitRecord fit : own) {
                out.append("<tr><td>").append(Html.text(fit.model())).append("</td><td>")
                        .append(Html.text(fit.curveTemperatureK() == null ? "all" : fit.curveKind() + " at "
                                + Temperatures.celsius(fit.curveTemperatureK())))
                        .append("</td><td><code>").append(Html.text(fit.parametersJson())).append("</code></td><td>")
                        .append(Html.text(fit.fittedAt().toString())).append("</td></tr>");
            }
            out.append("</tbody></table>");
        }
        return out.toString();
    }

    private static String percent(double perKelvin) {
        return String.format(Locale.ROOT, "%.4g", 100 * perKelvin);
    }

    private static String cell(String pattern, double value) {
        return "<td>" + Html.text(String.format(Locale.ROOT, pattern, value)) + "</td>";
    }
}
