package org.kneepoint.server.web;

import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.stream.Stream;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.StoredGrade;
import org.kneepoint.server.app.grades.GradeCurves;
import org.kneepoint.server.app.wording.Temperatures;

/**
 * The Grade page ({@code /grades/{name}}, template {@code grade.jte}): what is known of the grade, its B and J
 * curves at every stored temperature on one chart with the knees marked, the characterization of each curve,
 * links to export each curve, and a form to edit the grade's supplier, density, notes and price.
 */
final class GradePage {

    private GradePage() {
    }

    /** What the page shows. */
    record View(Layout.Frame frame, String name, boolean demo, List<Fact> facts, EditForm edit, String chart, List<CurveRow> curves,
            List<FitForm> fits, FormAccess access, GradeModelSection.View models) {
    }

    /** One known fact of the grade, e.g. its supplier. */
    record Fact(String label, String value) {
    }

    /**
     * The form that edits the grade's details. It carries the version shown, so an edit made meanwhile by someone else is
     * refused (409) instead of overwritten.
     */
    record EditForm(String action, int version, String supplier, String density, String price, String notes) {
    }

    /** One stored curve's characterization and export links; "—" where the curve does not reach a point. */
    record CurveRow(String temperature, String kind, String points, String br, String hcb, String hcj, String bhMax, String hk,
            String squareness, String muRec, String csv, String intrinsicCsv, String json) {
    }

    /** The form that starts a Jiles–Atherton fit to the loop at one temperature. */
    record FitForm(String action, String temperature) {
    }

    static String render(LibraryReader library, String name, FormAccess access, boolean demoPresent) {
        List<LibraryCurve> curves = GradeCurves.stored(library, name).stream()
                .sorted(Comparator.comparing((LibraryCurve curve) -> curve.curve().temperatureK())).toList();
        StoredGrade stored = library.storedGrade(name).orElseThrow();
        GradeInfo info = stored.grade();
        String segment = Links.segment(name);
        List<Fact> facts = Stream.of(fact("Family", info.family()), fact("Supplier", info.supplier()),
                fact("Density", info.density() == null ? null : String.format(Locale.ROOT, "%.0f kg/m³", info.density())),
                fact("Price", info.price() == null ? null : String.format(Locale.ROOT, "%.2f per kg", info.price())),
                fact("Notes", info.notes()), fact("Provenance", info.provenance())).filter(Objects::nonNull).toList();
        EditForm edit = new EditForm("/grades/" + segment + "/details", stored.version(), info.supplier(),
                info.density() == null ? null : String.format(Locale.ROOT, "%.0f kg/m3", info.density()),
                info.price() == null ? null : String.format(Locale.ROOT, "%.2f", info.price()), info.notes());
        List<CurveRow> rows = curves.stream().map(curve -> row(curve, segment)).toList();
        List<FitForm> fits = curves.stream().filter(curve -> curve.curve().kind() == CurveKind.LOOP)
                .map(curve -> new FitForm("/jobs/ja-fit?grade=" + segment + "&temperature=" + kelvin(curve),
                        Temperatures.celsius(curve.curve().temperatureK()))).toList();
        View view = new View(new Layout.Frame(name, "Library", demoPresent), name, Layout.isDemo(name), facts, edit,
                "/charts/grades/" + segment + ".svg", rows, fits, access, GradeModelSection.of(name, curves, library.fits()));
        return Templates.render("grade.jte", view);
    }

    private static CurveRow row(LibraryCurve stored, String segment) {
        Characterization c = CurveCharacterizer.characterize(stored.curve());
        String base = "/api/grades/" + segment + "/export?temperature=" + kelvin(stored);
        return new CurveRow(Temperatures.celsius(stored.curve().temperatureK()), stored.curve().kind().name().toLowerCase(Locale.ROOT),
                number(stored.curve().size(), "%.0f"), number(c.br(), "%.3f"), number(kilo(c.hcb()), "%.0f"), number(kilo(c.hcj()), "%.0f"),
                number(kilo(c.bhMax()), "%.1f"), number(kilo(c.hk()), "%.0f"), number(c.squareness(), "%.3f"), number(c.muRec(), "%.3f"),
                base + "&format=csv", base + "&format=csv&curve=intrinsic", base + "&format=json");
    }

    /** The curve's temperature as a query value, in kelvin. */
    private static String kelvin(LibraryCurve stored) {
        return Links.segment(String.format(Locale.ROOT, "%.2fK", stored.curve().temperatureK()));
    }

    private static Fact fact(String label, String value) {
        return value == null || value.isBlank() ? null : new Fact(label, value);
    }

    private static Double kilo(Double value) {
        return value == null ? null : value / 1000.0;
    }

    private static String number(Number value, String pattern) {
        return value == null ? "—" : String.format(Locale.ROOT, pattern, value.doubleValue());
    }
}
