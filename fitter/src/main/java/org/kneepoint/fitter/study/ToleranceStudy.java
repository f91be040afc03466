package org.kneepoint.fitter.study;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.KneepointException;
import org.kneepoint.fitter.loadline.FieldConvention;
import org.kneepoint.fitter.loadline.IntrinsicCurve;

/**
 * A tolerance study of a design check (issue 14, item 1): Monte Carlo over the bands ({@link MonteCarloRun}), each
 * sample a check ({@link CheckSample}); the outputs summed up ({@link OutputSummary}), the share of samples over the
 * loss limit, the worst corner ({@link WorstCorner}) and the sensitivity shares ({@link SensitivityShares}). The
 * bands are checked first: a band that makes a size, Pc, Br, HcJ, the knee field or the temperature non-positive, or
 * a field negative, is refused, and so is any corner the check itself refuses, each naming the option.
 */
public final class ToleranceStudy {

    private static final Set<ToleranceName> POSITIVE = EnumSet.complementOf(
            EnumSet.of(ToleranceName.MU_REC, ToleranceName.OPPOSING_FIELD, ToleranceName.EXTERNAL_FIELD));

    /**
     * A loss below this (in percent, 10⁻⁵ of the flux) counts as none when choosing what the shares explain: a
     * hundredth of the 0.1 % a flux measurement resolves (common practice), and above the knee models' tail on the
     * straight part of a curve, which is never exactly zero.
     */
    static final double NEGLIGIBLE_LOSS_PERCENT = 1e-3;

    private ToleranceStudy() {
    }

    /** Runs the study of {@code setup} under {@code tolerances}; {@code option} names them in messages. */
    public static ToleranceStudyResult run(CheckSetup setup, List<ToleranceSpec> tolerances, StudyOptions options, String option) {
        if (tolerances.isEmpty()) {
            throw new BadInputException(option + ": a tolerance study needs at least one band");
        }
        FieldConvention convention = convention(setup, tolerances, option);
        List<StudyInput> inputs = inputs(setup, tolerances, option);
        CheckSample model = new CheckSample(setup, inputs, convention);
        WorstCorner corner = worstCorner(inputs, model, option);
        MonteCarloRun run = MonteCarloRun.of(inputs, model, options.distribution(), options.samples(), options.seed());
        Map<String, OutputSummary> results = new LinkedHashMap<>();
        Map<String, Double> cornerResults = new LinkedHashMap<>();
        for (CheckOutput output : CheckOutput.values()) {
            results.put(output.key(), OutputSummary.of(run.outputs()[output.ordinal()]));
            double value = corner.outputs()[output.ordinal()];
            cornerResults.put(output.key(), Double.isFinite(value) ? value : null);
        }
        Map<String, Double> cornerInputs = new LinkedHashMap<>();
        for (int i = 0; i < inputs.size(); i++) {
            cornerInputs.put(inputs.get(i).name(), corner.values()[i]);
        }
        CheckOutput explained = CheckOutput.IRREVERSIBLE_LOSS;
        double[] loss = run.outputs()[explained.ordinal()];
        double[] shares = Arrays.stream(loss).allMatch(v -> v < NEGLIGIBLE_LOSS_PERCENT) ? null
                : SensitivityShares.of(run.inputs(), loss);
        if (shares == null) {
            explained = CheckOutput.B;
            shares = SensitivityShares.of(run.inputs(), run.outputs()[explained.ordinal()]);
        }
        List<ToleranceStudyResult.Share> sensitivity = new ArrayList<>();
        for (int i = 0; shares != null && i < shares.length; i++) {
            sensitivity.add(new ToleranceStudyResult.Share(inputs.get(i).name(), shares[i]));
        }
        return new ToleranceStudyResult(options.samples(), options.seed(), options.distribution(), results,
                run.shareAbove(CheckOutput.IRREVERSIBLE_LOSS.ordinal(), 100.0 * setup.lossLimit()),
                new ToleranceStudyResult.WorstCase(cornerInputs, cornerResults), explained.key(), sensitivity);
    }

