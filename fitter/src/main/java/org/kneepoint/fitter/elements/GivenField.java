package org.kneepoint.fitter.elements;

/** Which field an element table gives: the field strength H (A/m) or the flux density B (T). */
public enum GivenField {
    /** Hx, Hy, Hz in A/m. */
    FIELD_STRENGTH,
    /** Bx, By, Bz in T; H along the magnetization is found on the grade's curve. */
    FLUX_DENSITY
}
