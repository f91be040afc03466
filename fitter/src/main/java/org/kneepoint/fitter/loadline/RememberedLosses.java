package org.kneepoint.fitter.loadline;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * A temperature model that keeps the irreversible losses it computed ({@link TemperatureModel#irreversibleLoss}), per
 * load line and exact temperature, and answers a temperature asked again from what it kept: the same number, since
 * the loss is a function of the model, the line and the temperature alone. The working temperatures
 * ({@link WorkingTemperatures}) tabulate the loss on a grid fixed by the model's range and solve for its roots between
 * the same grid nodes, so on one load line their work is nearly all repeated from one check temperature to the next.
 * It keeps at most {@value #LINES} load lines (a further line starts afresh) and {@value #TEMPERATURES}
 * temperatures per line (beyond them a loss is computed and not kept). Temperatures are told apart as {@link Double}s
 * are, by their exact bits. Everything else is the wrapped model's. Safe to share
 * between threads.
 */
public final class RememberedLosses implements TemperatureModel {

    static final int LINES = 4;
    static final int TEMPERATURES = 512;

    private final TemperatureModel model;
    private final Map<LoadLine, Map<Double, Double>> lines = new ConcurrentHashMap<>();

    /** {@code model}, keeping its losses. */
    public RememberedLosses(TemperatureModel model) {
        this.model = model;
    }

    @Override
    public double irreversibleLoss(LoadLine line, double temperature) {
        Map<Double, Double> losses = lines.get(line);
        if (losses == null) {
            if (lines.size() >= LINES) {
                lines.clear();
            }
            losses = lines.computeIfAbsent(line, any -> new ConcurrentHashMap<>());
        }
        Double kept = losses.get(temperature);
        if (kept != null) {
            return kept;
        }
        double loss = model.irreversibleLoss(line, temperature);
        if (losses.size() < TEMPERATURES) {
            losses.put(temperature, loss);
        }
        return loss;
    }

    @Override
    public IntrinsicCurve at(double temperature) {
        return model.at(temperature);
    }

    @Override
    public double referenceTemperature() {
        return model.referenceTemperature();
    }

    @Override
    public double remanenceRatio(double temperature) {
        return model.remanenceRatio(temperature);
    }

    @Override
    public double lowestTemperature() {
        return model.lowestTemperature();
    }

    @Override
    public double highestTemperature() {
        return model.highestTemperature();
    }

    @Override
    public boolean isExtrapolated(double temperature) {
        return model.isExtrapolated(temperature);
    }
}
