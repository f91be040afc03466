package org.kneepoint.fitter.limits;

import java.util.Arrays;
import java.util.Comparator;
import java.util.Optional;
import java.util.stream.IntStream;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.DuplicatePoints;
import org.kneepoint.fitter.curve.Quantity;

/**
 * Whether a curve can be a measurement: its temperature, H and J within {@link PhysicalLimits};
 * not all at one H, not zero everywhere; a demagnetization curve whose J does not rise as H falls
 * by more than its noise; a loop that encloses an area. The first problem found is returned with
 * the point it concerns, so a reader can name the line.
 */
public final class CurvePlausibility {

    /**
     * How far J may rise as H falls, in robust noise deviations of the curve (the median absolute
     * deviation of second differences), before the rise is refused; never less than the
     * duplicate-reading tolerance, 1 % of the largest |J|. Pure noise of a few thousand points stays
     * below about 6 deviations (common practice).
     */
    public static final double NOISE_MULTIPLE = 8.0;

    /**
     * Smallest area a loop must enclose in the (H, J) plane, as a fraction of its bounding box. A
     * soft alloy with a coercivity of 1 A/m measured to 1000 A/m still encloses about 1e-3 (common
     * practice); points that go and come back on one path enclose nothing.
     */
    public static final double LOOP_AREA_FRACTION = 1.0e-6;

    /** Which value of a point (or the whole curve) a finding is about. */
    public enum Part { FIELD, VALUE, TEMPERATURE, CURVE }

    /**
     * Why a curve is implausible.
     *
     * @param point      index of the point concerned, or −1 for the whole curve
     * @param otherPoint index of a second point involved, or −1
     * @param part       which value is at fault
     * @param problem    what is wrong and what was expected, one line
     */
    public record Finding(int point, int otherPoint, Part part, String problem) {
    }

    private CurvePlausibility() {
    }

    /** The first problem of the curve, or empty when it is plausible. */
    public static Optional<Finding> check(DemagnetizationCurve curve) {
        Optional<Finding> limits = limits(curve);
        if (limits.isPresent()) {
            return limits;
        }
        Optional<Finding> degenerate = degenerate(curve);
        if (degenerate.isPresent()) {
            return degenerate;
        }
        return curve.kind() == CurveKind.LOOP ? LoopArea.check(curve.h(), curve.j()) : rise(curve.h(), curve.j());
    }

    private static Optional<Finding> limits(DemagnetizationCurve curve) {
        Double temperature = curve.temperatureK();
        if (temperature != null && !PhysicalLimits.CURVE_TEMPERATURE.contains(temperature)) {
            return Optional.of(new Finding(-1, -1, Part.TEMPERATURE, "a curve at " + PhysicalLimits.CURVE_TEMPERATURE.format(temperature)
                    + "; curves are measured " + PhysicalLimits.CURVE_TEMPERATURE.describe()
                    + " (no material stays magnetized above the Curie temperature of cobalt)"));
        }
        double[] h = curve.h();
        double[] values = curve.values();
        double[] j = curve.j();
        PlausibleRange field = PhysicalLimits.FIELD_STRENGTH;
        PlausibleRange polarization = PhysicalLimits.polarization(temperature);
        for (int i = 0; i < h.length; i++) {
            if (!field.contains(h[i])) {
                return Optional.of(new Finding(i, -1, Part.FIELD, "H = " + field.format(h[i])
                        + " is beyond any field an instrument applies (" + field.describe() + ", about 126 T)"));
            }
            if (!polarization.contains(j[i])) {
                String value = curve.quantity() == Quantity.B
                        ? "B = " + polarization.format(values[i]) + " at H = " + field.format(h[i]) + " means J = " + polarization.format(j[i])
                        : "J = " + polarization.format(j[i]);
                return Optional.of(new Finding(i, -1, Part.VALUE, value + ", beyond what any known material reaches (J "
                        + polarization.describe() + (polarization == PhysicalLimits.POLARIZATION ? " at 250 K and above" : "") + ")"));
            }
        }
        return Optional.empty();
    }

    private static Optional<Finding> degenerate(DemagnetizationCurve curve) {
        double[] h = curve.h();
        double[] values = curve.values();
        boolean oneField = Arrays.stream(h).allMatch(x -> x == h[0]);
        boolean zeroValues = Arrays.stream(values).allMatch(x -> x == 0);
        if (oneField && zeroValues && h[0] == 0) {
            return Optional.of(new Finding(-1, -1, Part.CURVE, "every H and every " + curve.quantity() + " is 0 (all-zero data)"));
        }
        if (oneField && h.length > 1) {
            return Optional.of(new Finding(-1, -1, Part.FIELD, "every point has the same H; a curve needs a range of H"));
        }
        if (Arrays.stream(curve.j()).allMatch(x -> x == 0)) {
            return Optional.of(new Finding(-1, -1, Part.VALUE, "J is 0 at every point: the data hold no magnetization"));
        }
        return Optional.empty();
    }

    /** The largest rise of J as H falls, refused when it is beyond the curve's noise. */
    private static Optional<Finding> rise(double[] h, double[] j) {
        Integer[] order = IntStream.range(0, h.length).boxed().toArray(Integer[]::new);
        Arrays.sort(order, Comparator.comparingDouble((Integer i) -> h[i]).reversed());
        double[] sorted = new double[h.length];
        for (int k = 0; k < order.length; k++) {
            sorted[k] = j[order[k]];
        }
        double tolerance = Math.max(DuplicatePoints.TOLERANCE_FRACTION * DuplicatePoints.largestMagnitude(j),
                NOISE_MULTIPLE * NoiseEstimate.deviation(sorted));
        int lowest = 0;
        int worst = -1;
        int worstFrom = -1;
        double worstRise = tolerance;
        for (int k = 1; k < sorted.length; k++) {
            if (sorted[k] - sorted[lowest] > worstRise) {
                worstRise = sorted[k] - sorted[lowest];
                worst = k;
                worstFrom = lowest;
            }
            if (sorted[k] < sorted[lowest]) {
                lowest = k;
            }
        }
        if (worst < 0) {
            return Optional.empty();
        }
        PlausibleRange polarization = PhysicalLimits.POLARIZATION_CRYOGENIC;
        PlausibleRange field = PhysicalLimits.FIELD_STRENGTH;
        int at = order[worst];
        int from = order[worstFrom];
        return Optional.of(new Finding(at, from, Part.VALUE, "J rises from " + polarization.format(j[from]) + " to "
                + polarization.format(j[at]) + " as H falls from " + field.format(h[from]) + " to " + field.format(h[at])
                + ", more than the curve's noise allows (" + polarization.format(tolerance)
                + "); on a demagnetization curve J falls as H falls (is the sign of H reversed?)"));
    }
}
