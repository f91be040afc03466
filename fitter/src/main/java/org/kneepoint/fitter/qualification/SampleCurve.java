package org.kneepoint.fitter.qualification;

import org.kneepoint.fitter.curve.DemagnetizationCurve;

/** One measured curve of a lot: the sample it was measured on and the curve (with its temperature). */
public record SampleCurve(String sample, DemagnetizationCurve curve) {

    public SampleCurve {
        if (sample == null || sample.isBlank()) {
            throw new IllegalArgumentException("a lot's curve needs its sample's name");
        }
        if (curve == null || curve.temperatureK() == null) {
            throw new IllegalArgumentException("a lot's curve needs a temperature");
        }
    }

    public double temperatureK() {
        return curve.temperatureK();
    }
}
