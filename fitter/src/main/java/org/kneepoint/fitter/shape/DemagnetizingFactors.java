package org.kneepoint.fitter.shape;

import org.kneepoint.fitter.error.BadInputException;

/**
 * The magnetometric, fluxmetric and centre-point demagnetizing factors of one magnet along its
 * magnetization (Chen, Brug, Goldfarb, IEEE Trans. Magn. 27, 3601, 1991), each strictly between
 * 0 and 1. For an ellipsoid the three are equal (Osborn, Phys. Rev. 67, 351, 1945).
 *
 * @param magnetometric Nm, volume average
 * @param fluxmetric    Nf, mid-plane average
 * @param centrePoint   N0, at the centre
 */
public record DemagnetizingFactors(double magnetometric, double fluxmetric, double centrePoint) {

    public DemagnetizingFactors {
        check("magnetometric", magnetometric);
        check("fluxmetric", fluxmetric);
        check("centre-point", centrePoint);
    }

    /** The three factors equal, as for an ellipsoid. */
    public static DemagnetizingFactors uniform(double factor) {
        return new DemagnetizingFactors(factor, factor, factor);
    }

    /** The factor of the given kind. */
    public double factor(DemagnetizingKind kind) {
        return switch (kind) {
            case MAGNETOMETRIC -> magnetometric;
            case FLUXMETRIC -> fluxmetric;
            case CENTRE_POINT -> centrePoint;
        };
    }

    /** Pc = (1 − N)/N for each kind (docs/design.md §4; exact for an ellipsoid in open circuit). */
    public PermeanceCoefficients permeanceCoefficients() {
        return new PermeanceCoefficients(toPermeance(magnetometric), toPermeance(fluxmetric), toPermeance(centrePoint));
    }

    private static double toPermeance(double factor) {
        return (1.0 - factor) / factor;
    }

    private static void check(String kind, double factor) {
        if (!(factor > 0.0 && factor < 1.0)) {
            throw new BadInputException(kind + " demagnetizing factor must lie strictly between 0 and 1, got " + factor);
        }
    }
}
