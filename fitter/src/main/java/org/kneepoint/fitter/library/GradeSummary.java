package org.kneepoint.fitter.library;

import java.util.List;

/**
 * One row of the grade list: name, family, supplier, the temperatures at which curves are stored
 * (K, ascending), the number of curves, and the price per kilogram (null when not known).
 */
public record GradeSummary(String name, String family, String supplier, List<Double> temperaturesK, int curves, Double price) {

    public GradeSummary {
        temperaturesK = List.copyOf(temperaturesK);
    }
}
