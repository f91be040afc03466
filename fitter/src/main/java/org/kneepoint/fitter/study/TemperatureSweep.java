package org.kneepoint.fitter.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.IntrinsicCurve;
import org.kneepoint.fitter.loadline.IrreversibleLoss;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.loadline.OperatingPoint;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.fitter.loadline.WorkingRange;
import org.kneepoint.fitter.loadline.WorkingTemperatures;

/**
 * A check swept over temperature (issue 14, item 4): at T1, T1 + dT, … up to T2 (and at T2 itself when the steps do
 * not land on it) the operating point on the load line, the reversible change, the irreversible loss by the recoil
 * line and the margin to the knee, each by the same steps as {@link org.kneepoint.fitter.loadline.DesignCheck}; and
 * the working-temperature range for the loss limit around T1 ({@link WorkingTemperatures}), for the chart's marks.
 * Each temperature is its own exposure (no history: a duty sequence carries the worst point forward).
 *
 * @param points  the checks in ascending temperature
 * @param working the lowest and highest working temperatures for the limit
 */
public record TemperatureSweep(List<SweepPoint> points, WorkingRange working) {

    /** The most temperatures one sweep takes. */
    public static final int MAX_POINTS = 100_000;

    public TemperatureSweep {
        points = List.copyOf(points);
    }

    /** Sweeps {@code model} on the load line of {@code pc} under {@code field} from {@code from} to {@code to} K by {@code step} K. */
    public static TemperatureSweep run(TemperatureModel model, double pc, AppliedField field, double from, double to, double step,
            double lossLimit) {
        if (!(lossLimit > 0.0 && lossLimit < 1.0)) {
            throw new BadInputException("loss limit must lie strictly between 0 % and 100 %, got " + lossLimit * 100 + " %");
        }
        if (!(step > 0.0) || !Double.isFinite(step)) {
            throw new BadInputException("the sweep's step must be positive, got " + step + " K");
        }
        if (!(to >= from)) {
            throw new BadInputException(String.format(Locale.ROOT, "the sweep runs upwards: --to (%.2f K) must not lie below --from"
                    + " (%.2f K)", to, from));
        }
        if ((to - from) / step + 1 > MAX_POINTS) {
            throw new BadInputException("the sweep would take more than " + MAX_POINTS + " temperatures; take a larger step");
        }
        for (double end : new double[] {from, to}) {
            if (end < model.lowestTemperature() || end > model.highestTemperature()) {
                throw new BadInputException(String.format(Locale.ROOT, "the sweep's %.2f K lies outside the model's range %.2f K"
                        + " to %.2f K", end, model.lowestTemperature(), model.highestTemperature()));
            }
        }
        LoadLine line = field.loadLine(pc);
        List<SweepPoint> points = new ArrayList<>();
        int steps = (int) Math.floor((to - from) / step * (1 + 1e-12));
        for (int k = 0; k <= steps; k++) {
            points.add(at(model, line, from + k * step));
        }
        if (to - (from + steps * step) > 1e-9 * step) {
            points.add(at(model, line, to));
        }
        return new TemperatureSweep(points, WorkingTemperatures.of(model, line, from, lossLimit));
    }

    private static SweepPoint at(TemperatureModel model, LoadLine line, double temperature) {
        IntrinsicCurve curve = model.at(temperature);
        OperatingPoint point = line.on(curve);
        Double margin = curve.kneeField().isPresent() ? point.h() - curve.kneeField().getAsDouble() : null;
        return new SweepPoint(temperature, point.h(), point.b(), point.j(), model.remanenceRatio(temperature) - 1.0,
                IrreversibleLoss.after(curve, point), margin, model.isExtrapolated(temperature),
                curve.beyondMeasuredField(point.h()));
    }
}
