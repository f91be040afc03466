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
    /** Work space of one evaluation (a fit is one thread's): t and ln t of every point, residuals, the Jacobian's columns. */
    private final double[] reduced;
    private final double[] logReduced;
    private final double[] residuals;
    private double[][] columns = new double[0][];

    /** The optimum: the model, the unscaled covariance (JᵀJ)⁻¹, RMS residual and the work done. */
    record Solution(KneeCurve model, double[] parameters, double[][] inverseNormalMatrix, double rms, int iterations,
            int evaluations) {
    }

    KneeLeastSquares(double[] h, double[] j, double hcjFloor) {
        this.h = h;
        this.j = j;
        this.hcjFloor = hcjFloor;
        this.logX = new double[h.length];
        this.reduced = new double[h.length];
        this.logReduced = new double[h.length];
        this.residuals = new double[h.length];
        for (int i = 0; i < h.length; i++) {
            logX[i] = h[i] < 0 ? Math.log(-h[i]) : Double.NaN;
        }
    }

    /**
     * The least-squares model from {@code start}. It stops when the undamped Gauss–Newton step from the current model
     * would lower the sum of squares by no more than {@code tolerance} × the residual variance RSS/(n − p) (the step is
     * then shorter than √tolerance standard errors, jointly), or lowers it by less than 10⁻⁷ of it, or moves no parameter
     * by more than that share, or after {@code iterations} iterations (a slow crawl along a bound; the best model so far
     * is kept and its residual judged by the caller); only a residual that is not finite is a numerical failure. The
     * damping follows H. B. Nielsen's gain-ratio rule ("Damping parameter in Marquardt's method", IMM-REP-1999-05,
     * Technical University of Denmark, 1999 — from memory).
     */
    Solution solve(KneeCurve start, double tolerance) {
        return solve(start, MAX_ITERATIONS, tolerance);
    }

    /** As {@link #solve(KneeCurve, double)}, with at most {@code iterations} iterations (0: the start judged on these points). */
    Solution solve(KneeCurve start, int iterations, double tolerance) {
        KneeCurve model = bounded(start, parameters(start));
        int n = 3 + start.shape().parameters().length;
        double[][] normal = new double[n][n];
        double[] gradient = new double[n];
        double[][] trialNormal = new double[n][n];
        double[] trialGradient = new double[n];
        double cost = accumulate(model, normal, gradient);
        int evaluations = 1;
        double lambda = 1e-3;
        double growth = 2;
        double variance = cost / Math.max(1, h.length - n);
        boolean moved = true;
        int iteration = 0;
        for (; iteration < iterations; iteration++) {
            if (moved && step(model, normal, gradient, 0).decrease() <= tolerance * variance) {
                break;
            }
            moved = false;
            KneeCurve trial = step(model, normal, gradient, lambda).model();
            double predicted = predictedDecrease(model, trial, normal, gradient);
            clear(trialNormal, trialGradient);
            double trialCost = accumulate(trial, trialNormal, trialGradient);
            evaluations++;
            if (trialCost < cost) {
                boolean converged = cost - trialCost <= RELATIVE_TOLERANCE * cost || smallStep(parameters(model), parameters(trial));
                double gain = predicted > 0 ? (cost - trialCost) / predicted : 1;
                model = trial;
                cost = trialCost;
                variance = cost / Math.max(1, h.length - n);
                double[][] swapNormal = normal;
                normal = trialNormal;
                trialNormal = swapNormal;
                double[] swapGradient = gradient;
                gradient = trialGradient;
                trialGradient = swapGradient;
                lambda = Math.max(1e-12, lambda * Math.max(1.0 / 3, 1 - Math.pow(2 * gain - 1, 3)));
                growth = 2;
                moved = true;
                if (converged) {
                    break;
                }
            } else {
                lambda *= growth;
                growth *= 2;
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

    /** The fall of the sum of squares the linearized model predicts for the move from {@code model} to {@code trial}: 2gᵀΔ − ΔᵀAΔ. */
    private static double predictedDecrease(KneeCurve model, KneeCurve trial, double[][] normal, double[] gradient) {
        double[] from = parameters(model);
        double[] to = parameters(trial);
        int n = from.length;
        double[] delta = new double[n];
        for (int k = 0; k < n; k++) {
            delta[k] = to[k] - from[k];
        }
        double sum = 0;
        for (int a = 0; a < n; a++) {
            double row = 0;
            for (int b = 0; b < n; b++) {
                row += normal[a][b] * delta[b];
            }
            sum += delta[a] * (2 * gradient[a] - row);
        }
        return sum;
    }

    private static void clear(double[][] normal, double[] gradient) {
        for (double[] row : normal) {
            java.util.Arrays.fill(row, 0.0);
        }
        java.util.Arrays.fill(gradient, 0.0);
    }

    /**
     * The damped Gauss–Newton step from {@code model}, pulled inside the bounds. A parameter that sits on a bound the
     * step pushes against is kept where it is and the step solved again without it (an active set), so that the others
     * take the step that is best with it held, instead of crawling along the bound.
     */
    private Step step(KneeCurve model, double[][] normal, double[] gradient, double lambda) {
        int n = gradient.length;
        double[] from = parameters(model);
        boolean[] held = new boolean[n];
        double[][] a = new double[n][n];
        double[] b = new double[n];
        double[] p = new double[n];
        KneeCurve trial = model;
        double decrease = Double.POSITIVE_INFINITY;
        for (int pass = 0; pass <= n; pass++) {
            for (int k = 0; k < n; k++) {
                System.arraycopy(normal[k], 0, a[k], 0, n);
                b[k] = gradient[k];
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
            decrease = Double.POSITIVE_INFINITY;
            if (step == null) {
                step = new double[n];
            } else {
                decrease = 0;
                for (int k = 0; k < n; k++) {
                    decrease += b[k] * step[k];
                }
            }
            for (int k = 0; k < n; k++) {
                p[k] = from[k] + step[k];
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
        return new Step(trial, decrease);
    }

    /**
     * A step's model inside the bounds, and gᵀδ of the step before it was pulled inside them (the fall of the sum of
     * squares the linearized model predicts for it; with no damping the Gauss–Newton decrement over the parameters
     * not held on a bound), +∞ when the equations are singular.
     */
    private record Step(KneeCurve model, double decrease) {
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

    /** Sum of squared residuals of the model; fills JᵀJ and Jᵀr (from the Jacobian's columns, one dot product each). */
    private double accumulate(KneeCurve model, double[][] normal, double[] gradient) {
        int n = normal.length;
        int count = h.length;
        if (columns.length != n) {
            columns = new double[n][count];
        }
        double br = model.remanence();
        double slope = MU0 * (model.linePermeability() - 1);
        double hcj = model.intrinsicCoercivity();
        double inverseHcj = 1.0 / hcj;
        double logHcj = Math.log(hcj);
        for (int i = 0; i < count; i++) {
            reduced[i] = -h[i] * inverseHcj;
            logReduced[i] = logX[i] - logHcj;
        }
        // the shape's derivatives land in the columns of t and of its own parameters, then are scaled by the line
        double[][] shapeColumns = java.util.Arrays.copyOfRange(columns, 2, n);
        model.shape().fractions(reduced, logReduced, count, columns[0], shapeColumns);
        double[] f = columns[0];
        double[] ofLine = columns[1];
        double[] ofHcj = columns[2];
        for (int i = 0; i < count; i++) {
            double x = -h[i];
            double line = br - slope * x;
            residuals[i] = j[i] - line * f[i];
            ofLine[i] = -MU0 * x * f[i];
            ofHcj[i] = -line * ofHcj[i] * reduced[i] * inverseHcj;
            for (int k = 3; k < n; k++) {
                columns[k][i] *= line;
            }
        }
        for (int a = 0; a < n; a++) {
            gradient[a] = dot(columns[a], residuals, count);
            for (int b = a; b < n; b++) {
                normal[a][b] = dot(columns[a], columns[b], count);
                normal[b][a] = normal[a][b];
            }
        }
        return dot(residuals, residuals, count);
    }

    private static double dot(double[] u, double[] v, int count) {
        double sum = 0;
        for (int i = 0; i < count; i++) {
            sum += u[i] * v[i];
        }
        return sum;
    }
}
