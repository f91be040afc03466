package org.kneepoint.fitter.curve;

/**
 * How a curve was measured: a normal (B–H) or intrinsic (J–H) demagnetization curve, or a full
 * hysteresis loop whose points keep the order of measurement.
 */
public enum CurveKind {
    NORMAL,
    INTRINSIC,
    LOOP
}
