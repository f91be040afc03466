package org.kneepoint.fitter.select;

/**
 * One requirement a grade or design misses and by how much, in the requirement's own SI unit (T for flux
 * density, a fraction for loss, K for temperature, A/m for fields).
 *
 * @param requirement which one
 * @param by          how far it falls short, zero or positive
 */
public record Shortfall(Requirement requirement, double by) {

    /** The requirements a grade or design can miss. */
    public enum Requirement {
        /** B at the operating point below the minimum. */
        MINIMUM_FLUX_DENSITY,
        /** Irreversible loss above the maximum. */
        MAXIMUM_IRREVERSIBLE_LOSS,
        /** The grade's model does not reach the required temperature; {@code by} is the distance in K. */
        TEMPERATURE_RANGE,
        /** HcJ at the temperature below the least of a permanent magnet ({@link DesignShortfalls#PERMANENT_MAGNET_HCJ}); {@code by} in A/m. */
        PERMANENT_MAGNET,
        /** B at the operating point is zero or negative (the third quadrant); {@code by} is −B, T. */
        POSITIVE_FLUX_DENSITY,
        /** The operating point lies below the knee (J = 0.9·Br); {@code by} is H_knee − H_op, A/m. */
        KNEE_MARGIN,
        /** The highest working temperature for the loss limit lies below the temperature; {@code by} in K. */
        MAXIMUM_WORKING_TEMPERATURE,
        /** The lowest working temperature for the loss limit lies above the temperature; {@code by} in K. */
        MINIMUM_WORKING_TEMPERATURE,
        /** No temperature of the model keeps the loss within the limit; {@code by} is the loss over the limit at the temperature. */
        WORKING_TEMPERATURE_FOUND
    }
}
