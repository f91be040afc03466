package org.kneepoint.fitter.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.hipparchus.distribution.continuous.NormalDistribution;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.DesignCheck;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;

class ToleranceStudyTest {

    /** Invented square grade with a flat straight part (μrec = 1): Br 1.2 T, HcJ 1600 kA/m, Hk 1400 kA/m at 20 °C. */
    private static final LinearRecoilKnee CURVE = LinearRecoilKnee.withKneeField(1.2, 1.0, 1.6e6, 1.4e6);
    private static final LinearTemperatureLaw LAW = LinearTemperatureLaw.ofPercentPerKelvin(CURVE, -0.12, -0.6, 293.15);
    private static final StudyOptions OPTIONS = new StudyOptions(BandDistribution.NORMAL, 10_000, StudyOptions.DEFAULT_SEED);

    private static List<ToleranceSpec> specs(String... texts) {
        return java.util.Arrays.stream(texts).map(text -> ToleranceSpec.parse(text, "--tolerance")).toList();
    }

    @Test
    void flux_density_percentiles_under_a_remanence_band_follow_the_truncated_normal() {
        // On the flat straight part J = Br, so B = Br·Pc/(Pc + 1) is linear in Br. Br = Br0·(1 + 0.02·Z/3) with Z standard
        // normal truncated to ±3: its quantile is Φ⁻¹(Φ(−3) + p·(Φ(3) − Φ(−3))), its variance
        // 1 − 2·3·φ(3)/(Φ(3) − Φ(−3)) (truncated normal: N. L. Johnson, S. Kotz, N. Balakrishnan, Continuous Univariate
        // Distributions vol. 1, 2nd ed., Wiley 1994, ch. 13, section 10.1; docs/references.md §10).
        ToleranceStudyResult result = ToleranceStudy.run(CheckSetup.ofPc(LAW, 2.0, AppliedField.NONE, 293.15, 0.01),
                specs("br=±2%"), OPTIONS, "--tolerance");
        NormalDistribution normal = new NormalDistribution();
        double mass = normal.cumulativeProbability(3) - normal.cumulativeProbability(-3);
        double nominal = 1.2 * 2.0 / 3.0;
        double sigma = nominal * 0.02 / 3.0;
        OutputSummary b = result.results().get("b");
        double[] probabilities = {0.05, 0.5, 0.95};
        double[] sampled = {b.p05(), b.p50(), b.p95()};
        for (int k = 0; k < 3; k++) {
            double z = normal.inverseCumulativeProbability(normal.cumulativeProbability(-3) + probabilities[k] * mass);
            assertEquals(nominal + sigma * z, sampled[k], 1e-3);
        }
        assertEquals(nominal, b.mean(), 1e-3);
        assertEquals(sigma * Math.sqrt(1 - 2 * 3 * normal.density(3) / mass), b.sd(), 0.02 * sigma);
        assertTrue(b.min() >= nominal * 0.98 - 1e-9 && b.max() <= nominal * 1.02 + 1e-9);
        assertEquals(0.0, result.probabilityOverLossLimit(), 0.0);
        assertEquals("b", result.sensitivityOutput());
        assertEquals(List.of(new ToleranceStudyResult.Share("br", 1.0)), result.sensitivity());
    }

