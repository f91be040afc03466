package org.kneepoint.server.app.design;

import org.kneepoint.fitter.select.DesignShortfalls;
import org.kneepoint.fitter.select.Shortfall;
import org.kneepoint.server.app.wording.EngineeringUnits;

/**
 * One {@link Shortfall} in words, with the values of the point it was found at; the same sentences for a check, a duty
 * step, a sweep's temperature and a grade of a selection.
 *
 * @param temperature        K, the temperature asked for
 * @param fluxDensity        B at the operating point, T
 * @param loss               the irreversible loss, a fraction
 * @param lossLimit          the loss allowed, a fraction
 * @param minimumFluxDensity the least B asked for, T, or null
 * @param maximumWorking     the highest working temperature for the limit, K, or null
 * @param minimumWorking     the lowest working temperature for the limit, K, or null
 */
record ShortfallWording(double temperature, double fluxDensity, double loss, double lossLimit, Double minimumFluxDensity,
        Double maximumWorking, Double minimumWorking) {

    /** The shortfall as one sentence. */
    String words(Shortfall shortfall) {
        String limit = EngineeringUnits.percent(lossLimit);
        String at = EngineeringUnits.celsius(temperature);
        return switch (shortfall.requirement()) {
            case PERMANENT_MAGNET -> "not a permanent magnet: HcJ " + EngineeringUnits.field(DesignShortfalls.PERMANENT_MAGNET_HCJ
                    - shortfall.by()) + " at " + at + " is below the " + EngineeringUnits.field(DesignShortfalls.PERMANENT_MAGNET_HCJ)
                    + " that even the least coercive permanent magnets exceed (a soft material's curve)";
            case MINIMUM_FLUX_DENSITY -> "flux density " + EngineeringUnits.tesla(fluxDensity) + " is below the minimum "
                    + EngineeringUnits.tesla(minimumFluxDensity);
            case MAXIMUM_IRREVERSIBLE_LOSS -> "irreversible loss " + EngineeringUnits.percent(loss) + " exceeds the maximum " + limit;
            case TEMPERATURE_RANGE -> at + " lies " + EngineeringUnits.number(shortfall.by())
                    + " K outside the range of the grade's temperature model";
            case POSITIVE_FLUX_DENSITY -> "operating point with B = " + EngineeringUnits.tesla(fluxDensity)
                    + ": not above zero, the magnet works in the third quadrant";
            case KNEE_MARGIN -> "margin to the knee is negative: the operating point lies " + EngineeringUnits.field(shortfall.by())
                    + " below the knee (J = 0.9·Br)";
            case MAXIMUM_WORKING_TEMPERATURE -> "maximum working temperature " + EngineeringUnits.celsius(maximumWorking) + " for the "
                    + limit + " limit lies below the " + at + " asked for";
            case MINIMUM_WORKING_TEMPERATURE -> "minimum working temperature " + EngineeringUnits.celsius(minimumWorking) + " for the "
                    + limit + " limit lies above the " + at + " asked for";
            case WORKING_TEMPERATURE_FOUND -> "maximum working temperature not found in the model's range: the loss exceeds the "
                    + limit + " limit at every temperature the model describes";
        };
    }
}
