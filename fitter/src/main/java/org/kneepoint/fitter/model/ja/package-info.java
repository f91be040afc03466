/**
 * Jiles–Atherton hysteresis (D. C. Jiles, D. L. Atherton, J. Magn. Magn. Mater. 61, 48–60, 1986)
 * in the exact form of docs/design.md §4, with H as input: He = H + α·M, Man = Ms·L(He/a),
 * dM/dH = X/(1 − α·X), X = (Man − M)/(δ·k) + c·dMan/dHe. Simulation (adaptive and fixed-step),
 * loop metrics, and identification of Ms, a, k, c, α from measured loops. Every value is SI:
 * A/m for H, M, Ms, a, k; tesla for B; J/m³ for loss per cycle; c and α are dimensionless.
 */
package org.kneepoint.fitter.model.ja;
