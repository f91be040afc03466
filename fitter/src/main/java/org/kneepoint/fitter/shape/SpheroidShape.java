package org.kneepoint.fitter.shape;

/**
 * A spheroid centred at the origin with its symmetry (polar) axis along z, magnetized along that
 * axis. Being an ellipsoid, its internal field is uniform and Nm = Nf = N0 exactly
 * (J. A. Osborn, "Demagnetizing factors of the general ellipsoid", Phys. Rev. 67, 351, 1945).
 * With ratio m = polar/equatorial diameter:
 * prolate (m &gt; 1) N = [m·acosh(m)/√(m² − 1) − 1]/(m² − 1);
 * oblate (m &lt; 1) N = [1 − m·acos(m)/√(1 − m²)]/(1 − m²) (docs/references.md §3; the logarithm of Osborn's
 * prolate form is written as 2·acosh m). Near the sphere both are replaced by the series
 * N = (1/m²)·Σ (−q)ᵏ/(2k + 3), q = (1 − m²)/m², obtained by expanding Osborn's integral
 * N = (m/2)·∫₀^∞ ds/[(m² + s)^{3/2}·(1 + s)]. Accepted m: {@value #MIN_RATIO} to {@value #MAX_RATIO}.
 *
 * @param equatorialDiameter across the axis, in metres
 * @param polarDiameter      along the axis and the magnetization, in metres
 */
public record SpheroidShape(double equatorialDiameter, double polarDiameter) implements MagnetShape {

    /** Smallest accepted polar/equatorial ratio. */
    public static final double MIN_RATIO = 1e-3;
    /** Largest accepted polar/equatorial ratio. */
    public static final double MAX_RATIO = 1e3;

    private static final double SERIES_LIMIT = 1e-2;

    public SpheroidShape {
        SizeChecks.positiveLength("equatorial diameter", equatorialDiameter);
        SizeChecks.positiveLength("polar diameter", polarDiameter);
        SizeChecks.ratioWithin("spheroid polar/equatorial diameter", polarDiameter / equatorialDiameter, MIN_RATIO, MAX_RATIO);
    }

    /** A sphere of the given diameter. */
    public static SpheroidShape sphere(double diameter) {
        return new SpheroidShape(diameter, diameter);
    }

    /** The demagnetizing factor along the axis; the three kinds coincide. */
    public double demagnetizingFactor() {
        double m = polarDiameter / equatorialDiameter;
        double q = (1 - m * m) / (m * m);
        if (Math.abs(q) < SERIES_LIMIT) {
            double sum = 0;
            double power = 1;
            for (int k = 0; k < 12; k++) {
                sum += power / (2 * k + 3);
                power *= -q;
            }
            return sum / (m * m);
        }
        if (m > 1) {
            double e2 = m * m - 1;
            return (m * acosh(m) / Math.sqrt(e2) - 1) / e2;
        }
        double e2 = 1 - m * m;
        return (1 - m * Math.acos(m) / Math.sqrt(e2)) / e2;
    }

    @Override
    public DemagnetizingFactors demagnetizingFactors() {
        return DemagnetizingFactors.uniform(demagnetizingFactor());
    }

    @Override
    public double volume() {
        return Math.PI / 6 * equatorialDiameter * equatorialDiameter * polarDiameter;
    }

    private static double acosh(double x) {
        return Math.log(x + Math.sqrt(x * x - 1));
    }
}
