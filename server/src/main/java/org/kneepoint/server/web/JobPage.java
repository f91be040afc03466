package org.kneepoint.server.web;

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

    private static final String[][] ROWS = {
        {"ms", "Ms", "kA/m", "1000"}, {"a", "a", "A/m", "1"}, {"k", "k", "A/m", "1"}, {"c", "c", "", "1"}, {"alpha", "α", "", "1"}};

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
        String page = Layout.page("Jiles–Atherton fit", "Library", out.toString(), demoPresent);
        return status.pending() ? page.replace("<head>", "<head><meta http-equiv=\"refresh\" content=\"1\">") : page;
    }

    private static String result(Map<String, Object> result) {
        Map<?, ?> errors = (Map<?, ?>) result.get("standardErrors");
        StringBuilder out = new StringBuilder("<p>").append(Html.text(String.valueOf(result.get("source"))))
                .append(": fit to the ").append(Html.text(String.valueOf(result.get("curveKind")))).append(" curve</p>")
                .append("<table class=\"numbers\"><thead><tr><th>Parameter</th><th>Value</th><th>Standard error</th><th>Unit</th></tr></thead><tbody>");
        for (String[] row : ROWS) {
            double scale = Double.parseDouble(row[3]);
            out.append("<tr><th scope=\"row\">").append(row[1]).append("</th>").append(cell(result.get(row[0]), scale))
                    .append(cell(errors.get(row[0]), scale)).append("<td>").append(row[2]).append("</td></tr>");
        }
        out.append("<tr><th scope=\"row\">rms error in B</th>").append(cell(result.get("rmsB"), 1)).append("<td></td><td>T</td></tr>");
        return out.append("</tbody></table>").toString();
    }

    private static String cell(Object value, double scale) {
        String text = value instanceof Number number ? String.format(Locale.ROOT, "%.4g", number.doubleValue() / scale) : "—";
        return "<td class=\"number\">" + text + "</td>";
    }
}
