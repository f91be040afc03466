/**
 * A grade's intrinsic curve at any temperature, built from its measured curves rather than from a fit
 * of them. At a measured temperature it is that curve's monotone interpolant; between two measured
 * temperatures it blends the neighbours in reduced coordinates, J/Br(T) against H/HcJ(T), with Br(T)
 * and HcJ(T) linear between the neighbours' own values, so it is exact at each measured temperature,
 * monotone in H and continuous in T; beyond the measured temperatures it scales the nearest curve by
 * the fitted temperature model's Br(T) and HcJ(T) and says it extrapolated. Where a reduced field lies
 * below the lowest H a curve was measured to, the curve's fitted knee model continues it (offset to
 * meet the data there) and the result says so. Every value is SI (kelvin, A/m, tesla).
 */
package org.kneepoint.fitter.temperature;
