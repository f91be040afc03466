package org.kneepoint.server.web;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.kneepoint.server.http.JobStatus;

/**
 * The page of one background job ({@code /jobs/{id}}): while the job waits or runs it shows the
 * fraction done and the stage and reloads itself every second; when done it shows the fitted
 * Jiles–Atherton parameters with their standard errors, or the error. The page can be bookmarked:
 * the job goes on while nobody watches.
 */
final class JobPage {

    private static final List<Row> ROWS = List.of(new Row("ms", "Ms", "kA/m", 1000), new Row("a", "a", "A/m", 1),
            new Row("k", "k", "A/m", 1), new Row("c", "c", "", 1), new Row("alpha", "α", "", 1));

    private JobPage() {
    }

    static String render(JobStatus status, boolean demoPresent) {
        StringBuilder out = new StringBuilder("<h1>Jiles–Atherton fit</h1>");
        switch (status.state()) {
            case QUEUED -> out.append("<p class=\"status\">Waiting for the jobs before it to finish.</p>");
            case RUNNING -> out.append("<p class=\"status\">Running: ")
                    .append(String.format(Locale.ROOT, "%.0f %%", 100 * status.fraction()))
                    .append(status.stage() == null ? "" : ", " + Html.text(status.stage().replace('_', ' '))).append("</p>")
                    .append("<progress max=\"1\" value=\"").append(String.format(Locale.ROOT, "%.3f", status.fraction())).append("\"></progress>");
            case DONE -> out.append(result(status.result())).append(Layout.caution());
            case FAILED -> out.append("<div class=\"problem\" role=\"alert\">").append(Html.text(status.error())).append("</div>");
        }
        if (status.pending()) {
            out.append("<p class=\"hint\">This page reloads itself every second; it can be left and bookmarked, the fit goes on.</p>");
        }
        return Layout.page("Jiles–Atherton fit", "Library", out.toString(), demoPresent, status.pending());
    }

    private static String result(Map<String, Object> result) {
        Map<?, ?> errors = (Map<?, ?>) result.get("standardErrors");
        String grade = String.valueOf(result.get("grade"));
        StringBuilder out = new StringBuilder("<p>").append(Html.link("/grades/" + Html.pathSegment(grade), grade))
                .append(": fit to the ").append(Html.text(String.valueOf(result.get("curveKind")))).append(" curve</p>")
                .append("<table class=\"numbers\"><thead><tr><th>Parameter</th><th>Value</th><th>Standard error</th><th>Unit</th></tr></thead><tbody>");
        for (Row row : ROWS) {
            out.append("<tr><th scope=\"row\">").append(row.label()).append("</th>").append(cell(result.get(row.key()), row.scale()))
                    .append(cell(errors.get(row.key()), row.scale())).append("<td>").append(row.unit()).append("</td></tr>");
        }
        out.append("<tr><th scope=\"row\">rms error in B</th>").append(cell(result.get("rmsB"), 1)).append("<td></td><td>T</td></tr>");
        return out.append("</tbody></table>").toString();
    }

    /** One parameter's row: its key in the result, its label, the unit it is shown in and that unit's size in SI. */
    private record Row(String key, String label, String unit, double scale) {
    }

    private static String cell(Object value, double scale) {
        String text = value instanceof Number number ? String.format(Locale.ROOT, "%.4g", number.doubleValue() / scale) : "—";
        return "<td class=\"number\">" + text + "</td>";
    }
}
