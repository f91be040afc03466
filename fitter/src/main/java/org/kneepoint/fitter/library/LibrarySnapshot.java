package org.kneepoint.fitter.library;

import java.util.List;

/**
 * Everything the library holds, in a fixed order (imports by time then checksum, grades by name,
 * curves by grade, temperature and kind, susceptibility by material and temperature, fits by
 * time): the content of a backup, and of one import batch.
 */
public record LibrarySnapshot(List<ImportInfo> imports, List<GradeInfo> grades, List<LibraryCurve> curves,
        List<SusceptibilityPoint> susceptibility, List<FitRecord> fits) {

    public LibrarySnapshot {
        imports = List.copyOf(imports);
        grades = List.copyOf(grades);
        curves = List.copyOf(curves);
        susceptibility = List.copyOf(susceptibility);
        fits = List.copyOf(fits);
    }

    public int pointCount() {
        return curves.stream().mapToInt(curve -> curve.curve().size()).sum();
    }
}
