package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.List;
import org.junit.jupiter.api.Test;

class DutySequenceTest {

    private final LinearTemperatureLaw law = Grades.neodymiumLaw();

    @Test
    void worst_point_so_far_sets_the_recoil_line() {
        // docs/design.md §4: a duty sequence keeps the loss of its worst point; later milder steps recoil on that line
        List<DutyStepResult> results = DutySequence.run(law, 1.0,
                List.of(new DutyStep(293.15, 0), new DutyStep(423.15, 3e5), new DutyStep(293.15, 0)));
        assertEquals(0.0, results.get(0).irreversibleLoss(), 1e-9);
        double lost = results.get(1).irreversibleLoss();
        assertTrue(lost > 0.0);
        assertEquals(lost, results.get(2).irreversibleLoss(), 0.0);
        assertEquals(0.0, results.get(2).stepLoss(), 1e-9);
        // back at T0 on the recoil line of remanence (1 − ℓ)·Br0: Bd = Br'·Pc/(Pc + μrec) (common practice)
        assertEquals((1 - lost) * 1.3 * 1.0 / (1.0 + 1.05), results.get(2).point().b(), 1e-12);
        assertTrue(results.get(2).point().b() < results.get(0).point().b());
    }

    @Test
    void recoil_point_lies_on_the_load_line() {
        OperatingPoint point = new LoadLine(1.5, 1e5).onRecoilLine(1.1, 1.05);
        assertEquals(-MU0 * 1.5 * (point.h() + 1e5), point.b(), 1e-12);
        assertEquals(1.1 + MU0 * 0.05 * point.h(), point.j(), 1e-12);
    }
}
