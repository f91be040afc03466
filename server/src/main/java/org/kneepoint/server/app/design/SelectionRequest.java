package org.kneepoint.server.app.design;

import java.util.Objects;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.select.RankingOrder;
import org.kneepoint.server.app.InputLimits;

/**
 * A grade selection as every front end asks for it: the load line, the temperature (K), the field against the
 * magnetization in either convention ({@link AppliedField}),
 * the least flux density (T, null: any), the largest irreversible loss (a fraction), the order, and the family
 * (null: every grade of the library).
 */
public record SelectionRequest(LoadLineSpec loadLine, double temperature, AppliedField field, Double minimumFluxDensity,
        double maximumLoss, RankingOrder order, String family) {

    public SelectionRequest {
        Objects.requireNonNull(loadLine, "loadLine");
        Objects.requireNonNull(order, "order");
        InputLimits.temperatureProblem(temperature, temperature + " K").ifPresent(problem -> {
            throw new BadInputException(problem);
        });
    }
}
