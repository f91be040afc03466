package org.kneepoint.fitter.loadline;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.List;
import org.kneepoint.fitter.error.BadInputException;

/**
 * Operating points in bulk: H for every grade × temperature × permeance coefficient, written into one
 * array with no allocation per point. Each grade's curve at each temperature is formed in place from
 * its {@link LinearTemperatureLaw} (the same arithmetic as {@link LinearTemperatureLaw#at}) and each
 * point solved by the closed form of {@link KneeEquation}, with the logarithms of the slope μ0·(Pc + μrec)
 * kept per grade and of D/w per curve, so that a point costs one table look-up and one logarithm.
 */
public final class OperatingPointTable {

    private OperatingPointTable() {
    }

    /** Writes H (A/m) of point (grade g, temperature t, coefficient p) into target[(g·T + t)·P + p]. */
    public static void fieldsInto(List<LinearTemperatureLaw> grades, double[] temperatures, double[] pcs, double opposingField,
            double[] target) {
        int points = grades.size() * temperatures.length * pcs.length;
        if (target.length < points) {
            throw new BadInputException("target holds " + target.length + " values, the table needs " + points);
        }
        for (double pc : pcs) {
            new LoadLine(pc, opposingField);
        }
        double[] inverseSlope = new double[pcs.length];
        double[] logSlope = new double[pcs.length];
        int index = 0;
        for (LinearTemperatureLaw law : grades) {
            LinearRecoilKnee reference = law.reference();
            checkRange(law, temperatures);
            double slope = reference.recoilSlope();
            for (int p = 0; p < pcs.length; p++) {
                double a = MU0 * (pcs[p] + reference.recoilPermeability());
                inverseSlope[p] = 1.0 / a;
                logSlope[p] = Math.log(a);
            }
            for (double temperature : temperatures) {
                double change = temperature - law.referenceTemperature();
                double br = reference.remanence() * (1.0 + law.alpha() * change);
                double hcjScale = 1.0 + law.beta() * change;
                double hcj = reference.intrinsicCoercivity() * hcjScale;
                double width = reference.kneeWidth() * hcjScale;
                double logDepthOverWidth = Math.log((br - slope * hcj) / width);
                for (int p = 0; p < pcs.length; p++) {
                    double linearField = -(br + MU0 * pcs[p] * opposingField) * inverseSlope[p];
                    target[index++] = KneeEquation.fromLogarithms(linearField, logDepthOverWidth - logSlope[p], hcj, width);
                }
            }
        }
    }

    /** Forms each curve once through {@link LinearTemperatureLaw#at}, which refuses a temperature outside the law's range. */
    private static void checkRange(LinearTemperatureLaw law, double[] temperatures) {
        for (double temperature : temperatures) {
            law.at(temperature);
        }
    }
}
