package org.kneepoint.fitter.model.knee;

import java.util.List;

/**
 * The knee of a rounded curve that bends from H = 0 on (cast AlNiCo): f = (1 − t)/(1 − a·t + c·t·(1 − t))
 * at the reduced field t = −H/HcJ, a rational (hyperbolic) form after the classic hyperbolic
 * approximation of AlNiCo demagnetization curves, B = Br·(1 − t)/(1 − a·t) (the Fröhlich–Kennelly
 * relation applied to the second quadrant; R. J. Parker, "Advances in Permanent Magnetism", Wiley,
 * 1990, ch. 5 — from memory), with a curvature term c of our own. Outside 0 ≤ t ≤ 1 it continues along
 * its end tangents, so it stays monotone and finite. The denominator is kept positive on [0, 1].
 *
 * @param bend      a &lt; 1: how far the curve bows out (0 is a straight line to HcJ)
 * @param curvature c: how the bow is shared between the top and the bottom of the curve
 */
public record RationalShape(double bend, double curvature) implements KneeShape {

    static final double MIN_BEND = -10.0;
    static final double MAX_BEND = 0.995;
    static final double MAX_CURVATURE = 20.0;
    private static final double SMALLEST_DENOMINATOR = 1e-3;

    @Override
    public double fraction(double t, double logT) {
        return fraction(t, logT, null);
    }

    @Override
    public void fractions(double[] t, double[] logT, int count, double[] f, double[][] d) {
        double[] point = new double[3];
        for (int i = 0; i < count; i++) {
            f[i] = fraction(t[i], logT[i], point);
            for (int k = 0; k < 3; k++) {
                d[k][i] = point[k];
            }
        }
    }

    @Override
    public double fraction(double t, double logT, double[] d) {
        if (t < 0) {
            double slope = -1.0 + bend - curvature;
            if (d != null) {
                d[0] = slope;
                d[1] = t;
                d[2] = -t;
            }
            return 1.0 + slope * t;
        }
        if (t > 1) {
            double slope = -1.0 / (1.0 - bend);
            if (d != null) {
                d[0] = slope;
                d[1] = slope * (t - 1.0) / (1.0 - bend);
                d[2] = 0.0;
            }
            return slope * (t - 1.0);
        }
        double numerator = 1.0 - t;
        double denominator = 1.0 - bend * t + curvature * t * numerator;
        double f = numerator / denominator;
        if (d != null) {
            double square = denominator * denominator;
            d[0] = (-denominator - numerator * (-bend + curvature * (1.0 - 2.0 * t))) / square;
            d[1] = numerator * t / square;
            d[2] = -numerator * t * numerator / square;
        }
        return f;
    }

    @Override
    public double[] parameters() {
        return new double[] {bend, curvature};
    }

    @Override
    public List<String> parameterNames() {
        return List.of("rationalBend", "rationalCurvature");
    }

    @Override
    public RationalShape with(double[] p) {
        double bend = SwitchingShape.clamp(p[0], MIN_BEND, MAX_BEND);
        double curvature = Math.min(MAX_CURVATURE, p[1]);
        for (int i = 0; i < 60 && smallestDenominator(bend, curvature) < SMALLEST_DENOMINATOR; i++) {
            curvature *= 0.5;
        }
        return new RationalShape(bend, curvature);
    }

    /** Smallest of 1 − a·t + c·t·(1 − t) on [0, 1]: at an end, or at the vertex when c &lt; 0. */
    private static double smallestDenominator(double bend, double curvature) {
        double smallest = Math.min(1.0, 1.0 - bend);
        if (curvature < 0) {
            double vertex = (curvature - bend) / (2.0 * curvature);
            if (vertex > 0 && vertex < 1) {
                smallest = Math.min(smallest, 1.0 - bend * vertex + curvature * vertex * (1.0 - vertex));
            }
        }
        return smallest;
    }

    @Override
    public String form() {
        return "rational";
    }
}
