package org.kneepoint.server.app.grades;

import java.util.List;
import java.util.Locale;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.loadline.DutySequence;
import org.kneepoint.fitter.loadline.DutyStep;
import org.kneepoint.fitter.loadline.DutyStepResult;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.server.app.InputLimits;

/**
 * The history that damaged a magnet before its curve is exported ({@code export --after STEPS --pc P}): the (temperature,
 * field) steps in order on the load line of permeance coefficient {@code pc}, judged as {@code duty} judges them
 * ({@link DutySequence}: the worst point so far sets the recoil line). Its loss is what the exported curve has lost.
 */
public record CurveDamage(double pc, List<DutyStep> steps) {

    public CurveDamage {
        if (!(pc > 0) || Double.isInfinite(pc)) {
            throw new BadInputException("the permeance coefficient of the damage steps' load line must be positive and finite, got " + pc);
        }
        steps = List.copyOf(steps);
        if (steps.isEmpty()) {
            throw new BadInputException("give at least one step TEMPERATURE:FIELD such as 150C:300kA/m");
        }
        for (DutyStep step : steps) {
            InputLimits.temperatureProblem(step.temperature(), step.temperature() + " K").ifPresent(problem -> {
                throw new BadInputException(problem);
            });
        }
    }

    /**
     * The damage asked for by an optional pair of inputs, or null when neither is given: one without the other, and any
     * problem of either, is bad input at the place it was given ({@code pcAt}, {@code stepsAt}).
     */
    public static CurveDamage of(Double pc, List<DutyStep> steps, InputLocation pcAt, InputLocation stepsAt) {
        if (steps == null && pc == null) {
            return null;
        }
        if (steps == null) {
            throw new BadInputException(pcAt, "sets the load line of the damage steps; give the steps too, or leave this out");
        }
        if (pc == null) {
            throw new BadInputException(stepsAt, "needs the permeance coefficient of the load line its steps act on");
        }
        if (!(pc > 0) || Double.isInfinite(pc)) {
            throw new BadInputException(pcAt, "the permeance coefficient must be positive and finite, got " + pc);
        }
        try {
            return new CurveDamage(pc, steps);
        } catch (BadInputException e) {
            throw new BadInputException(stepsAt, e.getMessage());
        }
    }

    /** What the steps did to a magnet of {@code model}: its loss after the last step and whether any curve was extrapolated. */
    public Outcome outcome(TemperatureModel model) {
        List<DutyStepResult> results = DutySequence.run(model, pc, steps);
        DutyStepResult last = results.get(results.size() - 1);
        return new Outcome(last.irreversibleLoss(), results.stream().anyMatch(DutyStepResult::extrapolated));
    }

    /**
     * The loss after the steps and whether a step's curve lies outside the measured temperatures.
     *
     * @param loss         the irreversible loss, a fraction of Br (the same at every temperature)
     * @param extrapolated whether any step's curve is extrapolated
     */
    public record Outcome(double loss, boolean extrapolated) {

        /** The export's note on the damage; none when the steps cost nothing, so that the export is the plain one. */
        String describe(CurveDamage damage) {
            return loss == 0.0 ? "" : String.format(Locale.ROOT, "; the magnet damaged by %d step%s on the load line Pc = %s%s (irreversible loss"
                    + " %.6g %% of Br, as 'duty' finds it; the recoil line J = (1 − loss)·Br(T) + μ0·(μrec − 1)·H down to where it"
                    + " meets the curve, the curve beyond)", damage.steps().size(), damage.steps().size() == 1 ? "" : "s", Double.toString(damage.pc()),
                    extrapolated ? ", some at EXTRAPOLATED temperatures" : "", 100.0 * loss);
        }
    }
}
