/**
 * Complete elliptic integrals in the parameter convention m = k²: K(m), E(m), Π(n, m) and
 * Bulirsch's generalized complete integral cel(kc, p, c, s) (R. Bulirsch, Numer. Math. 13,
 * 305–315, 1969), evaluated by Bulirsch's quadratically convergent Landen-type iteration.
 * Definitions follow NIST DLMF §19.2.
 */
package org.kneepoint.fitter.special;
