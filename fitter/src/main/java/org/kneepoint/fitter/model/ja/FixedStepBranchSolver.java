package org.kneepoint.fitter.model.ja;

import org.kneepoint.fitter.error.BadInputException;

/**
 * Classical fourth-order Runge–Kutta (Kutta, 1901) with equal steps no longer than a given
 * maximum; used as a fine-step reference and for the legs of history before measured data.
 */
public final class FixedStepBranchSolver implements BranchSolver {

    private final JilesAthertonModel model;
    private final double maximumStep;

    /**
     * @param model       the model to integrate
     * @param maximumStep largest step in H, A/m, &gt; 0
     */
    public FixedStepBranchSolver(JilesAthertonModel model, double maximumStep) {
        if (!(maximumStep > 0) || Double.isInfinite(maximumStep)) {
            throw new BadInputException("maximum step " + maximumStep + " A/m is out of range; expected a finite value > 0");
        }
        this.model = model;
        this.maximumStep = maximumStep;
    }

    @Override
    public double advance(double hStart, double mStart, double hEnd) {
        double span = hEnd - hStart;
        if (span == 0) {
            return mStart;
        }
        long steps = (long) Math.ceil(Math.abs(span) / maximumStep);
        double step = span / steps;
        double direction = Math.signum(span);
        double m = mStart;
        for (long i = 0; i < steps; i++) {
            double h = hStart + i * step;
            m = rungeKuttaStep(model, h, m, step, direction);
        }
        return m;
    }

    /**
     * One classical RK4 step of dM/dH from (h, m) over {@code step}. Each stage's reduced field
     * x = (H + α·M)/a is formed as x(H_stage, m) + (α/a)·Δm with one multiply-add, so that only
     * that multiply-add, not the whole of x, lies between one stage's slope and the next stage.
     */
    static double rungeKuttaStep(JilesAthertonModel model, double h, double m, double step, double direction) {
        double half = 0.5 * step;
        double perMagnetization = model.reducedFieldPerMagnetization();
        double middle = model.reducedField(h + half, m);
        double end = model.reducedField(h + step, m);
        double k1 = model.susceptibilityAt(model.reducedField(h, m), m, direction);
        double k2 = model.susceptibilityAt(Math.fma(perMagnetization * half, k1, middle), m + half * k1, direction);
        double k3 = model.susceptibilityAt(Math.fma(perMagnetization * half, k2, middle), m + half * k2, direction);
        double k4 = model.susceptibilityAt(Math.fma(perMagnetization * step, k3, end), m + step * k3, direction);
        return Math.fma(step / 6, k1 + 2 * k2 + 2 * k3 + k4, m);
    }
}
