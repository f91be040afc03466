package org.kneepoint.server.web;

import java.util.List;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.ImportBatch;
import org.kneepoint.server.library.ImportPlan;
import org.kneepoint.server.text.Temperatures;

/**
 * The Import page ({@code /import}): a form to upload curve files and susceptibility tables, the
 * preview of a dry run with its validation message, and the result of the import; the preview also
 * offers to store the files in a background job ({@code /jobs/import}, answered by the job's page).
 */
final class ImportPage {

    private ImportPage() {
    }

    static String form(boolean tokenRequired, boolean demoPresent) {
        return Layout.page("Import", "Import", "<h1>Import</h1>" + intro() + uploadForm(tokenRequired), demoPresent);
    }

    static String refused(String message, boolean tokenRequired, boolean demoPresent) {
        String content = "<h1>Import</h1><div class=\"problem\" role=\"alert\"><strong>Nothing was imported.</strong> "
                + Html.text(message) + "</div>" + uploadForm(tokenRequired);
        return Layout.page("Import", "Import", content, demoPresent);
    }

    static String preview(List<ImportPlan> plans, String staged, boolean tokenRequired, boolean demoPresent) {
        StringBuilder out = new StringBuilder("<h1>Import: check</h1><p>Every file was read and checked; nothing is stored yet.</p>");
        out.append(planTable(plans, true));
        if (plans.stream().anyMatch(plan -> !plan.alreadyImported())) {
            out.append("<form method=\"post\" action=\"/import/commit\"><input type=\"hidden\" name=\"staged\" value=\"")
                    .append(Html.text(staged)).append("\">").append(tokenField(tokenRequired))
                    .append("<button type=\"submit\" class=\"primary\">Import these files</button> ")
                    .append("<button type=\"submit\" formaction=\"/jobs/import\">Import in the background</button> ")
                    .append("<a href=\"/import\">Start again</a>")
                    .append("<p class=\"hint\">For large uploads: in the background, a job page shows each file's progress ")
                    .append("and can be left and come back to; it links to the imported grades when done.</p></form>");
        } else {
            out.append("<p>All these files are in the library already. <a href=\"/import\">Choose other files</a></p>");
        }
        return Layout.page("Import", "Import", out.toString(), demoPresent);
    }

    static String done(List<ImportPlan> plans, boolean demoPresent) {
        String content = "<h1>Import: done</h1><p>The files below are stored in the library.</p>" + planTable(plans, false)
                + "<p><a href=\"/\">Back to the library</a> · <a href=\"/import\">Import more</a></p>";
        return Layout.page("Import", "Import", content, demoPresent);
    }

    private static String intro() {
        return "<p>Curve files (text with a header row naming each column's unit, or JSON) and susceptibility tables. "
                + "A curve file names its grade and family (<code># grade: NAME</code>, <code># family: NAME</code>) and "
                + "each curve's temperature. The files are checked first; nothing is stored until you confirm. "
                + "Up to 64 MiB in all.</p>";
    }

    private static String uploadForm(boolean tokenRequired) {
        return "<form class=\"upload\" method=\"post\" action=\"/import\" enctype=\"multipart/form-data\">"
                + "<label>Files <input type=\"file\" name=\"file\" multiple required></label>" + tokenField(tokenRequired)
                + "<button type=\"submit\" class=\"primary\">Check files</button></form>";
    }

    private static String tokenField(boolean tokenRequired) {
        return tokenRequired ? "<label>Access token <input type=\"password\" name=\"token\" autocomplete=\"off\" required></label>" : "";
    }

    private static String planTable(List<ImportPlan> plans, boolean dryRun) {
        StringBuilder out = new StringBuilder("<table class=\"plans\"><thead><tr><th>File</th><th>Status</th><th>Grades</th>"
                + "<th>Curves</th><th>Points</th><th>Temperatures</th></tr></thead><tbody>");
        for (ImportPlan plan : plans) {
            out.append("<tr><td>").append(Html.text(plan.fileName())).append("</td>");
            if (plan.alreadyImported()) {
                out.append("<td>already imported as ").append(Html.text(plan.earlier().fileName())).append(" at ")
                        .append(Html.text(plan.earlier().importedAt().toString())).append("; skipped</td><td></td><td></td><td></td><td></td></tr>");
                continue;
            }
            ImportBatch batch = plan.batch();
            List<Double> temperatures = batch.curves().stream().map(curve -> curve.curve().temperatureK()).distinct().sorted().toList();
            out.append("<td>").append(dryRun ? "valid" : "imported").append("</td><td>")
                    .append(Html.text(String.join(", ", batch.grades().stream().map(GradeInfo::name).toList()))).append("</td>")
                    .append("<td class=\"number\">").append(batch.info().curves()).append("</td><td class=\"number\">")
                    .append(batch.info().points() + batch.info().susceptibilityPoints()).append("</td><td>")
                    .append(Html.text(temperatures.isEmpty() ? "" : Temperatures.list(temperatures))).append("</td></tr>");
        }
        return out.append("</tbody></table>").toString();
    }
}
