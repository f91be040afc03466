package org.kneepoint.fitter.curve;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.Arrays;

/**
 * A measured or published curve at one temperature: points (H, B) or (H, J) in SI. The points may
 * be in any order unless the kind is {@link CurveKind#LOOP}, where they keep the order of
 * measurement. The values are kept exactly as given; {@link #j()} and {@link #b()} convert with
 * B = μ0·H + J.
 *
 * @param kind         normal, intrinsic or loop
 * @param quantity     whether {@code values} are B or J; a normal curve holds B, an intrinsic one J
 * @param h            field strength in A/m
 * @param values       B or J in tesla, one per H
 * @param temperatureK temperature in kelvin, or null when the data do not say
 */
public record DemagnetizationCurve(CurveKind kind, Quantity quantity, double[] h, double[] values, Double temperatureK) {

    public DemagnetizationCurve {
        if (kind == null || quantity == null || h == null || values == null) {
            throw new IllegalArgumentException("a curve needs a kind, a quantity, H and values");
        }
        if (kind == CurveKind.NORMAL && quantity != Quantity.B || kind == CurveKind.INTRINSIC && quantity != Quantity.J) {
            throw new IllegalArgumentException("a " + kind.name().toLowerCase() + " curve cannot hold " + quantity + " values");
        }
        if (h.length != values.length) {
            throw new IllegalArgumentException("H has " + h.length + " points but the values have " + values.length);
        }
        h = h.clone();
        values = values.clone();
        for (int i = 0; i < h.length; i++) {
            if (!Double.isFinite(h[i]) || !Double.isFinite(values[i])) {
                throw new IllegalArgumentException("point " + (i + 1) + " is not finite: H = " + h[i] + ", value = " + values[i]);
            }
        }
        if (temperatureK != null && !(temperatureK > 0 && Double.isFinite(temperatureK))) {
            throw new IllegalArgumentException("temperature must be above 0 K, got " + temperatureK + " K");
        }
    }

    /** A normal or intrinsic curve, the kind following from the quantity. */
    public static DemagnetizationCurve of(Quantity quantity, double[] h, double[] values, Double temperatureK) {
        CurveKind kind = quantity == Quantity.B ? CurveKind.NORMAL : CurveKind.INTRINSIC;
        return new DemagnetizationCurve(kind, quantity, h, values, temperatureK);
    }

    public int size() {
        return h.length;
    }

    @Override
    public double[] h() {
        return h.clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    /** Polarization J = B − μ0·H at every point, in tesla. */
    public double[] j() {
        return convert(Quantity.J);
    }

    /** Flux density B = μ0·H + J at every point, in tesla. */
    public double[] b() {
        return convert(Quantity.B);
    }

    private double[] convert(Quantity wanted) {
        if (wanted == quantity) {
            return values.clone();
        }
        double sign = wanted == Quantity.B ? 1.0 : -1.0;
        double[] converted = new double[h.length];
        for (int i = 0; i < h.length; i++) {
            converted[i] = values[i] + sign * MU0 * h[i];
        }
        return converted;
    }

    public DemagnetizationCurve withTemperatureK(Double newTemperatureK) {
        return new DemagnetizationCurve(kind, quantity, h, values, newTemperatureK);
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof DemagnetizationCurve that && kind == that.kind && quantity == that.quantity
                && Arrays.equals(h, that.h) && Arrays.equals(values, that.values)
                && java.util.Objects.equals(temperatureK, that.temperatureK);
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(kind, quantity, Arrays.hashCode(h), Arrays.hashCode(values), temperatureK);
    }

    @Override
    public String toString() {
        return kind.name().toLowerCase() + " curve of " + h.length + " points"
                + (temperatureK == null ? "" : " at " + temperatureK + " K");
    }
}
