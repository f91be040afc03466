package org.kneepoint.fitter.shape;

import org.kneepoint.fitter.error.BadInputException;

/**
 * Permeance coefficients Pc = −B/(μ0·H) = (1 − N)/N for the three kinds of demagnetizing
 * factor (docs/design.md §4): the slope of the open-circuit load line, dimensionless and positive.
 *
 * @param magnetometric from Nm
 * @param fluxmetric    from Nf
 * @param centrePoint   from N0
 */
public record PermeanceCoefficients(double magnetometric, double fluxmetric, double centrePoint) {

    public PermeanceCoefficients {
        check("magnetometric", magnetometric);
        check("fluxmetric", fluxmetric);
        check("centre-point", centrePoint);
    }

    /** The coefficient of the given kind. */
    public double coefficient(DemagnetizingKind kind) {
        return switch (kind) {
            case MAGNETOMETRIC -> magnetometric;
            case FLUXMETRIC -> fluxmetric;
            case CENTRE_POINT -> centrePoint;
        };
    }

    private static void check(String kind, double coefficient) {
        if (!(coefficient > 0.0 && Double.isFinite(coefficient))) {
            throw new BadInputException(kind + " permeance coefficient must be positive and finite, got " + coefficient);
        }
    }
}
