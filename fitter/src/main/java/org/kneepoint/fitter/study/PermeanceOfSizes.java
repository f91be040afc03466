package org.kneepoint.fitter.study;

import java.util.Map;

/** Pc of the check's shape with the sizes given (metres, by name; the sizes not named keep their nominal value). */
@FunctionalInterface
public interface PermeanceOfSizes {

    /** Pc for {@code sizes}. */
    double pc(Map<ToleranceName, Double> sizes);
}
