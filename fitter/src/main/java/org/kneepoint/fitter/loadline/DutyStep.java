package org.kneepoint.fitter.loadline;

import org.kneepoint.fitter.error.BadInputException;

/**
 * One step of a duty sequence: the magnet brought to {@code temperature} (K) under an opposing field
 * {@code opposingField} (A/m, ≥ 0).
 *
 * @param temperature   K
 * @param opposingField Ha, A/m
 */
public record DutyStep(double temperature, double opposingField) {

    public DutyStep {
        if (!(temperature > 0.0) || !Double.isFinite(temperature)) {
            throw new BadInputException("duty step temperature must be a positive finite number of kelvin, got " + temperature);
        }
        if (!(opposingField >= 0.0) || !Double.isFinite(opposingField)) {
            throw new BadInputException("duty step opposing field must be zero or positive in A/m, got " + opposingField);
        }
    }
}
