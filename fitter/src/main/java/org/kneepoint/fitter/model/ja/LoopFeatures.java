package org.kneepoint.fitter.model.ja;

import java.util.List;

/**
 * What the starting values are computed from, read off the measured points: the upper tip, the
 * coercivity and remanence on a falling branch, and differential susceptibilities there
 * (slopes of local least-squares lines). A feature the data do not show is NaN; for a curve
 * measured after a higher prior field, the tip and its slopes are not in the data.
 *
 * @param tipField          highest H, A/m (the magnetizing field for a second-quadrant curve)
 * @param tipMagnetization  M at the tip, A/m, or NaN
 * @param tipSlope          dM/dH rising into the tip, or NaN
 * @param reversalSlope     dM/dH just after the tip, falling, or NaN
 * @param coercivity        Hc as a positive number, A/m, or NaN
 * @param coercivitySlope   dM/dH at −Hc, or NaN
 * @param remanence         M at H = 0 on a falling branch, A/m, or NaN
 * @param remanenceSlope    dM/dH there, or NaN
 * @param largestMagnetization largest measured M, A/m
 */
record LoopFeatures(double tipField, double tipMagnetization, double tipSlope, double reversalSlope,
        double coercivity, double coercivitySlope, double remanence, double remanenceSlope,
        double largestMagnetization) {

    static LoopFeatures of(MeasuredLoop loop) {
        double[] h = loop.field();
        double[] m = loop.magnetization();
        List<BranchRun> runs = BranchRun.split(h);
        int tip = 0;
        double largest = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < h.length; i++) {
            tip = h[i] > h[tip] ? i : tip;
            largest = Math.max(largest, m[i]);
        }
        double tipField = h[tip];
        double tipMagnetization = m[tip];
        double tipSlope = Double.NaN;
        double reversalSlope = Double.NaN;
        boolean tipMeasured = true;
        for (double prior : loop.priorField()) {
            if (prior > tipField) {
                tipField = prior;
                tipMagnetization = Double.NaN;
                tipMeasured = false;
            }
        }
        double coercivity = Double.NaN;
        double coercivitySlope = Double.NaN;
        double remanence = Double.NaN;
        double remanenceSlope = Double.NaN;
        for (BranchRun run : runs) {
            int window = Math.max(2, run.length() / 40);
            if (tipMeasured && run.direction() > 0 && run.last() == tip) {
                tipSlope = slope(h, m, run.last() - window, run.last());
            }
            if (tipMeasured && run.direction() < 0 && run.first() == tip) {
                reversalSlope = slope(h, m, run.first(), run.first() + window);
            }
            if (run.direction() < 0 && Double.isNaN(coercivity)) {
                for (int i = run.first(); i < run.last(); i++) {
                    if (Double.isNaN(remanence) && h[i] >= 0 && h[i + 1] <= 0) {
                        remanence = interpolate(h[i], m[i], h[i + 1], m[i + 1], 0);
                        remanenceSlope = slope(h, m, Math.max(run.first(), i - window), Math.min(run.last(), i + window));
                    }
                    if (m[i] > 0 && m[i + 1] <= 0) {
                        coercivity = -interpolate(m[i], h[i], m[i + 1], h[i + 1], 0);
                        coercivitySlope = slope(h, m, Math.max(run.first(), i - window), Math.min(run.last(), i + window));
                        break;
                    }
                }
            }
        }
        return new LoopFeatures(tipField, tipMagnetization, tipSlope, reversalSlope, coercivity, coercivitySlope,
                remanence, remanenceSlope, largest);
    }

    private static double interpolate(double x0, double y0, double x1, double y1, double x) {
        return x1 == x0 ? y0 : y0 + (y1 - y0) * (x - x0) / (x1 - x0);
    }

    /** Least-squares slope of m against h over indices from..to inclusive. */
    private static double slope(double[] h, double[] m, int from, int to) {
        int lo = Math.max(0, from);
        int hi = Math.min(h.length - 1, to);
        double n = hi - lo + 1;
        double sh = 0;
        double sm = 0;
        for (int i = lo; i <= hi; i++) {
            sh += h[i];
            sm += m[i];
        }
        double hMean = sh / n;
        double mMean = sm / n;
        double shh = 0;
        double shm = 0;
        for (int i = lo; i <= hi; i++) {
            shh += (h[i] - hMean) * (h[i] - hMean);
            shm += (h[i] - hMean) * (m[i] - mMean);
        }
        return shh > 0 ? shm / shh : Double.NaN;
    }
}
