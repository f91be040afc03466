/**
 * Curie–Weiss susceptibility χ(T) = C/(T − θ) + χ0 (the "generalised Curie law", D. S. Kothari,
 * Math. Proc. Camb. Phil. Soc. 28(3), 338–340, 1932; docs/design.md §4), fitted to (T, χ) points, and the
 * classification diamagnetic / paramagnetic. Every value is SI: T and θ in kelvin, χ and χ0
 * dimensionless SI volume susceptibility, C in kelvin.
 */
package org.kneepoint.fitter.model.curieweiss;
