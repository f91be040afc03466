package org.kneepoint.fitter.select;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.kneepoint.fitter.error.NumericalFailureException;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.IntrinsicCurve;
import org.kneepoint.fitter.loadline.LimitReason;
import org.kneepoint.fitter.loadline.LossCheck;
import org.kneepoint.fitter.loadline.WorkingLimit;
import org.kneepoint.fitter.loadline.WorkingRange;
import org.kneepoint.fitter.study.IntrinsicCoercivity;

/**
 * The rules every verdict — a check, a duty step, a sweep's temperature, a grade in a selection — applies to a
 * magnet at its operating point: a permanent magnet (HcJ at least {@link #PERMANENT_MAGNET_HCJ}), B above zero, the
 * point above the knee, the loss within the limit and the temperature inside the working range for that limit; a
 * selection adds its least flux density. Each rule missed is one {@link Shortfall}, in a fixed order.
 */
public final class DesignShortfalls {

    /**
     * The least HcJ of a permanent magnet, A/m. Common practice (from memory): magnetically soft materials have
     * coercivities below about 1 kA/m, hard ones above about 10 kA/m; cast AlNiCo, the least coercive permanent
     * magnets in use, have some 40 to 150 kA/m. A loop of soft iron or a susceptibility table falls far below.
     */
    public static final double PERMANENT_MAGNET_HCJ = 10e3;

    private DesignShortfalls() {
    }

    /**
     * A check's shortfalls against its own loss limit: not a permanent magnet, B above the {@code minimumFluxDensity}
     * (null: any), loss over the limit, B ≤ 0, below the knee, a working range that misses the temperature or does not
     * exist. {@code curve} is the grade's curve at the check's temperature.
     */
    public static List<Shortfall> of(DesignCheckResult check, IntrinsicCurve curve, Double minimumFluxDensity) {
        return of(check.point().b(), check.kneeMarginField(), check.irreversibleLoss(), check.lossLimit(), check.working(),
                check.temperature(), curve, minimumFluxDensity);
    }

    /** The same shortfalls for a selection's {@link LossCheck} at {@code temperature} (K) against {@code lossLimit} (a fraction). */
    public static List<Shortfall> of(LossCheck check, double temperature, double lossLimit, IntrinsicCurve curve,
            Double minimumFluxDensity) {
        return of(check.point().b(), check.kneeMarginField(), check.irreversibleLoss(), lossLimit, check.working(), temperature,
                curve, minimumFluxDensity);
    }

    private static List<Shortfall> of(double flux, Double kneeMargin, double loss, double lossLimit, WorkingRange working,
            double temperature, IntrinsicCurve curve, Double minimumFluxDensity) {
        List<Shortfall> shortfalls = new ArrayList<>(4);
        permanentMagnet(curve).ifPresent(shortfalls::add);
        if (minimumFluxDensity != null && flux < minimumFluxDensity) {
            shortfalls.add(new Shortfall(Shortfall.Requirement.MINIMUM_FLUX_DENSITY, minimumFluxDensity - flux));
        }
        shortfalls.addAll(atPoint(flux, kneeMargin, loss, lossLimit));
        WorkingLimit minimum = working.minimum();
        WorkingLimit maximum = working.maximum();
        if (maximum.reason() == LimitReason.NONE_IN_RANGE) {
            shortfalls.add(new Shortfall(Shortfall.Requirement.WORKING_TEMPERATURE_FOUND, Math.max(0.0, loss - lossLimit)));
        } else {
            if (maximum.reason() == LimitReason.LIMIT_REACHED && maximum.temperature() < temperature) {
                shortfalls.add(new Shortfall(Shortfall.Requirement.MAXIMUM_WORKING_TEMPERATURE, temperature - maximum.temperature()));
            }
            if (minimum.reason() == LimitReason.LIMIT_REACHED && minimum.temperature() > temperature) {
                shortfalls.add(new Shortfall(Shortfall.Requirement.MINIMUM_WORKING_TEMPERATURE, minimum.temperature() - temperature));
            }
        }
        return List.copyOf(shortfalls);
    }

    /**
     * An operating point's own shortfalls: the {@code loss} (a fraction) over {@code lossLimit}, B ≤ 0, and H below the
     * knee ({@code kneeMargin} = H_op − H_knee, null: no knee).
     */
    public static List<Shortfall> atPoint(double fluxDensity, Double kneeMargin, double loss, double lossLimit) {
        List<Shortfall> shortfalls = new ArrayList<>(3);
        if (loss > lossLimit) {
            shortfalls.add(new Shortfall(Shortfall.Requirement.MAXIMUM_IRREVERSIBLE_LOSS, loss - lossLimit));
        }
        if (fluxDensity <= 0.0) {
            shortfalls.add(new Shortfall(Shortfall.Requirement.POSITIVE_FLUX_DENSITY, -fluxDensity));
        }
        if (kneeMargin != null && kneeMargin < 0.0) {
            shortfalls.add(new Shortfall(Shortfall.Requirement.KNEE_MARGIN, -kneeMargin));
        }
        return List.copyOf(shortfalls);
    }

    /** H_op − H_knee on {@code curve} (A/m, positive above the knee), or null when the curve never falls to 0.9·Br. */
    public static Double kneeMargin(IntrinsicCurve curve, double h) {
        return curve.kneeField().isPresent() ? h - curve.kneeField().getAsDouble() : null;
    }

    /**
     * Why {@code curve} is not a permanent magnet's (HcJ below {@link #PERMANENT_MAGNET_HCJ}), or empty when it is one;
     * a curve whose J never falls to 0 within reach is far from soft, so it is one.
     */
    public static Optional<Shortfall> permanentMagnet(IntrinsicCurve curve) {
        double hcj;
        try {
            hcj = IntrinsicCoercivity.of(curve);
        } catch (NumericalFailureException e) {
            return Optional.empty();
        }
        return hcj < PERMANENT_MAGNET_HCJ
                ? Optional.of(new Shortfall(Shortfall.Requirement.PERMANENT_MAGNET, PERMANENT_MAGNET_HCJ - hcj))
                : Optional.empty();
    }
}
