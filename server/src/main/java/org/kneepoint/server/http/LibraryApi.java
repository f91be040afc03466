package org.kneepoint.server.http;

import io.javalin.http.Context;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.CurveTables;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.library.GradeSummary;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.StoredGrade;
import org.kneepoint.importer.export.ExportUnits;
import org.kneepoint.server.cli.VersionInfo;
import org.kneepoint.server.library.CurveExport;
import org.kneepoint.server.library.GradeCurve;
import org.kneepoint.server.library.GradeCurves;
import org.kneepoint.server.text.CharacterizationView;
import org.kneepoint.server.text.GradeJson;
import org.kneepoint.server.text.Json;

/** The library routes: grades, one grade, an edit of its details, its characterization at a temperature, its export. */
final class LibraryApi {

    private final Library library;

    LibraryApi(Library library) {
        this.library = library;
    }

    void grades(Context context) {
        List<Map<String, Object>> rows = new ArrayList<>();
        for (GradeSummary grade : library.reader().grades(new Query(context).text("family"))) {
            rows.add(GradeJson.summary(grade));
        }
        json(context, rows);
    }

    void grade(Context context) {
        String name = context.pathParam("name");
        List<LibraryCurve> curves = GradeCurves.stored(library.reader(), name);
        json(context, gradeJson(library.reader().storedGrade(name).orElseThrow(), curves));
    }

    /** Edits the grade's details from the version the client read; answers the grade as it is now. */
    void editDetails(Context context) {
        StoredGrade edited = GradeEditRequests.fromQuery(context, library);
        json(context, gradeJson(edited, library.reader().curves(edited.grade().name())));
    }

    private static Map<String, Object> gradeJson(StoredGrade stored, List<LibraryCurve> curves) {
        Map<String, Object> grade = GradeJson.details(stored);
        List<Map<String, Object>> rows = new ArrayList<>();
        for (LibraryCurve curve : curves) {
            Map<String, Object> row = new LinkedHashMap<>();
            row.put("temperatureK", curve.curve().temperatureK());
            row.put("kind", curve.curve().kind().name().toLowerCase(java.util.Locale.ROOT));
            row.put("points", curve.curve().size());
            row.put("source", curve.source());
            rows.add(row);
        }
        grade.put("curves", rows);
        return grade;
    }

    void curve(Context context) {
        double temperatureK = new Query(context).temperatureK("temperature");
        List<Map<String, Object>> documents = new ArrayList<>();
        for (GradeCurve curve : GradeCurves.at(library.reader(), context.pathParam("name"), temperatureK)) {
            documents.add(CharacterizationView.json(curve, CurveCharacterizer.characterize(curve.curve())));
        }
        json(context, documents.size() == 1 ? documents.get(0) : documents);
    }

    void export(Context context) {
        Query query = new Query(context);
        String name = context.pathParam("name");
        double temperatureK = query.temperatureK("temperature");
        String format = query.choice("format", "csv", "csv", "json");
        CurveExport export = new CurveExport(name, temperatureK, format.equals("json") ? CurveExport.Format.JSON : CurveExport.Format.CSV,
                query.choice("curve", "normal", "normal", "intrinsic").equals("normal") ? Quantity.B : Quantity.J,
                query.optionalInteger("points", 2, CurveTables.MAX_POINTS),
                query.choice("units", "si", "si", "cgs").equals("si") ? ExportUnits.SI : ExportUnits.CGS,
                query.flag("shifted"), query.flag("bare"));
        GradeCurves.stored(library.reader(), name);
        String text = export.write(library.reader(), VersionInfo.version());
        context.contentType(format.equals("json") ? "application/json" : "text/csv; charset=utf-8").result(text);
    }

    static void json(Context context, Object value) {
        context.contentType("application/json").result(Json.write(value));
    }
}
