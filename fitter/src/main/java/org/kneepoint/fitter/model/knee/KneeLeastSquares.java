package org.kneepoint.fitter.model.knee;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import org.kneepoint.fitter.error.NumericalFailureException;

/**
 * Levenberg–Marquardt least squares specialised to the knee model (Br, μline, HcJ and the shape's
 * parameters): each iteration forms the small normal equations JᵀJ·δ = Jᵀr from one pass over the
 * points with the analytic derivatives of {@link KneeCurve} and {@link KneeShape}, and solves them with
 * Marquardt's diagonal damping (D. W. Marquardt, "An algorithm for least-squares estimation of nonlinear
 * parameters", J. SIAM 11(2), 431–441, 1963). ln(−H) of every point is computed once, so a point costs
 * two exponentials an evaluation. The tests check that it lands where Hipparchus's general optimizer does.
 */
final class KneeLeastSquares {

    private static final int MAX_ITERATIONS = 400;
    private static final double RELATIVE_TOLERANCE = 1e-7;

    private final double[] h;
    private final double[] j;
    private final double[] logX;
    private final double hcjFloor;

    /** The optimum: the model, the unscaled covariance (JᵀJ)⁻¹, RMS residual and the work done. */
    record Solution(KneeCurve model, double[] parameters, double[][] inverseNormalMatrix, double rms, int iterations,
            int evaluations) {
    }

    KneeLeastSquares(double[] h, double[] j, double hcjFloor) {
        this.h = h;
        this.j = j;
        this.hcjFloor = hcjFloor;
        this.logX = new double[h.length];
        for (int i = 0; i < h.length; i++) {
            logX[i] = h[i] < 0 ? Math.log(-h[i]) : Double.NaN;
        }
    }

    /**
     * The least-squares model from {@code start}. It stops when a step lowers the sum of squares by less
     * than 10⁻¹⁰ of it, moves no parameter by more than that share, or after {@value #MAX_ITERATIONS}
     * iterations (a slow crawl along a bound; the best model so far is kept and its residual judged by
     * the caller); only a residual that is not finite is a numerical failure.
     */
    Solution solve(KneeCurve start) {
        return solve(start, MAX_ITERATIONS);
    }

    /** As {@link #solve(KneeCurve)}, with at most {@code iterations} iterations (0: the start judged on these points). */
    Solution solve(KneeCurve start, int iterations) {
        KneeCurve model = bounded(start, parameters(start));
        int n = 3 + start.shape().parameters().length;
        double[][] normal = new double[n][n];
        double[] gradient = new double[n];
        double cost = accumulate(model, normal, gradient);
        int evaluations = 1;
        double lambda = 1e-3;
        int iteration = 0;
        for (; iteration < iterations; iteration++) {
            KneeCurve trial = step(model, normal, gradient, lambda);
            double[][] trialNormal = new double[n][n];
            double[] trialGradient = new double[n];
            double trialCost = accumulate(trial, trialNormal, trialGradient);
            evaluations++;
            if (trialCost < cost) {
                boolean converged = cost - trialCost <= RELATIVE_TOLERANCE * cost || smallStep(parameters(model), parameters(trial));
                model = trial;
                cost = trialCost;
                normal = trialNormal;
                gradient = trialGradient;
                lambda = Math.max(1e-12, lambda / 3);
                if (converged) {
                    break;
                }
            } else {
                lambda *= 4;
                if (lambda > 1e12) {
                    break;
                }
            }
        }
        if (!Double.isFinite(cost)) {
            throw new NumericalFailureException("the knee model's residuals became infinite");
        }
        return new Solution(model, parameters(model), SmallLinearSystem.inverse(normal), Math.sqrt(cost / h.length), iteration + 1,
                evaluations);
    }

