package org.kneepoint.fitter.shape;

import org.kneepoint.fitter.error.BadInputException;

/**
 * Checks of the sizes given to a shape, with messages that say what was expected. Ratio limits
 * are compared with a relative allowance of {@value #ROUNDING} so that a size typed exactly at a
 * documented limit passes whatever the unit conversion rounded (10 mm and 9.9 mm give
 * 0.9900000000000001, not 0.99).
 */
final class SizeChecks {

    /** Relative allowance for rounding at a limit: a few hundred ulps, far below any physical meaning. */
    static final double ROUNDING = 1e-12;

    private SizeChecks() {
    }

    /** Returns the length if it is positive and finite, else throws BadInputException. */
    static double positiveLength(String name, double value) {
        if (!(value > 0.0) || !Double.isFinite(value)) {
            throw new BadInputException(name + " must be a positive finite length in metres, got " + value);
        }
        return value;
    }

    /** Throws BadInputException unless ratio ≥ lower. */
    static void ratioAtLeast(String ratioName, double ratio, double lower) {
        if (!(ratio >= lower * (1 - ROUNDING))) {
            throw new BadInputException(ratioName + " must be at least " + lower + " (where the formulas keep their accuracy), got " + ratio);
        }
    }

    /** Throws BadInputException unless ratio ≤ upper. */
    static void ratioAtMost(String ratioName, double ratio, double upper) {
        if (!(ratio <= upper * (1 + ROUNDING))) {
            throw new BadInputException(ratioName + " must be at most " + upper + " (where the formulas keep their accuracy), got " + ratio);
        }
    }

    /** Throws BadInputException unless lower ≤ ratio ≤ upper. */
    static void ratioWithin(String ratioName, double ratio, double lower, double upper) {
        if (!(ratio >= lower * (1 - ROUNDING) && ratio <= upper * (1 + ROUNDING))) {
            throw new BadInputException(ratioName + " must lie between " + lower + " and " + upper
                    + " (where the formulas keep their accuracy), got " + ratio);
        }
    }
}
