package org.kneepoint.fitter.loadline;

import java.util.ArrayList;
import java.util.List;
import org.kneepoint.fitter.error.BadInputException;

/**
 * A duty sequence of (temperature, field) steps on one permeance coefficient (docs/design.md §4); each step's field
 * may be in either convention ({@link AppliedField}). The magnet's state is the worst loss so far, ℓ: at each
 * step the loss of that exposure from the virgin curve is found by the recoil line through its operating point
 * ({@link IrreversibleLoss}, no threshold at the knee); if it exceeds ℓ it becomes the new ℓ and the
 * magnet works on the virgin curve, otherwise it works on its recoil line J = (1 − ℓ)·Br(T) + μ0·(μrec − 1)·H
 * (the lost fraction carried reversibly with Br(T), as docs/design.md §4 carries loss back to T0).
 */
public final class DutySequence {

    private DutySequence() {
    }

    /** Runs the steps in order from the virgin state. */
    public static List<DutyStepResult> run(TemperatureModel model, double pc, List<DutyStep> steps) {
        if (steps == null || steps.isEmpty()) {
            throw new BadInputException("a duty sequence needs at least one step");
        }
        List<DutyStepResult> results = new ArrayList<>(steps.size());
        double worst = 0.0;
        for (DutyStep step : steps) {
            LoadLine line = step.field().loadLine(pc);
            IntrinsicCurve curve = model.at(step.temperature());
            OperatingPoint virgin = line.on(curve);
            double stepLoss = IrreversibleLoss.after(curve, virgin);
            OperatingPoint point = virgin;
            if (stepLoss >= worst) {
                worst = stepLoss;
            } else {
                point = line.onRecoilLine((1.0 - worst) * curve.remanence(), curve.recoilPermeability());
            }
            results.add(new DutyStepResult(step, line, point, stepLoss, worst, model.isExtrapolated(step.temperature()),
                    curve.beyondMeasuredField(virgin.h())));
        }
        return List.copyOf(results);
    }
}