    /**
     * The damped Gauss–Newton step from {@code model}, pulled inside the bounds. A parameter that sits on a bound the
     * step pushes against is kept where it is and the step solved again without it (an active set), so that the others
     * take the step that is best with it held, instead of crawling along the bound.
     */
    private KneeCurve step(KneeCurve model, double[][] normal, double[] gradient, double lambda) {
        int n = gradient.length;
        double[] from = parameters(model);
        boolean[] held = new boolean[n];
        KneeCurve trial = model;
        for (int pass = 0; pass <= n; pass++) {
            double[][] a = new double[n][];
            double[] b = gradient.clone();
            for (int k = 0; k < n; k++) {
                a[k] = normal[k].clone();
            }
            for (int k = 0; k < n; k++) {
                if (held[k]) {
                    for (int m = 0; m < n; m++) {
                        a[k][m] = 0;
                        a[m][k] = 0;
                    }
                    a[k][k] = 1;
                    b[k] = 0;
                }
            }
            double[] step = SmallLinearSystem.solveDamped(a, b, lambda);
            double[] p = from.clone();
            for (int k = 0; k < n; k++) {
                p[k] += step[k];
            }
            trial = bounded(model, p);
            double[] q = parameters(trial);
            boolean more = false;
            for (int k = 0; k < n; k++) {
                if (!held[k] && q[k] == from[k] && p[k] != from[k]) {
                    held[k] = true;
                    more = true;
                }
            }
            if (!more) {
                break;
            }
        }
        return trial;
    }

    static double[] parameters(KneeCurve model) {
        double[] shape = model.shape().parameters();
        double[] p = new double[3 + shape.length];
        p[0] = model.remanence();
        p[1] = model.linePermeability();
        p[2] = model.intrinsicCoercivity();
        System.arraycopy(shape, 0, p, 3, shape.length);
        return p;
    }

    /** The model with parameters p pulled inside the bounds: Br in (0, 3 T], HcJ above the floor, Br &gt; μ0(μline − 1)·HcJ. */
    private KneeCurve bounded(KneeCurve like, double[] p) {
        double br = Math.min(3.0, Math.max(1e-3, p[0]));
        double hcj = Math.max(hcjFloor, p[2]);
        double line = Math.min(Math.min(KneeCurve.MAX_LINE_PERMEABILITY, Math.max(1.0, p[1])), 1 + 0.999 * br / (MU0 * hcj));
        return new KneeCurve(br, line, hcj, like.shape().with(java.util.Arrays.copyOfRange(p, 3, p.length)));
    }

    private static boolean smallStep(double[] from, double[] to) {
        for (int i = 0; i < from.length; i++) {
            if (Math.abs(to[i] - from[i]) > RELATIVE_TOLERANCE * Math.max(Math.abs(from[i]), 1e-6)) {
                return false;
            }
        }
        return true;
    }

    /** Sum of squared residuals of the model; fills JᵀJ and Jᵀr. */
    private double accumulate(KneeCurve model, double[][] normal, double[] gradient) {
        int n = normal.length;
        double br = model.remanence();
        double slope = MU0 * (model.linePermeability() - 1);
        double hcj = model.intrinsicCoercivity();
        double logHcj = Math.log(hcj);
        KneeShape shape = model.shape();
        double[] shapeDerivatives = new double[n - 2];
        double[] d = new double[n];
        double cost = 0;
        for (int i = 0; i < h.length; i++) {
            double x = -h[i];
            double t = x / hcj;
            double line = br - slope * x;
            double f = shape.fraction(t, logX[i] - logHcj, shapeDerivatives);
            double r = j[i] - line * f;
            d[0] = f;
            d[1] = -MU0 * x * f;
            d[2] = -line * shapeDerivatives[0] * t / hcj;
            for (int k = 3; k < n; k++) {
                d[k] = line * shapeDerivatives[k - 2];
            }
            cost += r * r;
            for (int a = 0; a < n; a++) {
                gradient[a] += d[a] * r;
                for (int b = a; b < n; b++) {
                    normal[a][b] += d[a] * d[b];
                }
            }
        }
        for (int a = 0; a < n; a++) {
            for (int b = 0; b < a; b++) {
                normal[a][b] = normal[b][a];
            }
        }
        return cost;
    }
}
