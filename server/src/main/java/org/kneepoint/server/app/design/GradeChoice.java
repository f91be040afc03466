package org.kneepoint.server.app.design;

import java.util.List;
import java.util.function.Function;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.server.app.wording.Temperatures;

/**
 * Which grade a design works on: a grade of the library by {@code name}, or one {@code typed} in — exactly one of
 * them. This is the one place of that rule for the command line, the JSON API and the pages; {@code names} says
 * how the front end calls the inputs, so the message names what the person typed.
 *
 * @param name  the grade of the library, or null
 * @param typed the typed-in values (all null when none were given)
 * @param names the front end's names of the inputs
 */
public record GradeChoice(String name, TypedGrade typed, InputNames names) {

    /** Temperatures this close to the reference (K) count as the reference: parsing 20C may differ from 293.15 by rounding. */
    private static final double REFERENCE_TOLERANCE = 1e-9;

    /**
     * How a front end names the grade's inputs in messages.
     *
     * @param grade   what a grade of the library is called, e.g. "GRADE" or "grade"
     * @param hint    how to name one, after "of the library", e.g. "" or " (grade=...)"
     * @param all     every typed-in value, e.g. "--br, --mu-rec, --hcj, --knee, --alpha, --beta, --reference-temperature"
     * @param needed  the three values a typed-in grade needs, e.g. "--br, --mu-rec and --hcj"
     * @param coefficients the two temperature coefficients, e.g. "--alpha and --beta"
     */
    public record InputNames(String grade, String hint, String all, String needed, String coefficients) {
    }

    /**
     * The model of the chosen grade at the {@code temperatures} (K) the design asks for; {@code stored} looks a grade of
     * the library up (called only when one is named). A typed-in grade asked about away from its reference temperature
     * needs both temperature coefficients (issue 11: a law must not be assumed flat).
     */
    public GradeModel model(Function<String, GradeModel> stored, List<Double> temperatures) {
        if (name == null) {
            String missing = "name a " + names.grade() + " of the library" + names.hint() + ", or type one in with " + names.needed();
            TemperatureModel model = typed.model(missing);
            for (double temperature : temperatures) {
                if (!typed.hasTemperatureLaw() && Math.abs(temperature - typed.reference()) > REFERENCE_TOLERANCE) {
                    throw new BadInputException("a typed-in grade at " + Temperatures.celsius(temperature) + ", away from its"
                            + " reference temperature " + Temperatures.celsius(typed.reference()) + ", needs " + names.coefficients()
                            + " (give 0 for a value that does not change)");
                }
            }
            return GradeModel.typed(model);
        }
        if (typed.given()) {
            throw new BadInputException("give either a " + names.grade() + " of the library or the typed-in " + names.all() + ", not both");
        }
        return stored.apply(name);
    }
}
