package org.kneepoint.server.web;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.UnaryOperator;
import org.kneepoint.fitter.library.GradeSummary;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.server.app.elements.ElementCheckDocument;
import org.kneepoint.server.app.elements.ElementMap;
import org.kneepoint.server.app.elements.MapPlane;
import org.kneepoint.server.app.wording.EngineeringUnits;

/**
 * The element check on the Check page (template {@code elementCheck.jte}): a form that uploads a field solver's
 * element-field files (one per load case, in order) with the grade, temperature, direction, loss limit, transverse
 * rule and the plane of the map — the form fields are the parameters of {@code POST /api/check/elements} — and, once
 * sent, the summary, the worst elements, the load cases and the map of the elements by knee margin.
 */
final class ElementSection {

    private ElementSection() {
    }

    /** The section: its form, the problem of the last upload (or null) and the results (or null). */
    record View(Form form, String problem, Results results) {
    }

    /** The upload form's fields and the session's form token. */
    record Form(FormFields.Choice grade, List<FormFields.TextField> fields, FormFields.Choice transverse, FormFields.Choice plane,
            FormAccess access) {
    }

    /**
     * A check's results: its tables, the map's link, links to the map in the other planes and to the offline report,
     * what the map leaves out, and whether a curve was extrapolated.
     */
    record Results(Tables tables, String chart, String plane, List<PlaneLink> planes, String report, String note,
            boolean extrapolated) {
    }

    /** A check's tables as the page and the report show them: the summary rows, the worst elements, the load cases. */
    record Tables(List<Summary> summary, List<WorstRow> worst, List<CaseRow> cases) {
    }

    /** One summary value: in words with its unit, and its JSON key and exact SI value (as {@code --json} gives it). */
    record Summary(String name, String key, String value, String exact) {
    }

    /** One of the worst elements as the table shows it; rank from 1 as numbered on the map. */
    record WorstRow(int rank, int index, String position, String hParallel, String margin, String loss) {
    }

    /** One load case. */
    record CaseRow(int number, String file, String averageField, String pastKnee) {
    }

    /** A link to the map in a plane. */
    record PlaneLink(String label, String href, boolean current) {
    }

    static Form form(LibraryReader library, UnaryOperator<String> values, FormAccess access) {
        List<String[]> grades = new ArrayList<>();
        for (GradeSummary grade : library.grades(null)) {
            grades.add(new String[] {grade.name(), grade.name()});
        }
        return new Form(FormFields.choice(values, "grade", "grade", grades),
                List.of(FormFields.text(values, "temperature", "temperature (elements without T)", "80C"),
                        FormFields.text(values, "direction", "magnetization (without mx, my, mz)", "0,0,1"),
                        FormFields.text(values, "lossLimit", "loss limit", "1%")),
                FormFields.choice(values, "transverse", "transverse field", List.of(
                        new String[] {"along", "only the component along M acts"}, new String[] {"astroid", "astroid rule"})),
                FormFields.choice(values, "plane", "map plane", List.of(new String[] {"xy", "xy"}, new String[] {"xz", "xz"},
                        new String[] {"yz", "yz"})), access);
    }

    static Results results(String key, KeptElementChecks.Kept kept, MapPlane plane) {
        List<PlaneLink> planes = new ArrayList<>();
        for (MapPlane other : MapPlane.values()) {
            planes.add(new PlaneLink(other.label(), "/check/elements/" + key + "?plane=" + other.label() + "#element-map", other == plane));
        }
        return new Results(tables(kept.document()), "/charts/elements/" + key + ".svg?plane=" + plane.label(), plane.label(), planes,
                "/check/elements/" + key + "/report.html?plane=" + plane.label(), note(kept.map()), kept.document().extrapolated());
    }

    static Tables tables(ElementCheckDocument document) {
        List<Summary> summary = List.of(
                new Summary("elements", "elements", Integer.toString(document.elements()), Integer.toString(document.elements())),
                new Summary("volume", "volume", format("%.6g mm³", document.volume() * 1e9), Double.toString(document.volume())),
                new Summary("share of the volume past the knee", "volumeFractionPastKnee",
                        EngineeringUnits.percent(document.volumeFractionPastKnee()), Double.toString(document.volumeFractionPastKnee())),
                new Summary("irreversible loss of the moment", "irreversibleLossPercent",
                        EngineeringUnits.percent(document.irreversibleLossPercent() / 100.0), Double.toString(document.irreversibleLossPercent())),
                new Summary("verdict", "verdict", document.verdict() + " (loss limit " + EngineeringUnits.percent(document.lossLimitPercent()
                        / 100.0) + ")", document.verdict()),
                new Summary("transverse field", "transverseField", "along".equals(document.transverseField())
                        ? "only the component along the magnetization acts" : "astroid rule", document.transverseField()),
                new Summary("curves used", "provenance", document.provenance().curves() + ", at "
                        + EngineeringUnits.celsius(document.provenance().lowestTemperatureK())
                        + (document.provenance().highestTemperatureK() > document.provenance().lowestTemperatureK()
                        ? " to " + EngineeringUnits.celsius(document.provenance().highestTemperatureK()) : ""),
                        document.provenance().curves()));
        List<WorstRow> worst = new ArrayList<>();
        int rank = 1;
        for (ElementCheckDocument.Worst element : document.worstElements()) {
            worst.add(new WorstRow(rank++, element.index(), format("%.4g, %.4g, %.4g", element.x() * 1e3, element.y() * 1e3,
                    element.z() * 1e3), EngineeringUnits.field(element.hParallel()),
                    element.margin() == null ? "no knee" : EngineeringUnits.field(element.margin()),
                    EngineeringUnits.percent(element.lossPercent() / 100.0)));
        }
        List<CaseRow> cases = new ArrayList<>();
        int number = 1;
        for (ElementCheckDocument.LoadCase loadCase : document.loadCases()) {
            cases.add(new CaseRow(number++, loadCase.file(), EngineeringUnits.field(loadCase.averageFieldParallel()),
                    EngineeringUnits.percent(loadCase.volumeFractionPastKnee())));
        }
        return new Tables(summary, worst, cases);
    }

    /** What the map draws, in words. */
    static String note(ElementMap map) {
        if (!map.thinned()) {
            return "Every one of the " + map.elements() + " elements is drawn.";
        }
        return String.format(Locale.ROOT, "%d of the %d elements are drawn, to keep the map small: the %d worst, %s of the %d"
                + " past the knee, and an even sample of the rest (every k-th in the files' order, the same each time).",
                map.drawn(), map.elements(), map.worst().size(),
                map.drawnPastKnee() == map.pastKnee() ? "all" : map.drawnPastKnee() + " (an even sample)", map.pastKnee());
    }

    private static String format(String pattern, Object... values) {
        return String.format(Locale.ROOT, pattern, values);
    }
}