    @Test
    void worst_case_of_a_monotone_loss_is_the_band_corner_and_matches_a_check_of_the_rebuilt_grade() {
        // Loss grows with the opposing field and the temperature and falls with HcJ: the corner is HcJ low, field and T high.
        CheckSetup setup = CheckSetup.ofPc(LAW, 1.0, AppliedField.opposing(3e5), 373.15, 0.01);
        ToleranceStudyResult result = ToleranceStudy.run(setup,
                specs("hcj=±5%", "opposing-field=-0kA/m..+50kA/m", "temperature=±5K"), OPTIONS, "--tolerance");
        Map<String, Double> corner = result.worstCase().inputs();
        double hcjAtT = 1.6e6 * (1 - 0.006 * 80);
        assertEquals(0.95 * hcjAtT, corner.get("hcj"), 1e-6 * hcjAtT);
        assertEquals(3.5e5, corner.get("opposing-field"), 1e-6);
        assertEquals(378.15, corner.get("temperature"), 1e-9);
        double cornerLoss = result.worstCase().results().get("irreversibleLossPercent");
        assertTrue(cornerLoss > 0.0);
        assertTrue(cornerLoss >= result.results().get("irreversibleLossPercent").max() - 1e-9);
        // With μrec = 1, J(H/s) of the knee curve is the knee curve with HcJ and its width times s: rebuild and check it.
        LinearRecoilKnee scaled = new LinearRecoilKnee(1.2, 1.0, 0.95 * 1.6e6, 0.95 * CURVE.kneeWidth());
        DesignCheckResult direct = DesignCheck.of(LinearTemperatureLaw.ofPercentPerKelvin(scaled, -0.12, -0.6, 293.15), 1.0,
                AppliedField.opposing(3.5e5), 378.15, 0.01);
        assertEquals(100 * direct.irreversibleLoss(), cornerLoss, 1e-9);
        assertEquals(direct.point().b(), result.worstCase().results().get("b"), 1e-12);
        assertEquals(direct.maxWorkingTemperature(), result.worstCase().results().get("maxWorkingTemperatureK"), 1e-4);
        assertEquals("irreversibleLossPercent", result.sensitivityOutput());
        assertEquals(1.0, result.sensitivity().stream().mapToDouble(ToleranceStudyResult.Share::share).sum(), 1e-12);
    }

    @Test
    void each_sample_is_the_full_check_of_the_grade_rebuilt_with_its_br_and_hcj() {
        // With μrec = 1, s_B·J(H/s_H) of the knee curve is the knee curve with Br·s_B, HcJ·s_H and its width·s_H; the
        // sample's own steps (the shifted-Pc operating point, the maximum searched from the nominal crossing) must give
        // what DesignCheck gives on that grade with its full working-temperature scan.
        CheckSetup setup = CheckSetup.ofPc(LAW, 1.0, AppliedField.opposing(2e5), 353.15, 0.01);
        List<StudyInput> inputs = List.of(new StudyInput("br", 1.2 * (1 - 0.0012 * 60), new ToleranceBand(-0.02, 0.02, true)),
                new StudyInput("hcj", 1.6e6 * (1 - 0.006 * 60), new ToleranceBand(-0.05, 0.05, true)),
                new StudyInput("temperature", 353.15, new ToleranceBand(-10, 10, false)),
                new StudyInput("opposing-field", 2e5, new ToleranceBand(-5e4, 5e4, false)));
        CheckSample sample = new CheckSample(setup, inputs, org.kneepoint.fitter.loadline.FieldConvention.OPPOSING);
        java.util.SplittableRandom random = new java.util.SplittableRandom(5);
        for (int n = 0; n < 20; n++) {
            double sB = random.nextDouble(0.98, 1.02);
            double sH = random.nextDouble(0.95, 1.05);
            double temperature = random.nextDouble(343.15, 363.15);
            double field = random.nextDouble(1.5e5, 2.5e5);
            double[] outputs = sample.outputs(new double[] {sB * inputs.get(0).nominal(), sH * inputs.get(1).nominal(), temperature, field});
            LinearRecoilKnee rebuilt = new LinearRecoilKnee(sB * 1.2, 1.0, sH * 1.6e6, sH * CURVE.kneeWidth());
            DesignCheckResult direct = DesignCheck.of(LinearTemperatureLaw.ofPercentPerKelvin(rebuilt, -0.12, -0.6, 293.15), 1.0,
                    AppliedField.opposing(field), temperature, 0.01);
            assertEquals(direct.point().b(), outputs[CheckOutput.B.ordinal()], 1e-9);
            assertEquals(100 * direct.irreversibleLoss(), outputs[CheckOutput.IRREVERSIBLE_LOSS.ordinal()], 1e-7);
            assertEquals(direct.maxWorkingTemperature(), outputs[CheckOutput.MAX_WORKING_TEMPERATURE.ordinal()], 1e-3);
        }
    }

