package org.kneepoint.server.http;

import io.javalin.http.Context;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.server.app.design.CheckRequest;
import org.kneepoint.server.app.design.CheckRun;
import org.kneepoint.server.app.design.DesignChecks;
import org.kneepoint.server.app.design.DutyRequest;
import org.kneepoint.server.app.design.DutyRun;
import org.kneepoint.server.app.design.DutySteps;
import org.kneepoint.server.app.design.FieldChoice;
import org.kneepoint.server.app.design.GradeChoice;
import org.kneepoint.server.app.design.GradeModelCache;
import org.kneepoint.server.app.design.LoadLineSpec;
import org.kneepoint.server.app.design.SelectionRequest;
import org.kneepoint.server.app.design.SelectionRun;
import org.kneepoint.server.app.design.SelectionSort;
import org.kneepoint.server.app.design.SweepRequest;
import org.kneepoint.server.app.design.SweepRun;
import org.kneepoint.server.app.design.ToleranceRequest;
import org.kneepoint.server.app.design.TypedGrade;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.study.StudyOptions;

/**
 * A design check, a duty sequence and a grade selection read from a request's query parameters and run by the
 * application layer ({@link DesignChecks}), the same for the JSON routes and the pages: the parameters are those of
 * {@code kneepoint check}, {@code duty} and {@code select} in camelCase. Stored grades' models come from the server's
 * {@link GradeModelCache}.
 */
public final class DesignRequests {

    /** How the query names a grade's inputs in messages. */
    static final GradeChoice.InputNames NAMES = new GradeChoice.InputNames("grade", " (grade=...)",
            "br, muRec, hcj, knee, alpha, beta, referenceTemperature", "br, muRec and hcj", "alpha and beta");

    /** How the query names the tolerance study's inputs in messages. */
    private static final ToleranceRequest.OptionNames TOLERANCE_NAMES =
            new ToleranceRequest.OptionNames("query parameter tolerance", "distribution", "samples", "seed");

    private DesignRequests() {
    }

    /**
     * The check the query asks for: {@code grade} or the typed-in grade, the load line, temperature, field, loss limit,
     * and a tolerance study when {@code tolerance} is given (repeatable; with {@code distribution}, {@code samples},
     * {@code seed}).
     */
    public static CheckRun check(Context context, LibraryReader reader, GradeModelCache models) {
        Query query = new Query(context);
        LoadLineSpec loadLine = loadLine(query);
        CheckRequest request = new CheckRequest(grade(query), loadLine, query.temperatureK("temperature"), field(query),
                percent(query, "lossLimit", 1.0) / 100.0);
        ToleranceRequest tolerance = ToleranceRequest.of(context.queryParams("tolerance"), query.text("distribution"),
                query.optionalInteger("samples", 2, StudyOptions.MAX_SAMPLES), optionalSeed(query), TOLERANCE_NAMES);
        return models.check(reader, request, tolerance);
    }

    private static Long optionalSeed(Query query) {
        String text = query.text("seed");
        if (text == null) {
            return null;
        }
        try {
            return Long.parseLong(text);
        } catch (NumberFormatException e) {
            throw new BadInputException(InputLocation.of("query parameter 'seed'"), "expected a whole number, got '" + text + "'");
        }
    }

    /**
     * The temperature sweep the query asks for: the grade, the load line, {@code from}, {@code to}, {@code step} (in K),
     * the field and {@code lossLimit}, as {@code kneepoint sweep}.
     */
    public static SweepRun sweep(Context context, LibraryReader reader, GradeModelCache models) {
        Query query = new Query(context);
        LoadLineSpec loadLine = loadLine(query);
        double from = query.temperatureK("from");
        double to = query.temperatureK("to");
        query.required("step", "5K");
        SweepRequest request = new SweepRequest(grade(query), loadLine, from, to, query.optionalNumber("step", "K", "5K"), field(query),
                percent(query, "lossLimit", 1.0) / 100.0);
        return DesignChecks.sweep(request, name -> models.stored(reader, name));
    }

    /** The duty sequence the query asks for: {@code grade} or the typed-in grade, the load line, {@code steps}, {@code lossLimit}. */
    public static DutyRun duty(Context context, LibraryReader reader, GradeModelCache models) {
        Query query = new Query(context);
        LoadLineSpec loadLine = loadLine(query);
        DutyRequest request = new DutyRequest(grade(query), loadLine, DutySteps.parse(query.text("steps")),
                percent(query, "lossLimit", 1.0) / 100.0);
        return DesignChecks.duty(request, name -> models.stored(reader, name));
    }

    /** The selection the query asks for, over every grade of the library or of {@code family}. */
    public static SelectionRun select(Context context, LibraryReader reader, GradeModelCache models) {
        Query query = new Query(context);
        LoadLineSpec loadLine = loadLine(query);
        SelectionRequest request = new SelectionRequest(loadLine, query.temperatureK("temperature"), field(query),
                query.optionalQuantity("minFluxDensity", Dimension.FLUX_DENSITY, "1T"), percent(query, "maxLoss", 1.0) / 100.0,
                SelectionSort.of(query.choice("sort", "flux", "flux", "margin", "loss", "temperature", "price")), query.text("family"));
        return DesignChecks.select(request, reader, models.selection(reader));
    }

    /** The grade the query names ({@code grade}) or types in ({@code br}, {@code muRec}, ...); shared with the element check. */
    static GradeChoice grade(Query query) {
        TypedGrade typed = new TypedGrade(query.optionalQuantity("br", Dimension.FLUX_DENSITY, "1.3T"),
                query.optionalNumber("muRec", "", "1.05"), query.optionalQuantity("hcj", Dimension.FIELD_STRENGTH, "1600kA/m"),
                query.optionalQuantity("knee", Dimension.FIELD_STRENGTH, "1450kA/m"), query.optionalNumber("alpha", "%/K", "-0.12%/K"),
                query.optionalNumber("beta", "%/K", "-0.6%/K"), query.optionalTemperatureK("referenceTemperature"));
        return new GradeChoice(query.text("grade"), typed, NAMES);
    }

    private static LoadLineSpec loadLine(Query query) {
        return new LoadLineSpec(query.optionalNumber("pc", "", "2.5"), query.optionalLength("diameter"), query.optionalLength("length"),
                query.optionalLength("innerDiameter"), query.optionalLength("width"), query.optionalLength("depth"),
                query.optionalLength("thickness"), query.flag("onSteel"),
                query.choice("factor", "magnetometric", "magnetometric", "fluxmetric", "center"));
    }

    /** The field against the magnetization: {@code opposingField} (circuit convention) or {@code externalField}, not both. */
    private static AppliedField field(Query query) {
        return FieldChoice.of(query.optionalQuantity("opposingField", Dimension.FIELD_STRENGTH, "200kA/m"),
                query.optionalQuantity("externalField", Dimension.FIELD_STRENGTH, "300kA/m"), "opposingField", "externalField");
    }

    static double percent(Query query, String name, double fallback) {
        Double value = query.optionalNumber(name, "%", "1%");
        return value == null ? fallback : value;
    }
}
