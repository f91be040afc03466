package org.kneepoint.fitter.model.knee;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import org.kneepoint.fitter.error.NumericalFailureException;

/**
 * Levenberg–Marquardt least squares specialised to the four knee parameters (Br, μrec, HcJ, w):
 * each iteration forms the 4 × 4 normal equations JᵀJ·δ = Jᵀr from one pass over the points (one
 * exponential a point, the analytic derivatives of {@link KneeResidual}) and solves them with
 * Marquardt's diagonal damping (D. W. Marquardt, "An algorithm for least-squares estimation of
 * nonlinear parameters", J. SIAM 11(2), 431–441, 1963). A general-purpose optimizer spends most of
 * its time on matrix objects for so small a problem; this one meets the 0.2 ms budget for a
 * 500-point curve, and the tests check that it lands where Commons Math's optimizer does.
 */
final class KneeLeastSquares {

    private static final int MAX_ITERATIONS = 5000;
    private static final double RELATIVE_TOLERANCE = 1e-10;

    private final double[] h;
    private final double[] j;
    private final Bounds bounds;

    /** Parameter bounds applied after each step: Br in (0, 3 T], μrec in [1, 2], HcJ &gt; 0, w in [1e-4, 2]·HcJ. */
    record Bounds(double hcjFloor) {
        double[] apply(double[] p) {
            double br = Math.min(3.0, Math.max(1e-3, p[0]));
            double hcj = Math.max(hcjFloor, p[2]);
            double muRec = Math.min(Math.min(2.0, Math.max(1.0, p[1])), 1 + 0.999 * br / (MU0 * hcj));
            double width = Math.min(2 * hcj, Math.max(1e-4 * hcj, p[3]));
            return new double[] {br, muRec, hcj, width};
        }
    }

    /** The optimum: parameters, the unscaled covariance (JᵀJ)⁻¹, RMS residual and the work done. */
    record Solution(double[] parameters, double[][] inverseNormalMatrix, double rms, int iterations, int evaluations) {
    }

    KneeLeastSquares(double[] h, double[] j, Bounds bounds) {
        this.h = h;
        this.j = j;
        this.bounds = bounds;
    }

    Solution solve(double[] start) {
        double[] p = bounds.apply(start);
        double[][] normal = new double[4][4];
        double[] gradient = new double[4];
        double cost = accumulate(p, normal, gradient);
        int evaluations = 1;
        double lambda = 1e-3;
        int iteration = 0;
        for (; iteration < MAX_ITERATIONS; iteration++) {
            double[] step = FourByFour.solveDamped(normal, gradient, lambda);
            double[] trial = bounds.apply(new double[] {p[0] + step[0], p[1] + step[1], p[2] + step[2], p[3] + step[3]});
            double[][] trialNormal = new double[4][4];
            double[] trialGradient = new double[4];
            double trialCost = accumulate(trial, trialNormal, trialGradient);
            evaluations++;
            if (trialCost < cost) {
                boolean converged = cost - trialCost <= RELATIVE_TOLERANCE * cost || smallStep(p, trial);
                p = trial;
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
        if (iteration == MAX_ITERATIONS) {
            throw new NumericalFailureException("the knee model did not converge in " + MAX_ITERATIONS
                    + " iterations; the curve may not have the shape of a recoil line with one knee");
        }
        if (!Double.isFinite(cost)) {
            throw new NumericalFailureException("the knee model's residuals became infinite; the curve may not have one knee");
        }
        return new Solution(p, FourByFour.inverse(normal), Math.sqrt(cost / h.length), iteration + 1, evaluations);
    }

    private static boolean smallStep(double[] from, double[] to) {
        for (int i = 0; i < 4; i++) {
            if (Math.abs(to[i] - from[i]) > RELATIVE_TOLERANCE * Math.abs(from[i])) {
                return false;
            }
        }
        return true;
    }

    /** Sum of squared residuals at p; fills JᵀJ and Jᵀr. */
    private double accumulate(double[] p, double[][] normal, double[] gradient) {
        double br = p[0];
        double slope = MU0 * (p[1] - 1);
        double hcj = p[2];
        double width = p[3];
        double depth = br - slope * hcj;
        double[] d = new double[4];
        double cost = 0;
        for (int i = 0; i < h.length; i++) {
            double e = Math.exp(-(h[i] + hcj) / width);
            double r = j[i] - (br + slope * h[i] - depth * e);
            d[0] = 1 - e;
            d[1] = MU0 * (h[i] + hcj * e);
            d[2] = slope * e + depth * e / width;
            d[3] = -depth * e * (h[i] + hcj) / (width * width);
            cost += r * r;
            for (int a = 0; a < 4; a++) {
                gradient[a] += d[a] * r;
                for (int b = a; b < 4; b++) {
                    normal[a][b] += d[a] * d[b];
                }
            }
        }
        for (int a = 0; a < 4; a++) {
            for (int b = 0; b < a; b++) {
                normal[a][b] = normal[b][a];
            }
        }
        return cost;
    }
}
