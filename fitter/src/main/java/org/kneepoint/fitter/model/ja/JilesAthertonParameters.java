package org.kneepoint.fitter.model.ja;

import org.kneepoint.fitter.error.BadInputException;

/**
 * The five Jiles–Atherton parameters (Jiles, Atherton, J. Magn. Magn. Mater. 61, 48–60, 1986).
 *
 * <p>Validation: Ms, a, k &gt; 0; 0 ≤ c ≤ 1 (c = 1 is the reversible limit, no hysteresis);
 * α ≥ 0; and α·Ms &lt; 3a. The last keeps the anhysteretic stable: its susceptibility at the origin
 * is χan = Ms/(3a − α·Ms) (Jiles, Thoelke, Devine, IEEE Trans. Magn. 28, 27, 1992); at α·Ms = 3a it
 * diverges, and beyond it the mean-field equation M = Ms·L((H + α·M)/a) has a spontaneous
 * magnetization at H = 0, so the demagnetized start M = 0 is no longer an equilibrium.
 *
 * @param ms    saturation magnetization Ms, A/m
 * @param a     anhysteretic shape parameter, A/m
 * @param k     pinning parameter, A/m
 * @param c     reversibility, dimensionless
 * @param alpha interdomain coupling α, dimensionless
 */
public record JilesAthertonParameters(double ms, double a, double k, double c, double alpha) {

    public JilesAthertonParameters {
        requirePositive("Ms", ms);
        requirePositive("a", a);
        requirePositive("k", k);
        if (!(c >= 0 && c <= 1)) {
            throw new BadInputException("Jiles–Atherton c = " + c + " is out of range; expected 0 ≤ c ≤ 1");
        }
        if (!(alpha >= 0) || Double.isInfinite(alpha)) {
            throw new BadInputException("Jiles–Atherton α = " + alpha + " is out of range; expected a finite α ≥ 0");
        }
        if (!(alpha * ms < 3 * a)) {
            throw new BadInputException("Jiles–Atherton α·Ms = " + alpha * ms + " A/m must be below 3a = " + 3 * a
                    + " A/m, or the anhysteretic is unstable (spontaneous magnetization at H = 0)");
        }
    }

    private static void requirePositive(String name, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new BadInputException("Jiles–Atherton " + name + " = " + value
                    + " is out of range; expected a finite value > 0 A/m");
        }
    }

    /** Anhysteretic susceptibility at the origin, χan = Ms/(3a − α·Ms) (Jiles, Thoelke, Devine 1992). */
    public double anhystereticSusceptibilityAtOrigin() {
        return ms / (3 * a - alpha * ms);
    }

    /** The parameters as an array in the order Ms, a, k, c, α. */
    public double[] toArray() {
        return new double[] {ms, a, k, c, alpha};
    }

    /** Parameters from an array in the order Ms, a, k, c, α. */
    public static JilesAthertonParameters fromArray(double[] values) {
        if (values.length != 5) {
            throw new BadInputException("expected 5 Jiles–Atherton parameters (Ms, a, k, c, α), got " + values.length);
        }
        return new JilesAthertonParameters(values[0], values[1], values[2], values[3], values[4]);
    }
}
