package org.kneepoint.server.http;

import io.javalin.http.Context;
import java.util.List;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.curve.CurveTables;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.DutyStep;
import org.kneepoint.fitter.library.StoredGrade;
import org.kneepoint.importer.export.ExportUnits;
import org.kneepoint.server.app.version.VersionInfo;
import org.kneepoint.server.app.design.DutySteps;
import org.kneepoint.server.app.grades.CurveDamage;
import org.kneepoint.server.app.grades.CurveExport;
import org.kneepoint.server.app.grades.GradeCurves;
import org.kneepoint.server.app.grades.GradeDocument;
import org.kneepoint.server.app.grades.Grades;
import org.kneepoint.server.app.OneOrMany;
import org.kneepoint.server.app.Json;

/** The library routes: grades, one grade, an edit of its details, its characterization at a temperature, its export. */
final class LibraryApi {

    private final Library library;

    LibraryApi(Library library) {
        this.library = library;
    }

    void grades(Context context) {
        json(context, Grades.list(library.reader(), new Query(context).text("family")));
    }

    void grade(Context context) {
        json(context, Grades.detail(library.reader(), context.pathParam("name")));
    }

    /** Edits the grade's details from the version the client read; answers the grade as it is now. */
    void editDetails(Context context) {
        StoredGrade edited = GradeEditRequests.fromQuery(context, library);
        json(context, GradeDocument.withCurves(edited, library.reader().curves(edited.grade().name())));
    }

    void curve(Context context) {
        double temperatureK = new Query(context).temperatureK("temperature");
        json(context, OneOrMany.of(Grades.curvesAt(library.reader(), context.pathParam("name"), temperatureK)));
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
                query.flag("shifted"), query.flag("bare"), damage(query));
        GradeCurves.stored(library.reader(), name);
        String text = export.write(library.reader(), VersionInfo.version());
        context.contentType(format.equals("json") ? "application/json" : "text/csv; charset=utf-8").result(text);
    }

    /** The damage of {@code after=STEPS&pc=P}, as {@code export --after STEPS --pc P} takes it, or null. */
    private static CurveDamage damage(Query query) {
        String after = query.text("after");
        List<DutyStep> steps;
        try {
            steps = after == null ? null : DutySteps.parse(after);
        } catch (BadInputException e) {
            throw new BadInputException(query.location("after"), e.getMessage());
        }
        return CurveDamage.of(query.optionalNumber("pc", "", "2.5"), steps, query.location("pc"), query.location("after"));
    }

    static void json(Context context, Object value) {
        context.contentType("application/json").result(Json.write(value));
    }
}
