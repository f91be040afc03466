package org.kneepoint.fitter.elements;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.field.FieldVector;
import org.kneepoint.fitter.field.MagnetField;
import org.kneepoint.fitter.loadline.DesignCheck;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.DutySequence;
import org.kneepoint.fitter.loadline.DutyStep;
import org.kneepoint.fitter.loadline.DutyStepResult;
import org.kneepoint.fitter.loadline.IntrinsicCurve;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.loadline.LocalKneeCheck;
import org.kneepoint.fitter.loadline.LocalKneeResult;
import org.kneepoint.fitter.loadline.OperatingPoint;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.MagnetShape;

class ElementCheckTest {

    /** Invented grade (round numbers near sintered NdFeB): Br 1.3 T, μrec 1.05, HcJ 1600 kA/m, Hk 1450 kA/m, α −0.12 %/K, β −0.6 %/K. */
    private static final LinearTemperatureLaw LAW = LinearTemperatureLaw.ofPercentPerKelvin(
            LinearRecoilKnee.withKneeField(1.3, 1.05, 1.6e6, 1.45e6), -0.12, -0.6, LinearTemperatureLaw.DEFAULT_REFERENCE_TEMPERATURE);
    private static final double HOT = 414.15;

    @Test
    void uniform_field_on_every_element_gives_the_analytic_checks_operating_point_and_loss() {
        // docs/design-checks.md: Pc 1 at 141 °C works at H = −405.1 kA/m and loses 6.08 %
        DesignCheckResult check = DesignCheck.of(LAW, new LoadLine(1.0, 0.0), HOT, 0.01);
        double h = check.point().h();
        ElementField.Builder fields = ElementField.builder("uniform.csv", GivenField.FIELD_STRENGTH, false, false);
        ElementField.Builder fluxes = ElementField.builder("uniform-b.csv", GivenField.FLUX_DENSITY, false, false);
        for (int i = 0; i < 5; i++) {
            fields.add(i + 2, i * 1e-3, 0, 0, 0, 0, h, (i + 1) * 1e-9, 0, 0, 0, 0);
            fluxes.add(i + 2, i * 1e-3, 0, 0, 0, 0, check.point().b(), (i + 1) * 1e-9, 0, 0, 0, 0);
        }
        ElementCheckResult byField = ElementCheck.run(LAW, List.of(fields.build()), ElementSettings.alongZ(HOT, 0.01));
        ElementCheckResult byFlux = ElementCheck.run(LAW, List.of(fluxes.build()), ElementSettings.alongZ(HOT, 0.01));
        assertEquals(0.0608, check.irreversibleLoss(), 5e-5);
        for (ElementCheckResult result : List.of(byField, byFlux)) {
            assertEquals(check.irreversibleLoss(), result.irreversibleLoss(), 1e-12);
            assertEquals(1.5e-8, result.volume(), 1e-21);
            assertEquals(h, result.worstElements().get(0).hParallel(), 1e-9 * Math.abs(h));
            assertEquals(check.kneeMarginField(), result.worstElements().get(0).margin(), 1e-9 * Math.abs(h));
            assertEquals(0.0, result.volumeFractionPastKnee(), 0.0);
            assertEquals(h, result.cases().get(0).averageFieldParallel(), 1e-9 * Math.abs(h));
            for (int i = 0; i < 5; i++) {
                assertEquals(check.irreversibleLoss(), result.loss(i), 1e-12);
                assertEquals((1 - check.irreversibleLoss()) * LAW.at(HOT).remanence(), result.remanence(i), 1e-12);
            }
            assertTrue(!result.withinLimit());
        }
    }

    @Test
    void field_sampled_in_a_cylinder_and_a_block_gives_the_local_check() {
        // the local volume-fraction check (docs/design-checks.md) on the same 24³ cells, Ha chosen to put part of each past the knee
        assertMatchesLocalCheck(new CylinderShape(0.01, 0.004), 1.2e5);
        assertMatchesLocalCheck(new BlockShape(0.02, 0.01, 0.004), 1.0e5);
    }

