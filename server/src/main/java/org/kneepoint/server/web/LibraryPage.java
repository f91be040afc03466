package org.kneepoint.server.web;

import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.library.GradeSummary;
import org.kneepoint.server.app.wording.Temperatures;

/**
 * The Library page ({@code /}, template {@code library.jte}): every grade with its family, supplier, price, number
 * of curves and the temperatures they were taken at; a family filter and columns sorted on the server by
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

    /** What the page shows: the family filter, the family asked for (or null), the column headers and the grades. */
    record View(Layout.Frame frame, List<FormFields.Option> families, String family, List<Header> headers, List<Row> rows) {
    }

    /** A column header: its label (with the arrow of the current order), the link that sorts by it, and its aria-sort or null. */
    record Header(String label, String href, String ariaSort) {
    }

    /** One grade's row. */
    record Row(Links.Link grade, boolean demo, String family, String supplier, String price, int curves, String temperatures) {
    }

    static String render(LibraryReader library, String family, String sort, String order) {
        String sortKey = sort != null && SORTS.containsKey(sort) ? sort : "name";
        boolean descending = "desc".equals(order);
        Comparator<GradeSummary> comparator = SORTS.get(sortKey).thenComparing(GradeSummary::name);
        List<GradeSummary> grades = library.grades(family).stream().sorted(descending ? comparator.reversed() : comparator).toList();
        boolean demo = library.grades(null).stream().anyMatch(grade -> Layout.isDemo(grade.name()));
        List<FormFields.Option> families = library.families().stream()
                .map(name -> new FormFields.Option(name, name, name.equals(family))).toList();
        List<Header> headers = Arrays.stream(COLUMNS).map(column -> header(column[0], column[1], family, sortKey, descending)).toList();
        List<Row> rows = grades.stream().map(grade -> new Row(Links.Link.toGrade(grade.name()), Layout.isDemo(grade.name()), grade.family(),
                grade.supplier(), grade.price() == null ? "—" : String.format(Locale.ROOT, "%.2f", grade.price()), grade.curves(),
                Temperatures.list(grade.temperaturesK()))).toList();
        return Templates.render("library.jte", new View(new Layout.Frame("Library", "Library", demo), families, family, headers, rows));
    }

    private static Header header(String key, String label, String family, String sortKey, boolean descending) {
        boolean current = key.equals(sortKey);
        String nextOrder = current && !descending ? "desc" : "asc";
        String href = "/?sort=" + key + "&order=" + nextOrder + (family == null ? "" : "&family=" + Links.segment(family));
        String arrow = current ? (descending ? " ▼" : " ▲") : "";
        return new Header(label + arrow, href, current ? (descending ? "descending" : "ascending") : null);
    }
}
