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
 * @param price      price per kilogram in the team's one currency, or null when not known
 */
public record GradeInfo(String name, String family, String supplier, Double density, String notes, String provenance,
        Double price) {

    /** A grade without a price (as every import makes it; a price is set by an edit). */
    public GradeInfo(String name, String family, String supplier, Double density, String notes, String provenance) {
        this(name, family, supplier, density, notes, provenance, null);
    }

    public GradeInfo {
        LibraryText.requireName("grade name", name);
        LibraryText.requireName("family", family);
        LibraryText.requireDensity(density);
        LibraryText.requirePrice(price);
    }
}
