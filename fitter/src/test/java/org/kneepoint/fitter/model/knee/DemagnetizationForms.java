package org.kneepoint.fitter.model.knee;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.SplittableRandom;
import java.util.function.DoubleUnaryOperator;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;

/**
 * Test-only: synthetic demagnetization curves of each family, from forms independent of the knee
 * model, with known Gaussian noise (fixed seeds). Parameters are invented to look like their families.
 */
final class DemagnetizationForms {

    private DemagnetizationForms() {
    }

    /**
     * Square sintered NdFeB after the hyperbolic-tangent branch of J. Takács's T(x) hysteresis model,
     * J = Js·tanh((H + Hc)/a) + μ0·χ·H (J. Takács, "Mathematics of Hysteretic Phenomena: the T(x)
     * Model for the Description of Hysteresis", Wiley-VCH, 2003, ch. 2 — from memory).
     */
    static DoubleUnaryOperator takacsBranch(double js, double hc, double a, double chi) {
        return h -> js * Math.tanh((h + hc) / a) + MU0 * chi * h;
    }

    /**
     * A reversible recoil line whose grains reverse with a Gaussian (λ = 1) or log-normal (λ = 0)
     * distribution of switching fields centred on h0, J = (Br + μ0(μrec − 1)·H)·(1 − 2·P(−H)) —
     * the Preisach-type picture (F. Preisach, "Über die magnetische Nachwirkung", Z. Phys. 94,
     * 277–302, 1935; log-normal switching fields of particulate magnets, e.g. E. Della Torre,
     * "Magnetic Hysteresis", IEEE Press, 1999 — from memory).
     */
    static DoubleUnaryOperator switchingDistribution(double br, double muRec, double h0, double spread, boolean logNormal) {
        return h -> {
            double x = -h;
            double z = logNormal ? (x > 0 ? Math.log(x / h0) / spread : Double.NEGATIVE_INFINITY) : (x - h0) / (spread * h0);
            return (br - MU0 * (muRec - 1) * x) * (1 - 2 * normalProbability(z));
        };
    }

    /**
     * Cast AlNiCo after the hyperbolic approximation of its demagnetization curve in B,
     * B = Br·(1 − t)/(1 − a·t), t = −H/HcB (R. J. Parker, "Advances in Permanent Magnetism", Wiley,
     * 1990, ch. 5 — from memory), written as J = B − μ0·H.
     */
    static DoubleUnaryOperator hyperbolicAlnico(double br, double hcb, double a) {
        return h -> {
            double t = -h / hcb;
            return br * (1 - t) / (1 - a * t) - MU0 * h;
        };
    }

    /** Φ(z) by the complementary error function of W. J. Cody's rational approximation, as 0.5·erfc(−z/√2). */
    static double normalProbability(double z) {
        if (z == Double.NEGATIVE_INFINITY) {
            return 0;
        }
        return 0.5 * org.hipparchus.special.Erf.erfc(-z / Math.sqrt(2));
    }

    /** The form sampled at evenly spaced H from hTop down to hBottom, with Gaussian noise of σ = noise. */
    static DemagnetizationCurve sampled(DoubleUnaryOperator j, double hTop, double hBottom, int points, double noise, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        double[] h = new double[points];
        double[] values = new double[points];
        for (int i = 0; i < points; i++) {
            h[i] = hTop + (hBottom - hTop) * i / (points - 1);
            values[i] = j.applyAsDouble(h[i]) + noise * random.nextGaussian();
        }
        return DemagnetizationCurve.of(Quantity.J, h, values, 293.15);
    }
}
