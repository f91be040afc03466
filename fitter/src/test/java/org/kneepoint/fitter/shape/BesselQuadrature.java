package org.kneepoint.fitter.shape;

import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.hipparchus.special.BesselJ;

/**
 * Test-only reference integrals over Bessel functions (Hipparchus 4.0.1 BesselJ and
 * IterativeLegendreGaussIntegrator), panel by panel of length π up to where the exponential
 * damping has made the rest negligible. A fresh integrator per call, because the integrator keeps
 * state and nested integrals would share it.
 */
final class BesselQuadrature {

    private BesselQuadrature() {
    }

    private static IterativeLegendreGaussIntegrator integrator() {
        return new IterativeLegendreGaussIntegrator(20, 1e-13, 1e-16);
    }

    static double j1(double x) {
        return BesselJ.value(1, x);
    }

    /** ∫₀^∞ f(x)·e^{−damping·x} dx for f bounded by a constant. */
    static double damped(DoubleUnaryOperator f, double damping) {
        double upper = 40.0 / damping;
        double sum = 0.0;
        for (double lower = 0.0; lower < upper; lower += Math.PI) {
            sum += integrator().integrate(Integer.MAX_VALUE, x -> f.applyAsDouble(x) * Math.exp(-damping * x), lower,
                    lower + Math.PI);
        }
        return sum;
    }

    /** ∫ f over [lower, upper] with the adaptive Gauss–Legendre rule. */
    static double integrate(DoubleUnaryOperator f, double lower, double upper) {
        return integrator().integrate(Integer.MAX_VALUE, f::applyAsDouble, lower, upper);
    }
}
