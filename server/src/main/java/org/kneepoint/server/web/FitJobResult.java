package org.kneepoint.server.web;

import java.util.List;
import java.util.Locale;
import java.util.function.ToDoubleFunction;
import java.util.function.Function;
import org.kneepoint.server.app.fits.JilesAthertonFitDocument;
import org.kneepoint.server.app.fits.JilesAthertonFitParameters;

/**
 * The result of a finished Jiles–Atherton fit job (template {@code fitResult.jte}): Ms, a, k, c, α with their
 * standard errors and the rms error in B.
 */
final class FitJobResult {

    private static final List<Parameter> PARAMETERS = List.of(
            new Parameter("Ms", "kA/m", 1000, JilesAthertonFitParameters::ms, JilesAthertonFitDocument.StandardErrors::ms),
            new Parameter("a", "A/m", 1, JilesAthertonFitParameters::a, JilesAthertonFitDocument.StandardErrors::a),
            new Parameter("k", "A/m", 1, JilesAthertonFitParameters::k, JilesAthertonFitDocument.StandardErrors::k),
            new Parameter("c", "", 1, JilesAthertonFitParameters::c, JilesAthertonFitDocument.StandardErrors::c),
            new Parameter("α", "", 1, JilesAthertonFitParameters::alpha, JilesAthertonFitDocument.StandardErrors::alpha));

    private FitJobResult() {
    }

    /** The fitted grade, the kind of curve, a row per parameter and the rms error in B, in tesla. */
    record View(Links.Link grade, String curveKind, List<Row> rows, String rmsB) {
    }

    /** One parameter: its label, value and standard error in the unit shown, or "—". */
    record Row(String label, String value, String error, String unit) {
    }

    /** One parameter: its label, the unit it is shown in and that unit's size in SI, and where its value and error are. */
    private record Parameter(String label, String unit, double scale, ToDoubleFunction<JilesAthertonFitParameters> value,
            Function<JilesAthertonFitDocument.StandardErrors, Double> error) {
    }

    static View of(JilesAthertonFitDocument result) {
        List<Row> rows = PARAMETERS.stream().map(parameter -> new Row(parameter.label(),
                number(parameter.value().applyAsDouble(result.parameters()), parameter.scale()),
                number(parameter.error().apply(result.standardErrors()), parameter.scale()), parameter.unit())).toList();
        return new View(Links.Link.toGrade(String.valueOf(result.grade())), result.curveKind(), rows, number(result.rmsB(), 1));
    }

    private static String number(Double value, double scale) {
        return value != null && Double.isFinite(value) ? String.format(Locale.ROOT, "%.4g", value / scale) : "—";
    }
}
