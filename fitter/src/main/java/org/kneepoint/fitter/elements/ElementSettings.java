package org.kneepoint.fitter.elements;

import org.kneepoint.fitter.error.BadInputException;

/**
 * What an element check takes besides the fields: the magnetization direction of elements whose table gives
 * none, their temperature likewise, the loss limit of the verdict and the transverse-field rule.
 *
 * @param directionX    x of the default magnetization direction (any length but zero)
 * @param directionY    y of it
 * @param directionZ    z of it
 * @param temperature   K for elements whose table has no temperature; null when every table has its own
 * @param lossLimit     the volume-weighted irreversible loss allowed, a fraction strictly between 0 and 1
 * @param transverse    how a field across the magnetization counts
 */
public record ElementSettings(double directionX, double directionY, double directionZ, Double temperature, double lossLimit,
        TransverseRule transverse) {

    public ElementSettings {
        double length = Math.sqrt(directionX * directionX + directionY * directionY + directionZ * directionZ);
        if (!(length > 0.0) || !Double.isFinite(length)) {
            throw new BadInputException("the magnetization direction must be a non-zero vector x,y,z");
        }
        directionX /= length;
        directionY /= length;
        directionZ /= length;
        if (temperature != null && !(temperature > 0.0 && Double.isFinite(temperature))) {
            throw new BadInputException("the temperature must be above absolute zero, got " + temperature + " K");
        }
        if (!(lossLimit > 0.0 && lossLimit < 1.0)) {
            throw new BadInputException("loss limit must lie strictly between 0 % and 100 %, got " + lossLimit * 100 + " %");
        }
        if (transverse == null) {
            throw new BadInputException("a transverse-field rule is needed (along or astroid)");
        }
    }

    /** Magnetization along +z, the given temperature, the given loss limit, only the field along the magnetization acting. */
    public static ElementSettings alongZ(Double temperature, double lossLimit) {
        return new ElementSettings(0, 0, 1, temperature, lossLimit, TransverseRule.ALONG);
    }
}
