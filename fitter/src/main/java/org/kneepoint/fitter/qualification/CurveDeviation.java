package org.kneepoint.fitter.qualification;

import java.util.Arrays;
import java.util.stream.DoubleStream;
import org.kneepoint.fitter.curve.DemagnetizationBranch;

/**
 * The largest difference between a lot's J(H) and the grade's reference J(H) over the field range
 * both cover, as a share of the reference's Br, signed (positive where the lot lies above), with
 * the H where it occurs. Both curves are evaluated on their monotone interpolants
 * ({@link DemagnetizationBranch}) at every measured H of either curve in the common range and at
 * {@value #SUBDIVISIONS} − 1 points inside each interval between them, so a curve equal to the
 * reference deviates by exactly 0.
 *
 * @param share  (J_lot − J_reference)/Br_reference where its magnitude is largest
 * @param atH    the H of that point, A/m
 */
public record CurveDeviation(double share, double atH) {

    /** Evaluation points per interval between neighbouring measured H values. */
    static final int SUBDIVISIONS = 8;

    /** The deviation, or null when the two curves share no field range. */
    public static CurveDeviation between(DemagnetizationBranch lot, DemagnetizationBranch reference, double referenceBr) {
        double from = Math.max(lot.lowestH(), reference.lowestH());
        double to = Math.min(lot.highestH(), reference.highestH());
        if (!(from < to)) {
            return null;
        }
        double[] nodes = DoubleStream.concat(Arrays.stream(lot.measuredBetween(from, to)[0]),
                Arrays.stream(reference.measuredBetween(from, to)[0])).toArray();
        double[] fields = DoubleStream.concat(Arrays.stream(nodes), DoubleStream.of(from, to)).sorted().distinct().toArray();
        double worst = 0;
        double worstH = fields[0];
        for (int i = 0; i < fields.length; i++) {
            int steps = i == fields.length - 1 ? 1 : SUBDIVISIONS;
            for (int k = 0; k < steps; k++) {
                double h = i == fields.length - 1 ? fields[i] : fields[i] + (fields[i + 1] - fields[i]) * k / SUBDIVISIONS;
                double difference = (lot.j(h) - reference.j(h)) / referenceBr;
                if (Math.abs(difference) > Math.abs(worst)) {
                    worst = difference;
                    worstH = h;
                }
            }
        }
        return new CurveDeviation(worst, worstH);
    }
}
