package org.kneepoint.fitter.study;

import org.hipparchus.analysis.solvers.BrentSolver;
import org.kneepoint.fitter.loadline.DesignCheck;
import org.kneepoint.fitter.loadline.LimitReason;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.fitter.loadline.WorkingLimit;
import org.kneepoint.fitter.loadline.WorkingTemperatures;

/**
 * The highest working temperature of one sample, found from the nominal check's. Where the nominal maximum is the
 * crossing of loss(T) and the limit, the sample's crossing is found from there by secant steps (the first with the
 * nominal slope of the loss) until they move, or the nominal slope says they would move, less than {@value #ACCURACY} K; where they stall or leave the range, it is
 * bracketed — steps doubling away from the nominal crossing — and found by Brent's method (Hipparchus {@link BrentSolver};
 * R. P. Brent, Algorithms for Minimization without Derivatives, 1973, ch. 4) to {@value #ACCURACY} K. Where the nominal
 * maximum is the top of the model's range, the sample's is too while its loss there stays within the limit. Anything
 * else — a nominal check with no working range, no crossing on the way to the model's bottom — goes to the full scan
 * ({@link WorkingTemperatures}). For a loss that rises with temperature, as where HcJ falls with temperature, this is
 * the full scan's answer (the crossing nearest the check temperature) at a fraction of its cost.
 */
final class SampleWorkingLimit {

    static final double ACCURACY = 1e-4;
    private static final double SLOPE_STEP = 0.05;
    private static final double LEAST_STEP = 0.05;
    private static final int MAX_EVALUATIONS = 100;
    private static final int SECANT_STEPS = 8;

    private final WorkingLimit nominal;
    private final double lossLimit;
    private final double slope;

    /** The nominal check's maximum on {@code line} at {@code temperature} and the loss's slope there (fraction per K). */
    SampleWorkingLimit(TemperatureModel model, LoadLine line, double temperature, double lossLimit) {
        this.nominal = WorkingTemperatures.of(model, line, temperature, lossLimit).maximum();
        this.lossLimit = lossLimit;
        if (nominal.reason() == LimitReason.LIMIT_REACHED) {
            double at = nominal.temperature();
            double below = Math.max(model.lowestTemperature(), at - SLOPE_STEP);
            double above = Math.min(model.highestTemperature(), at + SLOPE_STEP);
            this.slope = (DesignCheck.lossAt(model, line, above) - DesignCheck.lossAt(model, line, below)) / (above - below);
        } else {
            this.slope = Double.NaN;
        }
    }

    /**
     * The sample's highest working temperature, K, or NaN when it has none; {@code temperature} is its own temperature
     * (where the full scan starts when it is needed).
     */
    double maximum(TemperatureModel model, LoadLine line, double temperature) {
        double top = model.highestTemperature();
        double bottom = model.lowestTemperature();
        if (nominal.reason() == LimitReason.NONE_IN_RANGE) {
            return full(model, line, temperature);
        }
        if (nominal.reason() == LimitReason.MODEL_RANGE_EDGE) {
            return excess(model, line, top) <= 0.0 ? top : full(model, line, temperature);
        }
        double from = Math.min(Math.max(nominal.temperature(), bottom), top);
        double excess = excess(model, line, from);
        double secant = secant(model, line, from, excess, bottom, top);
        if (!Double.isNaN(secant)) {
            return secant;
        }
        boolean within = excess <= 0.0;
        double step = slope > 0.0 ? Math.max(LEAST_STEP, Math.abs(excess / slope) * 1.1) : 1.0;
        while (true) {
            double to = within ? Math.min(from + step, top) : Math.max(from - step, bottom);
            boolean toWithin = excess(model, line, to) <= 0.0;
            if (toWithin != within) {
                double low = within ? from : to;
                double high = within ? to : from;
                return new BrentSolver(ACCURACY).solve(MAX_EVALUATIONS, t -> excess(model, line, t), low, high);
            }
            if (to == top || to == bottom) {
                return within ? top : full(model, line, temperature);
            }
            from = to;
            step *= 2.0;
        }
    }

    /**
     * The crossing by secant steps from {@code t0} (the first with the nominal slope), or NaN when they stall, leave the
     * model's range or do not settle within {@value #SECANT_STEPS} steps (the bracketing search then takes over).
     */
    private double secant(TemperatureModel model, LoadLine line, double t0, double e0, double bottom, double top) {
        if (!(slope > 0.0) || e0 == 0.0) {
            return e0 == 0.0 ? t0 : Double.NaN;
        }
        double t1 = t0 - e0 / slope;
        for (int i = 0; i < SECANT_STEPS && t1 > bottom && t1 < top; i++) {
            double e1 = excess(model, line, t1);
            if (Math.abs(t1 - t0) < ACCURACY || Math.abs(e1) < ACCURACY * slope) {
                return t1;
            }
            if (e1 == e0) {
                return Double.NaN;
            }
            double next = t1 - e1 * (t1 - t0) / (e1 - e0);
            t0 = t1;
            e0 = e1;
            t1 = next;
        }
        return Double.NaN;
    }

    private double full(TemperatureModel model, LoadLine line, double temperature) {
        Double maximum = WorkingTemperatures.of(model, line, temperature, lossLimit).maximum().temperature();
        return maximum == null ? Double.NaN : maximum;
    }

    private double excess(TemperatureModel model, LoadLine line, double temperature) {
        return DesignCheck.lossAt(model, line, temperature) - lossLimit;
    }
}
