package org.kneepoint.fitter.elements;

import java.util.List;

/**
 * The element check of a magnet over its load cases: the summary (volume, share past the knee, volume-weighted
 * loss, the worst elements, the verdict) and, element by element in the tables' order, the state a solver's next
 * pass needs — the new remanence and the recoil permeability at the element's temperature of the last case.
 * The per-element values are held in arrays owned by this result and read by index.
 */
public final class ElementCheckResult {

    private final double volume;
    private final double volumeFractionPastKnee;
    private final double irreversibleLoss;
    private final double lossLimit;
    private final TransverseRule transverse;
    private final List<WorstElement> worstElements;
    private final List<LoadCaseResult> cases;
    private final double[] loss;
    private final double[] remanence;
    private final double[] recoilPermeability;
    private final double[] margin;
    private final boolean[] pastKnee;

    ElementCheckResult(double volume, double volumeFractionPastKnee, double irreversibleLoss, double lossLimit,
            TransverseRule transverse, List<WorstElement> worstElements, List<LoadCaseResult> cases, ElementStates states) {
        this.volume = volume;
        this.volumeFractionPastKnee = volumeFractionPastKnee;
        this.irreversibleLoss = irreversibleLoss;
        this.lossLimit = lossLimit;
        this.transverse = transverse;
        this.worstElements = List.copyOf(worstElements);
        this.cases = List.copyOf(cases);
        this.loss = states.loss;
        this.remanence = states.remanence;
        this.recoilPermeability = states.recoilPermeability;
        this.margin = states.margin;
        this.pastKnee = states.pastKnee;
    }

    /** Number of elements. */
    public int elements() {
        return loss.length;
    }

    /** Total volume, m³. */
    public double volume() {
        return volume;
    }

    /** Share of the volume whose field passed the knee in at least one case. */
    public double volumeFractionPastKnee() {
        return volumeFractionPastKnee;
    }

    /** Irreversible loss of the magnet's moment, Σ V·loss / Σ V (the same share at T0, where every element has one Br). */
    public double irreversibleLoss() {
        return irreversibleLoss;
    }

    /** The loss limit of the verdict, a fraction. */
    public double lossLimit() {
        return lossLimit;
    }

    /** Whether the loss stays within the limit. */
    public boolean withinLimit() {
        return irreversibleLoss <= lossLimit;
    }

    /** How a field across the magnetization counted. */
    public TransverseRule transverse() {
        return transverse;
    }

    /** The worst elements, worst first: largest loss, then smallest margin to the knee. */
    public List<WorstElement> worstElements() {
        return worstElements;
    }

    /** The load cases in order. */
    public List<LoadCaseResult> cases() {
        return cases;
    }

    /** Whether any curve used rests on data beyond the measured temperatures. */
    public boolean extrapolated() {
        return cases.stream().anyMatch(LoadCaseResult::extrapolated);
    }

    /** Irreversible loss of element {@code i} after every case, a fraction of Br. */
    public double loss(int i) {
        return loss[i];
    }

    /** Remanence of element {@code i} after every case, T: (1 − loss)·Br at its temperature in the last case. */
    public double remanence(int i) {
        return remanence[i];
    }

    /**
     * Margin to the knee of element {@code i} at the point that set its recoil line (as for the worst elements), A/m:
     * H − H_knee of the field the rule makes act, negative past the knee; NaN where the curve has no knee.
     */
    public double margin(int i) {
        return margin[i];
    }

    /** Whether element {@code i} passed the knee in some load case. */
    public boolean pastKnee(int i) {
        return pastKnee[i];
    }

    /** Relative recoil permeability of element {@code i} at its temperature in the last case. */
    public double recoilPermeability(int i) {
        return recoilPermeability[i];
    }
}
