package org.kneepoint.fitter.study;

import org.kneepoint.fitter.error.BadInputException;

/**
 * How a study samples: the distribution over each band, the number of samples and the seed of the random numbers.
 */
public record StudyOptions(BandDistribution distribution, int samples, long seed) {

    /** Samples when none are asked for (issue 14). */
    public static final int DEFAULT_SAMPLES = 10_000;
    /** The seed when none is given: fixed, so a study repeats. */
    public static final long DEFAULT_SEED = 14L;
    /** The most samples one study takes. */
    public static final int MAX_SAMPLES = 1_000_000;

    public StudyOptions {
        if (distribution == null) {
            throw new BadInputException("a study needs a distribution, normal or uniform");
        }
    }

    /** The options, with the sample count checked; {@code samplesOption} names it in the message. */
    public static StudyOptions of(BandDistribution distribution, int samples, long seed, String samplesOption) {
        if (samples < 2 || samples > MAX_SAMPLES) {
            throw new BadInputException(samplesOption + " must lie between 2 and " + MAX_SAMPLES + ", got " + samples);
        }
        return new StudyOptions(distribution, samples, seed);
    }
}
