package org.kneepoint.fitter.model.ja;

/**
 * One step of the Dormand–Prince 5(4) pair (Dormand, Prince, J. Comput. Appl. Math. 6, 19–26,
 * 1980, Table 2): the fifth-order solution, the embedded error estimate and the end slope, which
 * is the first stage of the next step (first same as last).
 *
 * @param magnetization fifth-order M at the step end, A/m
 * @param errorEstimate fifth- minus fourth-order M, A/m
 * @param endSlope      dM/dH at the step end
 */
record DormandPrinceStep(double magnetization, double errorEstimate, double endSlope) {

    static DormandPrinceStep take(JilesAthertonModel model, double h, double m, double k1, double dh, double d) {
        double k2 = model.susceptibility(h + dh / 5, m + dh * (k1 / 5), d);
        double k3 = model.susceptibility(h + dh * 3 / 10, m + dh * (3 * k1 / 40 + 9 * k2 / 40), d);
        double k4 = model.susceptibility(h + dh * 4 / 5,
                m + dh * (44 * k1 / 45 - 56 * k2 / 15 + 32 * k3 / 9), d);
        double k5 = model.susceptibility(h + dh * 8 / 9,
                m + dh * (19372 * k1 / 6561 - 25360 * k2 / 2187 + 64448 * k3 / 6561 - 212 * k4 / 729), d);
        double k6 = model.susceptibility(h + dh,
                m + dh * (9017 * k1 / 3168 - 355 * k2 / 33 + 46732 * k3 / 5247 + 49 * k4 / 176 - 5103 * k5 / 18656), d);
        double next = m + dh * (35 * k1 / 384 + 500 * k3 / 1113 + 125 * k4 / 192 - 2187 * k5 / 6784 + 11 * k6 / 84);
        double k7 = model.susceptibility(h + dh, next, d);
        double error = dh * (71 * k1 / 57600 - 71 * k3 / 16695 + 71 * k4 / 1920 - 17253 * k5 / 339200
                + 22 * k6 / 525 - k7 / 40);
        return new DormandPrinceStep(next, error, k7);
    }
}
