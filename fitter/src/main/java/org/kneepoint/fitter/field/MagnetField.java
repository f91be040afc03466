package org.kneepoint.fitter.field;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.fitter.shape.RingShape;
import org.kneepoint.fitter.shape.SpheroidShape;
import org.kneepoint.fitter.units.MagneticConstant;

/**
 * The field of one uniformly magnetized magnet (magnetization along +z, origin at its centre), at
 * any point inside or outside. Implementations are immutable and safe to share between threads.
 * Far away (beyond {@value MultipoleExpansion#SWITCH_RADII} radii of the enclosing sphere) the
 * field is summed as a multipole expansion, which keeps full precision at any distance. On the
 * sharp edges of the pole faces, where the exact field is infinite, {@link #fluxDensityInto} is not
 * finite; {@link #sample} says so with a reason.
 */
public interface MagnetField {

    /** Writes B (tesla) at (x, y, z) into target[offset], target[offset + 1], target[offset + 2]. */
    void fluxDensityInto(double x, double y, double z, double[] target, int offset);

    /** Whether (x, y, z) lies inside the magnet material (the surface counts as outside). */
    boolean isInside(double x, double y, double z);

    /**
     * Why B is not defined at (x, y, z) — the point lies on a sharp edge of a pole face, within
     * {@value #EDGE_TOLERANCE} of the magnet's size, where the field is infinite — or null.
     */
    String singularity(double x, double y, double z);

    /** Points this close to an edge, relative to the magnet's enclosing radius, count as on it (rounding). */
    double EDGE_TOLERANCE = 1e-12;

    /** B at (x, y, z), or the reason it is not defined there; never a NaN or infinite component. */
    default FieldSample sample(double x, double y, double z) {
        String reason = singularity(x, y, z);
        if (reason != null) {
            return FieldSample.singular(reason);
        }
        FieldVector b = fluxDensity(x, y, z);
        if (!(Double.isFinite(b.x()) && Double.isFinite(b.y()) && Double.isFinite(b.z()))) {
            return FieldSample.singular("the field is not finite at this point (next to a sharp edge of a pole face)");
        }
        return FieldSample.of(b);
    }

    /** Br = μ0·M in tesla. */
    double remanence();

    /** B in tesla at (x, y, z). */
    default FieldVector fluxDensity(double x, double y, double z) {
        double[] b = new double[3];
        fluxDensityInto(x, y, z, b, 0);
        return new FieldVector(b[0], b[1], b[2]);
    }

    /** H = B/μ0 − M in A/m (M only inside the magnet); inside the magnet this is the demagnetizing field. */
    default FieldVector fieldStrength(double x, double y, double z) {
        FieldVector b = fluxDensity(x, y, z);
        double mz = isInside(x, y, z) ? remanence() : 0.0;
        return new FieldVector(b.x() / MagneticConstant.MU0, b.y() / MagneticConstant.MU0, (b.z() - mz) / MagneticConstant.MU0);
    }

    /** The field of a cylinder, ring, block or spheroid with the given remanence in tesla. */
    static MagnetField of(MagnetShape shape, double remanence) {
        if (shape instanceof CylinderShape cylinder) {
            return new CylinderField(cylinder, remanence);
        }
        if (shape instanceof RingShape ring) {
            return new RingField(ring, remanence);
        }
        if (shape instanceof BlockShape block) {
            return new BlockField(block, remanence);
        }
        if (shape instanceof SpheroidShape spheroid) {
            return new SpheroidField(spheroid, remanence);
        }
        throw new BadInputException("field maps must be asked for a cylinder, ring, block or spheroid, got "
                + (shape == null ? "null" : shape.getClass().getSimpleName()));
    }
}
