package org.kneepoint.server.library;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;

/**
 * A grade typed in rather than taken from the library: Br, μrec and HcJ at the reference temperature, optionally
 * the knee field Hk (without it an assumed square knee {@value #DEFAULT_RELATIVE_KNEE_WIDTH} of HcJ wide), the
 * temperature coefficients α and β in %/K (default 0) and the reference temperature (default 20 °C). Every value
 * is SI or null when not given.
 */
public record TypedGrade(Double br, Double muRec, Double hcj, Double knee, Double alpha, Double beta, Double referenceTemperature) {

    /** Knee width w/HcJ used when no knee field is given: an assumed square knee, not data. */
    public static final double DEFAULT_RELATIVE_KNEE_WIDTH = 0.02;

    /** Whether any value was given. */
    public boolean given() {
        return br != null || muRec != null || hcj != null || knee != null || alpha != null || beta != null
                || referenceTemperature != null;
    }

    /** The linear temperature law of the grade; {@code missing} says how to give Br, μrec and HcJ when one lacks. */
    public LinearTemperatureLaw law(String missing) {
        if (br == null || muRec == null || hcj == null) {
            throw new BadInputException(missing);
        }
        LinearRecoilKnee curve = knee == null
                ? new LinearRecoilKnee(br, muRec, hcj, DEFAULT_RELATIVE_KNEE_WIDTH * hcj)
                : LinearRecoilKnee.withKneeField(br, muRec, hcj, knee);
        return LinearTemperatureLaw.ofPercentPerKelvin(curve, alpha == null ? 0.0 : alpha, beta == null ? 0.0 : beta,
                referenceTemperature == null ? LinearTemperatureLaw.DEFAULT_REFERENCE_TEMPERATURE : referenceTemperature);
    }
}
