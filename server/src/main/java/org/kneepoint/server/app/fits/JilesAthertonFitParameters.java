package org.kneepoint.server.app.fits;

import org.kneepoint.fitter.model.ja.JilesAthertonParameters;

/**
 * The five Jiles–Atherton parameters, SI, as a saved fit stores them and as the fit and loop documents write them:
 * Ms (A/m), a (A/m), k (A/m), c and α.
 */
public record JilesAthertonFitParameters(double ms, double a, double k, double c, double alpha) {

    /** The parameters of a model. */
    public static JilesAthertonFitParameters of(JilesAthertonParameters p) {
        return new JilesAthertonFitParameters(p.ms(), p.a(), p.k(), p.c(), p.alpha());
    }
}
