package org.kneepoint.fitter.model.curieweiss;

import org.kneepoint.fitter.error.BadInputException;

/**
 * The Curie–Weiss law χ(T) = C/(T − θ) + χ0 (Kothari, Math. Proc. Camb. Phil. Soc. 28, 338, 1932),
 * valid only above θ.
 *
 * @param curieConstant                       C, kelvin (SI volume susceptibility × K)
 * @param weissTemperature                    θ, kelvin
 * @param temperatureIndependentSusceptibility χ0, dimensionless
 */
public record CurieWeissParameters(double curieConstant, double weissTemperature,
        double temperatureIndependentSusceptibility) {

    public CurieWeissParameters {
        if (!Double.isFinite(curieConstant) || !Double.isFinite(weissTemperature)
                || !Double.isFinite(temperatureIndependentSusceptibility)) {
            throw new BadInputException("Curie–Weiss parameters C = " + curieConstant + " K, θ = " + weissTemperature
                    + " K, χ0 = " + temperatureIndependentSusceptibility + " must all be finite");
        }
    }

    /** χ at temperature T, which must lie above θ. */
    public double susceptibility(double temperature) {
        if (!(temperature > weissTemperature)) {
            throw new BadInputException("temperature " + temperature + " K is not above the Weiss temperature θ = "
                    + weissTemperature + " K; the Curie–Weiss law holds only for T > θ");
        }
        return curieConstant / (temperature - weissTemperature) + temperatureIndependentSusceptibility;
    }
}
