package org.kneepoint.server.web;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.library.GradeSummary;
import org.kneepoint.server.app.design.CheckRun;
import org.kneepoint.server.app.design.Verdict;
import org.kneepoint.server.app.wording.Temperatures;

/**
 * The Check page ({@code /check}, template {@code check.jte}): a form — a grade of the library or one typed in,
 * the load line, temperature, opposing field, loss limit — and, once sent, the check's results, the
 * operating-point chart and the cautions. The form sends the query parameters of {@code GET /api/check}, so the
 * page and the route compute the same check. Below it, the element check of a field solver's files ({@link ElementSection}).
 */
final class CheckPage {

    private CheckPage() {
    }

    /** What the page shows: the problem of the request (or null), the form's fields, and the results once sent (or null). */
    record View(Layout.Frame frame, String problem, FormFields.Choice grade, List<FormFields.TextField> typedGrade,
            FormFields.LoadLine loadLine, List<FormFields.TextField> duty, Results results, ElementSection.View elements) {
    }

    /** A check's results: the temperature, the model and load line in words, the numbers, the chart's link, the verdict. */
    record Results(String temperature, String model, String loadLine, List<CheckResults.Row> rows, String chart, boolean extrapolated,
            Verdict verdict) {
    }

    static String render(LibraryReader library, UnaryOperator<String> values, String query, CheckRun run, String problem,
            boolean demoPresent, ElementSection.View elements) {
        List<String[]> grades = new ArrayList<>();
        grades.add(new String[] {"", "typed in below"});
        for (GradeSummary grade : library.grades(null)) {
            grades.add(new String[] {grade.name(), grade.name()});
        }
        List<FormFields.TextField> typed = List.of(FormFields.text(values, "br", "Br", "1.3T"), FormFields.text(values, "muRec", "μrec", "1.05"),
                FormFields.text(values, "hcj", "HcJ", "1600kA/m"), FormFields.text(values, "knee", "Hk", "1450kA/m"),
                FormFields.text(values, "alpha", "α of Br", "-0.12%/K"), FormFields.text(values, "beta", "β of HcJ", "-0.6%/K"),
                FormFields.text(values, "referenceTemperature", "values at", "20C"));
        List<FormFields.TextField> duty = List.of(FormFields.text(values, "temperature", "temperature", "120C"),
                FormFields.text(values, "opposingField", "opposing field (circuit)", "200kA/m"),
                FormFields.text(values, "externalField", "or external field (free magnet)", "300kA/m"),
                FormFields.text(values, "lossLimit", "loss limit", "1%"));
        Results results = run == null ? null : new Results(Temperatures.celsius(run.result().temperature()), run.model().description(),
                run.loadLine().describe(), CheckResults.rows(run), "/charts/check.svg?" + query, run.extrapolated(), run.verdict());
        View view = new View(new Layout.Frame("Check", "Check", demoPresent), problem, FormFields.choice(values, "grade", "grade", grades),
                typed, FormFields.loadLine(values), duty, results, elements);
        return Templates.render("check.jte", view);
    }
}
