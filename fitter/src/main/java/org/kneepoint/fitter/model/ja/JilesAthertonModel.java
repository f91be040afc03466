package org.kneepoint.fitter.model.ja;

/**
 * The Jiles–Atherton differential susceptibility dM/dH in the binding form of docs/design.md §4
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

    /** Above this |He/a| the fused form's D² could overflow; the term-by-term form is used. */
    private static final double FUSED_LIMIT = 1e6;

    private final JilesAthertonParameters parameters;
    private final double ms;
    private final double inverseA;
    private final double inverseK;
    private final double c;
    private final double alpha;
    private final double reversibleScale;
    private final double alphaOverA;

    public JilesAthertonModel(JilesAthertonParameters parameters) {
        this.parameters = parameters;
        this.ms = parameters.ms();
        this.inverseA = 1 / parameters.a();
        this.inverseK = 1 / parameters.k();
        this.c = parameters.c();
        this.alpha = parameters.alpha();
        this.reversibleScale = c * ms * inverseA;
        this.alphaOverA = alpha * inverseA;
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
     *
     * <p>For 0.1 ≤ |x| ≤ 1e6, x = He/a, the whole expression is put over one denominator so that a
     * single exponential and a single division lie on the critical path of an RK4 chain: with
     * e = exp(−2|x|) and D = |x|·(1 − e), L = N/D with N = (1 + e)·|x| − (1 − e),
     * L' = S/D² with S = (1 − e)² − 4e·x², and dM/dH = T/(D² − α·T) with
     * T = D·max(0, δ·(Ms·N·sign x − m·D))/k + (c·Ms/a)·S. This is algebraically the docs/design.md §4 form.
     * The exponential is {@code NegativeExponential.of}, whose chain is shorter than that of Math.exp.
     * Multiply-adds ({@link Math#fma}, one rounding each) and a plain comparison for the floor of
     * the denominator keep the chain from x to dM/dH short; the direction is folded into the two
     * products of the drive, so it costs no step of its own.
     */
    public double susceptibility(double h, double m, double direction) {
        return susceptibilityAt(reducedField(h, m), m, direction);
    }

    /**
     * The same dM/dH from the reduced effective field x = He/a = (H + α·M)/a, which the caller
     * has already formed (an integrator can then build each stage's x by one multiply-add from
     * the previous stage's slope, see {@link #reducedFieldPerMagnetization()}).
     */
    double susceptibilityAt(double x, double m, double direction) {
        double ax = Math.abs(x);
        if (ax < LangevinFunction.SERIES_LIMIT || ax > FUSED_LIMIT) {
            return separate(x, m, direction);
        }
        double e = NegativeExponential.of(2 * ax);
        double oneMinus = 1 - e;
        double d = ax * oneMinus;
        double numerator = Math.copySign(Math.fma(1 + e, ax, -oneMinus), x);
        double drive = direction * ms * numerator - direction * m * d;
        double reversible = reversibleScale * (oneMinus * oneMinus - 4 * e * ax * ax);
        double total = drive > 0 ? Math.fma(d * inverseK, drive, reversible) : reversible;
        double dSquared = d * d;
        double denominator = Math.fma(-alpha, total, dSquared);
        double floor = MINIMUM_DENOMINATOR * dSquared;
        return total / (denominator > floor ? denominator : floor);
    }

    /** α/a: how much the reduced field x = (H + α·M)/a moves per A/m of M. */
    double reducedFieldPerMagnetization() {
        return alphaOverA;
    }

    /** The reduced effective field x = (H + α·M)/a. */
    double reducedField(double h, double m) {
        return Math.fma(m, alphaOverA, h * inverseA);
    }

    /** The same susceptibility term by term, for |x| near 0 (series) and very large |x|. */
    private double separate(double x, double m, double direction) {
        double langevin = LangevinFunction.value(x);
        double slope = LangevinFunction.derivative(x);
        double drive = direction * (ms * langevin - m);
        double irreversible = drive > 0 ? drive * inverseK : 0;
        double total = irreversible + c * ms * inverseA * slope;
        return total / Math.max(1 - alpha * total, MINIMUM_DENOMINATOR);
    }
}
