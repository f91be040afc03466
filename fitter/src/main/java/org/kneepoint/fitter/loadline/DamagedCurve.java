package org.kneepoint.fitter.loadline;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.Arrays;
import java.util.Comparator;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;

/**
 * The demagnetization curve of a magnet that has lost the fraction ℓ of its remanence for good (docs/design.md §4):
 * from H = 0 it works on its recoil line J = (1 − ℓ)·Br(T) + μ0·(μrec − 1)·H, and once that line meets the virgin
 * curve (the worst point reached, carried to T) on the virgin curve again, so J' = min(J, recoil line). The point
 * where they meet is added to the points, so a solver's interpolation sees the corner. The recoil construction is
 * the one of {@link IrreversibleLoss} (P. Campbell, "Permanent Magnet Materials and their Application", Cambridge
 * University Press 1994, from memory); the lost fraction is carried reversibly with Br(T), as {@link DutySequence}
 * carries it.
 */
public final class DamagedCurve {

    private DamagedCurve() {
    }

    /**
     * The damaged form of {@code curve} (normal or intrinsic, any point order; the result is ordered by descending H and
     * holds the same quantity) after the loss {@code loss} (0 to 1), with Br and μrec of the grade at the curve's
     * temperature; with no loss the curve itself.
     */
    public static DemagnetizationCurve of(DemagnetizationCurve curve, double loss, double remanence, double recoilPermeability) {
        if (curve.kind() == CurveKind.LOOP) {
            throw new BadInputException("a damaged magnet's curve is drawn on a demagnetization curve, not on a loop");
        }
        if (!(loss >= 0.0 && loss <= 1.0) || !(remanence > 0.0) || !(recoilPermeability >= 1.0)) {
            throw new IllegalArgumentException("loss must lie in [0, 1], Br above 0 and μrec at least 1; got " + loss + ", "
                    + remanence + ", " + recoilPermeability);
        }
        if (loss == 0.0) {
            return curve;
        }
        double[] h = curve.h();
        double[] j = curve.j();
        Integer[] order = new Integer[h.length];
        Arrays.setAll(order, i -> i);
        Arrays.sort(order, Comparator.comparingDouble((Integer i) -> h[i]).reversed());
        double recoilRemanence = (1.0 - loss) * remanence;
        double slope = MU0 * (recoilPermeability - 1.0);
        double[] outH = new double[2 * h.length];
        double[] outJ = new double[2 * h.length];
        int size = 0;
        for (int k = 0; k < order.length; k++) {
            int i = order[k];
            double gap = j[i] - (recoilRemanence + slope * h[i]);
            if (k > 0) {
                int previous = order[k - 1];
                double previousGap = j[previous] - (recoilRemanence + slope * h[previous]);
                if (previousGap > 0.0 && gap < 0.0 || previousGap < 0.0 && gap > 0.0) {
                    double share = previousGap / (previousGap - gap);
                    double crossing = h[previous] + share * (h[i] - h[previous]);
                    outH[size] = crossing;
                    outJ[size++] = recoilRemanence + slope * crossing;
                }
            }
            outH[size] = h[i];
            outJ[size++] = Math.min(j[i], recoilRemanence + slope * h[i]);
        }
        double[] damagedH = Arrays.copyOf(outH, size);
        double[] values = Arrays.copyOf(outJ, size);
        if (curve.kind() == CurveKind.NORMAL) {
            for (int i = 0; i < size; i++) {
                values[i] += MU0 * damagedH[i];
            }
        }
        return new DemagnetizationCurve(curve.kind(), curve.quantity(), damagedH, values, curve.temperatureK());
    }
}
