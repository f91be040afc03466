package org.kneepoint.fitter.model.knee;

import java.util.List;

/**
 * The temperature model of a grade and its data-sheet coefficients relative to T0: α and β (1/K)
 * of the least-squares lines Br(T) = Br(T0)·(1 + α·(T − T0)) and HcJ(T) = HcJ(T0)·(1 + β·(T − T0)),
 * and with three or more temperatures the quadratic terms α2, β2 (1/K²) of the least-squares
 * parabolas (NaN otherwise); the slopes of μrec and of the relative knee width; the per-curve fits.
 */
public record TemperatureFit(FittedTemperatureModel model, List<KneeFit> fits, double referenceTemperatureK,
        double alpha, double beta, double alpha2, double beta2, double muRecSlope, double relativeWidthSlope) {

    public TemperatureFit {
        fits = List.copyOf(fits);
    }
}
