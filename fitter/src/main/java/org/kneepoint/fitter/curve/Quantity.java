package org.kneepoint.fitter.curve;

/**
 * What a curve's values are: the flux density B of the normal curve or the polarization J = μ0·M
 * of the intrinsic curve, both in tesla.
 */
public enum Quantity {
    B,
    J
}
