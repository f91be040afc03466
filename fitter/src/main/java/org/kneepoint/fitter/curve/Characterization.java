package org.kneepoint.fitter.curve;

/**
 * What a demagnetization curve says about its magnet, in SI. Coercivities and the knee field are
 * positive magnitudes (HcB = |H| at B = 0, HcJ = |H| at J = 0, Hk = |H| at J = 0.9·Br); the field
 * at the energy-product maximum is the signed H of that point (≤ 0). A value the data do not reach
 * is null: Kneepoint never extrapolates a curve to report it.
 *
 * @param br           remanence, T (B = J at H = 0)
 * @param hcb          normal coercivity, A/m, or null if B never reaches 0
 * @param hcj          intrinsic coercivity, A/m, or null if J never reaches 0
 * @param bhMax        (BH)max = max of −B·H in the second quadrant, J/m³, or null if the maximum is not inside the data
 * @param hAtBhMax     H at (BH)max, A/m (negative), or null
 * @param bAtBhMax     B at (BH)max, T, or null
 * @param hk           knee field, A/m, or null if J never falls to 0.9·Br
 * @param squareness   Hk/HcJ, or null unless both are reached
 * @param muRec        recoil permeability (relative), from the straight part near H = 0
 * @param recoilWindow the H range and points that gave {@code muRec}
 * @param temperatureK the curve's temperature, K, or null
 */
public record Characterization(
        double br,
        Double hcb,
        Double hcj,
        Double bhMax,
        Double hAtBhMax,
        Double bAtBhMax,
        Double hk,
        Double squareness,
        double muRec,
        RecoilWindow recoilWindow,
        Double temperatureK) {

    /** Share of Br that defines the knee field Hk (IEC 60404-8-1 practice; from memory). */
    public static final double KNEE_FRACTION = 0.9;
}
