package org.kneepoint.fitter.curve;

/**
 * The maximum of the energy product −B·H over the second quadrant of a branch, found at the best
 * node and refined by golden-section search on the interpolant over the neighbouring intervals.
 * When the curve stops before B = 0 and the maximum sits at its lowest point, the true maximum may
 * lie beyond the data, so none is reported.
 */
record EnergyProductMaximum(double h, double b, double bh) {

    private static final double GOLDEN = (Math.sqrt(5) - 1) / 2;

    static EnergyProductMaximum find(DemagnetizationBranch branch, Double hcb) {
        double low = hcb != null ? -hcb : branch.lowestH();
        int steps = Math.min(branch.size() * 2, 4096);
        double bestH = 0;
        double best = 0;
        for (int i = 0; i <= steps; i++) {
            double field = low * (1.0 - (double) i / steps);
            double product = -field * branch.b(field);
            if (product > best) {
                best = product;
                bestH = field;
            }
        }
        double step = -low / steps;
        double left = Math.max(low, bestH - step);
        double right = Math.min(0.0, bestH + step);
        for (int iteration = 0; iteration < 100 && right - left > 1e-12 * -low; iteration++) {
            double a = right - GOLDEN * (right - left);
            double c = left + GOLDEN * (right - left);
            if (-a * branch.b(a) >= -c * branch.b(c)) {
                right = c;
            } else {
                left = a;
            }
        }
        double field = 0.5 * (left + right);
        if (hcb == null && field - low < 1e-6 * -low) {
            return null;
        }
        double b = branch.b(field);
        return new EnergyProductMaximum(field, b, -field * b);
    }
}
