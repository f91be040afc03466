package org.kneepoint.fitter.library;

import java.util.List;

/**
 * Everything the library holds, in a fixed order (imports by time then checksum, grades by name,
 * curves by grade, temperature and kind, susceptibility by material and temperature, fits by
 * time, specifications by grade and temperature, lots by grade and name, lot curves by grade, lot,
 * sample, temperature and kind): the content of a backup, and of one import batch.
 */
public record LibrarySnapshot(List<ImportInfo> imports, List<GradeInfo> grades, List<LibraryCurve> curves,
        List<SusceptibilityPoint> susceptibility, List<FitRecord> fits, List<GradeSpecification> specifications,
        List<LotInfo> lots, List<LotCurve> lotCurves) {

    public LibrarySnapshot {
        imports = List.copyOf(imports);
        grades = List.copyOf(grades);
        curves = List.copyOf(curves);
        susceptibility = List.copyOf(susceptibility);
        fits = List.copyOf(fits);
        specifications = List.copyOf(specifications);
        lots = List.copyOf(lots);
        lotCurves = List.copyOf(lotCurves);
    }

    /** A library without specifications or lots (as every backup of format version 1 holds). */
    public LibrarySnapshot(List<ImportInfo> imports, List<GradeInfo> grades, List<LibraryCurve> curves,
            List<SusceptibilityPoint> susceptibility, List<FitRecord> fits) {
        this(imports, grades, curves, susceptibility, fits, List.of(), List.of(), List.of());
    }

    public int pointCount() {
        return curves.stream().mapToInt(curve -> curve.curve().size()).sum();
    }
}
