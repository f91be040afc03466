package org.kneepoint.fitter.model.ja;

import java.util.Arrays;
import org.kneepoint.fitter.units.MagneticConstant;

/**
 * A simulated history: M and B at each applied field, in the order given.
 *
 * @param field         H, A/m
 * @param magnetization M, A/m
 */
public record Trajectory(double[] field, double[] magnetization) {

    public Trajectory {
        if (field.length != magnetization.length) {
            throw new IllegalArgumentException("field and magnetization differ in length");
        }
        field = field.clone();
        magnetization = magnetization.clone();
    }

    @Override
    public double[] field() {
        return field.clone();
    }

    @Override
    public double[] magnetization() {
        return magnetization.clone();
    }

    /** B = μ0·(H + M) at each point, tesla (docs/design.md §4). */
    public double[] fluxDensity() {
        double[] b = new double[field.length];
        for (int i = 0; i < b.length; i++) {
            b[i] = MagneticConstant.MU0 * (field[i] + magnetization[i]);
        }
        return b;
    }

    public int size() {
        return field.length;
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof Trajectory t && Arrays.equals(field, t.field)
                && Arrays.equals(magnetization, t.magnetization);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(field) + Arrays.hashCode(magnetization);
    }

    @Override
    public String toString() {
        return "Trajectory[" + field.length + " points]";
    }
}
