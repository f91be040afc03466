package org.kneepoint.fitter.qualification;

import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;

/**
 * Which specification and which curve belong to a measurement temperature. Temperatures within
 * {@value #TOLERANCE_K} K are the same (our choice: a sample is measured at the specification's
 * temperature, give or take the setting of the heater). Of several curves at one temperature the
 * intrinsic one is taken first, then the normal one, then a loop; recoil curves never.
 */
public final class SameTemperature {

    /** Largest difference of two temperatures taken as the same, K. */
    public static final double TOLERANCE_K = 0.5;

    private static final List<CurveKind> PREFERENCE = List.of(CurveKind.INTRINSIC, CurveKind.NORMAL, CurveKind.LOOP);

    private SameTemperature() {
    }

    public static boolean same(double first, double second) {
        return Math.abs(first - second) <= TOLERANCE_K;
    }

    /** The specification at the temperature, the nearest when two are within the tolerance. */
    public static Optional<Specification> specification(List<Specification> specifications, double temperatureK) {
        return specifications.stream().filter(spec -> same(spec.temperatureK(), temperatureK))
                .min(Comparator.comparingDouble(spec -> Math.abs(spec.temperatureK() - temperatureK)));
    }

    /** The curve to characterize at the temperature, by the preference of kinds. */
    public static Optional<DemagnetizationCurve> curve(List<DemagnetizationCurve> curves, double temperatureK) {
        return curves.stream().filter(curve -> curve.temperatureK() != null && same(curve.temperatureK(), temperatureK))
                .filter(curve -> PREFERENCE.contains(curve.kind()))
                .min(Comparator.<DemagnetizationCurve>comparingInt(curve -> PREFERENCE.indexOf(curve.kind()))
                        .thenComparingDouble(curve -> Math.abs(curve.temperatureK() - temperatureK)));
    }
}
