package org.kneepoint.fitter.study;

import org.kneepoint.fitter.loadline.IntrinsicCurve;
import org.kneepoint.fitter.loadline.TemperatureModel;

/**
 * A temperature model whose curve at every temperature is perturbed alike ({@link PerturbedCurve}): a magnet whose Br
 * is 2 % high at the check temperature is taken as 2 % high at every temperature. Range, T0, Br(T)/Br(T0) and
 * extrapolation are the base model's.
 */
final class PerturbedModel implements TemperatureModel {

    private final TemperatureModel base;
    private final CurveScaling scaling;

    PerturbedModel(TemperatureModel base, CurveScaling scaling) {
        this.base = base;
        this.scaling = scaling;
    }

    /** {@code base} perturbed by {@code scaling}, or {@code base} itself when the scaling changes nothing. */
    static TemperatureModel of(TemperatureModel base, CurveScaling scaling) {
        return scaling.isNone() ? base : new PerturbedModel(base, scaling);
    }

    @Override
    public IntrinsicCurve at(double temperature) {
        return new PerturbedCurve(base.at(temperature), scaling);
    }

    @Override
    public double referenceTemperature() {
        return base.referenceTemperature();
    }

    @Override
    public double remanenceRatio(double temperature) {
        return base.remanenceRatio(temperature);
    }

    @Override
    public double lowestTemperature() {
        return base.lowestTemperature();
    }

    @Override
    public double highestTemperature() {
        return base.highestTemperature();
    }

    @Override
    public boolean isExtrapolated(double temperature) {
        return base.isExtrapolated(temperature);
    }
}
