package org.kneepoint.fitter.library;

/**
 * The details of a grade that people edit after import (its name, family, curves and provenance
 * stay as imported). An edit replaces all four; null clears one.
 *
 * @param supplier supplier text, or null
 * @param density  kg/m³, or null
 * @param notes    free text, or null
 * @param price    price per kilogram in the team's one currency, or null
 */
public record GradeDetails(String supplier, Double density, String notes, Double price) {

    public GradeDetails {
        LibraryText.requireDensity(density);
        LibraryText.requirePrice(price);
    }

    /** The details of a stored grade. */
    public static GradeDetails of(GradeInfo grade) {
        return new GradeDetails(grade.supplier(), grade.density(), grade.notes(), grade.price());
    }
}
