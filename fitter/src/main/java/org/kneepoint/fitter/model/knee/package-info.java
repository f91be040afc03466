/**
 * The knee model fitted to measured curves, and the temperature model built from such fits. The
 * model is {@link org.kneepoint.fitter.loadline.LinearRecoilKnee}: J(H) = Br + μ0(μrec − 1)·H −
 * D·exp(−(H + HcJ)/w), D = Br − μ0(μrec − 1)·HcJ — a recoil line with an exponential knee that
 * reaches J = 0 exactly at −HcJ. Fits are Levenberg–Marquardt least squares (Commons Math) with the
 * analytic Jacobian, bounded, started from the curve's characterization.
 */
package org.kneepoint.fitter.model.knee;
