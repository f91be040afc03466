package org.kneepoint.server.chart;

import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.fitter.shape.RingShape;

/**
 * The section of a magnet by the x–z plane through its centre: material for bore ≤ |x| ≤ halfWidth and
 * |z| ≤ halfHeight (one rectangle, or two beside a ring's bore), metres.
 *
 * @param halfWidth  half the extent along x
 * @param halfHeight half the extent along z, the magnetization
 * @param bore       half the bore of a ring, 0 for a solid magnet
 */
record MagnetOutline(double halfWidth, double halfHeight, double bore) {

    /** The section of a cylinder, ring or block (a block's width along x, its thickness along z). */
    static MagnetOutline of(MagnetShape shape) {
        if (shape instanceof CylinderShape cylinder) {
            return new MagnetOutline(cylinder.radius(), 0.5 * cylinder.length(), 0.0);
        }
        if (shape instanceof RingShape ring) {
            return new MagnetOutline(0.5 * ring.outerDiameter(), 0.5 * ring.length(), 0.5 * ring.innerDiameter());
        }
        BlockShape block = (BlockShape) shape;
        return new MagnetOutline(0.5 * block.width(), 0.5 * block.thickness(), 0.0);
    }

    /** {@code count} points spread evenly over the material's part of a pole face, as x, metres. */
    double[] seeds(int count) {
        double[] xs = new double[count];
        double span = halfWidth - bore;
        for (int i = 0; i < count; i++) {
            double along = 2.0 * span * (i + 0.5) / count;
            xs[i] = along < span ? -halfWidth + along : bore + (along - span);
        }
        return xs;
    }
}
