package org.kneepoint.fitter.loadline;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.SplittableRandom;

/** Invented grades for the tests (round numbers near sintered NdFeB and ferrite; not any supplier's data). */
final class Grades {

    private Grades() {
    }

    /** Br 1.3 T, μrec 1.05, HcJ 1600 kA/m, Hk 1450 kA/m at 20 °C. */
    static LinearRecoilKnee neodymium() {
        return LinearRecoilKnee.withKneeField(1.3, 1.05, 1.6e6, 1.45e6);
    }

    /** The neodymium curve with α = −0.12 %/K, β = −0.6 %/K, T0 = 20 °C. */
    static LinearTemperatureLaw neodymiumLaw() {
        return LinearTemperatureLaw.ofPercentPerKelvin(neodymium(), -0.12, -0.6, LinearTemperatureLaw.DEFAULT_REFERENCE_TEMPERATURE);
    }

    /** A random valid knee curve: Br 0.8–1.5 T, μrec 1–1.1, HcJ 0.2–2.5 MA/m, Hk 75–98 % of the largest valid knee field. */
    static LinearRecoilKnee random(SplittableRandom random) {
        double br = random.nextDouble(0.8, 1.5);
        double muRec = random.nextDouble(1.0, 1.1);
        double hcj = random.nextDouble(2e5, 2.5e6);
        double slope = MU0 * (muRec - 1);
        double largest = slope > 0 ? Math.min(hcj, 0.95 * 0.1 * br / slope) : hcj;
        return LinearRecoilKnee.withKneeField(br, muRec, hcj, largest * random.nextDouble(0.75, 0.98));
    }
}
