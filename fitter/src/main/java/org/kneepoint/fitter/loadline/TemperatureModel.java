package org.kneepoint.fitter.loadline;

/**
 * A grade's intrinsic curve as a function of temperature (kelvin): the seam where a fitted
 * temperature model plugs in. {@link LinearTemperatureLaw} is the linear law in use until then.
 */
public interface TemperatureModel {

    /** The curve at {@code temperature} K, inside [{@link #lowestTemperature()}, {@link #highestTemperature()}]. */
    IntrinsicCurve at(double temperature);

    /** T0, K: the temperature the coefficients refer to and losses are reported at. */
    double referenceTemperature();

    /** Br(T)/Br(T0), the reversible change of remanence. */
    double remanenceRatio(double temperature);

    /** Lowest temperature the model describes, K. */
    double lowestTemperature();

    /** Highest temperature the model describes, K. */
    double highestTemperature();

    /** Whether the curve at {@code temperature} rests on data beyond the measured temperatures; a law typed in never does. */
    default boolean isExtrapolated(double temperature) {
        return false;
    }

    /**
     * The irreversible loss fraction after exposure to {@code line} at {@code temperature} ({@link IrreversibleLoss}, by
     * the recoil line through the operating point on the curve at that temperature). A model may keep what it computed
     * ({@link RememberedLosses}); the value is the same either way.
     */
    default double irreversibleLoss(LoadLine line, double temperature) {
        IntrinsicCurve curve = at(temperature);
        return IrreversibleLoss.after(curve, line.on(curve));
    }
}
