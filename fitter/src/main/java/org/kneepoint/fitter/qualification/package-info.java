/**
 * Qualification of delivered lots against a grade: specifications per temperature (lower limits
 * and typical values of Br, HcJ, (BH)max, Hk, Hk/HcJ and HcB), the check of a lot's measured
 * curves against them with an optional guard band for measurement uncertainty, the deviation of a
 * lot's J(H) from the grade's reference curve, and the process capability across lots. Every value
 * is SI (docs/design.md §4); quantities come from {@link org.kneepoint.fitter.curve.CurveCharacterizer}.
 */
package org.kneepoint.fitter.qualification;
