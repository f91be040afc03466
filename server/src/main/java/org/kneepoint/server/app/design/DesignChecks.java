package org.kneepoint.server.app.design;

import java.util.List;
import java.util.function.Function;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.loadline.DesignCheck;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.DutySequence;
import org.kneepoint.fitter.loadline.DutyStep;
import org.kneepoint.fitter.loadline.DutyStepResult;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.loadline.LocalKneeCheck;
import org.kneepoint.fitter.loadline.LocalKneeResult;
import org.kneepoint.fitter.select.Requirements;
import org.kneepoint.fitter.study.CheckSetup;
import org.kneepoint.fitter.study.TemperatureSweep;
import org.kneepoint.fitter.study.ToleranceStudy;
import org.kneepoint.fitter.study.ToleranceStudyResult;

/**
 * The design use cases — a check, a duty sequence, a grade selection — for the command line, the JSON API and the
 * pages alike. {@code stored} looks up a grade of the library ({@link GradeModel#stored}); it is called only when
 * the request names one, so a typed-in grade needs no library.
 */
public final class DesignChecks {

    private DesignChecks() {
    }

    /**
     * A grade on its load line at a temperature, with the local check when the load line comes from a shape. The load
     * line is read first, so a request wrong in both its shape and its grade names the shape.
     */
    public static CheckRun check(CheckRequest request, Function<String, GradeModel> stored) {
        return check(request, null, stored);
    }

    /**
     * The check with a tolerance study of it ({@link ToleranceStudy}) when {@code tolerance} is not null: the grade's
     * model, the load line (its sizes through Pc of the shape), temperature, field and loss limit are the study's
     * nominal check.
     */
    public static CheckRun check(CheckRequest request, ToleranceRequest tolerance, Function<String, GradeModel> stored) {
        double pc = request.loadLine().permeanceCoefficient();
        GradeModel model = request.grade().model(stored, List.of(request.temperature()));
        DesignCheckResult result = DesignCheck.of(model.model(), pc, request.field(),
                request.temperature(), request.lossLimit());
        LoadLine line = result.loadLine();
        LocalKneeResult local = request.loadLine().shape()
                .map(shape -> LocalKneeCheck.of(shape, model.model().at(request.temperature()), line, LocalKneeCheck.DEFAULT_RESOLUTION))
                .orElse(null);
        ToleranceStudyResult study = tolerance == null ? null : ToleranceStudy.run(new CheckSetup(model.model(), pc,
                request.field(), request.temperature(), request.lossLimit(), request.loadLine().sizes(),
                sizes -> request.loadLine().withSizes(sizes).permeanceCoefficient()), tolerance.tolerances(),
                tolerance.options(), tolerance.option());
        return new CheckRun(model, request.loadLine(), result, request.lossLimit(), model.extrapolated(result), local, study);
    }

    /** A duty sequence step by step; the worst point so far sets the recoil line. */
    public static DutyRun duty(DutyRequest request, Function<String, GradeModel> stored) {
        double pc = request.loadLine().permeanceCoefficient();
        GradeModel model = request.grade().model(stored, request.steps().stream().map(DutyStep::temperature).toList());
        List<DutyStepResult> results = DutySequence.run(model.model(), pc, request.steps());
        boolean extrapolated = results.stream().anyMatch(DutyStepResult::extrapolated);
        return new DutyRun(model, request.loadLine(), pc, results, extrapolated, request.lossLimit());
    }

    /** A check swept over temperature ({@link TemperatureSweep}). */
    public static SweepRun sweep(SweepRequest request, Function<String, GradeModel> stored) {
        double pc = request.loadLine().permeanceCoefficient();
        GradeModel model = request.grade().model(stored, List.of(request.from(), request.to()));
        return new SweepRun(model, request.loadLine(), pc, request.field(), request.lossLimit(), TemperatureSweep.run(model.model(), pc,
                request.field(), request.from(), request.to(), request.step(), request.lossLimit()));
    }

    /** Every grade of the library (or of the family) ranked against the requirements. */
    public static SelectionRun select(SelectionRequest request, LibraryReader reader) {
        return select(request, reader, grade -> LibrarySelection.model(reader, grade).model());
    }

    /** The selection with each grade's model from {@code models} (computed, or kept by a {@link GradeModelCache}). */
    public static SelectionRun select(SelectionRequest request, LibraryReader reader, LibrarySelection.Models models) {
        Requirements requirements = Requirements.of(request.loadLine().permeanceCoefficient(), request.field(),
                request.temperature(), request.minimumFluxDensity(), request.maximumLoss());
        return new SelectionRun(requirements, request.loadLine(), request.order(),
                LibrarySelection.rank(reader, request.family(), requirements, request.order(), models));
    }
}
