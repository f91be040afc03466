package org.kneepoint.server.web;

import java.util.List;
import java.util.function.UnaryOperator;

/**
 * The input fields the design pages share: a labelled text field, a choice, and the load line (a permeance
 * coefficient or a cylinder, ring or block). Field names are the query parameters of the JSON routes, and a
 * field shows the value the request gave it, escaped.
 */
final class FormFields {

    private FormFields() {
    }

    /** A labelled text field named {@code name}, showing the request's value or the example as a placeholder. */
    static String text(UnaryOperator<String> values, String name, String label, String example) {
        return "<label>" + label + " <input name=\"" + name + "\" value=\"" + Html.text(values.apply(name)) + "\" placeholder=\""
                + Html.text(example) + "\" size=\"12\"></label>";
    }

    /** A labelled choice; each option is {value, label}, the request's value selected. */
    static String choice(UnaryOperator<String> values, String name, String label, List<String[]> options) {
        StringBuilder out = new StringBuilder("<label>").append(label).append(" <select name=\"").append(name).append("\">");
        String chosen = values.apply(name);
        for (String[] option : options) {
            out.append("<option value=\"").append(Html.text(option[0])).append('"').append(option[0].equals(chosen) ? " selected" : "")
                    .append('>').append(Html.text(option[1])).append("</option>");
        }
        return out.append("</select></label>").toString();
    }

    /** The load line: Pc, or a cylinder or ring, or a block; on a steel plate; the kind of demagnetizing factor. */
    static String loadLine(UnaryOperator<String> values) {
        String steel = "true".equals(values.apply("onSteel")) ? " checked" : "";
        return "<fieldset><legend>Load line: a permeance coefficient, or one shape</legend>"
                + "<div class=\"fields\">" + text(values, "pc", "Pc", "2.5") + "</div>"
                + "<div class=\"fields\"><span class=\"group\">Cylinder or ring</span>" + text(values, "diameter", "diameter", "10mm")
                + text(values, "length", "length", "5mm") + text(values, "innerDiameter", "bore (ring)", "4mm") + "</div>"
                + "<div class=\"fields\"><span class=\"group\">Block</span>" + text(values, "width", "width", "20mm")
                + text(values, "depth", "depth", "10mm") + text(values, "thickness", "thickness (along M)", "5mm") + "</div>"
                + "<div class=\"fields\"><label><input type=\"checkbox\" name=\"onSteel\" value=\"true\"" + steel
                + "> on a steel plate</label>" + choice(values, "factor", "factor", List.of(
                        new String[] {"magnetometric", "magnetometric Nm"}, new String[] {"fluxmetric", "fluxmetric Nf"},
                        new String[] {"center", "centre point N0"})) + "</div></fieldset>";
    }

    /** The problem a request had, as an alert. */
    static String problem(String message) {
        return message == null ? "" : "<div class=\"problem\" role=\"alert\"><strong>No result.</strong> " + Html.text(message) + "</div>";
    }
}
