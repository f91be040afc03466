package org.kneepoint.fitter.model.curieweiss;

import org.kneepoint.fitter.model.MatrixCopy;
import java.util.Arrays;
import java.util.Objects;

/**
 * A Curie–Weiss fit and what it is worth. Standard errors are infinite when there are no degrees
 * of freedom (three points); the correlation matrix (order C, θ, χ0) does not need them.
 *
 * @param parameters        fitted C, θ, χ0
 * @param curieConstantError standard error of C, kelvin
 * @param weissTemperatureError standard error of θ, kelvin
 * @param temperatureIndependentError standard error of χ0
 * @param correlation       3 × 3 correlation matrix of (C, θ, χ0)
 * @param rmsResidual       root-mean-square residual in χ
 * @param points            number of points used
 * @param temperatureMin    lowest temperature used, kelvin
 * @param temperatureMax    highest temperature used, kelvin
 * @param behaviour         sign classification of the measured χ
 * @param curieWeissSignificant whether C differs from 0 by more than three standard errors
 * @param evaluations       profile evaluations spent on θ
 */
public record CurieWeissFit(CurieWeissParameters parameters, double curieConstantError, double weissTemperatureError,
        double temperatureIndependentError, double[][] correlation, double rmsResidual, int points,
        double temperatureMin, double temperatureMax, SusceptibilityBehaviour behaviour,
        boolean curieWeissSignificant, int evaluations) {

    public CurieWeissFit {
        correlation = MatrixCopy.of(correlation);
    }

    @Override
    public double[][] correlation() {
        return MatrixCopy.of(correlation);
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof CurieWeissFit f && parameters.equals(f.parameters)
                && Double.compare(curieConstantError, f.curieConstantError) == 0
                && Double.compare(weissTemperatureError, f.weissTemperatureError) == 0
                && Double.compare(temperatureIndependentError, f.temperatureIndependentError) == 0
                && Arrays.deepEquals(correlation, f.correlation) && Double.compare(rmsResidual, f.rmsResidual) == 0
                && points == f.points && Double.compare(temperatureMin, f.temperatureMin) == 0
                && Double.compare(temperatureMax, f.temperatureMax) == 0 && behaviour == f.behaviour
                && curieWeissSignificant == f.curieWeissSignificant && evaluations == f.evaluations;
    }

    @Override
    public int hashCode() {
        return Objects.hash(parameters, curieConstantError, weissTemperatureError, temperatureIndependentError,
                Arrays.deepHashCode(correlation), rmsResidual, points, temperatureMin, temperatureMax, behaviour,
                curieWeissSignificant, evaluations);
    }

    @Override
    public String toString() {
        return "CurieWeissFit[" + parameters + ", errors C " + curieConstantError + " K, θ " + weissTemperatureError
                + " K, χ0 " + temperatureIndependentError + ", rms " + rmsResidual + ", " + points + " points, "
                + behaviour + (curieWeissSignificant ? ", Curie–Weiss" : "") + "]";
    }
}
