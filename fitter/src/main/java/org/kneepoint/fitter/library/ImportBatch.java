package org.kneepoint.fitter.library;

import java.util.List;

/** What one imported file brings: its import record, the grades it names, its curves and susceptibility points. */
public record ImportBatch(ImportInfo info, List<GradeInfo> grades, List<LibraryCurve> curves, List<SusceptibilityPoint> susceptibility) {

    public ImportBatch {
        grades = List.copyOf(grades);
        curves = List.copyOf(curves);
        susceptibility = List.copyOf(susceptibility);
    }
}
