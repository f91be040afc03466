/**
 * The knee model fitted to measured curves, and the temperature model built from such fits. The
 * model is {@link org.kneepoint.fitter.model.knee.KneeCurve}: J(H) = (Br + μ0(μline − 1)·H)·f(−H/HcJ),
 * a recoil line times the share of it left, with f(1) = 0 so that J reaches 0 exactly at −HcJ. The
 * share f has two forms: a switching-field distribution ({@link org.kneepoint.fitter.model.knee.SwitchingShape},
 * square sintered and round ferrite or bonded curves) and a rational bow
 * ({@link org.kneepoint.fitter.model.knee.RationalShape}, cast AlNiCo). Fits are Levenberg–Marquardt
 * least squares with the analytic Jacobian, bounded, started from the curve's characterization; the
 * fit reports its RMS beside the scatter of the points ({@link org.kneepoint.fitter.model.knee.PointScatter}).
 * Numerics from Hipparchus (root finding, polynomial fits). Every value is SI.
 */
package org.kneepoint.fitter.model.knee;
