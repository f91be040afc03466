package org.kneepoint.fitter.shape;

/**
 * The three demagnetizing factors of a non-ellipsoidal magnet (docs/design.md §4; D.-X. Chen,
 * J. A. Brug, R. B. Goldfarb, IEEE Trans. Magn. 27, 3601, 1991): which average of the
 * demagnetizing field a result uses.
 */
public enum DemagnetizingKind {
    /** Volume average of the demagnetizing field: governs the total moment (Helmholtz-coil flux). */
    MAGNETOMETRIC,
    /** Average over the mid-plane cross-section: what a search coil around the middle sees. */
    FLUXMETRIC,
    /** The value at the centre of the magnet (for a ring: the mid-plane at the mean radius). */
    CENTRE_POINT
}