    private static FieldConvention convention(CheckSetup setup, List<ToleranceSpec> tolerances, String option) {
        boolean opposing = tolerances.stream().anyMatch(t -> t.name() == ToleranceName.OPPOSING_FIELD);
        boolean external = tolerances.stream().anyMatch(t -> t.name() == ToleranceName.EXTERNAL_FIELD);
        FieldConvention given = setup.field().convention();
        boolean noField = setup.field().field() == 0.0;
        if (opposing && external) {
            throw new BadInputException(option + ": give a band on opposing-field or on external-field, not both");
        }
        if (opposing && given == FieldConvention.EXTERNAL && !noField || external && given == FieldConvention.OPPOSING && !noField) {
            throw new BadInputException(option + " " + (opposing ? "opposing-field" : "external-field") + ": the check's field is "
                    + (opposing ? "an external field" : "an opposing field") + "; put the band on "
                    + (opposing ? "external-field" : "opposing-field"));
        }
        return external ? FieldConvention.EXTERNAL : opposing ? FieldConvention.OPPOSING : given;
    }

    private static List<StudyInput> inputs(CheckSetup setup, List<ToleranceSpec> tolerances, String option) {
        IntrinsicCurve curve = setup.model().at(setup.temperature());
        Set<ToleranceName> seen = EnumSet.noneOf(ToleranceName.class);
        List<StudyInput> inputs = new ArrayList<>();
        for (ToleranceSpec spec : tolerances) {
            String where = option + " " + spec.name().label();
            if (!seen.add(spec.name())) {
                throw new BadInputException(where + ": given twice; give one band per input");
            }
            StudyInput input = new StudyInput(spec.name().label(), nominal(setup, curve, spec.name(), where), spec.band());
            for (double end : new double[] {input.value(-1.0), input.value(1.0)}) {
                boolean bad = POSITIVE.contains(spec.name()) ? !(end > 0.0) : spec.name() != ToleranceName.MU_REC && end < 0.0;
                if (bad) {
                    throw new BadInputException(String.format(Locale.ROOT, "%s: the band makes %s %s (%.6g %s at its end)",
                            where, spec.name().label(), POSITIVE.contains(spec.name()) ? "zero or negative" : "negative",
                            end, unit(spec.name())));
                }
            }
            inputs.add(input);
        }
        return inputs;
    }

    private static double nominal(CheckSetup setup, IntrinsicCurve curve, ToleranceName name, String where) {
        return switch (name) {
            case BR -> curve.remanence();
            case HCJ -> IntrinsicCoercivity.of(curve);
            case KNEE -> -curve.kneeField().orElseThrow(() -> new BadInputException(where
                    + ": the curve at the check temperature has no knee (it never falls to 0.9·Br)"));
            case MU_REC -> curve.recoilPermeability();
            case PC -> setup.pc();
            case TEMPERATURE -> setup.temperature();
            case OPPOSING_FIELD, EXTERNAL_FIELD -> setup.field().field();
            default -> {
                Double size = setup.sizes().get(name);
                if (size == null) {
                    throw new BadInputException(where + ": the check's load line has no " + name.label()
                            + (setup.sizes().isEmpty() ? " (it is given by its Pc)" : ""));
                }
                yield size;
            }
        };
    }

    private static String unit(ToleranceName name) {
        return name.dimension() == null ? "" : name.dimension().siSymbol();
    }

    private static WorstCorner worstCorner(List<StudyInput> inputs, CheckSample model, String option) {
        try {
            return WorstCorner.find(inputs, model, CheckOutput.IRREVERSIBLE_LOSS.ordinal(), CheckOutput.B.ordinal());
        } catch (KneepointException e) {
            throw new BadInputException(option + ": at a corner of the bands the check fails: " + e.getMessage());
        }
    }
}
