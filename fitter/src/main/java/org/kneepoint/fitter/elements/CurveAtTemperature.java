package org.kneepoint.fitter.elements;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.IntrinsicCurve;
import org.kneepoint.fitter.loadline.TemperatureModel;

/**
 * The grade's curve at the temperature of the element at hand, with its knee: looked up once per temperature met in
 * a row, since a solver's elements mostly share one temperature and a curve's knee takes a root search.
 */
final class CurveAtTemperature {

    private final TemperatureModel model;
    private double temperature = Double.NaN;
    private IntrinsicCurve curve;
    private double knee;
    private boolean extrapolated;

    CurveAtTemperature(TemperatureModel model) {
        this.model = model;
    }

    /** Moves to {@code kelvin}; a temperature outside the model is bad input at element {@code i} of {@code table}. */
    void moveTo(double kelvin, ElementField table, int i) {
        if (kelvin == temperature) {
            return;
        }
        try {
            curve = model.at(kelvin);
        } catch (BadInputException outside) {
            throw new BadInputException(table.location(i), outside.getMessage());
        }
        knee = curve.kneeField().orElse(Double.NaN);
        temperature = kelvin;
        extrapolated |= model.isExtrapolated(kelvin);
    }

    IntrinsicCurve curve() {
        return curve;
    }

    /** The knee field (negative A/m), NaN when the curve has none. */
    double knee() {
        return knee;
    }

    /** Whether any temperature moved to so far rests on an extrapolated curve. */
    boolean extrapolated() {
        return extrapolated;
    }
}
