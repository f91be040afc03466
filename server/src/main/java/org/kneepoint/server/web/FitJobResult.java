package org.kneepoint.server.web;

import java.util.List;
import java.util.Locale;
import java.util.Map;

/** The result of a finished Jiles–Atherton fit job: Ms, a, k, c, α with their standard errors and the rms error in B. */
final class FitJobResult {

    private static final List<Row> ROWS = List.of(new Row("ms", "Ms", "kA/m", 1000), new Row("a", "a", "A/m", 1),
            new Row("k", "k", "A/m", 1), new Row("c", "c", "", 1), new Row("alpha", "α", "", 1));

    private FitJobResult() {
    }

    static String render(Map<String, Object> result) {
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
        return out.append("</tbody></table>").append(Layout.caution()).toString();
    }

    /** One parameter's row: its key in the result, its label, the unit it is shown in and that unit's size in SI. */
    private record Row(String key, String label, String unit, double scale) {
    }

    private static String cell(Object value, double scale) {
        String text = value instanceof Number number ? String.format(Locale.ROOT, "%.4g", number.doubleValue() / scale) : "—";
        return "<td class=\"number\">" + text + "</td>";
    }
}
