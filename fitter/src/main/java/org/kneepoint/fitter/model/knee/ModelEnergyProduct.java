package org.kneepoint.fitter.model.knee;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;


/** (BH)max of a knee model: the maximum of −H·(μ0·H + J(H)) between HcB and 0, by golden-section search. */
final class ModelEnergyProduct {

    private static final double GOLDEN = (Math.sqrt(5) - 1) / 2;

    private ModelEnergyProduct() {
    }

    static double maximum(KneeCurve model) {
        double left = model.operatingField(0.0, 0.0);
        double right = 0.0;
        double tolerance = 1e-10 * -left;
        double a = right - GOLDEN * (right - left);
        double b = left + GOLDEN * (right - left);
        double atA = product(model, a);
        double atB = product(model, b);
        for (int i = 0; i < 200 && right - left > tolerance; i++) {
            if (atA >= atB) {
                right = b;
                b = a;
                atB = atA;
                a = right - GOLDEN * (right - left);
                atA = product(model, a);
            } else {
                left = a;
                a = b;
                atA = atB;
                b = left + GOLDEN * (right - left);
                atB = product(model, b);
            }
        }
        return product(model, 0.5 * (left + right));
    }

    private static double product(KneeCurve model, double h) {
        return -h * (MU0 * h + model.j(h));
    }
}
