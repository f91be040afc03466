package org.kneepoint.fitter.model.ja;

/**
 * The Jiles–Atherton differential susceptibility dM/dH in the binding form of DESIGN §4
 * (after Jiles, Atherton, J. Magn. Magn. Mater. 61, 48–60, 1986):
 * He = H + α·M; Man = Ms·L(He/a); X = (Man − M)/(δ·k) + c·dMan/dHe, δ = sign(dH); the
 * irreversible term (Man − M)/(δ·k) is 0 when δ·(Man − M) &lt; 0 (R. Venkataraman, PhD thesis,
 * University of Maryland, 1999, Eq. 30); dM/dH = X/(1 − α·X).
 *
 * <p>Where the form predicts an avalanche (1 − α·X ≤ 0, an unstable jump of M) the denominator
 * is held at {@value #MINIMUM_DENOMINATOR}: M then moves steeply but at a finite rate toward the
 * anhysteretic, where the irreversible term switches off. This regularization is ours, not the
 * paper's; it keeps every history finite. Immutable and thread-safe.
 */
public final class JilesAthertonModel {

    /** Floor of 1 − α·X; see the class comment. */
    public static final double MINIMUM_DENOMINATOR = 1e-3;

    private final JilesAthertonParameters parameters;
    private final double ms;
    private final double inverseA;
    private final double inverseK;
    private final double c;
    private final double alpha;

    public JilesAthertonModel(JilesAthertonParameters parameters) {
        this.parameters = parameters;
        this.ms = parameters.ms();
        this.inverseA = 1 / parameters.a();
        this.inverseK = 1 / parameters.k();
        this.c = parameters.c();
        this.alpha = parameters.alpha();
    }

    public JilesAthertonParameters parameters() {
        return parameters;
    }

    /** The anhysteretic magnetization Man(He) = Ms·L(He/a), A/m. */
    public double anhysteretic(double effectiveField) {
        return ms * LangevinFunction.value(effectiveField * inverseA);
    }

    /** dMan/dHe = (Ms/a)·L'(He/a), dimensionless. */
    public double anhystereticSlope(double effectiveField) {
        return ms * inverseA * LangevinFunction.derivative(effectiveField * inverseA);
    }

    /**
     * dM/dH at field {@code h} and magnetization {@code m} while H moves in {@code direction}
     * (+1 rising, −1 falling). Finite for every finite input.
     */
    public double susceptibility(double h, double m, double direction) {
        double x = (h + alpha * m) * inverseA;
        double ax = Math.abs(x);
        double langevin;
        double slope;
        if (ax < LangevinFunction.SERIES_LIMIT) {
            langevin = LangevinFunction.value(x);
            slope = LangevinFunction.derivative(x);
        } else {
            double e = Math.exp(-2 * ax);
            double oneMinus = 1 - e;
            double shared = 1 / (ax * oneMinus);
            double inverseAx = oneMinus * shared;
            double inverseOneMinus = ax * shared;
            double magnitude = (1 + e) * inverseOneMinus - inverseAx;
            langevin = x < 0 ? -magnitude : magnitude;
            slope = inverseAx * inverseAx - 4 * e * inverseOneMinus * inverseOneMinus;
        }
        double gap = ms * langevin - m;
        double drive = direction * gap;
        double irreversible = drive > 0 ? drive * inverseK : 0;
        double total = irreversible + c * ms * inverseA * slope;
        double denominator = Math.max(1 - alpha * total, MINIMUM_DENOMINATOR);
        return total / denominator;
    }
}