    private static void assertMatchesLocalCheck(MagnetShape shape, double opposingField) {
        double nm = shape.demagnetizingFactors().magnetometric();
        double temperature = 393.15;
        IntrinsicCurve curve = LAW.at(temperature);
        LoadLine line = new LoadLine((1 - nm) / nm, opposingField);
        LocalKneeResult local = LocalKneeCheck.of(shape, curve, line, 24);
        Sampled sampled = sample(shape, line.on(curve), line.on(curve).h(), 24);
        ElementCheckResult result = ElementCheck.run(LAW, List.of(sampled.field()), ElementSettings.alongZ(temperature, 0.01));
        assertTrue(local.fractionBelowKnee() > 0.0 && local.fractionBelowKnee() < 1.0, shape + ": " + local.fractionBelowKnee());
        assertEquals(local.fractionBelowKnee(), result.volumeFractionPastKnee(), 1e-12);
        WorstElement worst = result.worstElements().get(0);
        assertEquals(local.worstField(), worst.hParallel(), 0.0);
        assertEquals(local.worstX(), worst.x(), 0.0);
        assertEquals(local.worstY(), worst.y(), 0.0);
        assertEquals(local.worstZ(), worst.z(), 0.0);
        assertEquals(local.cells(), result.elements());

        // with no opposing field the sampled field is the demagnetizing field itself; its volume average is −Nm·M
        // (Nm is the volume average of the demagnetizing field: Chen, Brug, Goldfarb, IEEE Trans. Magn. 27, 3601, 1991)
        OperatingPoint free = new LoadLine((1 - nm) / nm, 0.0).on(curve);
        ElementField demagnetizing = sample(shape, free, Double.NaN, 24).field();
        double m = free.j() / MU0;
        double average = ElementCheck.run(LAW, List.of(demagnetizing), ElementSettings.alongZ(temperature, 0.01)).cases().get(0)
                .averageFieldParallel();
        assertEquals(-nm * m, average, 0.01 * nm * m, shape.toString());
    }

    private record Sampled(ElementField field) {
    }

    /**
     * The local check's cells (LocalKneeCheck's grid and order): H from the magnet polarized at the point's J, shifted
     * so that its volume average is {@code operatingField} (NaN: not shifted).
     */
    private static Sampled sample(MagnetShape shape, OperatingPoint point, double operatingField, int n) {
        double[] half = shape instanceof CylinderShape c ? new double[] {c.radius(), c.radius(), 0.5 * c.length()}
                : new double[] {0.5 * ((BlockShape) shape).width(), 0.5 * ((BlockShape) shape).depth(), 0.5 * ((BlockShape) shape).thickness()};
        MagnetField magnet = MagnetField.of(shape, point.j());
        double[][] centres = new double[3][n];
        for (int i = 0; i < n; i++) {
            for (int axis = 0; axis < 3; axis++) {
                centres[axis][i] = -half[axis] + (i + 0.5) * 2 * half[axis] / n;
            }
        }
        List<double[]> cells = new ArrayList<>();
        double sum = 0.0;
        for (int index = 0; index < n * n * n; index++) {
            double x = centres[0][index / (n * n)];
            double y = centres[1][index / n % n];
            double z = centres[2][index % n];
            if (magnet.isInside(x, y, z)) {
                FieldVector h = magnet.fieldStrength(x, y, z);
                cells.add(new double[] {x, y, z, h.x(), h.y(), h.z()});
                sum += h.z();
            }
        }
        double shift = Double.isNaN(operatingField) ? 0.0 : operatingField - sum / cells.size();
        double volume = 8 * half[0] * half[1] * half[2] / (n * n * n);
        ElementField.Builder builder = ElementField.builder(shape.getClass().getSimpleName(), GivenField.FIELD_STRENGTH, false, false);
        for (double[] c : cells) {
            builder.add(0, c[0], c[1], c[2], c[3], c[4], c[5] + shift, volume, 0, 0, 0, 0);
        }
        return new Sampled(builder.build());
    }

