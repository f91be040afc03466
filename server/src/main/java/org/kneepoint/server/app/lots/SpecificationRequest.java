package org.kneepoint.server.app.lots;

import java.util.EnumMap;
import java.util.Map;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.qualification.SpecifiedQuantity;

/**
 * A specification as typed in: the grade, the temperature and, per quantity, a minimum and a
 * typical value (SI; a ratio for squareness). Quantities not named keep what is stored.
 */
public record SpecificationRequest(String grade, double temperatureK, Map<SpecifiedQuantity, Double> minimums,
        Map<SpecifiedQuantity, Double> typicals) {

    public SpecificationRequest {
        if (minimums.isEmpty() && typicals.isEmpty()) {
            throw new BadInputException("a specification needs at least one quantity: give --br-min, --hcj-min, --bh-max-min, --hk-min,"
                    + " --squareness-min or --hcb-min (or a typical value)");
        }
        minimums = minimums.isEmpty() ? Map.of() : Map.copyOf(new EnumMap<>(minimums));
        typicals = typicals.isEmpty() ? Map.of() : Map.copyOf(new EnumMap<>(typicals));
    }
}
