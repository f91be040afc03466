package org.kneepoint.fitter.model.ja;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.NumericalFailureException;

/**
 * Embedded Runge–Kutta 5(4) of Dormand and Prince (J. R. Dormand, P. J. Prince, "A family of
 * embedded Runge–Kutta formulae", J. Comput. Appl. Math. 6, 19–26, 1980) with local error control
 * and step clipping at the branch end, where H reverses.
 *
 * <p>The δ switch happens only at branch ends (a restart). The irreversible-term switch inside a
 * branch is continuous in M (the term goes to 0 as δ·(Man − M) goes to 0), so only the slope has
 * a kink there; the error control shortens the steps across it. The error per step is held below
 * tolerance·(Ms + |M|).
 */
public final class AdaptiveBranchSolver implements BranchSolver {

    /** Local tolerance giving about 1e-6 relative accuracy in Hc and Mr of a major loop. */
    public static final double DEFAULT_TOLERANCE = 1e-9;

    private static final long MAXIMUM_STEPS = 10_000_000L;

    private final JilesAthertonModel model;
    private final double tolerance;
    private final double scale;

    public AdaptiveBranchSolver(JilesAthertonModel model, double tolerance) {
        if (!(tolerance >= 1e-14 && tolerance <= 1e-2)) {
            throw new BadInputException("tolerance " + tolerance + " is out of range; expected 1e-14 to 1e-2");
        }
        this.model = model;
        this.tolerance = tolerance;
        this.scale = model.parameters().ms();
    }

    public AdaptiveBranchSolver(JilesAthertonModel model) {
        this(model, DEFAULT_TOLERANCE);
    }

    @Override
    public double advance(double hStart, double mStart, double hEnd) {
        return solve(hStart, mStart, hEnd).magnetization();
    }

    /** Integrates one branch and reports the accepted and rejected steps. */
    public BranchResult solve(double hStart, double mStart, double hEnd) {
        double span = hEnd - hStart;
        if (span == 0) {
            return new BranchResult(mStart, 0, 0);
        }
        double direction = Math.signum(span);
        JilesAthertonParameters p = model.parameters();
        double step = direction * Math.min(Math.abs(span), 0.05 * Math.min(p.a(), p.k()));
        double minimumStep = 1e-12 * (Math.abs(hStart) + Math.abs(hEnd) + p.a());
        double h = hStart;
        double m = mStart;
        double k1 = model.susceptibility(h, m, direction);
        int accepted = 0;
        int rejected = 0;
        while (direction * (hEnd - h) > 0) {
            if (accepted + rejected > MAXIMUM_STEPS) {
                throw new NumericalFailureException("Jiles–Atherton integration from H = " + hStart + " to " + hEnd
                        + " A/m did not finish in " + MAXIMUM_STEPS + " steps");
            }
            boolean last = direction * (h + step - hEnd) >= 0;
            double dh = last ? hEnd - h : step;
            DormandPrinceStep trial = DormandPrinceStep.take(model, h, m, k1, dh, direction);
            double error = Math.abs(trial.errorEstimate()) / (tolerance * (scale + Math.abs(trial.magnetization())));
            if (error <= 1 || Math.abs(dh) <= minimumStep) {
                h = last ? hEnd : h + dh;
                m = trial.magnetization();
                k1 = trial.endSlope();
                accepted++;
            } else {
                rejected++;
            }
            double factor = error == 0 ? 5 : Math.min(5, Math.max(0.2, 0.9 * Math.pow(error, -0.2)));
            step = direction * Math.max(Math.abs(dh) * factor, minimumStep);
        }
        if (!Double.isFinite(m)) {
            throw new NumericalFailureException("Jiles–Atherton integration from H = " + hStart + " to " + hEnd
                    + " A/m left the finite range");
        }
        return new BranchResult(m, accepted, rejected);
    }

    /**
     * What one branch integration produced.
     *
     * @param magnetization M at the branch end, A/m
     * @param accepted      accepted steps
     * @param rejected      rejected steps
     */
    public record BranchResult(double magnetization, int accepted, int rejected) {
    }
}
