package org.kneepoint.fitter.loadline;

/**
 * Where in a magnet a cell lies, in plain words: by its distance from the mid-plane (as a share of the
 * half-length) and from the middle of the cross-section towards the side walls (as a share of the way).
 */
public enum MagnetRegion {
    /** Inner three quarters both along the magnetization and across it. */
    CORE,
    /** Near a side wall, away from the pole faces. */
    SIDE,
    /** Near a pole face, away from the side walls. */
    POLE_FACE,
    /** Where a pole face meets a side wall: the rim or corners. */
    POLE_FACE_EDGE,
    /** Everywhere alike: an ellipsoid's internal field is uniform. */
    UNIFORM;

    /** Share of the way out beyond which a cell counts as near a face or wall. */
    static final double OUTER = 0.75;

    static MagnetRegion of(double alongMagnetization, double across) {
        boolean face = alongMagnetization >= OUTER;
        boolean side = across >= OUTER;
        return face && side ? POLE_FACE_EDGE : face ? POLE_FACE : side ? SIDE : CORE;
    }
}
