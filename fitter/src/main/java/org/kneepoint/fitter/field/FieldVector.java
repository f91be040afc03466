package org.kneepoint.fitter.field;

/**
 * A field vector in Cartesian components: B in tesla or H in A/m, as the method that returns it says.
 *
 * @param x component along x
 * @param y component along y
 * @param z component along z (the magnetization)
 */
public record FieldVector(double x, double y, double z) {

    /** Euclidean length. */
    public double magnitude() {
        return Math.sqrt(x * x + y * y + z * z);
    }
}
