package org.kneepoint.fitter.curve;

/**
 * Points of a curve ready to hand to another program: H and the chosen quantity (B or J), in SI,
 * plus how they were made (for the export's header).
 *
 * @param h           A/m
 * @param values      B or J in tesla
 * @param quantity    which of the two
 * @param description how the points were made, in plain words
 */
public record CurveTable(double[] h, double[] values, Quantity quantity, String description) {

    public CurveTable {
        h = h.clone();
        values = values.clone();
    }

    @Override
    public double[] h() {
        return h.clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    public int size() {
        return h.length;
    }
}
