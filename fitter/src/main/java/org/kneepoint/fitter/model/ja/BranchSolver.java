package org.kneepoint.fitter.model.ja;

/**
 * Integrates the Jiles–Atherton equation along one monotone branch of H, from (hStart, mStart)
 * to hEnd, with δ = sign(hEnd − hStart) fixed. Reversals of H happen only between branches, so
 * every reversal restarts the integration (docs/design.md §4).
 */
public interface BranchSolver {

    /** M at {@code hEnd}, A/m; returns {@code mStart} when hEnd = hStart. */
    double advance(double hStart, double mStart, double hEnd);
}
