package org.kneepoint.fitter.model.knee;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;

/**
 * Builds a grade's temperature model: one knee fit per curve, then {@link FittedTemperatureModel}
 * and the coefficients of {@link TemperatureFit}. Needs curves at two or more distinct temperatures.
 * T0 is 20 °C when the model reaches it; when the data lie too far above or below it, they say otherwise
 * (docs/design.md §4) and T0 is the measured temperature nearest to 20 °C, so that every check's reference and
 * its search for a maximum working temperature stay inside the model's range.
 */
public final class TemperatureModelFitter {

    /** T0 when the data do not say otherwise: 20 °C (docs/design.md §4). */
    public static final double DEFAULT_REFERENCE_K = 293.15;

    private TemperatureModelFitter() {
    }

    public static TemperatureFit fit(List<DemagnetizationCurve> curves) {
        if (curves.size() < 2) {
            throw new BadInputException("a temperature model needs curves at two or more temperatures, got " + curves.size());
        }
        List<KneeFit> fits = new ArrayList<>();
        for (DemagnetizationCurve curve : curves) {
            if (curve.temperatureK() == null) {
                throw new BadInputException("every curve of a temperature model needs its temperature");
            }
            try {
                fits.add(KneeFitter.fit(curve));
            } catch (BadInputException e) {
                throw new BadInputException(String.format(java.util.Locale.ROOT, "curve at %.2f K: %s", curve.temperatureK(), e.getMessage()));
            }
        }
        fits.sort(Comparator.comparingDouble(KneeFit::temperatureK));
        for (int i = 1; i < fits.size(); i++) {
            if (Math.abs(fits.get(i).temperatureK() - fits.get(i - 1).temperatureK()) < 0.01) {
                throw new BadInputException(String.format(java.util.Locale.ROOT,
                        "two curves at %.2f K; a temperature model needs one curve per temperature", fits.get(i).temperatureK()));
            }
        }
        if (fits.size() < 2) {
            throw new BadInputException("a temperature model needs curves at two or more temperatures, got " + fits.size());
        }
        double[] t = fits.stream().mapToDouble(KneeFit::temperatureK).toArray();
        double t0 = DEFAULT_REFERENCE_K;
        FittedTemperatureModel model = new FittedTemperatureModel(fits, t0);
        if (t0 < model.lowestTemperature() || t0 > model.highestTemperature()) {
            t0 = t0 < model.lowestTemperature() ? t[0] : t[t.length - 1];
            model = new FittedTemperatureModel(fits, t0);
        }
        double[] br = fits.stream().mapToDouble(fit -> fit.model().remanence()).toArray();
        double[] hcj = fits.stream().mapToDouble(fit -> fit.model().intrinsicCoercivity()).toArray();
        double[] muRec = fits.stream().mapToDouble(fit -> fit.model().recoilPermeability()).toArray();
        double[] width = fits.stream().mapToDouble(fit -> fit.model().kneeWidth() / fit.model().intrinsicCoercivity()).toArray();
        double[] brLine = LeastSquaresLine.line(t, br, t0);
        double[] hcjLine = LeastSquaresLine.line(t, hcj, t0);
        double alpha2 = Double.NaN;
        double beta2 = Double.NaN;
        if (fits.size() >= 3) {
            double[] brParabola = LeastSquaresLine.parabola(t, br, t0);
            double[] hcjParabola = LeastSquaresLine.parabola(t, hcj, t0);
            alpha2 = brParabola[2] / brParabola[0];
            beta2 = hcjParabola[2] / hcjParabola[0];
        }
        return new TemperatureFit(model, fits, t0, brLine[1] / brLine[0], hcjLine[1] / hcjLine[0], alpha2, beta2,
                LeastSquaresLine.slope(t, muRec), LeastSquaresLine.slope(t, width));
    }
}
