package org.kneepoint.fitter.model.ja;

import java.util.Arrays;
import java.util.Objects;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.units.MagneticConstant;

/**
 * Measured points (H, B) in measurement order, with the history that preceded them: the sample
 * starts demagnetized, visits the prior fields in order (for a second-quadrant curve, the
 * magnetizing field), moves to the first measured H, and then runs through the measured H
 * sequence {@code settlingPasses} times before the pass that is compared with the data.
 *
 * @param field          H, A/m
 * @param fluxDensity    B, tesla
 * @param priorField     fields visited before the first measured H, A/m; may be empty
 * @param settlingPasses passes over the measured H sequence before the compared pass, 0 to 20
 */
public record MeasuredLoop(double[] field, double[] fluxDensity, double[] priorField, int settlingPasses) {

    /** Fewest points a Jiles–Atherton fit accepts: five parameters need many more than five. */
    public static final int MINIMUM_POINTS = 20;

    public MeasuredLoop {
        if (field.length != fluxDensity.length) {
            throw new BadInputException("H has " + field.length + " values and B has " + fluxDensity.length
                    + "; expected one B per H");
        }
        if (field.length < MINIMUM_POINTS) {
            throw new BadInputException("the loop has " + field.length + " points; expected at least " + MINIMUM_POINTS);
        }
        requireFinite("H", field);
        requireFinite("B", fluxDensity);
        requireFinite("prior H", priorField);
        if (settlingPasses < 0 || settlingPasses > 20) {
            throw new BadInputException("settling passes = " + settlingPasses + "; expected 0 to 20");
        }
        if (range(field) == 0) {
            throw new BadInputException("H is flat (every point at " + field[0] + " A/m); expected a swept field");
        }
        if (range(fluxDensity) == 0) {
            throw new BadInputException("B is flat (every point at " + fluxDensity[0] + " T); expected a response to H");
        }
        field = field.clone();
        fluxDensity = fluxDensity.clone();
        priorField = priorField.clone();
    }

    /** A loop measured as B, started demagnetized, with no settling pass. */
    public static MeasuredLoop ofFluxDensity(double[] field, double[] fluxDensity) {
        return new MeasuredLoop(field, fluxDensity, new double[0], 0);
    }

    /** A loop measured as M (A/m), converted to B = μ0·(H + M). */
    public static MeasuredLoop ofMagnetization(double[] field, double[] magnetization, int settlingPasses) {
        if (field.length != magnetization.length) {
            throw new BadInputException("H has " + field.length + " values and M has " + magnetization.length
                    + "; expected one M per H");
        }
        double[] b = new double[field.length];
        for (int i = 0; i < b.length; i++) {
            b[i] = MagneticConstant.MU0 * (field[i] + magnetization[i]);
        }
        return new MeasuredLoop(field, b, new double[0], settlingPasses);
    }

    /** A second-quadrant curve measured after magnetizing at {@code magnetizingField}. */
    public static MeasuredLoop secondQuadrant(double[] field, double[] fluxDensity, double magnetizingField) {
        return new MeasuredLoop(field, fluxDensity, new double[] {magnetizingField}, 0);
    }

    @Override
    public double[] field() {
        return field.clone();
    }

    @Override
    public double[] fluxDensity() {
        return fluxDensity.clone();
    }

    @Override
    public double[] priorField() {
        return priorField.clone();
    }

    public int size() {
        return field.length;
    }

    /** M = B/μ0 − H at each point, A/m. */
    public double[] magnetization() {
        double[] m = new double[field.length];
        for (int i = 0; i < m.length; i++) {
            m[i] = fluxDensity[i] / MagneticConstant.MU0 - field[i];
        }
        return m;
    }

    private static void requireFinite(String name, double[] values) {
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new BadInputException(name + " at point " + (i + 1) + " is " + values[i] + "; expected a finite number");
            }
        }
    }

    private static double range(double[] values) {
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            low = Math.min(low, v);
            high = Math.max(high, v);
        }
        return high - low;
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof MeasuredLoop m && settlingPasses == m.settlingPasses && Arrays.equals(field, m.field)
                && Arrays.equals(fluxDensity, m.fluxDensity) && Arrays.equals(priorField, m.priorField);
    }

    @Override
    public int hashCode() {
        return Objects.hash(Arrays.hashCode(field), Arrays.hashCode(fluxDensity), Arrays.hashCode(priorField),
                settlingPasses);
    }

    @Override
    public String toString() {
        return "MeasuredLoop[" + field.length + " points, " + priorField.length + " prior fields, "
                + settlingPasses + " settling passes]";
    }
}
