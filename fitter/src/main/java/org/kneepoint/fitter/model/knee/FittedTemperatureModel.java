package org.kneepoint.fitter.model.knee;

import java.util.List;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.TemperatureModel;

/**
 * A grade's knee model at any temperature, from knee fits at several measured temperatures. Within
 * the measured range Br, μline and HcJ are interpolated linearly between neighbouring fits, and so are
 * the shape's parameters when both fits have the same form of knee (otherwise the nearer fit's shape
 * is kept), so at a measured temperature the model is that temperature's own fit. Beyond the range
 * Br, μline and HcJ continue from the nearest end with the slope of the least-squares line through all
 * fits and the end's shape is kept, up to half the measured span (at least 50 K) further; such
 * temperatures are extrapolated and say so ({@link #isExtrapolated}).
 */
public final class FittedTemperatureModel implements TemperatureModel {

    private final double[] temperatures;
    private final double[][] parameters;
    private final KneeShape[] shapes;
    private final double[] endSlopes;
    private final double referenceTemperature;
    private final double margin;

    /** @param fits knee fits at distinct temperatures, ascending */
    FittedTemperatureModel(List<KneeFit> fits, double referenceTemperature) {
        int n = fits.size();
        temperatures = new double[n];
        parameters = new double[3][n];
        shapes = new KneeShape[n];
        for (int i = 0; i < n; i++) {
            KneeCurve model = fits.get(i).model();
            temperatures[i] = fits.get(i).temperatureK();
            parameters[0][i] = model.remanence();
            parameters[1][i] = model.linePermeability();
            parameters[2][i] = model.intrinsicCoercivity();
            shapes[i] = model.shape();
        }
        endSlopes = new double[3];
        for (int p = 0; p < 3; p++) {
            endSlopes[p] = LeastSquaresLine.slope(temperatures, parameters[p]);
        }
        this.referenceTemperature = referenceTemperature;
        this.margin = Math.max(50.0, 0.5 * (temperatures[n - 1] - temperatures[0]));
    }

    @Override
    public KneeCurve at(double temperature) {
        if (!(temperature >= lowestTemperature() && temperature <= highestTemperature())) {
            throw new BadInputException(String.format(java.util.Locale.ROOT,
                    "%.2f K lies too far outside the measured %.2f K to %.2f K for the temperature model (it extrapolates up to %.0f K beyond)",
                    temperature, temperatures[0], temperatures[temperatures.length - 1], margin));
        }
        double br = Math.max(1e-6, parameter(0, temperature));
        double hcj = Math.max(1e-6, parameter(2, temperature));
        double line = Math.min(Math.max(1.0, parameter(1, temperature)), 1 + 0.999 * br / (org.kneepoint.fitter.units.MagneticConstant.MU0 * hcj));
        return new KneeCurve(br, Math.min(KneeCurve.MAX_LINE_PERMEABILITY, line), hcj, shape(temperature));
    }

    private KneeShape shape(double temperature) {
        int last = temperatures.length - 1;
        if (temperature <= temperatures[0]) {
            return shapes[0];
        }
        if (temperature >= temperatures[last]) {
            return shapes[last];
        }
        int k = 0;
        while (temperatures[k + 1] < temperature) {
            k++;
        }
        double t = (temperature - temperatures[k]) / (temperatures[k + 1] - temperatures[k]);
        if (shapes[k].getClass() != shapes[k + 1].getClass()) {
            return t < 0.5 ? shapes[k] : shapes[k + 1];
        }
        double[] from = shapes[k].parameters();
        double[] to = shapes[k + 1].parameters();
        double[] mixed = new double[from.length];
        for (int i = 0; i < from.length; i++) {
            mixed[i] = from[i] + t * (to[i] - from[i]);
        }
        return shapes[k].with(mixed);
    }

    private double parameter(int p, double temperature) {
        int last = temperatures.length - 1;
        if (temperature <= temperatures[0]) {
            return parameters[p][0] + endSlopes[p] * (temperature - temperatures[0]);
        }
        if (temperature >= temperatures[last]) {
            return parameters[p][last] + endSlopes[p] * (temperature - temperatures[last]);
        }
        int k = 0;
        while (temperatures[k + 1] < temperature) {
            k++;
        }
        double t = (temperature - temperatures[k]) / (temperatures[k + 1] - temperatures[k]);
        return parameters[p][k] + t * (parameters[p][k + 1] - parameters[p][k]);
    }

    /** True outside the measured temperatures. */
    public boolean isExtrapolated(double temperature) {
        return temperature < temperatures[0] || temperature > temperatures[temperatures.length - 1];
    }

    @Override
    public double referenceTemperature() {
        return referenceTemperature;
    }

    @Override
    public double remanenceRatio(double temperature) {
        return parameter(0, temperature) / parameter(0, referenceTemperature);
    }

    @Override
    public double lowestTemperature() {
        return Math.max(1.0, temperatures[0] - margin);
    }

    @Override
    public double highestTemperature() {
        return temperatures[temperatures.length - 1] + margin;
    }
}
