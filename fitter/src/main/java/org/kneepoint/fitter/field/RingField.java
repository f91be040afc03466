package org.kneepoint.fitter.field;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.shape.RingShape;

/**
 * B of an axially magnetized ring: the outer cylinder minus the inner one (superposition of
 * magnetizations M and −M), each by Derby and Olbert, Am. J. Phys. 78, 229 (2010); beyond
 * {@value MultipoleExpansion#SWITCH_RADII} enclosing radii, the {@link MultipoleExpansion}.
 *
 * @param shape     the ring, axis along z
 * @param remanence Br in tesla
 */
public record RingField(RingShape shape, double remanence) implements MagnetField {

    public RingField {
        Magnetization.fromRemanence(remanence);
        if (shape == null) {
            throw new BadInputException("ring field must be given a ring, got null");
        }
    }

    @Override
    public void fluxDensityInto(double x, double y, double z, double[] target, int offset) {
        double half = 0.5 * shape.length();
        double outer = 0.5 * shape.outerDiameter();
        double inner = 0.5 * shape.innerDiameter();
        double enclosing = Math.hypot(outer, half);
        if (MultipoleExpansion.applies(enclosing, x, y, z)) {
            MultipoleExpansion.fluxDensityInto(remanence, enclosing, VolumeMoments.ring(outer, inner, half, enclosing), x,
                    y, z, target, offset);
            return;
        }
        target[offset] = 0.0;
        target[offset + 1] = 0.0;
        target[offset + 2] = 0.0;
        double scale = remanence / Math.PI;
        CylinderField.accumulate(outer, half, scale, x, y, z, target, offset);
        CylinderField.accumulate(inner, half, -scale, x, y, z, target, offset);
    }

    @Override
    public String singularity(double x, double y, double z) {
        double half = 0.5 * shape.length();
        if (CylinderField.onRim(0.5 * shape.outerDiameter(), half, x, y, z)) {
            return "on the outer rim of a pole face (ρ = D/2, z = ±L/2), where the field of a sharp edge is infinite";
        }
        if (CylinderField.onRim(0.5 * shape.innerDiameter(), half, x, y, z)) {
            return "on the inner rim of a pole face (ρ = Di/2, z = ±L/2), where the field of a sharp edge is infinite";
        }
        return null;
    }

    @Override
    public boolean isInside(double x, double y, double z) {
        double rho2 = x * x + y * y;
        double outer = 0.5 * shape.outerDiameter();
        double inner = 0.5 * shape.innerDiameter();
        return rho2 < outer * outer && rho2 > inner * inner && Math.abs(z) < 0.5 * shape.length();
    }
}
