package org.kneepoint.fitter.library;

import java.util.List;

/** One row of the grade list: name, family, supplier and the temperatures at which curves are stored (K, ascending). */
public record GradeSummary(String name, String family, String supplier, List<Double> temperaturesK, int curves) {

    public GradeSummary {
        temperaturesK = List.copyOf(temperaturesK);
    }
}
