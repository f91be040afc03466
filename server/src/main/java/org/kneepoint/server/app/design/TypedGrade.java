package org.kneepoint.server.app.design;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.BoundedTemperatureModel;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.fitter.model.knee.KneeCurve;
import org.kneepoint.fitter.model.knee.KneeTemperatureLaw;
import org.kneepoint.fitter.model.knee.TypedKnee;

/**
 * A grade typed in rather than taken from the library: Br, μrec and HcJ at the reference temperature, optionally
 * the knee field Hk (without it an assumed square knee of switching width {@value #DEFAULT_RELATIVE_KNEE_WIDTH}·HcJ),
 * on the same knee model as a fitted grade ({@link TypedKnee}: J(−Hk) = 0.9·Br, slope μrec at H = 0), the
 * temperature coefficients α and β in %/K and the reference temperature (default 20 °C). Without both α and β the
 * grade is known only at its reference temperature (a check elsewhere is refused by {@link GradeChoice}; 0 may be
 * given explicitly). Every value is SI or null when not given.
 */
public record TypedGrade(Double br, Double muRec, Double hcj, Double knee, Double alpha, Double beta, Double referenceTemperature) {

    /** Switching width σ (relative to HcJ) used when no knee field is given: an assumed square knee, not data. */
    public static final double DEFAULT_RELATIVE_KNEE_WIDTH = 0.02;

    /** Whether any value was given. */
    public boolean given() {
        return br != null || muRec != null || hcj != null || knee != null || alpha != null || beta != null
                || referenceTemperature != null;
    }

    /** Whether both temperature coefficients were given (either may be 0). */
    public boolean hasTemperatureLaw() {
        return alpha != null && beta != null;
    }

    /** T0, K: the given reference temperature or 20 °C. */
    public double reference() {
        return referenceTemperature == null ? LinearTemperatureLaw.DEFAULT_REFERENCE_TEMPERATURE : referenceTemperature;
    }

    /**
     * The grade's temperature model: its linear law, or, without both α and β, that law known only at T0 (so no
     * working-temperature search pretends to know more).
     */
    public TemperatureModel model(String missing) {
        KneeTemperatureLaw law = law(missing);
        return hasTemperatureLaw() ? law : BoundedTemperatureModel.within(law, reference(), reference(),
                "the reference temperature: without α and β the grade is known only there");
    }

    /** The linear temperature law of the grade's knee model; {@code missing} says how to give Br, μrec and HcJ when one lacks. */
    public KneeTemperatureLaw law(String missing) {
        if (br == null || muRec == null || hcj == null) {
            throw new BadInputException(missing);
        }
        KneeCurve curve = knee == null ? TypedKnee.square(br, muRec, hcj, DEFAULT_RELATIVE_KNEE_WIDTH)
                : TypedKnee.withKneeField(br, muRec, hcj, knee);
        return new KneeTemperatureLaw(curve, alpha == null ? 0.0 : alpha, beta == null ? 0.0 : beta, reference());
    }
}
