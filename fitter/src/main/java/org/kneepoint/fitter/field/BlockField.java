package org.kneepoint.fitter.field;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.shape.BlockShape;

/**
 * B of a rectangular block magnetized along z, from the two charged pole faces z = ±c (surface
 * charge ±M) in closed form, as in R. Engel-Herbert, T. Hesjedal, J. Appl. Phys. 97, 074504 (2005);
 * re-derived here by integrating (r − r')/|r − r'|³ over a face. For a face of charge σ at height
 * z0, corners x_i = ∓a, y_j = ∓b, u_i = x − x_i, v_j = y − y_j, w = z − z0, R_ij = |(u_i, v_j, w)|:
 * Hz = (σ/4π)·Σ (−1)^{i+j}·atan(u_i·v_j/(w·R_ij)) (the solid angle of the face);
 * Hx = (σ/4π)·[L_2 − L_1], L_i = ln[(v_1 + R_i1)/(v_2 + R_i2)]; Hy likewise with u and v exchanged.
 * The logarithms are evaluated without cancellation (ln(v + R) = ln[(u² + w²)/(R − v)] for v &lt; 0),
 * and B = μ0·(H + M inside). Beyond {@value MultipoleExpansion#SWITCH_RADII} enclosing radii, where
 * the two faces' terms would cancel (along a diagonal the closed form had come out 35 % off with
 * the wrong sign at 10⁵ sizes), the field is the {@link MultipoleExpansion}.
 *
 * @param shape     the block, magnetized along its thickness (z)
 * @param remanence Br in tesla
 */
public record BlockField(BlockShape shape, double remanence) implements MagnetField {

    public BlockField {
        Magnetization.fromRemanence(remanence);
        if (shape == null) {
            throw new BadInputException("block field must be given a block, got null");
        }
    }

    @Override
    public void fluxDensityInto(double x, double y, double z, double[] target, int offset) {
        double a = 0.5 * shape.width();
        double b = 0.5 * shape.depth();
        double c = 0.5 * shape.thickness();
        double enclosing = Math.sqrt(a * a + b * b + c * c);
        if (MultipoleExpansion.applies(enclosing, x, y, z)) {
            MultipoleExpansion.fluxDensityInto(remanence, enclosing, VolumeMoments.block(a, b, c, enclosing), x, y, z,
                    target, offset);
            return;
        }
        closedFormInto(a, b, c, remanence, x, y, z, target, offset);
    }

    @Override
    public boolean isInside(double x, double y, double z) {
        return Math.abs(x) < 0.5 * shape.width() && Math.abs(y) < 0.5 * shape.depth() && Math.abs(z) < 0.5 * shape.thickness();
    }

    /** The closed form at any point, for half-edges a, b, c (the far field sums the expansion instead). */
    static void closedFormInto(double a, double b, double c, double remanence, double x, double y, double z,
            double[] target, int offset) {
        double above = z - c;
        double below = z + c;
        if (below == 0.0) {
            below = -0.0;
        }
        double scale = remanence / (4.0 * Math.PI);
        double u1 = x + a;
        double u2 = x - a;
        double v1 = y + b;
        double v2 = y - b;
        double hx = logSum(u1, u2, v1, v2, above) - logSum(u1, u2, v1, v2, below);
        double hy = logSum(v1, v2, u1, u2, above) - logSum(v1, v2, u1, u2, below);
        double hz = solidAngle(u1, u2, v1, v2, above) - solidAngle(u1, u2, v1, v2, below);
        target[offset] = scale * hx;
        target[offset + 1] = scale * hy;
        boolean inside = Math.abs(x) < a && Math.abs(y) < b && Math.abs(z) < c;
        target[offset + 2] = scale * hz + (inside ? remanence : 0.0);
    }


    @Override
    public String singularity(double x, double y, double z) {
        double a = 0.5 * shape.width();
        double b = 0.5 * shape.depth();
        double c = 0.5 * shape.thickness();
        double tolerance = EDGE_TOLERANCE * Math.sqrt(a * a + b * b + c * c);
        if (Math.abs(Math.abs(z) - c) > tolerance) {
            return null;
        }
        boolean onX = Math.abs(Math.abs(x) - a) <= tolerance;
        boolean onY = Math.abs(Math.abs(y) - b) <= tolerance;
        if (onX && onY) {
            return "at a corner of a pole face (x = ±W/2, y = ±D/2, z = ±T/2), where the field of sharp edges is infinite";
        }
        if (onX && Math.abs(y) < b || onY && Math.abs(x) < a) {
            return "on an edge of a pole face (z = ±T/2), where the field of a sharp edge is infinite";
        }
        return null;
    }

    /** L_2 − L_1 for one face: the x component (or, with the roles of u and v exchanged, y) per σ/4π. */
    private static double logSum(double u1, double u2, double v1, double v2, double w) {
        return logRatio(u2, v1, v2, w) - logRatio(u1, v1, v2, w);
    }

    /** ln[(v1 + R(u, v1))/(v2 + R(u, v2))] with v1 &gt; v2, free of cancellation. */
    private static double logRatio(double u, double v1, double v2, double w) {
        double transverse2 = u * u + w * w;
        double r1 = Math.sqrt(transverse2 + v1 * v1);
        double r2 = Math.sqrt(transverse2 + v2 * v2);
        if (v2 >= 0.0) {
            return Math.log((v1 + r1) / (v2 + r2));
        }
        if (v1 < 0.0) {
            return Math.log((r2 - v2) / (r1 - v1));
        }
        return Math.log((v1 + r1) * (r2 - v2) / transverse2);
    }

    private static double solidAngle(double u1, double u2, double v1, double v2, double w) {
        return corner(u1, v1, w) - corner(u1, v2, w) - corner(u2, v1, w) + corner(u2, v2, w);
    }

    /** atan(u·v/(w·R)); 0 when u·v = 0, its limit off the face edges (w = ±0 then gives ±π/2 by side). */
    private static double corner(double u, double v, double w) {
        double product = u * v;
        if (product == 0.0) {
            return 0.0;
        }
        return Math.atan(product / (w * Math.sqrt(u * u + v * v + w * w)));
    }
}
