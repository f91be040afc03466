package org.kneepoint.fitter.library;

/**
 * A magnet grade as the library keeps it.
 *
 * @param name       unique name, as the user writes it (any characters)
 * @param family     material family, e.g. "sintered NdFeB"
 * @param supplier   supplier text, or null
 * @param density    kg/m³, or null
 * @param notes      free text, or null
 * @param provenance where the grade came from (file, checksum, source text), or null
 */
public record GradeInfo(String name, String family, String supplier, Double density, String notes, String provenance) {

    public GradeInfo {
        LibraryText.requireName("grade name", name);
        LibraryText.requireName("family", family, LibraryText.MAX_FAMILY);
        if (density != null && !(density > 0 && Double.isFinite(density))) {
            throw new IllegalArgumentException("density must be positive and finite, got " + density);
        }
    }
}
