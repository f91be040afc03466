package org.kneepoint.fitter.qualification;

import java.util.List;

/**
 * A lot against its grade: every sample at every temperature, and the lot's verdict, the worst of
 * all its checks (inconclusive when no sample was measured at a specified temperature).
 */
public record LotAssessment(List<SampleAssessment> samples, Verdict verdict) {

    public LotAssessment {
        samples = List.copyOf(samples);
    }
}
