package org.kneepoint.fitter.qualification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.curve.DemagnetizationCurve;

/**
 * Lots made from the invented knee formula of {@link KneeCurves}, whose Br and HcJ are exact by
 * construction, checked against limits just below, at and just above those values. The
 * characterization finds Br and HcJ to 1e-9 relative on this grid (CurveCharacterizerTest), which
 * is the tolerance of the margins here.
 */
class LotQualificationTest {

    private static final double T20 = 293.15;
    private static final double BR = 1.30;
    private static final double HCJ = 1.4e6;
    private static final double TOLERANCE = 1e-9;

    private static LotAssessment check(double brLimit, double hcjLimit, GuardBand band) {
        Specification spec = new Specification(T20, List.of(new Limit(SpecifiedQuantity.BR, brLimit, null),
                new Limit(SpecifiedQuantity.HCJ, hcjLimit, null)));
        return LotQualification.assess(List.of(new SampleCurve("s1", KneeCurves.curve(BR, HCJ, T20))), List.of(spec),
                List.of(KneeCurves.curve(BR, HCJ, T20)), band);
    }

    private static QuantityCheck quantity(LotAssessment lot, SpecifiedQuantity quantity) {
        return lot.samples().get(0).checks().stream().filter(check -> check.quantity() == quantity).findFirst().orElseThrow();
    }

    @Test
    void a_lot_just_above_both_limits_passes_with_the_margins_of_the_formula() {
        LotAssessment lot = check(BR - 0.01, HCJ - 20e3, GuardBand.none());
        assertEquals(Verdict.PASS, lot.verdict());
        assertEquals(0.01, quantity(lot, SpecifiedQuantity.BR).margin(), TOLERANCE * BR);
        assertEquals(20e3, quantity(lot, SpecifiedQuantity.HCJ).margin(), TOLERANCE * HCJ);
    }

    @Test
    void a_lot_exactly_at_its_limits_passes_with_zero_margin() {
        LotAssessment lot = check(BR, HCJ, GuardBand.none());
        assertEquals(Verdict.PASS, lot.verdict());
        assertEquals(0.0, quantity(lot, SpecifiedQuantity.BR).margin(), TOLERANCE * BR);
        assertEquals(0.0, quantity(lot, SpecifiedQuantity.HCJ).margin(), TOLERANCE * HCJ);
    }

    @Test
    void a_lot_just_below_the_hcj_limit_fails_on_hcj_alone() {
        LotAssessment lot = check(BR - 0.01, HCJ + 20e3, GuardBand.none());
        assertEquals(Verdict.FAIL, lot.verdict());
        assertEquals(Verdict.PASS, quantity(lot, SpecifiedQuantity.BR).verdict());
        assertEquals(Verdict.FAIL, quantity(lot, SpecifiedQuantity.HCJ).verdict());
        assertEquals(-20e3, quantity(lot, SpecifiedQuantity.HCJ).margin(), TOLERANCE * HCJ);
    }

    @Test
    void a_lot_just_below_the_br_limit_fails() {
        LotAssessment lot = check(BR + 0.001, HCJ - 20e3, GuardBand.none());
        assertEquals(Verdict.FAIL, quantity(lot, SpecifiedQuantity.BR).verdict());
        assertEquals(-0.001, quantity(lot, SpecifiedQuantity.BR).margin(), TOLERANCE * BR);
    }

    // Guarded acceptance (JCGM 106:2012; ILAC-G8:09/2019 §4): a value above its limit by less than its
    // expanded uncertainty is not a proven pass.
    @Test
    void a_value_above_its_limit_by_less_than_its_uncertainty_is_inconclusive() {
        GuardBand band = new GuardBand(Map.of(SpecifiedQuantity.BR, 0.005, SpecifiedQuantity.HCJ, 0.01));
        LotAssessment lot = check(BR - 0.005, HCJ - 20e3, band);
        assertEquals(Verdict.INCONCLUSIVE, quantity(lot, SpecifiedQuantity.BR).verdict());
        assertEquals(0.005 * BR, quantity(lot, SpecifiedQuantity.BR).uncertainty(), 1e-12);
        assertEquals(Verdict.PASS, quantity(lot, SpecifiedQuantity.HCJ).verdict());
        assertEquals(Verdict.INCONCLUSIVE, lot.verdict());
    }

    @Test
    void a_value_clear_of_its_uncertainty_passes_and_one_below_its_limit_still_fails() {
        GuardBand band = new GuardBand(Map.of(SpecifiedQuantity.BR, 0.005));
        assertEquals(Verdict.PASS, quantity(check(BR - 0.007, HCJ, band), SpecifiedQuantity.BR).verdict());
        assertEquals(Verdict.FAIL, quantity(check(BR + 0.001, HCJ, band), SpecifiedQuantity.BR).verdict());
    }

    @Test
    void a_lot_whose_curve_equals_the_reference_deviates_by_zero() {
        SampleAssessment sample = check(BR, HCJ, GuardBand.none()).samples().get(0);
        assertEquals(0.0, sample.deviation().share());
        assertEquals(T20, sample.referenceTemperatureK());
    }

    @Test
    void a_lot_with_a_lower_coercivity_deviates_most_near_its_own_knee() {
        DemagnetizationCurve lot = KneeCurves.curve(BR, HCJ - 100e3, T20);
        LotAssessment assessed = LotQualification.assess(List.of(new SampleCurve("s1", lot)), List.of(),
                List.of(KneeCurves.curve(BR, HCJ, T20)), GuardBand.none());
        CurveDeviation deviation = assessed.samples().get(0).deviation();
        // At H = −1.3 MA/m the lot's J is 0 and the reference's is (Br − μ0·0.04·1.3e6)·(1 − e^(−100/30)):
        // the largest difference between the two formulas, negative since the lot lies below. Between
        // grid points the interpolants may add up to one grid step of the reference's slope there
        // (Br·e^(−10/3)/w·2 kA/m ≈ 0.003 T).
        double expected = -KneeCurves.j(-1.3e6, BR, HCJ) / BR;
        assertEquals(expected, deviation.share(), 0.003 / BR);
        assertEquals(-1.3e6, deviation.atH(), 2e3);
        assertEquals(Verdict.INCONCLUSIVE, assessed.verdict(), "nothing specified: no verdict but inconclusive");
    }

    @Test
    void a_sample_at_a_temperature_without_specification_or_reference_has_no_checks_and_no_deviation() {
        LotAssessment lot = LotQualification.assess(List.of(new SampleCurve("hot", KneeCurves.curve(1.2, 0.5e6, 423.15))),
                List.of(new Specification(T20, List.of(new Limit(SpecifiedQuantity.BR, 1.0, null)))),
                List.of(KneeCurves.curve(BR, HCJ, T20)), GuardBand.none());
        SampleAssessment sample = lot.samples().get(0);
        assertTrue(sample.checks().isEmpty());
        assertNull(sample.specificationTemperatureK());
        assertNull(sample.deviation());
        assertEquals(Verdict.INCONCLUSIVE, lot.verdict());
    }

    @Test
    void typical_values_alone_are_not_checked() {
        Specification spec = new Specification(T20, List.of(new Limit(SpecifiedQuantity.BR, null, 1.35),
                new Limit(SpecifiedQuantity.HCJ, 1.0e6, null)));
        LotAssessment lot = LotQualification.assess(List.of(new SampleCurve("s1", KneeCurves.curve(BR, HCJ, T20))), List.of(spec),
                List.of(), GuardBand.none());
        assertEquals(1, lot.samples().get(0).checks().size());
        assertEquals(Verdict.PASS, lot.verdict());
    }
}