    @Test
    void two_elements_in_two_load_cases_follow_the_duty_rule() {
        // docs/design.md §4: the worst point so far sets the recoil line
        double pc = 1.0;
        List<DutyStep> first = List.of(new DutyStep(423.15, 3e5), new DutyStep(293.15, 0.0));
        List<DutyStep> second = List.of(new DutyStep(293.15, 0.0), new DutyStep(433.15, 3.5e5));
        List<DutyStepResult> a = DutySequence.run(LAW, pc, first);
        List<DutyStepResult> b = DutySequence.run(LAW, pc, second);
        List<ElementField> byField = new ArrayList<>();
        List<ElementField> byFlux = new ArrayList<>();
        for (int c = 0; c < 2; c++) {
            ElementField.Builder fields = ElementField.builder("case" + c + ".csv", GivenField.FIELD_STRENGTH, false, true);
            ElementField.Builder fluxes = ElementField.builder("case" + c + "-b.csv", GivenField.FLUX_DENSITY, false, true);
            for (List<DutyStepResult> element : List.of(a, b)) {
                DutyStepResult step = element.get(c);
                double h = step.loadLine().on(LAW.at(step.step().temperature())).h();
                fields.add(c + 2, 0, 0, 0, 0, 0, h, 1e-9, 0, 0, 0, step.step().temperature());
                fluxes.add(c + 2, 0, 0, 0, 0, 0, step.point().b(), 1e-9, 0, 0, 0, step.step().temperature());
            }
            byField.add(fields.build());
            byFlux.add(fluxes.build());
        }
        ElementSettings settings = ElementSettings.alongZ(null, 0.01);
        ElementCheckResult field = ElementCheck.run(LAW, byField, settings);
        ElementCheckResult flux = ElementCheck.run(LAW, byFlux, settings);
        assertTrue(a.get(1).irreversibleLoss() > 0.0 && b.get(1).irreversibleLoss() > a.get(1).irreversibleLoss());
        for (ElementCheckResult result : List.of(field, flux)) {
            assertEquals(a.get(1).irreversibleLoss(), result.loss(0), 1e-12);
            assertEquals(b.get(1).irreversibleLoss(), result.loss(1), 1e-12);
            assertEquals(0.5 * (a.get(1).irreversibleLoss() + b.get(1).irreversibleLoss()), result.irreversibleLoss(), 1e-12);
            assertEquals(1, result.worstElements().get(0).index());
        }
        // in the second case the first element works on its recoil line, where the duty sequence puts it
        double expected = 0.5 * (a.get(1).point().h() + b.get(1).point().h());
        assertEquals(expected, flux.cases().get(1).averageFieldParallel(), 1e-9 * Math.abs(expected));
        assertEquals((1 - a.get(1).irreversibleLoss()) * LAW.at(293.15).remanence(), field.remanence(0), 1e-12);
    }

    @Test
    void flux_density_and_field_strength_tables_of_the_same_state_agree() {
        IntrinsicCurve curve = LAW.at(373.15);
        ElementField.Builder fields = ElementField.builder("h.csv", GivenField.FIELD_STRENGTH, true, false);
        ElementField.Builder fluxes = ElementField.builder("b.csv", GivenField.FLUX_DENSITY, true, false);
        for (int i = 0; i < 200; i++) {
            double h = -8.0e5 + 9.0e5 * i / 199.0;
            double across = 4e4 * Math.sin(i);
            double theta = 0.01 * i;
            double[] m = {Math.sin(theta), 0, Math.cos(theta)};
            double[] t = {Math.cos(theta), 0, -Math.sin(theta)};
            double b = MU0 * h + curve.j(h);
            fields.add(i + 2, i, 0, 0, h * m[0] + across * t[0], across, h * m[2] + across * t[2], 1e-9, m[0], m[1], m[2], 0);
            fluxes.add(i + 2, i, 0, 0, b * m[0] + MU0 * across * t[0], MU0 * across, b * m[2] + MU0 * across * t[2], 1e-9,
                    m[0], m[1], m[2], 0);
        }
        List<ElementField> h = List.of(fields.build());
        List<ElementField> b = List.of(fluxes.build());
        for (TransverseRule rule : TransverseRule.values()) {
            ElementSettings settings = new ElementSettings(0, 0, 1, 373.15, 0.01, rule);
            ElementCheckResult byField = ElementCheck.run(LAW, h, settings);
            ElementCheckResult byFlux = ElementCheck.run(LAW, b, settings);
            for (int i = 0; i < 200; i++) {
                assertEquals(byField.loss(i), byFlux.loss(i), 1e-9, rule + " element " + i);
            }
            assertEquals(byField.volumeFractionPastKnee(), byFlux.volumeFractionPastKnee(), 0.0);
            assertTrue(byField.volumeFractionPastKnee() > 0.0 && byField.volumeFractionPastKnee() < 1.0);
            for (int k = 0; k < 10; k++) {
                WorstElement fromField = byField.worstElements().get(k);
                WorstElement fromFlux = byFlux.worstElements().get(k);
                assertEquals(fromField.index(), fromFlux.index());
                assertEquals(fromField.hParallel(), fromFlux.hParallel(), 1e-6);
            }
        }
    }

