package org.kneepoint.server.web;

import java.util.List;
import java.util.function.UnaryOperator;
import org.kneepoint.server.http.FieldRequest;

/**
 * The Field page ({@code /field}, template {@code field.jte}): a form — a cylinder, ring or block, its sizes and
 * Br — and, once sent, the map of |B| with field lines over the plane through the magnet's axis. The form sends the
 * parameters of {@code GET /api/field/{shape}} (without the point) and {@code shape}.
 */
final class FieldPage {

    /** The width of the field chart, pixels. */
    static final int CHART_WIDTH = 960;
    /** The height of the field chart, pixels. */
    static final int CHART_HEIGHT = 680;

    private FieldPage() {
    }

    /** What the page shows: the problem of the request (or null), the form's fields, and the magnet drawn once sent (or null). */
    record View(Layout.Frame frame, String problem, FormFields.Choice shape, FormFields.TextField br, List<FormFields.TextField> cylinder,
            List<FormFields.TextField> block, Result result) {
    }

    /** The magnet in words and the link of its chart, with the chart's size in pixels. */
    record Result(String magnet, String chart, int width, int height) {
    }

    static String render(UnaryOperator<String> values, String query, FieldRequest request, String problem, boolean demoPresent) {
        FormFields.Choice shape = FormFields.choice(values, "shape", "shape", List.of(new String[] {"cylinder", "cylinder"},
                new String[] {"ring", "ring"}, new String[] {"block", "block"}));
        List<FormFields.TextField> cylinder = List.of(FormFields.text(values, "diameter", "diameter", "10mm"),
                FormFields.text(values, "length", "length", "5mm"), FormFields.text(values, "innerDiameter", "bore (ring)", "4mm"));
        List<FormFields.TextField> block = List.of(FormFields.text(values, "width", "width (along x)", "20mm"),
                FormFields.text(values, "depth", "depth", "10mm"), FormFields.text(values, "thickness", "thickness (along M)", "5mm"));
        Result result = request == null ? null : new Result(request.describe(), "/charts/field.svg?" + query, CHART_WIDTH, CHART_HEIGHT);
        View view = new View(new Layout.Frame("Field", "Field", demoPresent), problem, shape, FormFields.text(values, "br", "Br", "1.3T"),
                cylinder, block, result);
        return Templates.render("field.jte", view);
    }
}
