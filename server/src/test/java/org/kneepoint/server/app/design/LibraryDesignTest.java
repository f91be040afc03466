package org.kneepoint.server.app.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.function.Function;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.select.RankingOrder;
import org.kneepoint.server.app.DemoLibraryFixture;
import org.kneepoint.server.app.JsonKeys;

/** The design use cases over the demo library: a check and a duty sequence of a stored grade, and a selection. */
class LibraryDesignTest {

    private static final String NDFEB = "DEMO NdFeB 42/100";
    private static final GradeChoice.InputNames NAMES = new GradeChoice.InputNames("grade", "", "br, muRec, hcj", "br, muRec and hcj",
            "alpha and beta");
    private static final TypedGrade NONE = new TypedGrade(null, null, null, null, null, null, null);
    private static final LoadLineSpec PC_2 = new LoadLineSpec(2.0, null, null, null, null, null, null, false, "magnetometric");

    @TempDir
    static Path folder;

    private static DemoLibraryFixture demo;
    private static Function<String, GradeModel> stored;

    @BeforeAll
    static void load() {
        demo = DemoLibraryFixture.in(folder);
        stored = name -> GradeModel.stored(demo.reader(), name);
    }

    @AfterAll
    static void close() {
        demo.close();
    }

    @Test
    void a_stored_grade_is_checked_on_its_load_line_with_its_own_cautions() {
        CheckDocument hot = DesignChecks.check(new CheckRequest(new GradeChoice(NDFEB, NONE, NAMES), PC_2, 273.15 + 80, AppliedField.NONE,
                0.02), stored).document();
        CheckDocument cold = DesignChecks.check(new CheckRequest(new GradeChoice(NDFEB, NONE, NAMES), PC_2, 293.15, AppliedField.NONE,
                0.02), stored).document();
        assertTrue(hot.operatingPoint().b() < cold.operatingPoint().b(), "B falls as Br falls with temperature");
        assertEquals(2.0, hot.lossLimitPercent(), 1e-12);
        assertFalse(hot.cautions().isEmpty());
    }

    @Test
    void a_grade_named_and_typed_in_at_once_is_refused_and_an_unknown_one_is_not_found() {
        TypedGrade typed = new TypedGrade(1.3, 1.05, 1.6e6, null, null, null, null);
        BadInputException both = assertThrows(BadInputException.class, () -> DesignChecks.check(new CheckRequest(
                new GradeChoice(NDFEB, typed, NAMES), PC_2, 293.15, AppliedField.NONE, 0.02), stored));
        assertTrue(both.getMessage().contains("not both"), both.getMessage());
        assertThrows(NotFoundException.class, () -> DesignChecks.check(new CheckRequest(new GradeChoice("no such grade", NONE, NAMES),
                PC_2, 293.15, AppliedField.NONE, 0.02), stored));
    }

    @Test
    void a_duty_sequence_never_recovers_an_irreversible_loss() {
        DutyDocument duty = DesignChecks.duty(new DutyRequest(new GradeChoice(NDFEB, NONE, NAMES),
                new LoadLineSpec(null, 0.01, 0.005, null, null, null, null, false, "magnetometric"),
                DutySteps.parse("20C:0, 100C:300kA/m, 20C:0"), 0.01), stored).document();
        assertEquals(List.of("pc", "steps", "extrapolated", "cautions", "beyondMeasuredField", "lossLimitPercent", "verdict"),
                JsonKeys.of(duty));
        assertEquals(3, duty.steps().size());
        double hot = duty.steps().get(1).irreversibleLossPercent();
        assertTrue(hot >= 0, "a loss is never negative: " + hot);
        assertEquals(hot, duty.steps().get(2).irreversibleLossPercent(), 1e-9, "back at 20 °C the loss stays");
        assertEquals(List.of("temperatureK", "opposingField", "operatingPoint", "stepLossPercent", "irreversibleLossPercent",
                "fieldConvention", "externalFieldH", "extrapolated", "beyondMeasuredField"), JsonKeys.of(duty.steps().get(0)));
    }

    @Test
    void a_selection_ranks_every_grade_of_the_family_by_the_order_asked_for() {
        SelectionRun run = DesignChecks.select(new SelectionRequest(PC_2, 273.15 + 100, AppliedField.NONE, 0.5, 0.02, RankingOrder.PRICE,
                "sintered NdFeB"), demo.reader());
        List<SelectionDocument> rows = run.document();
        assertEquals(5, rows.size(), "the five demo sintered NdFeB grades");
        assertTrue(rows.stream().allMatch(row -> row.family().equals("sintered NdFeB")));
        List<Double> passingPrices = rows.stream().filter(SelectionDocument::pass).map(SelectionDocument::price).toList();
        assertEquals(passingPrices.stream().sorted().toList(), passingPrices, "cheapest first among those that pass");
        for (SelectionDocument row : rows) {
            assertEquals(row.pass(), row.reasons().isEmpty(), row.toString());
        }
        assertEquals(List.of("grade", "family", "assessable", "pass", "reasons", "fluxDensity", "kneeMarginH", "irreversibleLossPercent",
                "maxWorkingTemperatureK", "extrapolated", "price", "fieldConvention", "minWorkingTemperatureK", "beyondMeasuredField", "verdict"),
                JsonKeys.of(rows.get(0)));
    }

    @Test
    void a_selection_at_a_temperature_beyond_every_limit_is_refused_before_it_runs() {
        assertThrows(BadInputException.class, () -> new SelectionRequest(PC_2, 1e5, AppliedField.NONE, null, 0.02, RankingOrder.FLUX_DENSITY,
                null));
    }
}
