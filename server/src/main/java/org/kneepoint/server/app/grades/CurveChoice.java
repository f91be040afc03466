package org.kneepoint.server.app.grades;

import java.util.List;
import java.util.stream.Collectors;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/**
 * Picks the one curve a command works on from the curves of a file or a grade: the only one, or
 * the one at the temperature asked for ({@code --temperature}, matched within
 * {@value #SAME_TEMPERATURE_K} K). Where several curves share that temperature the first in
 * stored order is taken.
 */
public final class CurveChoice {

    static final double SAME_TEMPERATURE_K = 0.005;
    private static final Unit CELSIUS = UnitCatalog.require("°C", Dimension.TEMPERATURE);

    private CurveChoice() {
    }

    public static DemagnetizationCurve choose(List<DemagnetizationCurve> curves, Double temperatureK, String where) {
        if (curves.isEmpty()) {
            throw new BadInputException(InputLocation.of(where), "holds no curve to fit");
        }
        if (temperatureK == null) {
            if (temperatures(curves).size() > 1) {
                throw new BadInputException(InputLocation.of(where), "holds curves at " + describe(curves)
                        + "; choose one with --temperature");
            }
            return curves.get(0);
        }
        return curves.stream()
                .filter(curve -> curve.temperatureK() != null
                        && Math.abs(curve.temperatureK() - temperatureK) <= SAME_TEMPERATURE_K)
                .findFirst()
                .orElseThrow(() -> new BadInputException(InputLocation.of(where), "has no curve at "
                        + QuantityFormatter.format(temperatureK, CELSIUS, 6) + "; it holds curves at " + describe(curves)));
    }

    private static List<String> temperatures(List<DemagnetizationCurve> curves) {
        return curves.stream()
                .map(curve -> curve.temperatureK() == null ? "no stated temperature"
                        : QuantityFormatter.format(curve.temperatureK(), CELSIUS, 6))
                .distinct()
                .toList();
    }

    private static String describe(List<DemagnetizationCurve> curves) {
        return temperatures(curves).stream().collect(Collectors.joining(", "));
    }
}
