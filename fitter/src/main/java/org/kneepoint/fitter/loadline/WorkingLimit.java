package org.kneepoint.fitter.loadline;

import org.kneepoint.fitter.error.BadInputException;

/**
 * One end of the working-temperature range on a load line: the temperature (K, null when there is none),
 * why it ended there, and whether that temperature lies beyond the measured temperatures.
 *
 * @param temperature  K, or null for {@link LimitReason#NONE_IN_RANGE}
 * @param reason       why the range ends there
 * @param extrapolated whether the curve at that temperature is extrapolated
 */
public record WorkingLimit(Double temperature, LimitReason reason, boolean extrapolated) {

    /** No working temperature at all. */
    public static final WorkingLimit NONE = new WorkingLimit(null, LimitReason.NONE_IN_RANGE, false);

    public WorkingLimit {
        if (reason == null || (temperature == null) != (reason == LimitReason.NONE_IN_RANGE)) {
            throw new BadInputException("a working-temperature limit has a temperature exactly when one exists, got "
                    + temperature + " (" + reason + ")");
        }
    }
}
