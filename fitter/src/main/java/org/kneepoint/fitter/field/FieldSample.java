package org.kneepoint.fitter.field;

/**
 * B at one point, or why it is not defined there: on a sharp edge of a charged pole face (a
 * cylinder's rim, a block's edge or corner) the field of an ideal magnet is infinite, so such a
 * point has no value, only a reason.
 *
 * @param fluxDensity B in tesla, or null at a singular point
 * @param singularity why B is not defined, or null where it is
 */
public record FieldSample(FieldVector fluxDensity, String singularity) {

    public FieldSample {
        if ((fluxDensity == null) == (singularity == null)) {
            throw new IllegalArgumentException("a field sample holds either B or the reason it is not defined");
        }
    }

    /** A point where B is finite. */
    public static FieldSample of(FieldVector fluxDensity) {
        return new FieldSample(fluxDensity, null);
    }

    /** A point where B is not defined, with the reason. */
    public static FieldSample singular(String reason) {
        return new FieldSample(null, reason);
    }

    /** Whether B is not defined here. */
    public boolean isSingular() {
        return singularity != null;
    }
}
