package org.kneepoint.fitter.study;

/**
 * A tolerance band around a nominal value: from {@code lower} to {@code upper} (lower &lt; upper), either fractions of
 * the nominal value ({@code relative}) or absolute offsets in SI. The band's middle is the distribution's centre and
 * its half-width is 3σ (common practice: a tolerance is a 3σ process limit).
 */
public record ToleranceBand(double lower, double upper, boolean relative) {

    public ToleranceBand {
        if (!(Double.isFinite(lower) && Double.isFinite(upper) && lower < upper)) {
            throw new IllegalArgumentException("a band needs a lower end below its upper end, got " + lower + " and " + upper);
        }
    }

    /** The value at position {@code t} in the band: −1 is the lower end, 0 the middle, +1 the upper end. */
    public double value(double nominal, double t) {
        double offset = 0.5 * (lower + upper) + t * 0.5 * (upper - lower);
        return relative ? nominal * (1.0 + offset) : nominal + offset;
    }
}
