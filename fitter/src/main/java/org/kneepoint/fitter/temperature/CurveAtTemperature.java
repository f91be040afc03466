package org.kneepoint.fitter.temperature;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.BoundedTemperatureModel;
import org.kneepoint.fitter.loadline.MagnetFamily;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.fitter.model.knee.FittedTemperatureModel;
import org.kneepoint.fitter.model.knee.KneeFit;
import org.kneepoint.fitter.model.knee.TemperatureFit;

/**
 * A grade's curve at any temperature from its measured curves (see the package description): exact at
 * each measured temperature; between two, J(H, T) = Br(T)·[(1 − w)·J_a(H·HcJ_a/HcJ(T))/Br_a +
 * w·J_b(H·HcJ_b/HcJ(T))/Br_b] with w = (T − T_a)/(T_b − T_a) and Br(T), HcJ(T) linear between the
 * neighbours' characterized values (our choice: it keeps each measured curve's own Br and HcJ exact and
 * needs no model between the data); beyond them, the nearest curve scaled by the fitted temperature
 * model's ratios Br(T)/Br(T_end) and HcJ(T)/HcJ(T_end), flagged. The temperature range, T0 and
 * the reversible change of Br come from the fitted model ({@link FittedTemperatureModel}).
 */
public final class CurveAtTemperature implements TemperatureModel {

    private static final double SAME_TEMPERATURE_K = 0.01;

    private final List<MeasuredComponent> components;
    private final FittedTemperatureModel law;

    private CurveAtTemperature(List<MeasuredComponent> components, FittedTemperatureModel law) {
        this.components = components;
        this.law = law;
    }

    /** From a grade's curves and the temperature fit made of them (one fit per curve, matched by temperature). */
    public static CurveAtTemperature of(List<DemagnetizationCurve> curves, TemperatureFit fit) {
        List<MeasuredComponent> components = new ArrayList<>();
        for (DemagnetizationCurve curve : curves) {
            if (curve.temperatureK() == null) {
                throw new BadInputException("every curve of a grade's curve at temperature needs its temperature");
            }
            KneeFit own = fit.fits().stream().filter(f -> Math.abs(f.temperatureK() - curve.temperatureK()) <= SAME_TEMPERATURE_K)
                    .findFirst().orElseThrow(() -> new BadInputException(String.format(Locale.ROOT,
                            "no knee fit for the curve at %.2f K in the temperature model", curve.temperatureK())));
            components.add(new MeasuredComponent(curve, own.model()));
        }
        components.sort(Comparator.comparingDouble(MeasuredComponent::temperature));
        return new CurveAtTemperature(List.copyOf(components), fit.model());
    }

    /**
     * These curves on the range of the fitted model cut as {@link BoundedTemperatureModel#of} cuts it (below the Curie
     * temperature of {@code family}, null for none, and where the model's curve ends), so that a check refuses the same
     * temperatures whichever of the two it works on.
     */
    public BoundedTemperatureModel bounded(MagnetFamily family) {
        BoundedTemperatureModel range = BoundedTemperatureModel.of(law, family);
        return BoundedTemperatureModel.within(this, range.lowestTemperature(), range.highestTemperature(), range.topReason());
    }

    /** The measured temperatures, K, ascending. */
    public List<Double> measuredTemperatures() {
        return components.stream().map(MeasuredComponent::temperature).toList();
    }

    @Override
    public TemperatureCurve at(double temperature) {
        if (!(temperature >= lowestTemperature() && temperature <= highestTemperature())) {
            throw new BadInputException(String.format(Locale.ROOT, "%.2f K lies outside %.2f K to %.2f K, the range of the grade's"
                    + " temperature model", temperature, lowestTemperature(), highestTemperature()));
        }
        MeasuredComponent first = components.get(0);
        MeasuredComponent last = components.get(components.size() - 1);
        if (temperature < first.temperature() - SAME_TEMPERATURE_K || temperature > last.temperature() + SAME_TEMPERATURE_K) {
            MeasuredComponent end = temperature < first.temperature() ? first : last;
            double brScale = law.at(temperature).remanence() / law.at(end.temperature()).remanence();
            double hcjScale = law.at(temperature).intrinsicCoercivity() / law.at(end.temperature()).intrinsicCoercivity();
            return new TemperatureCurve(temperature, end.br() * brScale, end.hcj() * hcjScale, new MeasuredComponent[] {end},
                    new double[] {1.0}, true);
        }
        for (MeasuredComponent c : components) {
            if (Math.abs(c.temperature() - temperature) <= SAME_TEMPERATURE_K) {
                return new TemperatureCurve(temperature, c.br(), c.hcj(), new MeasuredComponent[] {c}, new double[] {1.0}, false);
            }
        }
        int k = 0;
        while (components.get(k + 1).temperature() < temperature) {
            k++;
        }
        MeasuredComponent a = components.get(k);
        MeasuredComponent b = components.get(k + 1);
        double w = (temperature - a.temperature()) / (b.temperature() - a.temperature());
        return new TemperatureCurve(temperature, a.br() + w * (b.br() - a.br()), a.hcj() + w * (b.hcj() - a.hcj()),
                new MeasuredComponent[] {a, b}, new double[] {1 - w, w}, false);
    }

    /** True outside the measured temperatures. */
    public boolean isExtrapolated(double temperature) {
        return temperature < components.get(0).temperature() - SAME_TEMPERATURE_K
                || temperature > components.get(components.size() - 1).temperature() + SAME_TEMPERATURE_K;
    }

    @Override
    public double referenceTemperature() {
        return law.referenceTemperature();
    }

    @Override
    public double remanenceRatio(double temperature) {
        return at(temperature).remanence() / at(referenceTemperature()).remanence();
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
