package org.kneepoint.importer.csv;

import java.util.List;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.limits.PhysicalLimits;
import org.kneepoint.fitter.units.SusceptibilityForm;

/**
 * Refuses a susceptibility table whose χ is implausible: beyond −1 … 1e6 as a volume
 * susceptibility ({@link PhysicalLimits#plausibleSusceptibility}), or 0 at every point.
 */
final class SusceptibilityPlausibility {

    private SusceptibilityPlausibility() {
    }

    static void check(String source, int chiColumn, String chiName, SusceptibilityForm form, Double density, Double molarMass,
            List<double[]> points, List<Integer> lines) {
        boolean allZero = true;
        for (int i = 0; i < points.size(); i++) {
            double chi = points.get(i)[1];
            if (!PhysicalLimits.plausibleSusceptibility(chi, form, density, molarMass)) {
                throw new BadInputException(InputLocation.cell(source, lines.get(i), chiColumn + 1, chiName), String.format(
                        "χ = %.6g (SI, %s) is outside what is plausible: as a volume susceptibility it must lie between −1"
                                + " (perfect diamagnetism) and 1e6", chi, form.name().toLowerCase(java.util.Locale.ROOT)));
            }
            allZero &= chi == 0;
        }
        if (allZero) {
            throw new BadInputException(InputLocation.of(source), "χ is 0 at every point (all-zero data)");
        }
    }
}
