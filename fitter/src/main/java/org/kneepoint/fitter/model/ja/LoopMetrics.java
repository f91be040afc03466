package org.kneepoint.fitter.model.ja;

/**
 * Figures of the loop 0 → +Hmax → −Hmax → +Hmax started demagnetized, read on the descending
 * branch (coercivities positive, docs/design.md §4).
 *
 * @param hMax         turning field Hmax, A/m
 * @param hc           H at M = 0, as a positive number, A/m (0 when M ≤ 0 already at H = 0)
 * @param mr           M at H = 0, A/m
 * @param br           B at H = 0, tesla
 * @param hcj          H at J = 0, A/m; equal to hc since J = μ0·M
 * @param hcb          H at B = 0, as a positive number, A/m
 * @param mMax         M at the tip +Hmax where the descending branch starts, A/m
 * @param bMax         B at that tip, tesla
 * @param lossPerCycle ∮H dB over the last cycle +Hmax → −Hmax → +Hmax, closed at +Hmax, J/m³
 */
public record LoopMetrics(double hMax, double hc, double mr, double br, double hcj, double hcb,
        double mMax, double bMax, double lossPerCycle) {
}
