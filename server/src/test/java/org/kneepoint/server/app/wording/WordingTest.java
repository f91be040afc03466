package org.kneepoint.server.app.wording;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The words and units of the tables and pages: SI values shown in engineering units, and the cautions. */
class WordingTest {

    @Test
    void values_are_shown_in_the_units_of_the_trade() {
        assertTrue(EngineeringUnits.tesla(1.31).startsWith("1.31") && EngineeringUnits.tesla(1.31).endsWith("T"));
        assertTrue(EngineeringUnits.field(-9.5e5).startsWith("-950") && EngineeringUnits.field(-9.5e5).endsWith("kA/m"));
        assertTrue(EngineeringUnits.energy(3.3e5).startsWith("330") && EngineeringUnits.energy(3.3e5).endsWith("kJ/m³"));
        assertTrue(EngineeringUnits.millimetres(0.0125).startsWith("12.5") && EngineeringUnits.millimetres(0.0125).endsWith("mm"));
        assertTrue(EngineeringUnits.percent(0.02).startsWith("2") && EngineeringUnits.percent(0.02).endsWith(" %"), EngineeringUnits.percent(0.02));
        assertTrue(EngineeringUnits.celsius(393.15).startsWith("120"), EngineeringUnits.celsius(393.15));
        assertTrue(Lengths.mm(0.005).startsWith("5"), Lengths.mm(0.005));
    }

    @Test
    void a_few_temperatures_are_listed_and_many_are_summed_up_by_their_range() {
        String few = Temperatures.list(List.of(293.15, 353.15, 423.15));
        assertEquals(3, few.split(", ").length, few);
        assertTrue(few.startsWith("20") && few.contains("150"), few);
        List<Double> many = new ArrayList<>();
        for (int i = 0; i < 50; i++) {
            many.add(250.0 + i);
        }
        String summary = Temperatures.list(many);
        assertTrue(summary.startsWith("50 temperatures from -23.15"), summary);
        assertEquals("", Temperatures.list(List.of()));
    }

    @Test
    void every_result_carries_the_safety_cautions_and_an_extrapolated_one_says_so_first() {
        assertEquals(Cautions.SAFETY, Cautions.of(false));
        assertTrue(Cautions.SAFETY.stream().anyMatch(line -> line.contains("confirm them by measurement")));
        assertTrue(Cautions.SAFETY.stream().anyMatch(line -> line.contains("implanted medical devices")));
        List<String> extrapolated = Cautions.of(true);
        assertEquals(Cautions.EXTRAPOLATED, extrapolated.get(0));
        assertEquals(Cautions.SAFETY.size() + 1, extrapolated.size());
        List<String> beyond = Cautions.of(false, true);
        assertTrue(beyond.contains(Cautions.BEYOND_MEASURED_FIELD));
        assertTrue(Cautions.table(true).contains(Cautions.EXTRAPOLATED), Cautions.table(true));
    }
}
