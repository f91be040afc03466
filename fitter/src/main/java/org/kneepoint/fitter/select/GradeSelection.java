package org.kneepoint.fitter.select;

import java.util.ArrayList;
import java.util.List;
import org.kneepoint.fitter.loadline.DesignCheck;
import org.kneepoint.fitter.loadline.LossCheck;
import org.kneepoint.fitter.loadline.TemperatureModel;

/**
 * Ranks grades against requirements (docs/design.md §2, workflow 4): each grade's design check at the required
 * temperature on the required load line (loss by the recoil line through the operating point), its shortfalls
 * ({@link DesignShortfalls}: not a permanent magnet, flux density below the minimum or not above zero, loss above the
 * maximum, the point below the knee, the temperature outside the working range; or outside the grade's model), and
 * the ranked list. A grade with any shortfall never passes.
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
        List<Shortfall> shortfalls = DesignShortfalls.of(check, temperature, requirements.maximumIrreversibleLoss(), model.at(temperature),
                requirements.minimumFluxDensity());
        double flux = check.point().b();
        double kneeMargin = check.kneeMarginField() == null ? Double.NaN : check.kneeMarginField();
        return new RankedGrade(candidate.name(), shortfalls, flux, kneeMargin, check.irreversibleLoss(),
                check.maxWorkingTemperature(), candidate.price(), check.working().minimum().temperature(),
                check.beyondMeasuredField());
    }
}
