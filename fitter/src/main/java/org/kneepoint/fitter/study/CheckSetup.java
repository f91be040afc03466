package org.kneepoint.fitter.study;

import java.util.Map;
import java.util.Objects;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.TemperatureModel;

/**
 * The nominal check a tolerance study perturbs: the grade's temperature model, Pc of the load line, the field against
 * the magnetization, the temperature (K) and the loss limit (a fraction); for a load line from a shape, its sizes
 * (metres, by name) and how Pc follows from them (empty and null for a load line given by its Pc).
 */
public record CheckSetup(TemperatureModel model, double pc, AppliedField field, double temperature, double lossLimit,
        Map<ToleranceName, Double> sizes, PermeanceOfSizes permeance) {

    public CheckSetup {
        Objects.requireNonNull(model, "model");
        Objects.requireNonNull(field, "field");
        sizes = Map.copyOf(sizes);
    }

    /** A check whose load line is given by its Pc. */
    public static CheckSetup ofPc(TemperatureModel model, double pc, AppliedField field, double temperature, double lossLimit) {
        return new CheckSetup(model, pc, field, temperature, lossLimit, Map.of(), null);
    }
}
