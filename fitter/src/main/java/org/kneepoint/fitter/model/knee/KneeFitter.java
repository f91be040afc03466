package org.kneepoint.fitter.model.knee;

import java.util.List;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.DemagnetizationBranch;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.NumericalFailureException;

/**
 * Fits the knee model ({@link KneeCurve}) to a curve's descending branch: unweighted least squares on J
 * (every merged point counts once) over the points from the top of the data down to J = 0, by
 * {@link KneeLeastSquares} with the analytic Jacobian. The switching form ({@link SwitchingShape}) is started
 * from the characterization (Br, μrec, HcJ, Hk) with the skew of five that fits best as it starts; when its
 * residual is not within {@link KneeFit#WITHIN_SCATTER} × the points' scatter, the rational form
 * ({@link RationalShape}) is fitted too, and the smaller residual is kept. A dense curve is iterated on
 * {@value #ITERATED_POINTS} well-placed points ({@link WellPlacedPoints}) and each result polished on every point,
 * which also gives the residual and the standard errors. The curve must reach its knee; a curve that stops before HcJ is
 * fitted, its HcJ then being the model's extrapolation (flagged by the caller from the data range).
 */
public final class KneeFitter {

    /** A fit whose RMS residual exceeds this share of Br describes no demagnetization curve. */
    private static final double WORST_RELATIVE_RESIDUAL = 0.05;
    /** Points the iterations from each start work on; each result is then polished on every point. */
    static final int ITERATED_POINTS = 64;
    /** Most iterations of the polish on every point, which starts next to its optimum. */
    private static final int POLISH_ITERATIONS = 20;
    /**
     * The iterations from each start stop when a further step would move the parameters by less than √(this), 0.1, of
     * their standard errors on the iterated points; the polish on every point then finishes the fit.
     */
    private static final double ITERATED_TOLERANCE = 1e-2;
    /** The polish stops when a further step would move the parameters by less than √(this), 0.03, of their standard errors. */
    private static final double POLISH_TOLERANCE = 1e-3;
    /** Skews λ of the switching form tried as starts: ln H (0), H (1) and ever squarer onsets towards an exponential knee. */
    private static final double[] SWITCHING_SKEWS = {0, 1, 3, 10, 30};
    /** atanh(0.9): where −tanh falls to the knee's 0.9. */
    private static final double KNEE_ARGUMENT = 1.4722194895832204;

    private KneeFitter() {
    }

    public static KneeFit fit(DemagnetizationCurve curve) {
        DemagnetizationBranch branch = DemagnetizationBranch.of(curve);
        Characterization c = CurveCharacterizer.characterize(branch, curve.temperatureK());
        if (c.hk() == null) {
            throw new BadInputException("the curve stops before its knee (J never falls to 0.9·Br), so the knee model has nothing to fit;"
                    + " measure or digitize the curve past the knee");
        }
        double lowest = c.hcj() != null ? -c.hcj() : branch.lowestH();
        double[][] data = branch.measuredBetween(lowest, branch.highestH());
        int n = data[0].length;
        if (n < 8) {
            throw new BadInputException("the knee model has up to 6 parameters and needs at least 8 points above HcJ, got " + n);
        }
        double hcj = c.hcj() != null ? c.hcj() : 1.05 * -branch.lowestH();
        KneeLeastSquares every = new KneeLeastSquares(data[0], data[1], 1e-3 * hcj);
        double[][] placed = WellPlacedPoints.of(data[0], data[1], branch.monotoneBetween(lowest, branch.highestH()), hcj, c.br(),
                ITERATED_POINTS);
        KneeLeastSquares iterated = placed[0].length < n ? new KneeLeastSquares(placed[0], placed[1], 1e-3 * hcj) : every;
        double scatter = PointScatter.of(data[0], data[1]);
        KneeLeastSquares.Solution best = null;
        int evaluations = 0;
        NumericalFailureException failure = null;
        for (KneeCurve start : starts(c, hcj, iterated)) {
            try {
                KneeLeastSquares.Solution solution = iterated.solve(start, ITERATED_TOLERANCE);
                evaluations += solution.evaluations() + SWITCHING_SKEWS.length;
                if (iterated != every) {
                    solution = every.solve(solution.model(), POLISH_ITERATIONS, POLISH_TOLERANCE);
                    evaluations += solution.evaluations();
                }
                if (best == null || solution.rms() < best.rms()) {
                    best = solution;
                }
                if (best.rms() <= KneeFit.WITHIN_SCATTER * scatter) {
                    break;
                }
            } catch (NumericalFailureException e) {
                failure = e;
            }
        }
        if (best == null) {
            throw new NumericalFailureException("the knee fit failed from every start (" + failure.getMessage() + ")");
        }
        KneeCurve model = best.model();
        if (best.rms() > WORST_RELATIVE_RESIDUAL * model.remanence()) {
            throw new BadInputException(String.format(java.util.Locale.ROOT,
                    "the knee model leaves residuals of %.1f %% of Br; the data do not have the shape of a demagnetization curve with one knee",
                    100 * best.rms() / model.remanence()));
        }
        FitUncertainty uncertainty = FitUncertainty.of(best, n);
        double hk = -model.kneeField().orElseThrow();
        return new KneeFit(model, uncertainty.errors(), uncertainty.correlation(), best.rms(), scatter,
                uncertainty.kneeWidthError(model), best.iterations(), evaluations, n, data[0][0], data[0][n - 1], hk,
                ModelEnergyProduct.maximum(model), curve.temperatureK());
    }

    /**
     * Starting models, each through Hk: the switching form with the skew λ of {@link #SWITCHING_SKEWS} that fits
     * {@code points} best as it starts (its width σ = (1 − tk^λ)/(λ·atanh 0.9), −ln tk/atanh 0.9 at λ = 0, puts the
     * knee at tk = Hk/HcJ), then the rational form.
     */
    private static List<KneeCurve> starts(Characterization c, double hcj, KneeLeastSquares points) {
        double line = Math.min(3.0, Math.max(1.0, c.muRec()));
        double reduced = Math.min(0.999, c.hk() / hcj);
        KneeCurve switching = null;
        double lowest = Double.POSITIVE_INFINITY;
        for (double skew : SWITCHING_SKEWS) {
            double width = skew == 0 ? -Math.log(reduced) / KNEE_ARGUMENT : (1 - Math.pow(reduced, skew)) / (skew * KNEE_ARGUMENT);
            KneeCurve start = new KneeCurve(c.br(), line, hcj, new SwitchingShape(Math.max(SwitchingShape.MIN_WIDTH, width), skew, 0.0));
            double rms = points.solve(start, 0, 0).rms();
            if (switching == null || rms < lowest) {
                switching = start;
                lowest = rms;
            }
        }
        double bend = (1 - (1 - reduced) / 0.9) / reduced;
        return List.of(switching, new KneeCurve(c.br(), 1.0, hcj, new RationalShape(Math.min(RationalShape.MAX_BEND, bend), 0.0)));
    }
}
