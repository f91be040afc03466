package org.kneepoint.server.http;

import org.kneepoint.fitter.loadline.DutySequence;
import org.kneepoint.fitter.loadline.DutyStep;
import org.kneepoint.fitter.loadline.DutyStepResult;
import org.kneepoint.server.library.DutySteps;
import io.javalin.http.Context;
import java.util.List;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.DesignCheck;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.select.RankingOrder;
import org.kneepoint.fitter.select.Requirements;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.server.library.GradeModel;
import org.kneepoint.server.library.LibrarySelection;
import org.kneepoint.server.library.LoadLineSpec;
import org.kneepoint.server.library.SelectionRow;
import org.kneepoint.server.library.SelectionSort;
import org.kneepoint.server.library.TypedGrade;

/**
 * A design check and a grade selection read from a request's query parameters, the same for the JSON routes and
 * the pages: the parameters are those of {@code kneepoint check} and {@code kneepoint select} in camelCase.
 */
public final class DesignRequests {

    private DesignRequests() {
    }

    /** A check that ran: where its model came from, the load line, the result, the loss limit (a fraction). */
    public record CheckRun(GradeModel model, LoadLineSpec loadLine, DesignCheckResult result, double lossLimit, boolean extrapolated) {
    }

    /** A duty sequence that ran: where its model came from, the load line, its Pc and the result of each step. */
    public record DutyRun(GradeModel model, LoadLineSpec loadLine, double pc, List<DutyStepResult> results, boolean extrapolated) {
    }

    /** A selection that ran: the requirements, the load line, the order and the ranked rows. */
    public record SelectionRun(Requirements requirements, LoadLineSpec loadLine, RankingOrder order, List<SelectionRow> rows) {
    }

    /** The check the query asks for: {@code grade} or the typed-in grade, the load line, temperature, field, loss limit. */
    public static CheckRun check(Context context, LibraryReader reader) {
        Query query = new Query(context);
        LoadLineSpec loadLine = loadLine(query);
        double temperature = query.temperatureK("temperature");
        double opposingField = opposingField(query);
        double lossLimit = percent(query, "lossLimit", 1.0) / 100.0;
        GradeModel model = model(query, reader);
        DesignCheckResult result = DesignCheck.of(model.model(), new LoadLine(loadLine.permeanceCoefficient(), opposingField), temperature, lossLimit);
        return new CheckRun(model, loadLine, result, lossLimit, model.extrapolated(result));
    }

    /** The duty sequence the query asks for: {@code grade} or the typed-in grade, the load line, {@code steps}. */
    public static DutyRun duty(Context context, LibraryReader reader) {
        Query query = new Query(context);
        LoadLineSpec loadLine = loadLine(query);
        List<DutyStep> steps = DutySteps.parse(query.text("steps"));
        GradeModel model = model(query, reader);
        double pc = loadLine.permeanceCoefficient();
        List<DutyStepResult> results = DutySequence.run(model.model(), pc, steps);
        boolean extrapolated = steps.stream().anyMatch(step -> model.extrapolated().test(step.temperature()));
        return new DutyRun(model, loadLine, pc, results, extrapolated);
    }

    /** The selection the query asks for, over every grade of the library or of {@code family}. */
    public static SelectionRun select(Context context, LibraryReader reader) {
        Query query = new Query(context);
        LoadLineSpec loadLine = loadLine(query);
        RankingOrder order = SelectionSort.of(query.choice("sort", "flux", "flux", "margin", "loss", "temperature", "price"));
        double temperature = query.temperatureK("temperature");
        Requirements requirements = new Requirements(new LoadLine(loadLine.permeanceCoefficient(), opposingField(query)), temperature,
                query.optionalQuantity("minFluxDensity", Dimension.FLUX_DENSITY, "1T"), percent(query, "maxLoss", 1.0) / 100.0);
        return new SelectionRun(requirements, loadLine, order, LibrarySelection.rank(reader, query.text("family"), requirements, order));
    }

    private static GradeModel model(Query query, LibraryReader reader) {
        TypedGrade typed = new TypedGrade(query.optionalQuantity("br", Dimension.FLUX_DENSITY, "1.3T"),
                query.optionalNumber("muRec", "", "1.05"), query.optionalQuantity("hcj", Dimension.FIELD_STRENGTH, "1600kA/m"),
                query.optionalQuantity("knee", Dimension.FIELD_STRENGTH, "1450kA/m"), query.optionalNumber("alpha", "%/K", "-0.12%/K"),
                query.optionalNumber("beta", "%/K", "-0.6%/K"), query.optionalTemperatureK("referenceTemperature"));
        String grade = query.text("grade");
        if (grade == null) {
            return GradeModel.typed(typed.law("name a grade of the library (grade=...), or type one in with br, muRec and hcj"));
        }
        if (typed.given()) {
            throw new BadInputException("give either a grade of the library or the typed-in br, muRec, hcj, knee, alpha, beta,"
                    + " referenceTemperature, not both");
        }
        return GradeModel.stored(reader, grade);
    }

    private static LoadLineSpec loadLine(Query query) {
        return new LoadLineSpec(query.optionalNumber("pc", "", "2.5"), query.optionalLength("diameter"), query.optionalLength("length"),
                query.optionalLength("innerDiameter"), query.optionalLength("width"), query.optionalLength("depth"),
                query.optionalLength("thickness"), query.flag("onSteel"),
                query.choice("factor", "magnetometric", "magnetometric", "fluxmetric", "center"));
    }

    private static double opposingField(Query query) {
        Double field = query.optionalQuantity("opposingField", Dimension.FIELD_STRENGTH, "200kA/m");
        return field == null ? 0.0 : field;
    }

    private static double percent(Query query, String name, double fallback) {
        Double value = query.optionalNumber(name, "%", "1%");
        return value == null ? fallback : value;
    }
}
