package org.kneepoint.fitter.shape;

/**
 * A solid right circular cylinder magnetized along its axis (z), centred at the origin. All three
 * factors in closed form with γ = L/D: Nm exact with K and E (Chen, Brug, Goldfarb, IEEE Trans. Magn.
 * 27, 3601, 1991; Beleggia et al., J. Phys. D 38, 3333, 2005), Nf = d/dg[g·Nm(g)] at g = γ/2 in closed
 * form (derived here from the energy of the end discs), N0 = 1 − γ/√(γ² + 1).
 * Accepted aspect ratio L/D: {@value #MIN_ASPECT} to {@value #MAX_ASPECT}; within it the three
 * factors are accurate to about 1e-10 relative or better.
 *
 * @param diameter in metres
 * @param length   along the magnetization, in metres
 */
public record CylinderShape(double diameter, double length) implements FlatPoleShape {

    /** Smallest accepted length/diameter. */
    public static final double MIN_ASPECT = 1e-3;
    /** Largest accepted length/diameter. */
    public static final double MAX_ASPECT = 1e3;

    public CylinderShape {
        SizeChecks.positiveLength("diameter", diameter);
        SizeChecks.positiveLength("length", length);
        SizeChecks.ratioWithin("cylinder length/diameter", length / diameter, MIN_ASPECT, MAX_ASPECT);
    }

    /** Radius in metres. */
    public double radius() {
        return 0.5 * diameter;
    }

    @Override
    public DemagnetizingFactors demagnetizingFactors() {
        return CylinderDemagnetization.of(length / diameter);
    }

    @Override
    public double volume() {
        return 0.25 * Math.PI * diameter * diameter * length;
    }

    @Override
    public double lengthAlongMagnetization() {
        return length;
    }

    @Override
    public CylinderShape withLengthAlongMagnetization(double newLength) {
        return new CylinderShape(diameter, newLength);
    }
}
