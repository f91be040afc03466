package org.kneepoint.fitter.shape;

/**
 * A uniformly magnetized magnet (or magnet in a circuit) seen by the load line: its demagnetizing
 * factors and its volume. Magnetization is along +z; every length is in metres.
 */
public interface MagnetShape {

    /** Nm, Nf and N0 along the magnetization. */
    DemagnetizingFactors demagnetizingFactors();

    /** Volume of magnet material in m³. */
    double volume();
}
