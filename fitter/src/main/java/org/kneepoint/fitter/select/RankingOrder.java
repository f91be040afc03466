package org.kneepoint.fitter.select;

import java.util.Comparator;

/** How passing grades are ordered (failing ones follow, in the same order): best first. */
public enum RankingOrder {
    /** Highest B at the operating point first. */
    FLUX_DENSITY(Comparator.comparingDouble(RankedGrade::fluxDensity).reversed()),
    /** Largest margin to the knee first. */
    KNEE_MARGIN(Comparator.comparingDouble(RankedGrade::kneeMarginField).reversed()),
    /** Smallest irreversible loss first. */
    IRREVERSIBLE_LOSS(Comparator.comparingDouble(RankedGrade::irreversibleLoss)),
    /** Highest maximum working temperature first; grades with none last. */
    MAX_WORKING_TEMPERATURE(Comparator.comparing(RankedGrade::maxWorkingTemperature,
            Comparator.nullsLast(Comparator.<Double>reverseOrder()))),
    /** Cheapest first; grades without a price last. */
    PRICE(Comparator.comparing(RankedGrade::price, Comparator.nullsLast(Comparator.<Double>naturalOrder())));

    private final Comparator<RankedGrade> order;

    RankingOrder(Comparator<RankedGrade> order) {
        this.order = order;
    }

    /** Passing grades first, then this order, then by name. */
    public Comparator<RankedGrade> comparator() {
        return Comparator.comparing((RankedGrade grade) -> !grade.passes()).thenComparing(order)
                .thenComparing(RankedGrade::name);
    }
}
