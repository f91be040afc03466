package org.kneepoint.fitter.study;

import java.util.Locale;
import java.util.SplittableRandom;
import org.kneepoint.fitter.error.BadInputException;

/**
 * How a value is spread over its band, as a position t in [−1, 1] (−1 the lower end, +1 the upper):
 * {@code NORMAL}, the normal distribution with 3σ equal to the half-width truncated at the ends (common practice: a
 * tolerance is a 3σ process limit), drawn by rejection of standard normal draws beyond ±3; or {@code UNIFORM}.
 */
public enum BandDistribution {
    NORMAL, UNIFORM;

    /** The truncation point of the normal distribution, in σ. */
    public static final double SIGMAS = 3.0;

    /** A position in the band, drawn from {@code random}. */
    public double draw(SplittableRandom random) {
        if (this == UNIFORM) {
            return random.nextDouble(-1.0, 1.0);
        }
        double z;
        do {
            z = random.nextGaussian();
        } while (Math.abs(z) > SIGMAS);
        return z / SIGMAS;
    }

    /** The name as typed and written, {@code normal} or {@code uniform}. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The distribution called {@code text}; {@code option} names where it came from, for the message. */
    public static BandDistribution of(String text, String option) {
        for (BandDistribution distribution : values()) {
            if (distribution.label().equals(text)) {
                return distribution;
            }
        }
        throw new BadInputException(option + " '" + text + "': expected normal or uniform");
    }
}
