package org.kneepoint.server.web;

import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.StoredGrade;
import org.kneepoint.server.library.GradeCurves;
import org.kneepoint.server.text.Temperatures;

/**
 * The Grade page ({@code /grades/{name}}): what is known of the grade, its B and J curves at every
 * stored temperature on one chart with the knees marked, the characterization of each curve,
 * links to export each curve, and a form to edit the grade's supplier, density, notes and price.
 */
final class GradePage {

    private GradePage() {
    }

    static String render(LibraryReader library, String name, boolean tokenRequired, boolean demoPresent) {
        List<LibraryCurve> curves = GradeCurves.stored(library, name).stream()
                .sorted(Comparator.comparing((LibraryCurve curve) -> curve.curve().temperatureK())).toList();
        StoredGrade stored = library.storedGrade(name).orElseThrow();
        GradeInfo info = stored.grade();
        String segment = Html.pathSegment(name);
        StringBuilder out = new StringBuilder("<p class=\"crumbs\"><a href=\"/\">Library</a> ›</p><h1>").append(Html.text(name));
        out.append(Layout.isDemo(name) ? " <span class=\"tag\">invented demo data</span>" : "").append("</h1>");
        out.append("<dl class=\"facts\">").append(fact("Family", info.family())).append(fact("Supplier", info.supplier()))
                .append(fact("Density", info.density() == null ? null : String.format(Locale.ROOT, "%.0f kg/m³", info.density())))
                .append(fact("Price", info.price() == null ? null : String.format(Locale.ROOT, "%.2f per kg", info.price())))
                .append(fact("Notes", info.notes())).append(fact("Provenance", info.provenance())).append("</dl>")
                .append(editForm(stored, segment, tokenRequired));
        out.append("<figure class=\"chart\"><img src=\"/charts/grades/").append(segment).append(".svg\" width=\"960\" height=\"560\" alt=\"")
                .append("Demagnetization curves of ").append(Html.text(name)).append("\"><figcaption>B (solid) and J (dashed) against H at each ")
                .append("stored temperature; rings mark the knee, where J has fallen to 0.9·Br.</figcaption></figure>");
        out.append("<h2>Characterization</h2>").append(table(curves, segment)).append(fitForms(curves, segment, tokenRequired));
        out.append(GradeModelSection.html(name, curves, library.fits()));
        out.append(Layout.caution());
        return Layout.page(name, "Library", out.toString(), demoPresent);
    }

    private static String table(List<LibraryCurve> curves, String segment) {
        StringBuilder out = new StringBuilder("<table class=\"numbers\"><thead><tr><th>Temperature</th><th>Kind</th><th>Points</th>"
                + "<th>Br (T)</th><th>HcB (kA/m)</th><th>HcJ (kA/m)</th><th>(BH)max (kJ/m³)</th><th>Hk (kA/m)</th>"
                + "<th>Hk/HcJ</th><th>μrec</th><th>Export</th></tr></thead><tbody>");
        for (LibraryCurve stored : curves) {
            Characterization c = CurveCharacterizer.characterize(stored.curve());
            double kelvin = stored.curve().temperatureK();
            String query = "?temperature=" + Html.pathSegment(String.format(Locale.ROOT, "%.2fK", kelvin));
            String base = "/api/grades/" + segment + "/export" + query;
            out.append("<tr><td>").append(Html.text(Temperatures.celsius(kelvin))).append("</td><td>")
                    .append(stored.curve().kind().name().toLowerCase(Locale.ROOT)).append("</td>")
                    .append(cell(stored.curve().size(), "%.0f")).append(cell(c.br(), "%.3f")).append(cell(kilo(c.hcb()), "%.0f"))
                    .append(cell(kilo(c.hcj()), "%.0f")).append(cell(kilo(c.bhMax()), "%.1f")).append(cell(kilo(c.hk()), "%.0f"))
                    .append(cell(c.squareness(), "%.3f")).append(cell(c.muRec(), "%.3f")).append("<td class=\"links\">")
                    .append("<a href=\"").append(base).append("&amp;format=csv\">B–H CSV</a> ")
                    .append("<a href=\"").append(base).append("&amp;format=csv&amp;curve=intrinsic\">J–H CSV</a> ")
                    .append("<a href=\"").append(base).append("&amp;format=json\">JSON</a></td></tr>");
        }
        return out.append("</tbody></table><p class=\"hint\">— means the curve does not reach that point.</p>").toString();
    }

    /**
     * The form that edits the grade's details, folded away until opened. It carries the version
     * shown, so an edit made meanwhile by someone else is refused (409) instead of overwritten.
     */
    private static String editForm(StoredGrade stored, String segment, boolean tokenRequired) {
        GradeInfo info = stored.grade();
        return "<details class=\"edit\"><summary>Edit supplier, density, notes or price (version " + stored.version() + ")</summary>"
                + "<form class=\"design\" method=\"post\" action=\"/grades/" + segment + "/details\">"
                + "<input type=\"hidden\" name=\"version\" value=\"" + stored.version() + "\"><div class=\"fields\">"
                + field("Supplier", "supplier", info.supplier(), 28)
                + field("Density", "density", info.density() == null ? null : String.format(Locale.ROOT, "%.0f kg/m3", info.density()), 12)
                + field("Price per kg", "price", info.price() == null ? null : String.format(Locale.ROOT, "%.2f", info.price()), 8)
                + field("Notes", "notes", info.notes(), 40)
                + (tokenRequired ? "<label>Access token <input type=\"password\" name=\"token\" autocomplete=\"off\" required></label>" : "")
                + "</div><button type=\"submit\" class=\"primary\">Save</button> <span class=\"hint\">An empty field clears the value.</span>"
                + "</form></details>";
    }

    private static String field(String label, String name, String value, int size) {
        return "<label>" + label + " <input name=\"" + name + "\" size=\"" + size + "\" value=\"" + Html.text(value) + "\"></label>";
    }

    /** One form per stored loop curve that starts a Jiles–Atherton fit and leads to its job page. */
    private static String fitForms(List<LibraryCurve> curves, String segment, boolean tokenRequired) {
        StringBuilder out = new StringBuilder();
        for (LibraryCurve stored : curves) {
            if (stored.curve().kind() != CurveKind.LOOP) {
                continue;
            }
            double kelvin = stored.curve().temperatureK();
            out.append("<form class=\"fit\" method=\"post\" action=\"/jobs/ja-fit?grade=").append(segment).append("&amp;temperature=")
                    .append(Html.pathSegment(String.format(Locale.ROOT, "%.2fK", kelvin))).append("\">")
                    .append(tokenRequired ? "<label>Access token <input type=\"password\" name=\"token\" autocomplete=\"off\" required></label> " : "")
                    .append("<button type=\"submit\">Fit Jiles–Atherton to the loop at ").append(Html.text(Temperatures.celsius(kelvin)))
                    .append("</button></form>");
        }
        return out.isEmpty() ? "" : "<h2>Jiles–Atherton model</h2>" + out;
    }

    private static String fact(String label, String value) {
        return value == null || value.isBlank() ? "" : "<dt>" + label + "</dt><dd>" + Html.text(value) + "</dd>";
    }

    private static Double kilo(Double value) {
        return value == null ? null : value / 1000.0;
    }

    private static String cell(Number value, String pattern) {
        String text = value == null ? "—" : String.format(Locale.ROOT, pattern, value.doubleValue());
        return "<td class=\"number\">" + text + "</td>";
    }
}
