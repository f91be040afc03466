package org.kneepoint.fitter.model.ja;

import java.util.Arrays;

/**
 * Identifies Ms, a, k, c, α from a measured loop or a second-quadrant curve, minimizing the
 * B residuals of the fixed-step model ({@link FixedStepLoopEvaluator}) in three stages: starting
 * values from the Jiles–Thoelke–Devine relations ({@link JilesAthertonStartingValues}) and a
 * seeded CMA-ES global search, both on a thinned copy of the data ({@link LoopThinning}), then
 * Levenberg–Marquardt least squares on every point at the evaluator's fine step (about 1e-6·Ms of
 * integration error whatever the point spacing); then standard errors and correlations. Deterministic for given data and settings. Bad data (a single branch offered as
 * a loop, noise, too few points, NaN, flat data) are refused with a BadInputException before any
 * fitting, and every stage has a bounded budget.
 */
public final class JilesAthertonFitter {

    /**
     * Steps per largest |H| in the cheap stages: an RK4 error of order 1e-4·Ms, enough to find the
     * basin; the local stage then works at the evaluator's fine default.
     */
    static final int COARSE_STEPS_PER_LARGEST_FIELD = 50;

    private final JilesAthertonFitSettings settings;

    public JilesAthertonFitter(JilesAthertonFitSettings settings) {
        this.settings = settings;
    }

    public JilesAthertonFitter() {
        this(JilesAthertonFitSettings.defaults());
    }

    /** Fits a loop: the data must hold falling and rising branches. */
    public JilesAthertonFit fitLoop(MeasuredLoop loop, FitProgress progress) {
        LoopShapeCheck.requireLoop(loop);
        return identify(loop, progress);
    }

    /** Fits a falling second-quadrant curve measured after magnetizing at its prior field. */
    public JilesAthertonFit fitSecondQuadrant(MeasuredLoop curve, FitProgress progress) {
        LoopShapeCheck.requireSecondQuadrantCurve(curve);
        return identify(curve, progress);
    }

    private JilesAthertonFit identify(MeasuredLoop loop, FitProgress progress) {
        progress.report(0, FitStage.STARTING_VALUES);
        MeasuredLoop thinned = LoopThinning.thin(loop);
        LoopResidual coarse = new LoopResidual(thinned, COARSE_STEPS_PER_LARGEST_FIELD);
        JilesAthertonParameters start = JilesAthertonStartingValues.estimate(LoopFeatures.of(loop), coarse);
        double[] q = FitParameterization.toCoordinates(start);
        if (settings.globalEvaluations() > 0) {
            progress.report(0.05, FitStage.GLOBAL_SEARCH);
            q = CmaesGlobalSearch.search(coarse, q, settings, progress, 0.05, 0.6);
        }
        progress.report(0.6, FitStage.LOCAL_LEAST_SQUARES);
        LoopResidual residual = new LoopResidual(loop);
        LevenbergMarquardtStage.Result local = LevenbergMarquardtStage.refine(residual, q, settings, progress, 0.6, 0.95);
        progress.report(0.95, FitStage.UNCERTAINTY);
        double[] h = loop.field();
        JilesAthertonFit fit = FitUncertainty.assess(residual, local.coordinates(), local.iterations(),
                coarse.evaluations(), Arrays.stream(h).min().orElseThrow(), Arrays.stream(h).max().orElseThrow());
        progress.report(1, FitStage.DONE);
        return fit;
    }
}
