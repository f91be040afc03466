package org.kneepoint.server.web;

import java.util.List;
import java.util.function.UnaryOperator;
import org.kneepoint.server.http.FieldRequest;

/**
 * The Field page ({@code /field}): a form — a cylinder, ring or block, its sizes and Br — and, once sent, the map of
 * |B| with field lines over the plane through the magnet's axis. The form sends the parameters of
 * {@code GET /api/field/{shape}} (without the point) and {@code shape}.
 */
final class FieldPage {

    /** The width of the field chart, pixels. */
    static final int CHART_WIDTH = 960;
    /** The height of the field chart, pixels. */
    static final int CHART_HEIGHT = 680;

    private FieldPage() {
    }

    static String render(UnaryOperator<String> values, String query, FieldRequest request, String problem, boolean demoPresent) {
        StringBuilder out = new StringBuilder("<h1>Field of a magnet</h1>").append(FormFields.problem(problem))
                .append("<form class=\"design\" method=\"get\" action=\"/field\">")
                .append("<fieldset><legend>Magnet, magnetized along its length or thickness</legend><div class=\"fields\">")
                .append(FormFields.choice(values, "shape", "shape", List.of(new String[] {"cylinder", "cylinder"},
                        new String[] {"ring", "ring"}, new String[] {"block", "block"})))
                .append(FormFields.text(values, "br", "Br", "1.3T")).append("</div>")
                .append("<div class=\"fields\"><span class=\"group\">Cylinder or ring</span>")
                .append(FormFields.text(values, "diameter", "diameter", "10mm")).append(FormFields.text(values, "length", "length", "5mm"))
                .append(FormFields.text(values, "innerDiameter", "bore (ring)", "4mm")).append("</div>")
                .append("<div class=\"fields\"><span class=\"group\">Block</span>")
                .append(FormFields.text(values, "width", "width (along x)", "20mm")).append(FormFields.text(values, "depth", "depth", "10mm"))
                .append(FormFields.text(values, "thickness", "thickness (along M)", "5mm"))
                .append("</div></fieldset><button type=\"submit\" class=\"primary\">Draw the field</button></form>");
        if (request != null) {
            out.append(result(request, query));
        }
        return Layout.page("Field", "Field", out.toString(), demoPresent);
    }

    private static String result(FieldRequest request, String query) {
        return "<h2>Field of a " + Html.text(request.describe()) + "</h2>"
                + "<figure class=\"chart\"><img src=\"/charts/field.svg?" + Html.text(query) + "\" width=\"" + CHART_WIDTH
                + "\" height=\"" + CHART_HEIGHT + "\" alt=\"Map of the flux density with field lines\"><figcaption>"
                + "|B| in tesla over the plane through the magnet's axis (x across, z along the magnetization), field lines "
                + "from the north face and into the south face, and the magnet's section. Uniform magnetization, no "
                + "steel nearby.</figcaption></figure>";
    }
}
