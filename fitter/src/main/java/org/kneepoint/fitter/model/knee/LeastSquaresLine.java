package org.kneepoint.fitter.model.knee;

import org.hipparchus.fitting.PolynomialCurveFitter;
import org.hipparchus.fitting.WeightedObservedPoints;

/** Ordinary least-squares line and parabola (Hipparchus's polynomial fitter) through (x, y) points, for temperature coefficients. */
final class LeastSquaresLine {

    private LeastSquaresLine() {
    }

    static double slope(double[] x, double[] y) {
        double meanX = mean(x);
        double meanY = mean(y);
        double sxy = 0;
        double sxx = 0;
        for (int i = 0; i < x.length; i++) {
            sxy += (x[i] - meanX) * (y[i] - meanY);
            sxx += (x[i] - meanX) * (x[i] - meanX);
        }
        return sxy / sxx;
    }

    /** Coefficients {c0, c1, c2} of y ≈ c0 + c1·(x − x0) + c2·(x − x0)², least squares (needs 3 distinct x). */
    static double[] parabola(double[] x, double[] y, double x0) {
        WeightedObservedPoints points = new WeightedObservedPoints();
        for (int i = 0; i < x.length; i++) {
            points.add(x[i] - x0, y[i]);
        }
        return PolynomialCurveFitter.create(2).fit(points.toList());
    }

    /** Coefficients {c0, c1} of y ≈ c0 + c1·(x − x0), least squares. */
    static double[] line(double[] x, double[] y, double x0) {
        double slope = slope(x, y);
        return new double[] {mean(y) + slope * (x0 - mean(x)), slope};
    }

    private static double mean(double[] values) {
        double sum = 0;
        for (double value : values) {
            sum += value;
        }
        return sum / values.length;
    }
}
