package org.kneepoint.fitter.select;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.TemperatureModel;

/**
 * A grade that may be chosen: its name, its curve as a function of temperature, and optionally a
 * price or cost index (any consistent unit; lower is cheaper).
 *
 * @param name  the grade's name
 * @param model its intrinsic curve at any temperature
 * @param price price or cost index, or null if unknown
 */
public record GradeCandidate(String name, TemperatureModel model, Double price) {

    public GradeCandidate {
        if (name == null || name.isBlank() || model == null) {
            throw new BadInputException("a grade candidate needs a name and a temperature model, got " + name);
        }
        if (price != null && !(price >= 0.0 && Double.isFinite(price))) {
            throw new BadInputException("price of grade " + name + " must be zero or positive, got " + price);
        }
    }
}
