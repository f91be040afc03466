package org.kneepoint.fitter.model.knee;

import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;
import org.kneepoint.fitter.loadline.TemperatureModel;

/**
 * The linear temperature law on the knee model, for a grade typed in: Br(T) = Br0·(1 + α·(T − T0)) and
 * HcJ(T) = HcJ0·(1 + β·(T − T0)), with μline and the knee's shape in the reduced field −H/HcJ held constant (so the
 * knee keeps its width relative to HcJ). The coefficients, their checks and the temperature range are those of
 * {@link LinearTemperatureLaw} for a curve with the same Br, μline and HcJ (where Br, HcJ and the recoil line's J at
 * −HcJ stay positive, at most 800 K from T0).
 */
public final class KneeTemperatureLaw implements TemperatureModel {

    private final KneeCurve reference;
    private final LinearTemperatureLaw law;

    /** The law from the curve at T0 and α, β in %/K, as data sheets print them. */
    public KneeTemperatureLaw(KneeCurve reference, double alphaPercent, double betaPercent, double referenceTemperature) {
        this.reference = reference;
        double hcj = reference.intrinsicCoercivity();
        this.law = LinearTemperatureLaw.ofPercentPerKelvin(new LinearRecoilKnee(reference.remanence(), reference.linePermeability(),
                hcj, hcj), alphaPercent, betaPercent, referenceTemperature);
    }

    @Override
    public KneeCurve at(double temperature) {
        law.at(temperature);
        return new KneeCurve(reference.remanence() * law.remanenceRatio(temperature), reference.linePermeability(),
                reference.intrinsicCoercivity() * (1.0 + law.beta() * (temperature - law.referenceTemperature())), reference.shape());
    }

    @Override
    public double referenceTemperature() {
        return law.referenceTemperature();
    }

    @Override
    public double remanenceRatio(double temperature) {
        return law.remanenceRatio(temperature);
    }

    @Override
    public double lowestTemperature() {
        return law.lowestTemperature();
    }

    @Override
    public double highestTemperature() {
        return law.highestTemperature();
    }
}
