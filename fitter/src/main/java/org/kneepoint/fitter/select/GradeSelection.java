package org.kneepoint.fitter.select;

import java.util.ArrayList;
import java.util.List;
import org.kneepoint.fitter.loadline.DesignCheck;
import org.kneepoint.fitter.loadline.LossCheck;
import org.kneepoint.fitter.loadline.TemperatureModel;

/**
 * Ranks grades against requirements (docs/design.md §2, workflow 4): each grade's design check at the required
 * temperature on the required load line (loss by the recoil line through the operating point), its shortfalls (flux density below the minimum, loss above
 * the maximum, temperature outside the grade's model), and the ranked list.
 */
public final class GradeSelection {

    private GradeSelection() {
    }

    /** Every candidate's row, passing grades first, each group in the given order. */
    public static List<RankedGrade> rank(List<GradeCandidate> candidates, Requirements requirements, RankingOrder order) {
        List<RankedGrade> rows = new ArrayList<>(candidates.size());
        for (GradeCandidate candidate : candidates) {
            rows.add(row(candidate, requirements));
        }
        rows.sort(order.comparator());
        return List.copyOf(rows);
    }

    /** One candidate's row. */
    public static RankedGrade row(GradeCandidate candidate, Requirements requirements) {
        TemperatureModel model = candidate.model();
        double temperature = requirements.temperature();
        double outside = Math.max(model.lowestTemperature() - temperature, temperature - model.highestTemperature());
        if (outside > 0.0) {
            return new RankedGrade(candidate.name(), List.of(new Shortfall(Shortfall.Requirement.TEMPERATURE_RANGE, outside)),
                    Double.NaN, Double.NaN, Double.NaN, null, candidate.price(), null, false);
        }
        LossCheck check = DesignCheck.forRanking(model, requirements.loadLine().pc(), requirements.field(), temperature,
                requirements.maximumIrreversibleLoss());
        List<Shortfall> shortfalls = new ArrayList<>(2);
        double flux = check.point().b();
        if (requirements.minimumFluxDensity() != null && flux < requirements.minimumFluxDensity()) {
            shortfalls.add(new Shortfall(Shortfall.Requirement.MINIMUM_FLUX_DENSITY, requirements.minimumFluxDensity() - flux));
        }
        if (check.irreversibleLoss() > requirements.maximumIrreversibleLoss()) {
            shortfalls.add(new Shortfall(Shortfall.Requirement.MAXIMUM_IRREVERSIBLE_LOSS,
                    check.irreversibleLoss() - requirements.maximumIrreversibleLoss()));
        }
        double kneeMargin = check.kneeMarginField() == null ? Double.NaN : check.kneeMarginField();
        return new RankedGrade(candidate.name(), shortfalls, flux, kneeMargin, check.irreversibleLoss(),
                check.maxWorkingTemperature(), candidate.price(), check.working().minimum().temperature(),
                check.beyondMeasuredField());
    }
}
