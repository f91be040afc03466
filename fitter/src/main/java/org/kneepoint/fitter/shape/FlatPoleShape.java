package org.kneepoint.fitter.shape;

/**
 * A magnet with two flat pole faces normal to its magnetization (cylinder, ring, block): it can
 * stand on a steel plate, and its length along the magnetization can be varied.
 */
public interface FlatPoleShape extends MagnetShape {

    /** Length between the pole faces, in metres. */
    double lengthAlongMagnetization();

    /** The same cross-section with another length between the pole faces. */
    FlatPoleShape withLengthAlongMagnetization(double length);
}
