package org.kneepoint.server.app.fits;

import com.fasterxml.jackson.annotation.JsonUnwrapped;
import java.util.List;
import org.kneepoint.fitter.model.knee.KneeFit;
import org.kneepoint.fitter.model.knee.TemperatureFit;

/**
 * A temperature model as a saved temperature fit stores it and as its document begins: the reference temperature,
 * the coefficients of Br (α) and HcJ (β) in %/K with their quadratic terms in %/K² (null when not fitted), the slopes
 * of μrec and of the relative knee width per kelvin, and the knee fit at each measured temperature.
 */
public record TemperatureFitParameters(double referenceTemperatureK, double alphaPercentPerK, double betaPercentPerK,
        Double alpha2PercentPerK2, Double beta2PercentPerK2, double muRecSlopePerK, double relativeKneeWidthSlopePerK,
        List<KneeAtTemperature> fits) {

    public TemperatureFitParameters {
        fits = List.copyOf(fits);
    }

    /** The knee model's parameters at one measured temperature, with Hk and the RMS residual in J there. */
    public record KneeAtTemperature(@JsonUnwrapped KneeFitParameters parameters, Double temperatureK, double hk, double rmsJ) {

        static KneeAtTemperature of(KneeFit knee) {
            return new KneeAtTemperature(KneeFitParameters.of(knee.model()), knee.temperatureK(), knee.hk(), knee.rmsJ());
        }
    }

    /** The parameters of a fitted temperature model. */
    public static TemperatureFitParameters of(TemperatureFit fit) {
        return new TemperatureFitParameters(fit.referenceTemperatureK(), 100 * fit.alpha(), 100 * fit.beta(), finite(100 * fit.alpha2()),
                finite(100 * fit.beta2()), fit.muRecSlope(), fit.relativeWidthSlope(), fit.fits().stream().map(KneeAtTemperature::of).toList());
    }

    private static Double finite(double value) {
        return Double.isFinite(value) ? value : null;
    }
}
