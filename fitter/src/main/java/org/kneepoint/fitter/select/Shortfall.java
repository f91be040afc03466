package org.kneepoint.fitter.select;

/**
 * One requirement a grade misses and by how much, in the requirement's own SI unit (T for flux
 * density, a fraction for loss, K for temperature).
 *
 * @param requirement which one
 * @param by          how far the grade falls short, positive
 */
public record Shortfall(Requirement requirement, double by) {

    /** The requirements a grade can miss. */
    public enum Requirement {
        /** B at the operating point below the minimum. */
        MINIMUM_FLUX_DENSITY,
        /** Irreversible loss above the maximum. */
        MAXIMUM_IRREVERSIBLE_LOSS,
        /** The grade's model does not reach the required temperature; {@code by} is the distance in K. */
        TEMPERATURE_RANGE
    }
}
