package org.kneepoint.fitter.field;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.units.MagneticConstant;

/** Checks a remanence and converts it to the magnetization M = Br/μ0 (docs/design.md §4). */
final class Magnetization {

    private Magnetization() {
    }

    /** M in A/m for a positive finite remanence in tesla. */
    static double fromRemanence(double remanence) {
        if (!(remanence > 0.0) || !Double.isFinite(remanence)) {
            throw new BadInputException("remanence must be a positive finite flux density in tesla, got " + remanence);
        }
        return remanence / MagneticConstant.MU0;
    }
}
