package org.kneepoint.fitter.elements;

/**
 * Each element's state through the load cases, column by column: its loss so far (set by its worst point), H∥ and
 * the knee margin at that point, whether it ever passed the knee, and after the last case its remanence and recoil
 * permeability.
 */
final class ElementStates {

    final double[] loss;
    final double[] hParallel;
    final double[] margin;
    final boolean[] pastKnee;
    final double[] remanence;
    final double[] recoilPermeability;

    ElementStates(int n) {
        loss = new double[n];
        hParallel = new double[n];
        margin = new double[n];
        pastKnee = new boolean[n];
        remanence = new double[n];
        recoilPermeability = new double[n];
    }

    /** A case's point of element {@code i}: it becomes the worst point when its loss is larger, or as large and nearer the knee. */
    void record(int i, boolean firstCase, double caseLoss, double caseField, double caseMargin) {
        if (firstCase || caseLoss > loss[i] || caseLoss == loss[i] && caseMargin < margin[i]) {
            loss[i] = caseLoss;
            hParallel[i] = caseField;
            margin[i] = caseMargin;
        }
        pastKnee[i] |= caseMargin < 0.0;
    }
}
