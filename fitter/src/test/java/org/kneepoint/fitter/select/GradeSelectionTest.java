package org.kneepoint.fitter.select;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.DemagnetizingKind;

class GradeSelectionTest {

    // invented grades with round numbers (not any supplier's data)
    private static GradeCandidate grade(String name, double br, double hcj, double hk, double beta, Double price) {
        return new GradeCandidate(name, LinearTemperatureLaw.ofPercentPerKelvin(LinearRecoilKnee.withKneeField(br, 1.03, hcj, hk),
                -0.12, beta, 293.15), price);
    }

    private static final GradeCandidate STRONG = grade("strong", 1.42, 1.0e6, 0.9e6, -0.6, 10.0);
    private static final GradeCandidate HOT = grade("hot", 1.25, 2.4e6, 2.2e6, -0.5, 30.0);
    private static final GradeCandidate MIDDLE = grade("middle", 1.33, 1.6e6, 1.45e6, -0.55, null);
    private static final List<GradeCandidate> ALL = List.of(STRONG, MIDDLE, HOT);

    @Test
    void a_grade_that_loses_too_much_at_temperature_fails_with_the_excess_loss() {
        Requirements requirements = new Requirements(new LoadLine(1.0, 2e5), 393.15, null, 0.01);
        List<RankedGrade> rows = GradeSelection.rank(ALL, requirements, RankingOrder.FLUX_DENSITY);
        RankedGrade strong = rows.stream().filter(row -> row.name().equals("strong")).findFirst().orElseThrow();
        assertFalse(strong.passes());
        assertEquals(Shortfall.Requirement.MAXIMUM_IRREVERSIBLE_LOSS, strong.shortfalls().get(0).requirement());
        assertEquals(strong.irreversibleLoss() - 0.01, strong.shortfalls().get(0).by(), 1e-15);
        assertTrue(rows.get(0).passes());
        assertEquals("strong", rows.get(2).name());
    }

    @Test
    void flux_shortfall_is_the_distance_to_the_minimum() {
        // a grade far above its knee works at Bd = Br(T)·Pc/(Pc + μrec) (common practice)
        Requirements requirements = new Requirements(new LoadLine(2.0, 0.0), 293.15, 1.0, 0.01);
        RankedGrade hot = GradeSelection.row(HOT, requirements);
        double bd = 1.25 * 2.0 / (2.0 + 1.03);
        assertEquals(bd, hot.fluxDensity(), 1e-9);
        assertEquals(1.0 - bd, hot.shortfalls().get(0).by(), 1e-9);
        assertEquals(Shortfall.Requirement.MINIMUM_FLUX_DENSITY, hot.shortfalls().get(0).requirement());
    }

    @Test
    void passing_grades_sort_by_each_order() {
        Requirements requirements = new Requirements(new LoadLine(3.0, 0.0), 313.15, null, 0.05);
        assertEquals(List.of("strong", "middle", "hot"), names(GradeSelection.rank(ALL, requirements, RankingOrder.FLUX_DENSITY)));
        assertEquals(List.of("hot", "middle", "strong"), names(GradeSelection.rank(ALL, requirements, RankingOrder.KNEE_MARGIN)));
        assertEquals(List.of("strong", "hot", "middle"), names(GradeSelection.rank(ALL, requirements, RankingOrder.PRICE)));
        assertEquals("hot", GradeSelection.rank(ALL, requirements, RankingOrder.MAX_WORKING_TEMPERATURE).get(0).name());
    }

    @Test
    void temperature_beyond_a_grade_model_is_a_shortfall_in_kelvin() {
        // HcJ·(1 + β·ΔT) reaches 0 at ΔT = 1/0.6 % = 166.7 K above 20 °C for the strong grade
        Requirements requirements = new Requirements(new LoadLine(3.0, 0.0), 473.15, null, 0.05);
        RankedGrade strong = GradeSelection.row(STRONG, requirements);
        assertEquals(Shortfall.Requirement.TEMPERATURE_RANGE, strong.shortfalls().get(0).requirement());
        assertEquals(473.15 - (293.15 + 1 / 0.006), strong.shortfalls().get(0).by(), 1e-3);
    }

    @Test
    void requirements_from_a_shape_use_its_permeance_coefficient() {
        CylinderShape cylinder = new CylinderShape(0.01, 0.005);
        Requirements requirements = Requirements.forShape(cylinder, DemagnetizingKind.FLUXMETRIC, 0.0, 293.15, null, 0.01);
        assertEquals(cylinder.demagnetizingFactors().permeanceCoefficients().fluxmetric(), requirements.loadLine().pc(), 0.0);
        assertThrows(BadInputException.class, () -> new Requirements(new LoadLine(1, 0), 293.15, null, 0.0));
    }

    @Test
    void an_external_field_is_ranked_on_the_load_line_it_shifts_by_one_over_one_minus_n() {
        // free magnet, N = 1/(1 + Pc): Ha = Hext·(1 + Pc)/Pc (docs/design.md §4)
        Requirements external = Requirements.of(1.0, AppliedField.external(2e5), 393.15, null, 0.01);
        assertEquals(4e5, external.loadLine().opposingField(), 1e-9);
        RankedGrade viaExternal = GradeSelection.row(MIDDLE, external);
        RankedGrade viaCircuit = GradeSelection.row(MIDDLE, new Requirements(new LoadLine(1.0, 4e5), 393.15, null, 0.01));
        assertEquals(viaCircuit.irreversibleLoss(), viaExternal.irreversibleLoss(), 0.0);
        assertTrue(viaExternal.irreversibleLoss() > GradeSelection.row(MIDDLE,
                new Requirements(new LoadLine(1.0, 2e5), 393.15, null, 0.01)).irreversibleLoss());
    }

    private static List<String> names(List<RankedGrade> rows) {
        return rows.stream().map(RankedGrade::name).toList();
    }
}
