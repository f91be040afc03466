package org.kneepoint.fitter.loadline;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import org.kneepoint.fitter.error.BadInputException;

/**
 * The linear temperature law: Br(T) = Br0·(1 + α·(T − T0)), HcJ(T) = HcJ0·(1 + β·(T − T0)), with μrec
 * and the knee's relative width w/HcJ held constant (the form of the Modelica FluxTubes HardMagnetic
 * records, Br(T) = BrRef·(1 + α·(T − Tref)); docs/references.md §6b). α and β are in 1/K. The model's range
 * is where Br, HcJ and the recoil line's J at −HcJ all stay positive, within 1 K to T0 + 800 K (no
 * commercial magnet material keeps its magnetization that far: the Curie points of Sm2Co17 lie near
 * 800–850 °C; from memory).
 *
 * @param reference            the curve at T0
 * @param alpha                α of Br, 1/K
 * @param beta                 β of HcJ, 1/K
 * @param referenceTemperature T0, K
 */
public record LinearTemperatureLaw(LinearRecoilKnee reference, double alpha, double beta, double referenceTemperature)
        implements TemperatureModel {

    /** T0 when the data give none: 20 °C (docs/design.md §4). */
    public static final double DEFAULT_REFERENCE_TEMPERATURE = 293.15;

    private static final double RANGE_MARGIN = 1e-6;
    private static final double WIDEST_SPAN = 800.0;

    public LinearTemperatureLaw {
        if (reference == null) {
            throw new BadInputException("the linear temperature law needs the curve at T0, got null");
        }
        if (!Double.isFinite(alpha) || !Double.isFinite(beta) || Math.abs(alpha) > 0.1 || Math.abs(beta) > 0.1) {
            throw new BadInputException("temperature coefficients must be finite and within ±10 %/K, got α = " + alpha * 100
                    + " %/K, β = " + beta * 100 + " %/K");
        }
        if (!(referenceTemperature > 0.0) || !Double.isFinite(referenceTemperature)) {
            throw new BadInputException("reference temperature must be a positive finite number of kelvin, got " + referenceTemperature);
        }
    }

    /** The law with α and β given in %/K, as data sheets print them. */
    public static LinearTemperatureLaw ofPercentPerKelvin(LinearRecoilKnee reference, double alphaPercent, double betaPercent,
            double referenceTemperature) {
        return new LinearTemperatureLaw(reference, alphaPercent / 100.0, betaPercent / 100.0, referenceTemperature);
    }

    @Override
    public LinearRecoilKnee at(double temperature) {
        if (!(temperature >= lowestTemperature() && temperature <= highestTemperature())) {
            throw new BadInputException(String.format("temperature %.6g K lies outside %.6g K to %.6g K, where the linear law"
                    + " keeps Br, HcJ and the knee positive", temperature, lowestTemperature(), highestTemperature()));
        }
        double hcjScale = 1.0 + beta * (temperature - referenceTemperature);
        return new LinearRecoilKnee(reference.remanence() * remanenceRatio(temperature), reference.recoilPermeability(),
                reference.intrinsicCoercivity() * hcjScale, reference.kneeWidth() * hcjScale);
    }

    @Override
    public double remanenceRatio(double temperature) {
        return 1.0 + alpha * (temperature - referenceTemperature);
    }

    @Override
    public double lowestTemperature() {
        double span = WIDEST_SPAN;
        for (double[] line : positiveLines()) {
            if (line[1] > 0.0) {
                span = Math.min(span, line[0] / line[1]);
            }
        }
        return Math.max(1.0, referenceTemperature - span * (1.0 - RANGE_MARGIN));
    }

    @Override
    public double highestTemperature() {
        double span = WIDEST_SPAN;
        for (double[] line : positiveLines()) {
            if (line[1] < 0.0) {
                span = Math.min(span, -line[0] / line[1]);
            }
        }
        return referenceTemperature + span * (1.0 - RANGE_MARGIN);
    }

    /** Br, HcJ and D = Br − μ0(μrec − 1)·HcJ as p + q·(T − T0), each {p, q}; each must stay positive. */
    private double[][] positiveLines() {
        double br = reference.remanence();
        double hcj = reference.intrinsicCoercivity();
        double slope = MU0 * (reference.recoilPermeability() - 1.0);
        return new double[][] {{br, br * alpha}, {hcj, hcj * beta}, {br - slope * hcj, br * alpha - slope * hcj * beta}};
    }
}
