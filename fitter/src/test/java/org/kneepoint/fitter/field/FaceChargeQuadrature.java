package org.kneepoint.fitter.field;

import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;

/**
 * Test-only reference: B = μ0·(H + M inside) with H = (σ/4π)·∬ (r − r')/|r − r'|³ dA' summed over the
 * charged pole faces (σ = ±M), integrated numerically with Hipparchus 4.0.1
 * IterativeLegendreGaussIntegrator (a fresh one per integral, since the integrator keeps state).
 */
final class FaceChargeQuadrature {

    private FaceChargeQuadrature() {
    }

    /** B of an annulus-faced cylinder (inner = 0: solid) of half-length b, remanence br, at (x, y, z). */
    static double[] coaxial(double outer, double inner, double b, double br, double x, double y, double z) {
        double[] field = new double[3];
        for (int component = 0; component < 3; component++) {
            int k = component;
            double top = integrate(rho -> rho * integrate(phi -> kernel(k, x - rho * Math.cos(phi), y - rho * Math.sin(phi), z - b),
                    0, 2 * Math.PI), inner, outer);
            double bottom = integrate(rho -> rho * integrate(phi -> kernel(k, x - rho * Math.cos(phi), y - rho * Math.sin(phi), z + b),
                    0, 2 * Math.PI), inner, outer);
            field[component] = br / (4 * Math.PI) * (top - bottom);
        }
        double rho2 = x * x + y * y;
        if (rho2 < outer * outer && rho2 > inner * inner && Math.abs(z) < b) {
            field[2] += br;
        }
        return field;
    }

    /** B of a block with half edges a, b, c, remanence br, at (x, y, z). */
    static double[] block(double a, double b, double c, double br, double x, double y, double z) {
        double[] field = new double[3];
        for (int component = 0; component < 3; component++) {
            int k = component;
            double top = integrate(s -> integrate(t -> kernel(k, x - s, y - t, z - c), -b, b), -a, a);
            double bottom = integrate(s -> integrate(t -> kernel(k, x - s, y - t, z + c), -b, b), -a, a);
            field[component] = br / (4 * Math.PI) * (top - bottom);
        }
        if (Math.abs(x) < a && Math.abs(y) < b && Math.abs(z) < c) {
            field[2] += br;
        }
        return field;
    }

    private static double kernel(int component, double dx, double dy, double dz) {
        double r2 = dx * dx + dy * dy + dz * dz;
        double inverse3 = 1 / (r2 * Math.sqrt(r2));
        return (component == 0 ? dx : component == 1 ? dy : dz) * inverse3;
    }

    private static double integrate(DoubleUnaryOperator f, double lower, double upper) {
        return new IterativeLegendreGaussIntegrator(16, 1e-11, 1e-13).integrate(Integer.MAX_VALUE, f::applyAsDouble, lower, upper);
    }
}
