package org.kneepoint.fitter.shape;

/**
 * A rectangular block centred at the origin with edges along x (width), y (depth) and z
 * (thickness), magnetized along z. All three factors in closed form: Nm by Aharoni (J. Appl. Phys. 83,
 * 3432, 1998, Eq. 1), Nf from the double antiderivative of the face-to-mid-plane solid angle (derived
 * here), N0 = (2/π)·atan(ab/(c·√(a² + b² + c²))) with half edges a, b, c. Every ratio of two edges
 * must lie between 1/{@value #MAX_EDGE_RATIO} and {@value #MAX_EDGE_RATIO}; at those extremes the
 * closed forms lose digits to cancellation but stay accurate to about 1e-8 relative (1e-10 or better
 * for ratios up to 10).
 *
 * @param width     along x, in metres
 * @param depth     along y, in metres
 * @param thickness along z (the magnetization), in metres
 */
public record BlockShape(double width, double depth, double thickness) implements FlatPoleShape {

    /** Largest accepted ratio of any two edges. */
    public static final double MAX_EDGE_RATIO = 100.0;

    public BlockShape {
        SizeChecks.positiveLength("width", width);
        SizeChecks.positiveLength("depth", depth);
        SizeChecks.positiveLength("thickness", thickness);
        double lower = 1.0 / MAX_EDGE_RATIO;
        SizeChecks.ratioWithin("block width/thickness", width / thickness, lower, MAX_EDGE_RATIO);
        SizeChecks.ratioWithin("block depth/thickness", depth / thickness, lower, MAX_EDGE_RATIO);
        SizeChecks.ratioWithin("block width/depth", width / depth, lower, MAX_EDGE_RATIO);
    }

    @Override
    public DemagnetizingFactors demagnetizingFactors() {
        return PrismDemagnetization.of(0.5 * width, 0.5 * depth, 0.5 * thickness);
    }

    @Override
    public double volume() {
        return width * depth * thickness;
    }

    @Override
    public double lengthAlongMagnetization() {
        return thickness;
    }

    @Override
    public BlockShape withLengthAlongMagnetization(double length) {
        return new BlockShape(width, depth, length);
    }
}
