package org.kneepoint.fitter.field;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.DerbyOlbertTerms;

/**
 * B of an axially magnetized solid cylinder at any point: Derby and Olbert, "Cylindrical magnets and
 * ideal solenoids", Am. J. Phys. 78, 229 (2010), with Bulirsch's cel (docs/references.md §4a):
 * Bρ = (Br/π)·[radial(ρ, z + b) − radial(ρ, z − b)], Bz = (Br/π)·[axial(ρ, z + b) − axial(ρ, z − b)],
 * b = L/2; see {@link DerbyOlbertTerms}. The same expressions hold inside and outside. Beyond
 * {@value MultipoleExpansion#SWITCH_RADII} enclosing radii, where the difference of the two face
 * terms would cancel, the field is the {@link MultipoleExpansion}.
 *
 * @param shape     the cylinder, axis along z
 * @param remanence Br in tesla
 */
public record CylinderField(CylinderShape shape, double remanence) implements MagnetField {

    public CylinderField {
        Magnetization.fromRemanence(remanence);
        if (shape == null) {
            throw new BadInputException("cylinder field must be given a cylinder, got null");
        }
    }

    @Override
    public void fluxDensityInto(double x, double y, double z, double[] target, int offset) {
        double radius = shape.radius();
        double half = 0.5 * shape.length();
        double enclosing = Math.hypot(radius, half);
        if (MultipoleExpansion.applies(enclosing, x, y, z)) {
            MultipoleExpansion.fluxDensityInto(remanence, enclosing, VolumeMoments.cylinder(radius, half, enclosing), x, y,
                    z, target, offset);
            return;
        }
        target[offset] = 0.0;
        target[offset + 1] = 0.0;
        target[offset + 2] = 0.0;
        accumulate(radius, half, remanence / Math.PI, x, y, z, target, offset);
    }

    @Override
    public String singularity(double x, double y, double z) {
        return onRim(shape.radius(), 0.5 * shape.length(), x, y, z)
                ? "on the rim of a pole face (ρ = D/2, z = ±L/2), where the field of a sharp edge is infinite" : null;
    }

    /** Whether (x, y, z) lies on a rim ρ = radius, z = ±half, within the edge tolerance of the enclosing radius. */
    static boolean onRim(double radius, double half, double x, double y, double z) {
        double tolerance = EDGE_TOLERANCE * Math.hypot(radius, half);
        return Math.abs(Math.hypot(x, y) - radius) <= tolerance && Math.abs(Math.abs(z) - half) <= tolerance;
    }

    @Override
    public boolean isInside(double x, double y, double z) {
        double radius = shape.radius();
        return x * x + y * y < radius * radius && Math.abs(z) < 0.5 * shape.length();
    }

    /** Adds to target the Derby–Olbert field of a cylinder of the given radius and half-length, scale = ±Br/π. */
    static void accumulate(double radius, double halfLength, double scale, double x, double y, double z, double[] target,
            int offset) {
        double rho = Math.sqrt(x * x + y * y);
        target[offset + 2] += scale
                * (DerbyOlbertTerms.axial(radius, rho, z + halfLength) - DerbyOlbertTerms.axial(radius, rho, z - halfLength));
        if (rho > 0.0) {
            double brho = scale
                    * (DerbyOlbertTerms.radial(radius, rho, z + halfLength) - DerbyOlbertTerms.radial(radius, rho, z - halfLength));
            target[offset] += brho * x / rho;
            target[offset + 1] += brho * y / rho;
        }
    }
}
