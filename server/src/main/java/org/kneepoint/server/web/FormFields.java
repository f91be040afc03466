package org.kneepoint.server.web;

import java.util.List;
import java.util.function.UnaryOperator;

/**
 * The input fields the design pages share, as values for the templates {@code textField.jte},
 * {@code choice.jte} and {@code loadLine.jte}: a labelled text field, a choice, and the load line (a
 * permeance coefficient or a cylinder, ring or block). Field names are the query parameters of the
 * JSON routes, and a field shows the value the request gave it.
 */
final class FormFields {

    private FormFields() {
    }

    /** A labelled text field: its name, label, the request's value (or null) and the example shown as a placeholder. */
    record TextField(String name, String label, String value, String example) {
    }

    /** One option of a choice. */
    record Option(String value, String label, boolean selected) {
    }

    /** A labelled choice. */
    record Choice(String name, String label, List<Option> options) {
    }

    /** The load line: Pc, or a cylinder or ring, or a block; on a steel plate; the kind of demagnetizing factor. */
    record LoadLine(TextField pc, List<TextField> cylinder, List<TextField> block, boolean onSteel, Choice factor) {
    }

    /** A text field named {@code name}, showing the request's value or the example as a placeholder. */
    static TextField text(UnaryOperator<String> values, String name, String label, String example) {
        return new TextField(name, label, values.apply(name), example);
    }

    /** A choice; each option is {value, label}, the request's value selected. */
    static Choice choice(UnaryOperator<String> values, String name, String label, List<String[]> options) {
        String chosen = values.apply(name);
        return new Choice(name, label, options.stream().map(option -> new Option(option[0], option[1], option[0].equals(chosen))).toList());
    }

    /** The load line's fields with the request's values. */
    static LoadLine loadLine(UnaryOperator<String> values) {
        return new LoadLine(text(values, "pc", "Pc", "2.5"),
                List.of(text(values, "diameter", "diameter", "10mm"), text(values, "length", "length", "5mm"),
                        text(values, "innerDiameter", "bore (ring)", "4mm")),
                List.of(text(values, "width", "width", "20mm"), text(values, "depth", "depth", "10mm"),
                        text(values, "thickness", "thickness (along M)", "5mm")),
                "true".equals(values.apply("onSteel")),
                choice(values, "factor", "factor", List.of(new String[] {"magnetometric", "magnetometric Nm"},
                        new String[] {"fluxmetric", "fluxmetric Nf"}, new String[] {"center", "centre point N0"})));
    }
}
