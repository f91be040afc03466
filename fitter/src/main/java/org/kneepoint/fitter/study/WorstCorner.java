package org.kneepoint.fitter.study;

import java.util.List;

/**
 * The corner of all bands (every input at its lower or upper end) with the largest value of one output (the loss),
 * ties broken by the smallest value of another (the flux density), so a study whose loss is zero everywhere still
 * names the corner of least flux. With up to {@value #EXHAUSTIVE_INPUTS} inputs every one of the 2^k corners is
 * evaluated; with more, each input is put at the end that alone gives the worse result (exact for outputs monotone
 * in each input, which is what a corner search assumes anyway).
 *
 * @param values  the inputs' values at the corner, in the study's order
 * @param outputs the model's outputs there
 */
public record WorstCorner(double[] values, double[] outputs) {

    static final int EXHAUSTIVE_INPUTS = 8;
    private static final double TIE = 1e-12;

    /** The worst corner of {@code inputs} for {@code model}: largest output {@code worst}, then smallest {@code least}. */
    public static WorstCorner find(List<StudyInput> inputs, SampleModel model, int worst, int least) {
        int count = inputs.size();
        if (count <= EXHAUSTIVE_INPUTS) {
            WorstCorner found = at(inputs, model, 0);
            for (int mask = 1; mask < 1 << count; mask++) {
                WorstCorner corner = at(inputs, model, mask);
                if (isWorse(corner, found, worst, least)) {
                    found = corner;
                }
            }
            return found;
        }
        int mask = 0;
        for (int i = 0; i < count; i++) {
            if (isWorse(alone(inputs, model, i, 1.0), alone(inputs, model, i, -1.0), worst, least)) {
                mask |= 1 << i;
            }
        }
        return at(inputs, model, mask);
    }

    private static boolean isWorse(WorstCorner a, WorstCorner b, int worst, int least) {
        double difference = a.outputs[worst] - b.outputs[worst];
        if (Math.abs(difference) > TIE) {
            return difference > 0.0;
        }
        return a.outputs[least] < b.outputs[least];
    }

    private static WorstCorner at(List<StudyInput> inputs, SampleModel model, int mask) {
        double[] values = new double[inputs.size()];
        for (int i = 0; i < values.length; i++) {
            values[i] = inputs.get(i).value((mask >> i & 1) == 1 ? 1.0 : -1.0);
        }
        return new WorstCorner(values, model.outputs(values.clone()));
    }

    private static WorstCorner alone(List<StudyInput> inputs, SampleModel model, int index, double t) {
        double[] values = new double[inputs.size()];
        for (int i = 0; i < values.length; i++) {
            values[i] = inputs.get(i).value(i == index ? t : 0.0);
        }
        return new WorstCorner(values, model.outputs(values.clone()));
    }
}