    @Test
    void astroid_rule_makes_an_equal_transverse_field_act_as_its_norm() {
        // Stoner & Wohlfarth 1948: |h∥|^(2/3) + |h⊥|^(2/3); for |h∥| = |h⊥| = h the norm is 2^(3/2)·h
        assertEquals(-Math.pow(2, 1.5) * 1e5, TransverseRule.ASTROID.effective(-1e5, 1e5), 1e-9);
        assertEquals(-1e5, TransverseRule.ALONG.effective(-1e5, 1e5), 0.0);
        assertEquals(2e5, TransverseRule.ASTROID.effective(2e5, 1e5), 0.0);
        assertEquals(-3e5, TransverseRule.ASTROID.effective(-3e5, 0.0), 0.0);
    }

    @Test
    void an_element_nearer_the_knee_ranks_worse_when_neither_loses_flux() {
        ElementField.Builder fields = ElementField.builder("f.csv", GivenField.FIELD_STRENGTH, false, false);
        fields.add(2, 0, 0, 0, 0, 0, 1e5, 1e-9, 0, 0, 0, 0).add(3, 1, 0, 0, 0, 0, -1e5, 1e-9, 0, 0, 0, 0);
        ElementCheckResult result = ElementCheck.run(LAW, List.of(fields.build()), ElementSettings.alongZ(293.15, 0.01));
        assertEquals(1, result.worstElements().get(0).index());
        assertEquals(0.0, result.irreversibleLoss(), 1e-8);
        assertTrue(result.withinLimit());
        assertEquals(-1e5 - LAW.at(293.15).kneeField().orElseThrow(), result.worstElements().get(0).margin(), 1e-6);
    }

    @Test
    void load_cases_of_different_sizes_are_refused_naming_the_file() {
        ElementField one = ElementField.builder("one.csv", GivenField.FIELD_STRENGTH, false, false)
                .add(2, 0, 0, 0, 0, 0, 0, 1e-9, 0, 0, 0, 0).build();
        ElementField two = ElementField.builder("two.csv", GivenField.FIELD_STRENGTH, false, false)
                .add(2, 0, 0, 0, 0, 0, 0, 1e-9, 0, 0, 0, 0).add(3, 0, 0, 0, 0, 0, 0, 1e-9, 0, 0, 0, 0).build();
        BadInputException e = assertThrows(BadInputException.class,
                () -> ElementCheck.run(LAW, List.of(one, two), ElementSettings.alongZ(293.15, 0.01)));
        assertTrue(e.getMessage().startsWith("two.csv: holds 2 elements, but one.csv holds 1"), e.getMessage());
    }

    @Test
    void a_temperature_outside_the_model_names_the_line() {
        ElementField hot = ElementField.builder("hot.csv", GivenField.FIELD_STRENGTH, false, true)
                .add(7, 0, 0, 0, 0, 0, 0, 1e-9, 0, 0, 0, 2000).build();
        BadInputException e = assertThrows(BadInputException.class,
                () -> ElementCheck.run(LAW, List.of(hot), ElementSettings.alongZ(null, 0.01)));
        assertTrue(e.getMessage().startsWith("hot.csv, line 7: "), e.getMessage());
    }
}
