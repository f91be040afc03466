package org.kneepoint.server.app.design;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.select.RankingOrder;

/** The words that choose a selection's order ({@code flux}, {@code margin}, {@code loss}, {@code temperature}, {@code price}) and their descriptions. */
public final class SelectionSort {

    private SelectionSort() {
    }

    /** The order a word names; any other word is bad input. */
    public static RankingOrder of(String word) {
        return switch (word) {
            case "flux" -> RankingOrder.FLUX_DENSITY;
            case "margin" -> RankingOrder.KNEE_MARGIN;
            case "loss" -> RankingOrder.IRREVERSIBLE_LOSS;
            case "temperature" -> RankingOrder.MAX_WORKING_TEMPERATURE;
            case "price" -> RankingOrder.PRICE;
            default -> throw new BadInputException("sort must be flux, margin, loss, temperature or price, got '" + word + "'");
        };
    }

    /** What the order sorts by, for the table's footnote. */
    public static String describe(RankingOrder order) {
        return switch (order) {
            case FLUX_DENSITY -> "flux density at the operating point, highest first";
            case KNEE_MARGIN -> "margin to the knee, largest first";
            case IRREVERSIBLE_LOSS -> "irreversible loss, smallest first";
            case MAX_WORKING_TEMPERATURE -> "maximum working temperature, highest first";
            case PRICE -> "price per kilogram, cheapest first (grades without a price last)";
        };
    }
}
