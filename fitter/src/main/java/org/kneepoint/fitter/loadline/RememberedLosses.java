package org.kneepoint.fitter.loadline;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A temperature model that keeps the irreversible losses it computed ({@link TemperatureModel#irreversibleLoss}), per
 * load line and exact temperature, and answers a temperature asked again from what it kept: the same number, since
 * the loss is a function of the model, the line and the temperature alone. The working temperatures
 * ({@link WorkingTemperatures}) tabulate the loss on a grid fixed by the model's range and solve for its roots between
 * the same grid nodes, so on one load line their work is nearly all repeated from one check temperature to the next.
 * It keeps at most {@value #LINES} load lines (the least recently used goes) and {@value #TEMPERATURES} temperatures
 * per line (beyond them a loss is computed and not kept). Everything else is the wrapped model's. Safe to share
 * between threads.
 */
public final class RememberedLosses implements TemperatureModel {

    static final int LINES = 4;
    static final int TEMPERATURES = 512;

    private final TemperatureModel model;
    private final Map<LoadLine, Losses> lines = new LinkedHashMap<>(8, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<LoadLine, Losses> eldest) {
            return size() > LINES;
        }
    };

    /** {@code model}, keeping its losses. */
    public RememberedLosses(TemperatureModel model) {
        this.model = model;
    }

    @Override
    public double irreversibleLoss(LoadLine line, double temperature) {
        Losses losses;
        synchronized (lines) {
            losses = lines.computeIfAbsent(line, any -> new Losses());
        }
        double kept = losses.get(temperature);
        if (!Double.isNaN(kept)) {
            return kept;
        }
        double loss = model.irreversibleLoss(line, temperature);
        losses.put(temperature, loss);
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

    /**
     * Losses on one line by the exact bits of the temperature: an open-addressed table of {@value #TEMPERATURES} slots,
     * filled up to three quarters. A loss is never NaN (it is clamped to 0..1), so NaN marks an empty slot.
     */
    private static final class Losses {

        private static final int CAPACITY = TEMPERATURES * 4 / 3 + 1;

        private final long[] keys = new long[CAPACITY];
        private final double[] values = new double[CAPACITY];
        private int size;

        Losses() {
            Arrays.fill(values, Double.NaN);
        }

        synchronized double get(double temperature) {
            long key = Double.doubleToLongBits(temperature);
            for (int slot = slot(key); !Double.isNaN(values[slot]); slot = (slot + 1) % CAPACITY) {
                if (keys[slot] == key) {
                    return values[slot];
                }
            }
            return Double.NaN;
        }

        synchronized void put(double temperature, double loss) {
            if (size >= TEMPERATURES || Double.isNaN(loss)) {
                return;
            }
            long key = Double.doubleToLongBits(temperature);
            int slot = slot(key);
            while (!Double.isNaN(values[slot])) {
                if (keys[slot] == key) {
                    return;
                }
                slot = (slot + 1) % CAPACITY;
            }
            keys[slot] = key;
            values[slot] = loss;
            size++;
        }

        private static int slot(long key) {
            long mixed = key * 0x9E3779B97F4A7C15L;
            return (int) ((mixed >>> 33) % CAPACITY);
        }
    }
}
