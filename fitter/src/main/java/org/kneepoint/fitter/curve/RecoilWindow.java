package org.kneepoint.fitter.curve;

/**
 * The H range whose points gave the recoil permeability: a straight line J = Br + μ0·(μrec − 1)·H
 * fitted by least squares to the measured points with H in [{@code from}, {@code to}].
 *
 * @param from   lower end, A/m (negative)
 * @param to     upper end, A/m (0)
 * @param points measured points used; 0 when the window held too few and the interpolant was sampled
 */
public record RecoilWindow(double from, double to, int points) {

    public RecoilWindow {
        if (!(from < to) || points < 0) {
            throw new IllegalArgumentException("a recoil window needs from < to, got " + from + " .. " + to);
        }
    }
}
