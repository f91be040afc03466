package org.kneepoint.fitter.model.knee;

/** Ordinary least-squares line and parabola through (x, y) points, for temperature coefficients. */
final class LeastSquaresLine {

    private LeastSquaresLine() {
    }

    static double slope(double[] x, double[] y) {
        double meanX = 0;
        double meanY = 0;
        for (int i = 0; i < x.length; i++) {
            meanX += x[i];
            meanY += y[i];
        }
        meanX /= x.length;
        meanY /= x.length;
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
        org.apache.commons.math3.fitting.WeightedObservedPoints points = new org.apache.commons.math3.fitting.WeightedObservedPoints();
        for (int i = 0; i < x.length; i++) {
            points.add(x[i] - x0, y[i]);
        }
        return org.apache.commons.math3.fitting.PolynomialCurveFitter.create(2).fit(points.toList());
    }

    /** Coefficients {c0, c1} of y ≈ c0 + c1·(x − x0), least squares. */
    static double[] line(double[] x, double[] y, double x0) {
        double slope = slope(x, y);
        double meanX = 0;
        double meanY = 0;
        for (int i = 0; i < x.length; i++) {
            meanX += x[i];
            meanY += y[i];
        }
        meanX /= x.length;
        meanY /= x.length;
        return new double[] {meanY + slope * (x0 - meanX), slope};
    }
}
