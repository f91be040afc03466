package org.kneepoint.fitter.elements;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.ArrayList;
import java.util.List;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.loadline.IntrinsicCurve;
import org.kneepoint.fitter.loadline.IrreversibleLoss;
import org.kneepoint.fitter.loadline.OperatingPoint;
import org.kneepoint.fitter.loadline.TemperatureModel;

/**
 * Judges every element of a field solver's result on the grade's curve (docs/element-fields.md). In each load case,
 * in order, an element's field is split into H∥ along its magnetization and H⊥ across it (for B given, H∥ is the
 * root of μ0·H + J(H) = B∥ on the curve at its temperature and H⊥ = B⊥/μ0); the {@link TransverseRule} gives the
 * field that acts, and the recoil line through that point on the curve gives the case's loss
 * ({@link IrreversibleLoss}, docs/design.md §4). As in a duty sequence ({@code DutySequence}) the worst point so far
 * sets each element's recoil line: its loss is the largest of its cases, and an element given B that has lost more
 * before works on that recoil line, J = (1 − ℓ)·Br(T) + μ0·(μrec − 1)·H. An element is identified by its place in
 * the tables; positions and volumes of the summary are the first table's.
 */
public final class ElementCheck {

    /** How many of the worst elements the result lists. */
    public static final int WORST_LISTED = 10;

    private ElementCheck() {
    }

    /** The check of {@code cases} (one table per load case, in order) on {@code model}. */
    public static ElementCheckResult run(TemperatureModel model, List<ElementField> cases, ElementSettings settings) {
        if (cases == null || cases.isEmpty()) {
            throw new BadInputException("an element check needs at least one table of element fields");
        }
        ElementField first = cases.get(0);
        int n = first.size();
        for (ElementField table : cases) {
            if (table.size() != n) {
                throw new BadInputException(InputLocation.of(table.source()), "holds " + table.size() + " elements, but "
                        + first.source() + " holds " + n + "; every load case must list the same elements in the same order");
            }
            if (!table.hasTemperatures() && settings.temperature() == null) {
                throw new BadInputException(InputLocation.of(table.source()), "has no temperature column T; give one, or --temperature");
            }
        }
        ElementStates states = new ElementStates(n);
        List<LoadCaseResult> results = new ArrayList<>(cases.size());
        for (int c = 0; c < cases.size(); c++) {
            results.add(loadCase(model, cases.get(c), settings, states, c == 0, c == cases.size() - 1));
        }
        double volume = 0.0;
        double pastKnee = 0.0;
        double lost = 0.0;
        for (int i = 0; i < n; i++) {
            double v = first.volume(i);
            volume += v;
            pastKnee += states.pastKnee[i] ? v : 0.0;
            lost += v * states.loss[i];
        }
        return new ElementCheckResult(volume, pastKnee / volume, lost / volume, settings.lossLimit(), settings.transverse(),
                WorstElements.of(first, states.loss, states.hParallel, states.margin, WORST_LISTED), results, states);
    }

    private static LoadCaseResult loadCase(TemperatureModel model, ElementField table, ElementSettings settings,
            ElementStates states, boolean firstCase, boolean lastCase) {
        CurveAtTemperature at = new CurveAtTemperature(model);
        boolean fluxDensity = table.given() == GivenField.FLUX_DENSITY;
        boolean transverse = settings.transverse() != TransverseRule.ALONG;
        double fieldSum = 0.0;
        double volume = 0.0;
        double pastKnee = 0.0;
        for (int i = 0; i < table.size(); i++) {
            double mx = table.hasDirections() ? table.direction(i, 0) : settings.directionX();
            double my = table.hasDirections() ? table.direction(i, 1) : settings.directionY();
            double mz = table.hasDirections() ? table.direction(i, 2) : settings.directionZ();
            at.moveTo(table.hasTemperatures() ? table.temperature(i) : settings.temperature(), table, i);
            IntrinsicCurve curve = at.curve();
            double fx = table.field(i, 0);
            double fy = table.field(i, 1);
            double fz = table.field(i, 2);
            double along = fx * mx + fy * my + fz * mz;
            double across = transverse ? Math.sqrt(Math.max(0.0, fx * fx + fy * fy + fz * fz - along * along)) : 0.0;
            double hAlong;
            try {
                hAlong = fluxDensity ? FieldFromFluxDensity.on(curve, along) : along;
                double acting = settings.transverse().effective(hAlong, fluxDensity ? across / MU0 : across);
                double j = curve.j(acting);
                double loss = IrreversibleLoss.after(curve, new OperatingPoint(acting, MU0 * acting + j, j));
                double margin = acting - at.knee();
                double before = states.loss[i];
                boolean onRecoilLine = !firstCase && loss < before;
                double working = fluxDensity && onRecoilLine
                        ? (along - (1.0 - before) * curve.remanence()) / (MU0 * curve.recoilPermeability()) : hAlong;
                states.record(i, firstCase, loss, hAlong, margin);
                if (lastCase) {
                    states.remanence[i] = (1.0 - states.loss[i]) * curve.remanence();
                    states.recoilPermeability[i] = curve.recoilPermeability();
                }
                double v = table.volume(i);
                volume += v;
                fieldSum += v * working;
                pastKnee += margin < 0.0 ? v : 0.0;
            } catch (BadInputException outsideCurve) {
                throw new BadInputException(table.location(i), outsideCurve.getMessage());
            }
        }
        return new LoadCaseResult(table.source(), fieldSum / volume, pastKnee / volume, at.extrapolated());
    }
}
