package org.kneepoint.fitter.model.ja;

/**
 * The unconstrained coordinates the optimizers work in: q = (ln Ms, ln a, ln k, logit c, logit u)
 * with u = α·Ms/(3a). Every q maps to a valid parameter set: 0 &lt; c &lt; 1 and
 * 0 &lt; α·Ms &lt; 3a (the stability bound of {@link JilesAthertonParameters}) hold by construction,
 * and the logarithms make steps relative, which suits parameters spanning decades.
 */
final class FitParameterization {

    /** Values of c and u are kept this far inside (0, 1) when mapped to q. */
    private static final double MARGIN = 1e-6;
    private static final double LOG_LOWEST = Math.log(1e-9);
    private static final double LOG_HIGHEST = Math.log(1e12);
    private static final double LOGIT_LIMIT = 27;

    private FitParameterization() {
    }

    static JilesAthertonParameters toParameters(double[] q) {
        double ms = Math.exp(bounded(q[0]));
        double a = Math.exp(bounded(q[1]));
        double u = logistic(q[4]);
        return new JilesAthertonParameters(ms, a, Math.exp(bounded(q[2])), logistic(q[3]), u * 3 * a / ms);
    }

    /** Keeps a logarithm of Ms, a or k within 1e-9 to 1e12 A/m, so a wild optimizer step stays finite. */
    private static double bounded(double logarithm) {
        return Math.min(Math.max(logarithm, LOG_LOWEST), LOG_HIGHEST);
    }

    static double[] toCoordinates(JilesAthertonParameters p) {
        double u = p.alpha() * p.ms() / (3 * p.a());
        return new double[] {Math.log(p.ms()), Math.log(p.a()), Math.log(p.k()), logit(p.c()), logit(u)};
    }

    /** ∂p/∂q at q, rows in the order Ms, a, k, c, α; for carrying covariances to the parameters. */
    static double[][] parameterDerivatives(double[] q) {
        JilesAthertonParameters p = toParameters(q);
        double u = logistic(q[4]);
        double c = p.c();
        double[][] g = new double[5][5];
        g[0][0] = p.ms();
        g[1][1] = p.a();
        g[2][2] = p.k();
        g[3][3] = c * (1 - c);
        g[4][0] = -p.alpha();
        g[4][1] = p.alpha();
        g[4][4] = 3 * p.a() / p.ms() * u * (1 - u);
        return g;
    }

    /** The logistic function with its argument held within ±{@value #LOGIT_LIMIT}, so c and u stay inside (0, 1). */
    private static double logistic(double x) {
        double held = Math.min(Math.max(x, -LOGIT_LIMIT), LOGIT_LIMIT);
        return 1 / (1 + Math.exp(-held));
    }

    private static double logit(double value) {
        double v = Math.min(Math.max(value, MARGIN), 1 - MARGIN);
        return Math.log(v / (1 - v));
    }
}
