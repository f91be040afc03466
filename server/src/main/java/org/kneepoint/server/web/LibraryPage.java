package org.kneepoint.server.web;

import java.util.Comparator;
import java.util.List;
import java.util.Map;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.library.GradeSummary;
import org.kneepoint.server.text.Temperatures;

/**
 * The Library page ({@code /}): every grade with its family, supplier, price, number of curves and the
 * temperatures they were taken at; a family filter and columns sorted on the server by
 * {@code ?sort=name|family|supplier|price|curves|temperature&order=asc|desc}.
 */
final class LibraryPage {

    private static final Map<String, Comparator<GradeSummary>> SORTS = Map.of(
            "name", Comparator.comparing(GradeSummary::name, String.CASE_INSENSITIVE_ORDER),
            "family", Comparator.comparing(GradeSummary::family, String.CASE_INSENSITIVE_ORDER),
            "supplier", Comparator.comparing(grade -> grade.supplier() == null ? "" : grade.supplier(), String.CASE_INSENSITIVE_ORDER),
            "price", Comparator.comparing(GradeSummary::price, Comparator.nullsLast(Comparator.<Double>naturalOrder())),
            "curves", Comparator.comparingInt(GradeSummary::curves),
            "temperature", Comparator.comparingDouble(grade -> grade.temperaturesK().stream().mapToDouble(Double::doubleValue).max().orElse(0)));

    private static final String[][] COLUMNS = {
        {"name", "Grade"}, {"family", "Family"}, {"supplier", "Supplier"}, {"price", "Price /kg"}, {"curves", "Curves"}, {"temperature", "Temperatures"},
    };

    private LibraryPage() {
    }

    static String render(LibraryReader library, String family, String sort, String order) {
        String sortKey = sort != null && SORTS.containsKey(sort) ? sort : "name";
        boolean descending = "desc".equals(order);
        Comparator<GradeSummary> comparator = SORTS.get(sortKey).thenComparing(GradeSummary::name);
        List<GradeSummary> grades = library.grades(family).stream().sorted(descending ? comparator.reversed() : comparator).toList();
        boolean demo = library.grades(null).stream().anyMatch(grade -> Layout.isDemo(grade.name()));
        StringBuilder out = new StringBuilder("<h1>Library</h1>");
        out.append(filter(library.families(), family));
        if (grades.isEmpty()) {
            out.append("<p class=\"empty\">").append(family == null
                    ? "The library has no grades yet. Import curve files, or start with <code>kneepoint serve --demo</code>."
                    : "No grades of family " + Html.text(family) + ".").append("</p>");
            return Layout.page("Library", "Library", out.toString(), demo);
        }
        out.append("<table class=\"grades\"><thead><tr>");
        for (String[] column : COLUMNS) {
            out.append(header(column[0], column[1], family, sortKey, descending));
        }
        out.append("</tr></thead><tbody>");
        for (GradeSummary grade : grades) {
            out.append("<tr><td>").append(Html.link("/grades/" + Html.pathSegment(grade.name()), grade.name()))
                    .append(Layout.isDemo(grade.name()) ? " <span class=\"tag\">invented</span>" : "")
                    .append("</td><td>").append(Html.text(grade.family()))
                    .append("</td><td>").append(Html.text(grade.supplier()))
                    .append("</td><td class=\"number\">").append(grade.price() == null ? "—" : String.format(java.util.Locale.ROOT, "%.2f", grade.price()))
                    .append("</td><td class=\"number\">").append(grade.curves())
                    .append("</td><td>").append(Html.text(Temperatures.list(grade.temperaturesK()))).append("</td></tr>");
        }
        out.append("</tbody></table><p class=\"count\">").append(grades.size()).append(grades.size() == 1 ? " grade" : " grades").append("</p>");
        return Layout.page("Library", "Library", out.toString(), demo);
    }

    private static String filter(List<String> families, String selected) {
        StringBuilder out = new StringBuilder("<form class=\"filter\" method=\"get\" action=\"/\"><label>Family "
                + "<select name=\"family\"><option value=\"\">all families</option>");
        for (String family : families) {
            out.append("<option value=\"").append(Html.text(family)).append('"').append(family.equals(selected) ? " selected" : "")
                    .append('>').append(Html.text(family)).append("</option>");
        }
        return out.append("</select></label> <button type=\"submit\">Show</button></form>").toString();
    }

    private static String header(String key, String label, String family, String sortKey, boolean descending) {
        boolean current = key.equals(sortKey);
        String nextOrder = current && !descending ? "desc" : "asc";
        String href = "/?sort=" + key + "&amp;order=" + nextOrder + (family == null ? "" : "&amp;family=" + Html.pathSegment(family));
        String arrow = current ? (descending ? " ▼" : " ▲") : "";
        return "<th" + (current ? " aria-sort=\"" + (descending ? "descending" : "ascending") + "\"" : "") + "><a href=\"" + href + "\">"
                + label + arrow + "</a></th>";
    }
}
