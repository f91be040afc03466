package org.kneepoint.fitter.model.ja;

import org.hipparchus.exception.LocalizedCoreFormats;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.optim.InitialGuess;
import org.hipparchus.optim.MaxEval;
import org.hipparchus.optim.SimpleBounds;
import org.hipparchus.optim.nonlinear.scalar.GoalType;
import org.hipparchus.optim.nonlinear.scalar.ObjectiveFunction;
import org.hipparchus.optim.nonlinear.scalar.noderiv.CMAESOptimizer;
import org.hipparchus.random.MersenneTwister;

/**
 * The cheap global stage: CMA-ES (N. Hansen, A. Ostermeier, "Completely derandomized
 * self-adaptation in evolution strategies", Evol. Comput. 9, 159–195, 2001; Hipparchus 4.0.1
 * implementation) over the fit coordinates, bounded around the starting values, with a fixed
 * seed, minimizing the sum of squared B residuals. Stops at its evaluation budget and hands on the
 * best point it saw.
 */
final class CmaesGlobalSearch {

    /** Half-widths of the search box in fit coordinates: Ms ×/÷ 3, a and k ×/÷ 20, c and u in logit. */
    private static final double[] HALF_WIDTH = {Math.log(3), Math.log(20), Math.log(20), 4, 5};
    private static final int POPULATION = 12;

    private CmaesGlobalSearch() {
    }

    static double[] search(LoopResidual residual, double[] start, JilesAthertonFitSettings settings,
            FitProgress progress, double fromFraction, double toFraction) {
        int budget = settings.globalEvaluations();
        double[] lower = new double[5];
        double[] upper = new double[5];
        double[] sigma = new double[5];
        for (int i = 0; i < 5; i++) {
            lower[i] = start[i] - HALF_WIDTH[i];
            upper[i] = start[i] + HALF_WIDTH[i];
            sigma[i] = HALF_WIDTH[i] / 3;
        }
        int first = residual.evaluations();
        ObjectiveFunction objective = new ObjectiveFunction(q -> {
            int done = residual.evaluations() - first;
            if (done % 50 == 0) {
                progress.report(fromFraction + (toFraction - fromFraction) * done / budget, FitStage.GLOBAL_SEARCH);
            }
            return residual.sumOfSquares(q);
        });
        CMAESOptimizer optimizer = new CMAESOptimizer(budget, 0, true, 0, 0, new MersenneTwister(settings.seed()),
                false, null);
        try {
            optimizer.optimize(new MaxEval(budget), objective, GoalType.MINIMIZE, new InitialGuess(start),
                    new SimpleBounds(lower, upper), new CMAESOptimizer.Sigma(sigma),
                    new CMAESOptimizer.PopulationSize(POPULATION));
        } catch (MathIllegalStateException stopped) {
            // The budget is the stopping rule; the residual remembers the best point.
            if (stopped.getSpecifier() != LocalizedCoreFormats.MAX_COUNT_EXCEEDED) {
                throw stopped;
            }
        }
        return residual.best();
    }
}
