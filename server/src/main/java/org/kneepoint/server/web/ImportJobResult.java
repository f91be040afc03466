package org.kneepoint.server.web;

import java.util.List;
import java.util.Map;

/**
 * The result of a finished import job (the document of {@code kneepoint import --json}): each file
 * with what it added, and a link to every grade it imported.
 */
final class ImportJobResult {

    private ImportJobResult() {
    }

    static String render(Map<String, Object> result) {
        StringBuilder out = new StringBuilder("<p>The files below are stored in the library.</p><table class=\"plans\"><thead><tr>"
                + "<th>File</th><th>Status</th><th>Grades</th><th>Curves</th><th>Points</th></tr></thead><tbody>");
        for (Object item : (List<?>) result.get("files")) {
            Map<?, ?> file = (Map<?, ?>) item;
            out.append("<tr><td>").append(Html.text(String.valueOf(file.get("file")))).append("</td>");
            if ("already-imported".equals(file.get("status"))) {
                out.append("<td>already imported as ").append(Html.text(String.valueOf(file.get("importedAs"))))
                        .append("; skipped</td><td></td><td></td><td></td></tr>");
                continue;
            }
            out.append("<td>imported</td><td>").append(gradeLinks((List<?>) file.get("grades"))).append("</td><td class=\"number\">")
                    .append(file.get("curves")).append("</td><td class=\"number\">")
                    .append(((Number) file.get("points")).intValue() + ((Number) file.get("susceptibilityPoints")).intValue())
                    .append("</td></tr>");
        }
        return out.append("</tbody></table><p><a href=\"/\">Back to the library</a> · <a href=\"/import\">Import more</a></p>").toString();
    }

    private static String gradeLinks(List<?> grades) {
        StringBuilder out = new StringBuilder();
        for (Object grade : grades) {
            String name = String.valueOf(grade);
            out.append(out.isEmpty() ? "" : ", ").append(Html.link("/grades/" + Html.pathSegment(name), name));
        }
        return out.toString();
    }
}