    @Test
    void a_knee_nearer_zero_is_the_worse_corner_and_a_steeper_recoil_line_pulls_the_point_out_of_the_knee() {
        // A steeper line lowers J below H = 0, so the point moves towards H = 0 and the recoil from it loses less.
        CheckSetup setup = CheckSetup.ofPc(LAW, 1.0, AppliedField.opposing(3e5), 373.15, 0.01);
        ToleranceStudyResult result = ToleranceStudy.run(setup, specs("knee=±3%", "mu-rec=-0..+0.02"),
                new StudyOptions(BandDistribution.UNIFORM, 2000, 1), "--tolerance");
        double kneeAtT = -LAW.at(373.15).kneeField().orElseThrow();
        assertEquals(0.97 * kneeAtT, result.worstCase().inputs().get("knee"), 1e-6 * kneeAtT);
        assertEquals(1.0, result.worstCase().inputs().get("mu-rec"), 1e-12);
        assertTrue(result.worstCase().results().get("irreversibleLossPercent") >= result.results().get("irreversibleLossPercent").max());
        assertEquals(1.0, result.sensitivity().stream().mapToDouble(ToleranceStudyResult.Share::share).sum(), 1e-12);
    }

    @Test
    void sensitivity_shares_of_independent_linear_inputs_equal_their_variance_shares() {
        List<StudyInput> inputs = List.of(new StudyInput("x", 0.0, new ToleranceBand(-1, 1, false)),
                new StudyInput("y", 5.0, new ToleranceBand(-2, 2, false)), new StudyInput("z", 1.0, new ToleranceBand(-1, 1, false)));
        MonteCarloRun run = MonteCarloRun.of(inputs, v -> new double[] {3 * v[0] + v[1] + 0 * v[2]}, BandDistribution.UNIFORM, 20_000, 7);
        double[] shares = SensitivityShares.of(run.inputs(), run.outputs()[0]);
        // var = a²·w²/3 for a uniform band of half-width w: 9·1 against 1·4.
        assertEquals(9.0 / 13.0, shares[0], 0.01);
        assertEquals(4.0 / 13.0, shares[1], 0.01);
        assertEquals(0.0, shares[2], 1e-12);
        assertEquals(1.0, shares[0] + shares[1] + shares[2], 1e-12);
    }

    @Test
    void a_fixed_seed_repeats_the_study_and_another_seed_agrees_within_sampling_error() {
        CheckSetup setup = CheckSetup.ofPc(LAW, 1.0, AppliedField.opposing(2e5), 353.15, 0.01);
        List<ToleranceSpec> bands = specs("br=±2%", "hcj=-5%..+0%", "pc=±10%");
        ToleranceStudyResult first = ToleranceStudy.run(setup, bands, OPTIONS, "--tolerance");
        assertEquals(first, ToleranceStudy.run(setup, bands, OPTIONS, "--tolerance"));
        ToleranceStudyResult other = ToleranceStudy.run(setup, bands, new StudyOptions(BandDistribution.NORMAL, 10_000, 99), "--tolerance");
        assertNotEquals(first, other);
        OutputSummary a = first.results().get("b");
        OutputSummary b = other.results().get("b");
        assertEquals(a.mean(), b.mean(), 5 * a.sd() * Math.sqrt(2.0 / 10_000));
        assertEquals(a.sd(), b.sd(), 5 * a.sd() / Math.sqrt(10_000));
    }

    @Test
    void bands_that_leave_the_physics_are_refused_naming_the_option() {
        CheckSetup byPc = CheckSetup.ofPc(LAW, 1.0, AppliedField.NONE, 293.15, 0.01);
        assertMessage("--tolerance opposing-field: the band makes opposing-field negative", byPc, "opposing-field=±10kA/m");
        assertMessage("--tolerance length: the check's load line has no length (it is given by its Pc)", byPc, "length=±0.1mm");
        assertMessage("--tolerance br: given twice", byPc, "br=±1%", "br=±2%");
        CheckSetup cylinder = new CheckSetup(LAW, 1.0, AppliedField.NONE, 293.15, 0.01,
                Map.of(ToleranceName.DIAMETER, 0.01, ToleranceName.LENGTH, 0.005), sizes -> sizes.get(ToleranceName.LENGTH) * 200);
        assertMessage("--tolerance length: the band makes length zero or negative", cylinder, "length=±6mm");
        assertMessage("--tolerance: at a corner of the bands the check fails", byPc, "temperature=+0K..+400K");
    }

    private static void assertMessage(String start, CheckSetup setup, String... bands) {
        BadInputException refused = assertThrows(BadInputException.class,
                () -> ToleranceStudy.run(setup, specs(bands), OPTIONS, "--tolerance"));
        assertTrue(refused.getMessage().startsWith(start), refused.getMessage());
    }
}
