package org.kneepoint.server.app.design;

import java.util.ArrayList;
import java.util.List;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.study.BandDistribution;
import org.kneepoint.fitter.study.StudyOptions;
import org.kneepoint.fitter.study.ToleranceSpec;

/**
 * The tolerance study a check asks for (issue 14): the bands as typed, parsed, and how to sample them. {@code names}
 * says how the front end spells its options in messages ({@code --tolerance} or {@code tolerance}).
 *
 * @param tolerances the bands, none for a check without a study
 * @param options    distribution, samples, seed
 * @param option     the name of the tolerance option, for messages
 */
public record ToleranceRequest(List<ToleranceSpec> tolerances, StudyOptions options, String option) {

    /** Front ends' names of the four options, for messages. */
    public record OptionNames(String tolerance, String distribution, String samples, String seed) {
    }

    public ToleranceRequest {
        tolerances = List.copyOf(tolerances);
    }

    /**
     * The request from the options as given (null when absent): no band and no other option is no study; the other
     * options without a band are refused, since they would do nothing.
     */
    public static ToleranceRequest of(List<String> bands, String distribution, Integer samples, Long seed, OptionNames names) {
        List<ToleranceSpec> tolerances = new ArrayList<>();
        for (String band : bands == null ? List.<String>of() : bands) {
            tolerances.add(ToleranceSpec.parse(band, names.tolerance()));
        }
        if (tolerances.isEmpty()) {
            if (distribution != null || samples != null || seed != null) {
                throw new BadInputException(names.distribution() + ", " + names.samples() + " and " + names.seed()
                        + " shape a tolerance study: give at least one " + names.tolerance() + " NAME=SPEC");
            }
            return null;
        }
        BandDistribution shape = distribution == null ? BandDistribution.NORMAL : BandDistribution.of(distribution, names.distribution());
        StudyOptions options = StudyOptions.of(shape, samples == null ? StudyOptions.DEFAULT_SAMPLES : samples,
                seed == null ? StudyOptions.DEFAULT_SEED : seed, names.samples());
        return new ToleranceRequest(tolerances, options, names.tolerance());
    }
}
