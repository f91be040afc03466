package org.kneepoint.fitter.model.ja;

import org.hipparchus.exception.LocalizedCoreFormats;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;

/**
 * The local stage: Levenberg–Marquardt (K. Levenberg 1944; D. W. Marquardt, J. SIAM 11, 431–441,
 * 1963; Hipparchus 4.0.1, after Moré's MINPACK) on the B residuals in fit coordinates. The
 * Jacobian is by forward differences with step {@value #STEP} in the log/logit coordinates —
 * a relative step of about 1e-6 in each parameter, which balances truncation (∝ step) against
 * round-off (∝ 1e-16/step) — and the model value and Jacobian are evaluated lazily, so rejected
 * trial steps cost one loop evaluation, not six.
 */
final class LevenbergMarquardtStage {

    static final double STEP = 1e-6;

    private LevenbergMarquardtStage() {
    }

    /**
     * What the stage produced.
     *
     * @param coordinates best point in fit coordinates
     * @param iterations  Levenberg–Marquardt iterations
     */
    record Result(double[] coordinates, int iterations) {
    }

    static Result refine(LoopResidual residual, double[] start, JilesAthertonFitSettings settings,
            FitProgress progress, double fromFraction, double toFraction) {
        int limit = settings.localIterations();
        int[] jacobians = {0};
        LeastSquaresBuilder builder = new LeastSquaresBuilder()
                .start(start)
                .target(residual.measured())
                .model(residual::modelled, q -> {
                    jacobians[0]++;
                    progress.report(fromFraction + (toFraction - fromFraction) * Math.min(1, jacobians[0] / (double) limit),
                            FitStage.LOCAL_LEAST_SQUARES);
                    return forwardJacobian(residual, q);
                })
                .lazyEvaluation(true)
                .maxIterations(limit)
                .maxEvaluations(20 * limit);
        LevenbergMarquardtOptimizer optimizer = new LevenbergMarquardtOptimizer()
                .withCostRelativeTolerance(1e-12)
                .withParameterRelativeTolerance(1e-10)
                .withOrthoTolerance(1e-12);
        try {
            LeastSquaresOptimizer.Optimum optimum = optimizer.optimize(builder.build());
            residual.modelled(optimum.getPoint().toArray());
            return new Result(residual.best(), optimum.getIterations());
        } catch (MathIllegalStateException stopped) {
            if (stopped.getSpecifier() != LocalizedCoreFormats.MAX_COUNT_EXCEEDED) {
                throw stopped;
            }
            return new Result(residual.best(), limit);
        }
    }

    /** ∂B/∂q at every point by forward differences; rows are points, columns the five coordinates. */
    static double[][] forwardJacobian(LoopResidual residual, double[] q) {
        double[] base = residual.modelled(q);
        double[][] jacobian = new double[base.length][5];
        for (int j = 0; j < 5; j++) {
            double[] shifted = q.clone();
            shifted[j] += STEP;
            double[] value = residual.modelled(shifted);
            for (int i = 0; i < base.length; i++) {
                jacobian[i][j] = (value[i] - base[i]) / STEP;
            }
        }
        return jacobian;
    }
}
