package org.kneepoint.fitter.loadline;

import java.util.Locale;
import org.kneepoint.fitter.error.BadInputException;

/**
 * A temperature model whose range is cut to where it means something: below the family's Curie temperature
 * ({@link MagnetFamily}) and inside the temperatures where the model's curve exists (Br, HcJ and the knee's
 * depth all positive, as {@link LinearRecoilKnee} demands). The valid temperatures are taken to form one interval
 * around the reference temperature; each end is found by bisection to {@value #TOLERANCE} K on the valid side.
 * Outside the range {@link #at} refuses with one line naming the range and why it ends.
 */
public final class BoundedTemperatureModel implements TemperatureModel {

    static final double TOLERANCE = 1e-3;

    private final TemperatureModel model;
    private final double lowest;
    private final double highest;
    private final String topReason;

    private BoundedTemperatureModel(TemperatureModel model, double lowest, double highest, String topReason) {
        this.model = model;
        this.lowest = lowest;
        this.highest = highest;
        this.topReason = topReason;
    }

    /** {@code model} cut below the Curie temperature of {@code family} (none: only to where its curve exists). */
    public static BoundedTemperatureModel of(TemperatureModel model, MagnetFamily family) {
        double anchor = model.referenceTemperature();
        double top = model.highestTemperature();
        String reason = "the end of the model's own range";
        if (family != null && family.curieTemperature() < top) {
            top = Math.nextDown(family.curieTemperature());
            reason = String.format(Locale.ROOT, "the Curie temperature of %s, about %.0f K", family.label(), family.curieTemperature());
        }
        if (!(anchor >= model.lowestTemperature() && anchor <= top) || !valid(model, anchor)) {
            anchor = 0.5 * (model.lowestTemperature() + top);
        }
        if (!valid(model, anchor)) {
            throw new BadInputException(String.format(Locale.ROOT, "the temperature model has no valid curve near %.2f K"
                    + " (Br, HcJ or the knee reach zero), so it describes no temperature", anchor));
        }
        double highest = valid(model, top) ? top : edge(model, anchor, top);
        if (highest < top) {
            reason = "where the model's HcJ, Br or knee depth reaches zero";
        }
        double bottom = model.lowestTemperature();
        double lowest = valid(model, bottom) ? bottom : edge(model, anchor, bottom);
        return new BoundedTemperatureModel(model, lowest, highest, reason);
    }

    /** {@code model} known only from {@code lowest} to {@code highest} K, for the reason given in words. */
    public static BoundedTemperatureModel within(TemperatureModel model, double lowest, double highest, String reason) {
        if (!(lowest >= model.lowestTemperature() && highest <= model.highestTemperature() && lowest <= highest)) {
            throw new BadInputException(String.format(Locale.ROOT, "%.2f K to %.2f K is not inside the model's range %.2f K to"
                    + " %.2f K", lowest, highest, model.lowestTemperature(), model.highestTemperature()));
        }
        return new BoundedTemperatureModel(model, lowest, highest, reason);
    }

    @Override
    public IntrinsicCurve at(double temperature) {
        if (!(temperature >= lowest && temperature <= highest)) {
            throw new BadInputException(String.format(Locale.ROOT, "temperature %.2f K lies outside the model's range %.2f K"
                    + " to %.2f K (it ends at %s)", temperature, lowest, highest, topReason));
        }
        return model.at(temperature);
    }

    /** Why the range ends (at its top), in words. */
    public String topReason() {
        return topReason;
    }

    @Override
    public double referenceTemperature() {
        return model.referenceTemperature();
    }

    @Override
    public double remanenceRatio(double temperature) {
        return model.remanenceRatio(temperature);
    }

    @Override
    public double lowestTemperature() {
        return lowest;
    }

    @Override
    public double highestTemperature() {
        return highest;
    }

    @Override
    public boolean isExtrapolated(double temperature) {
        return model.isExtrapolated(temperature);
    }

    /** The last valid temperature from {@code valid} (valid) towards {@code invalid}. */
    private static double edge(TemperatureModel model, double valid, double invalid) {
        while (Math.abs(invalid - valid) > TOLERANCE) {
            double middle = 0.5 * (valid + invalid);
            if (valid(model, middle)) {
                valid = middle;
            } else {
                invalid = middle;
            }
        }
        return valid;
    }

    /** Whether the model gives a curve at {@code temperature}: its curve records refuse a non-positive Br, HcJ or depth. */
    private static boolean valid(TemperatureModel model, double temperature) {
        try {
            IntrinsicCurve curve = model.at(temperature);
            return curve.remanence() > 0.0 && Double.isFinite(curve.remanence());
        } catch (BadInputException refused) {
            return false;
        }
    }
}
