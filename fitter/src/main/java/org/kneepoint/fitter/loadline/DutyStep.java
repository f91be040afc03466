package org.kneepoint.fitter.loadline;

import org.kneepoint.fitter.error.BadInputException;

/**
 * One step of a duty sequence: the magnet brought to {@code temperature} (K) under a field against the
 * magnetization in either convention ({@link AppliedField}).
 *
 * @param temperature K
 * @param field       the step's field and its convention
 */
public record DutyStep(double temperature, AppliedField field) {

    public DutyStep {
        if (!(temperature > 0.0) || !Double.isFinite(temperature)) {
            throw new BadInputException("duty step temperature must be a positive finite number of kelvin, got " + temperature);
        }
        if (field == null) {
            throw new BadInputException("a duty step needs a field (0 for none)");
        }
    }

    /** A step with a field in the circuit convention, Ha ≥ 0 A/m. */
    public DutyStep(double temperature, double opposingField) {
        this(temperature, AppliedField.opposing(opposingField));
    }
}
