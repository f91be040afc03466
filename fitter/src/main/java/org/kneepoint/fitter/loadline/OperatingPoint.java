package org.kneepoint.fitter.loadline;

/**
 * Where the load line meets the curve: H (A/m, ≤ 0 in the second quadrant), B and J (T).
 *
 * @param h field strength, A/m
 * @param b flux density, T
 * @param j polarization J = B − μ0·H, T
 */
public record OperatingPoint(double h, double b, double j) {

    /** The energy product −B·H at the point, J/m³. */
    public double energyProduct() {
        return -b * h;
    }
}
