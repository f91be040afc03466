package org.kneepoint.fitter.field;

import java.util.ArrayList;
import java.util.List;
import org.kneepoint.fitter.error.BadInputException;

/**
 * Traces field lines of a magnet in the plane of a {@link FieldGrid}: the curve whose tangent is the direction of
 * (Bx, Bz) there, integrated with classical fourth-order Runge–Kutta at a fixed step length. A line stops when it
 * leaves the grid's rectangle, enters the magnet material, meets a point without a finite in-plane field, or after
 * the greatest number of steps. Immutable and safe to share between threads.
 */
public final class FieldLineTracer {

    /** The greatest number of steps a tracer may be given. */
    public static final int MAX_STEPS = 100_000;

    private final MagnetField field;
    private final FieldGrid bounds;
    private final double step;
    private final int maxSteps;

    /** A tracer of {@code field} inside {@code bounds} with steps of {@code step} metres, at most {@code maxSteps} of them. */
    public FieldLineTracer(MagnetField field, FieldGrid bounds, double step, int maxSteps) {
        if (field == null || bounds == null) {
            throw new BadInputException("field line tracing needs a field and a grid");
        }
        if (!(step > 0.0) || !Double.isFinite(step)) {
            throw new BadInputException("field line step must be a positive length in metres, got " + step);
        }
        if (maxSteps < 1 || maxSteps > MAX_STEPS) {
            throw new BadInputException("field line steps must be between 1 and " + MAX_STEPS + ", got " + maxSteps);
        }
        this.field = field;
        this.bounds = bounds;
        this.step = step;
        this.maxSteps = maxSteps;
    }

    /** The line through (x, z), followed along B when {@code alongField}, against it otherwise. */
    public FieldLine trace(double x, double z, boolean alongField) {
        double h = alongField ? step : -step;
        List<FieldLine.Point> points = new ArrayList<>();
        points.add(new FieldLine.Point(x, z));
        double[] b = new double[3];
        for (int i = 0; i < maxSteps; i++) {
            double[] k1 = direction(x, z, b);
            double[] k2 = k1 == null ? null : direction(x + 0.5 * h * k1[0], z + 0.5 * h * k1[1], b);
            double[] k3 = k2 == null ? null : direction(x + 0.5 * h * k2[0], z + 0.5 * h * k2[1], b);
            double[] k4 = k3 == null ? null : direction(x + h * k3[0], z + h * k3[1], b);
            if (k4 == null) {
                return new FieldLine(points, FieldLine.Ending.NO_FIELD);
            }
            x += h / 6.0 * (k1[0] + 2.0 * k2[0] + 2.0 * k3[0] + k4[0]);
            z += h / 6.0 * (k1[1] + 2.0 * k2[1] + 2.0 * k3[1] + k4[1]);
            points.add(new FieldLine.Point(x, z));
            if (x < bounds.xMin() || x > bounds.xMax() || z < bounds.zMin() || z > bounds.zMax()) {
                return new FieldLine(points, FieldLine.Ending.BORDER);
            }
            if (field.isInside(x, bounds.y(), z)) {
                return new FieldLine(points, FieldLine.Ending.MAGNET);
            }
        }
        return new FieldLine(points, FieldLine.Ending.STEPS);
    }

    /** The unit vector along (Bx, Bz) at (x, z) in the grid's plane, as {dx, dz}; null where it vanishes or is not finite. */
    public double[] direction(double x, double z) {
        return direction(x, z, new double[3]);
    }

    private double[] direction(double x, double z, double[] b) {
        field.fluxDensityInto(x, bounds.y(), z, b, 0);
        double size = Math.hypot(b[0], b[2]);
        if (!(size > 0.0) || !Double.isFinite(size)) {
            return null;
        }
        return new double[] {b[0] / size, b[2] / size};
    }
}
