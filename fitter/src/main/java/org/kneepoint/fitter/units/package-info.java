/**
 * Units and quantities at the edges of the program. Every {@code double} inside Kneepoint is SI:
 * tesla, A/m, J/m³, metre, kelvin, dimensionless SI volume susceptibility. Text with units is
 * parsed to SI here and formatted back here; conversion factors follow NIST SP 811 (2008),
 * Appendix B, and μ0 is {@link org.kneepoint.fitter.units.MagneticConstant#MU0}.
 */
package org.kneepoint.fitter.units;
