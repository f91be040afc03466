package org.kneepoint.fitter.study;

/** What a study samples: the outputs for one set of input values, in the order of the study's inputs. */
@FunctionalInterface
public interface SampleModel {

    /** The outputs for {@code inputs}; NaN for an output this sample does not have. */
    double[] outputs(double[] inputs);
}
