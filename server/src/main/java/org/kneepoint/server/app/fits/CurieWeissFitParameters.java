package org.kneepoint.server.app.fits;

import org.kneepoint.fitter.model.curieweiss.CurieWeissParameters;

/**
 * The Curie–Weiss law's parameters as a saved fit stores them and as its document begins: the Curie constant C (K),
 * the Weiss temperature θ (K) and the temperature-independent susceptibility χ0 (SI volume).
 */
public record CurieWeissFitParameters(double curieConstant, double weissTemperatureK, double chi0) {

    /** The parameters of a fitted law. */
    public static CurieWeissFitParameters of(CurieWeissParameters p) {
        return new CurieWeissFitParameters(p.curieConstant(), p.weissTemperature(), p.temperatureIndependentSusceptibility());
    }
}
