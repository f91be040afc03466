package org.kneepoint.fitter.loadline;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.field.MagnetField;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.MagnetOnSteelPlate;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.fitter.shape.RingShape;
import org.kneepoint.fitter.shape.SpheroidShape;

/**
 * The local check (docs/design.md §2, workflow 3): beyond the single-Pc estimate, the demagnetizing field
 * varies through a non-ellipsoidal magnet. The magnet is taken as uniformly polarized at the
 * polarization J of its operating point; its internal field H(r) comes from the field solvers
 * (org.kneepoint.fitter.field, H = B/μ0 − M). Each cell's field is the single-Pc operating field plus
 * the cell's departure from the volume average, H_local = H_op + H_z(r) − ⟨H_z⟩, so the opposing field
 * enters as in the load line (docs/design.md §4) and, with Pc from Nm and no opposing field, H_local = H_z(r)
 * (Nm is the volume average; Chen, Brug, Goldfarb 1991). A cell works below the knee where H_local &lt; H_knee. The bounding box is cut into n × n × n equal
 * cells (resolution: edge/n along each axis) and each cell is judged by its centre; the transverse
 * components of H and the non-uniform polarization they would cause are neglected (a first-order
 * estimate, our own). A magnet on a steel plate is judged as the real half of its image pair.
 */
public final class LocalKneeCheck {

    /** Cells per edge when none is asked for. */
    public static final int DEFAULT_RESOLUTION = 24;
    /** Most cells per edge (10⁶ cells). */
    public static final int MAX_RESOLUTION = 100;

    private LocalKneeCheck() {
    }

    /** The check of {@code shape} on {@code curve} with the load line's opposing field, at {@code resolution} cells per edge. */
    public static LocalKneeResult of(MagnetShape shape, IntrinsicCurve curve, LoadLine line, int resolution) {
        if (resolution < 4 || resolution > MAX_RESOLUTION) {
            throw new BadInputException("local check resolution must be 4 to " + MAX_RESOLUTION + " cells per edge, got " + resolution);
        }
        boolean onSteel = shape instanceof MagnetOnSteelPlate;
        MagnetShape solid = onSteel ? ((MagnetOnSteelPlate) shape).imagePair() : shape;
        double[] half = halfExtents(solid);
        double polarization = line.on(curve).j();
        double knee = curve.kneeField().orElse(Double.NEGATIVE_INFINITY);
        if (!(polarization > 0.0)) {
            throw new BadInputException("the operating point lies past HcJ (J = " + polarization + " T): the whole magnet is reversed");
        }
        MagnetField field = MagnetField.of(solid, polarization);
        double zFrom = onSteel ? 0.0 : -half[2];
        double[] demagnetizing = new double[resolution * resolution * resolution];
        double[][] centres = new double[3][resolution];
        for (int i = 0; i < resolution; i++) {
            centres[0][i] = -half[0] + (i + 0.5) * 2 * half[0] / resolution;
            centres[1][i] = -half[1] + (i + 0.5) * 2 * half[1] / resolution;
            centres[2][i] = zFrom + (i + 0.5) * (half[2] - zFrom) / resolution;
        }
        int cells = 0;
        double sum = 0.0;
        for (int index = 0; index < demagnetizing.length; index++) {
            double x = centres[0][index / (resolution * resolution)];
            double y = centres[1][index / resolution % resolution];
            double z = centres[2][index % resolution];
            demagnetizing[index] = field.isInside(x, y, z) ? field.fieldStrength(x, y, z).z() : Double.NaN;
            if (!Double.isNaN(demagnetizing[index])) {
                cells++;
                sum += demagnetizing[index];
            }
        }
        double average = sum / cells;
        double shift = line.on(curve).h() - average;
        int below = 0;
        int worst = -1;
        for (int index = 0; index < demagnetizing.length; index++) {
            if (!Double.isNaN(demagnetizing[index])) {
                below += demagnetizing[index] + shift < knee ? 1 : 0;
                worst = worst < 0 || demagnetizing[index] < demagnetizing[worst] ? index : worst;
            }
        }
        double[] point = {centres[0][worst / (resolution * resolution)], centres[1][worst / resolution % resolution],
            centres[2][worst % resolution]};
        return new LocalKneeResult(resolution, cells, (double) below / cells, average, demagnetizing[worst] + shift, point[0],
                point[1], point[2], region(solid, point, half));
    }

    private static double[] halfExtents(MagnetShape shape) {
        if (shape instanceof CylinderShape cylinder) {
            return new double[] {cylinder.radius(), cylinder.radius(), 0.5 * cylinder.length()};
        }
        if (shape instanceof RingShape ring) {
            return new double[] {0.5 * ring.outerDiameter(), 0.5 * ring.outerDiameter(), 0.5 * ring.length()};
        }
        if (shape instanceof BlockShape block) {
            return new double[] {0.5 * block.width(), 0.5 * block.depth(), 0.5 * block.thickness()};
        }
        if (shape instanceof SpheroidShape spheroid) {
            return new double[] {0.5 * spheroid.equatorialDiameter(), 0.5 * spheroid.equatorialDiameter(), 0.5 * spheroid.polarDiameter()};
        }
        throw new BadInputException("the local check needs a cylinder, ring, block or spheroid (free or on a steel plate), got "
                + (shape == null ? "null" : shape.getClass().getSimpleName()));
    }

    private static MagnetRegion region(MagnetShape shape, double[] point, double[] half) {
        if (shape instanceof SpheroidShape) {
            return MagnetRegion.UNIFORM;
        }
        double along = Math.abs(point[2]) / half[2];
        double rho = Math.hypot(point[0], point[1]);
        double across;
        if (shape instanceof RingShape ring) {
            double inner = 0.5 * ring.innerDiameter();
            double wall = 0.5 * (half[0] - inner);
            across = 1.0 - Math.min(rho - inner, half[0] - rho) / wall;
        } else if (shape instanceof BlockShape) {
            across = Math.max(Math.abs(point[0]) / half[0], Math.abs(point[1]) / half[1]);
        } else {
            across = rho / half[0];
        }
        return MagnetRegion.of(along, across);
    }
}
