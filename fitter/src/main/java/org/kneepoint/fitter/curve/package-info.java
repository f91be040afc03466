/**
 * Demagnetization curves and their characterization. A curve holds H (A/m) and B or J (T) at one
 * temperature, with B = μ0·H + J; the magnet is magnetized along +H and works in the second
 * quadrant (H ≤ 0, B ≥ 0). Characterization reports Br, HcB, HcJ, (BH)max, the knee field Hk
 * (J = 0.9·Br), squareness Hk/HcJ and the recoil permeability near H = 0; a quantity the data do
 * not reach is absent, never extrapolated.
 */
package org.kneepoint.fitter.curve;
