package org.kneepoint.fitter.shape;

import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * Test-only quadrature for integrands with (integrable) logarithmic singularities at the ends of
 * the interval: panels halve in width towards both ends, each integrated with the 12-point
 * Gauss–Legendre rule of Hipparchus 4.0.1.
 */
final class GradedQuadrature {

    private static final int LEVELS = 40;
    private static final GaussIntegratorFactory FACTORY = new GaussIntegratorFactory();

    private GradedQuadrature() {
    }

    static double integrate(DoubleUnaryOperator f, double lower, double upper) {
        double middle = 0.5 * (lower + upper);
        double sum = 0;
        double near = middle;
        double far = middle;
        for (int level = 1; level <= LEVELS; level++) {
            double step = (middle - lower) / Math.pow(2, level);
            double nextNear = level == LEVELS ? lower : lower + step;
            double nextFar = level == LEVELS ? upper : upper - step;
            sum += panel(f, nextNear, near) + panel(f, far, nextFar);
            near = nextNear;
            far = nextFar;
        }
        return sum;
    }

    private static double panel(DoubleUnaryOperator f, double lower, double upper) {
        GaussIntegrator rule = FACTORY.legendre(12, lower, upper);
        return rule.integrate(f::applyAsDouble);
    }
}
