package org.kneepoint.fitter.loadline;

import org.kneepoint.fitter.error.BadInputException;

/**
 * Checks a grade on a load line at a temperature (docs/design.md §2, workflow 3): operating point, knee margin
 * in A/m and in kelvin (by {@link TemperatureSearch} on T of H_op(T) − H_knee(T)), reversible change,
 * irreversible loss by the recoil line through the operating point ({@link IrreversibleLoss}) and the
 * working temperatures where that loss reaches the limit ({@link WorkingTemperatures}).
 */
public final class DesignCheck {

    /** Loss limit when none is given: 1 % (issue 5). */
    public static final double DEFAULT_LOSS_LIMIT = 0.01;

    private DesignCheck() {
    }

    /** The full check on a load line with a circuit field; {@code lossLimit} is a fraction strictly between 0 and 1. */
    public static DesignCheckResult of(TemperatureModel model, LoadLine line, double temperature, double lossLimit) {
        return of(model, line.pc(), AppliedField.opposing(line.opposingField()), temperature, lossLimit);
    }

    /** The full check with a field given in either convention ({@link AppliedField}). */
    public static DesignCheckResult of(TemperatureModel model, double pc, AppliedField field, double temperature,
            double lossLimit) {
        requireLossLimit(lossLimit);
        LoadLine line = field.loadLine(pc);
        IntrinsicCurve curve = model.at(temperature);
        OperatingPoint point = line.on(curve);
        Double knee = curve.kneeField().isPresent() ? curve.kneeField().getAsDouble() : null;
        double referenceTemperature = model.referenceTemperature();
        double referenceFlux = line.on(model.at(referenceTemperature)).b();
        return new DesignCheckResult(temperature, line, field, point, knee, knee == null ? null : point.h() - knee,
                knee == null ? null : kneeMarginTemperature(model, line, temperature, point.h() >= knee),
                model.remanenceRatio(temperature) - 1.0, point.b() / referenceFlux - 1.0, IrreversibleLoss.after(curve, point),
                lossLimit, WorkingTemperatures.of(model, line, temperature, lossLimit), model.isExtrapolated(temperature),
                model.isExtrapolated(referenceTemperature), curve.beyondMeasuredField(point.h()));
    }

    /**
     * What a grade selection ranks by ({@link LossCheck}), each part computed as {@link #of} computes it and refused where
     * {@link #of} refuses (the curve at T0 is asked for too, as there); the knee margin in kelvin is not searched for.
     */
    public static LossCheck forRanking(TemperatureModel model, double pc, AppliedField field, double temperature,
            double lossLimit) {
        requireLossLimit(lossLimit);
        LoadLine line = field.loadLine(pc);
        IntrinsicCurve curve = model.at(temperature);
        OperatingPoint point = line.on(curve);
        Double knee = curve.kneeField().isPresent() ? curve.kneeField().getAsDouble() : null;
        model.at(model.referenceTemperature());
        return new LossCheck(point, knee, IrreversibleLoss.after(curve, point), WorkingTemperatures.of(model, line, temperature,
                lossLimit), curve.beyondMeasuredField(point.h()));
    }

    private static void requireLossLimit(double lossLimit) {
        if (!(lossLimit > 0.0 && lossLimit < 1.0)) {
            throw new BadInputException("loss limit must lie strictly between 0 % and 100 %, got " + lossLimit * 100 + " %");
        }
    }

    /** The irreversible loss fraction after exposure to {@code line} at {@code temperature}. */
    public static double lossAt(TemperatureModel model, LoadLine line, double temperature) {
        return model.irreversibleLoss(line, temperature);
    }

    private static Double kneeMarginTemperature(TemperatureModel model, LoadLine line, double temperature, boolean aboveKnee) {
        double to = aboveKnee ? model.highestTemperature() : model.lowestTemperature();
        double crossing = TemperatureSearch.firstCrossing(t -> belowKnee(model, line, t) == aboveKnee, temperature, to);
        return Double.isNaN(crossing) ? null : crossing - temperature;
    }

    private static boolean belowKnee(TemperatureModel model, LoadLine line, double temperature) {
        IntrinsicCurve curve = model.at(temperature);
        return line.on(curve).h() < curve.kneeField().orElse(Double.NEGATIVE_INFINITY);
    }
}
