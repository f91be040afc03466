package org.kneepoint.fitter.study;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.FieldConvention;
import org.kneepoint.fitter.loadline.IntrinsicCurve;
import org.kneepoint.fitter.loadline.IrreversibleLoss;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.loadline.OperatingPoint;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.fitter.loadline.WorkingTemperatures;

/**
 * One check with its inputs set to a sample's values, by the same steps as
 * {@link org.kneepoint.fitter.loadline.DesignCheck}: the operating point on the perturbed curve at T, the loss by the
 * recoil line ({@link IrreversibleLoss}), Br(T)/Br(T0) − 1 and the highest working temperature ({@link SampleWorkingLimit}, from the nominal
 * check's {@link WorkingTemperatures}).
 * Immutable, so samples may run in parallel. Curve inputs enter as ratios to their nominal values at the check temperature ({@link PerturbedCurve}), μrec as a
 * difference; sizes through Pc of the shape; {@code pc} as a ratio on top of it.
 */
final class CheckSample implements SampleModel {

    private final CheckSetup setup;
    private final ToleranceName[] names;
    private final double[] nominals;
    private final FieldConvention convention;
    private final SampleWorkingLimit working;

    CheckSample(CheckSetup setup, List<StudyInput> inputs, FieldConvention convention) {
        this.setup = setup;
        this.names = inputs.stream().map(input -> ToleranceName.of(input.name()).orElseThrow()).toArray(ToleranceName[]::new);
        this.nominals = inputs.stream().mapToDouble(StudyInput::nominal).toArray();
        this.convention = convention;
        this.working = new SampleWorkingLimit(setup.model(), setup.field().loadLine(setup.pc()), setup.temperature(),
                setup.lossLimit());
    }

    @Override
    public double[] outputs(double[] values) {
        double remanence = 1.0;
        double coercivity = 1.0;
        double knee = 1.0;
        double recoil = 0.0;
        double pcRatio = 1.0;
        double temperature = setup.temperature();
        double field = setup.field().field();
        Map<ToleranceName, Double> sizes = null;
        for (int i = 0; i < names.length; i++) {
            double v = values[i];
            switch (names[i]) {
                case BR -> remanence = v / nominals[i];
                case HCJ -> coercivity = v / nominals[i];
                case KNEE -> knee = v / nominals[i];
                case MU_REC -> recoil = v - nominals[i];
                case PC -> pcRatio = v / nominals[i];
                case TEMPERATURE -> temperature = v;
                case OPPOSING_FIELD, EXTERNAL_FIELD -> field = v;
                default -> {
                    sizes = sizes == null ? new EnumMap<>(setup.sizes()) : sizes;
                    sizes.put(names[i], v);
                }
            }
        }
        double pc = (sizes == null ? setup.pc() : setup.permeance().pc(sizes)) * pcRatio;
        TemperatureModel model = PerturbedModel.of(setup.model(), new CurveScaling(remanence, coercivity, knee, recoil));
        LoadLine line = new AppliedField(convention, field).loadLine(pc);
        IntrinsicCurve curve = model.at(temperature);
        OperatingPoint point = line.on(curve);
        double loss = IrreversibleLoss.after(curve, point);
        return new double[] {point.b(), point.h(), point.j(), 100.0 * loss, 100.0 * (model.remanenceRatio(temperature) - 1.0),
            working.maximum(model, line, temperature)};
    }
}
