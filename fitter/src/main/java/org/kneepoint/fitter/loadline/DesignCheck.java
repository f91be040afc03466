package org.kneepoint.fitter.loadline;

import org.kneepoint.fitter.error.BadInputException;

/**
 * Checks a grade on a load line at a temperature (DESIGN §2, workflow 3): operating point, knee margin
 * in A/m and in kelvin (by {@link TemperatureSearch} on T of H_op(T) − H_knee(T)), reversible change,
 * irreversible loss ({@link IrreversibleLoss}) and the maximum working temperature for a loss limit.
 */
public final class DesignCheck {

    /** Loss limit when none is given: 1 % (issue 5). */
    public static final double DEFAULT_LOSS_LIMIT = 0.01;

    private DesignCheck() {
    }

    /** The full check; {@code lossLimit} is a fraction strictly between 0 and 1. */
    public static DesignCheckResult of(TemperatureModel model, LoadLine line, double temperature, double lossLimit) {
        if (!(lossLimit > 0.0 && lossLimit < 1.0)) {
            throw new BadInputException("loss limit must lie strictly between 0 % and 100 %, got " + lossLimit * 100 + " %");
        }
        IntrinsicCurve curve = model.at(temperature);
        OperatingPoint point = line.on(curve);
        double knee = curve.kneeField().orElse(Double.NEGATIVE_INFINITY);
        double referenceTemperature = model.referenceTemperature();
        double referenceFlux = line.on(model.at(referenceTemperature)).b();
        Maximum maximum = maxWorkingTemperature(model, line, lossLimit);
        return new DesignCheckResult(temperature, line, point, knee, point.h() - knee,
                kneeMarginTemperature(model, line, temperature, point.h() >= knee),
                model.remanenceRatio(temperature) - 1.0, point.b() / referenceFlux - 1.0,
                IrreversibleLoss.after(curve, point), maximum.temperature(), maximum.atModelLimit());
    }

    /** The irreversible loss fraction after exposure to {@code line} at {@code temperature}. */
    public static double lossAt(TemperatureModel model, LoadLine line, double temperature) {
        IntrinsicCurve curve = model.at(temperature);
        return IrreversibleLoss.after(curve, line.on(curve));
    }

    private record Maximum(Double temperature, boolean atModelLimit) {
    }

    private static Maximum maxWorkingTemperature(TemperatureModel model, LoadLine line, double lossLimit) {
        double from = model.referenceTemperature();
        if (lossAt(model, line, from) > lossLimit) {
            return new Maximum(null, false);
        }
        double crossing = TemperatureSearch.firstCrossing(t -> lossAt(model, line, t) > lossLimit, from,
                model.highestTemperature());
        return Double.isNaN(crossing) ? new Maximum(model.highestTemperature(), true) : new Maximum(crossing, false);
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
