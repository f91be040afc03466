package org.kneepoint.importer.csv;

import java.util.List;
import org.kneepoint.fitter.units.SusceptibilityForm;

/**
 * A susceptibility table after reading: the material, its density and molar mass when given
 * (SI), and the (T, χ) points in SI of the table's form.
 */
public record SusceptibilityTable(String source, String material, Double density, Double molarMass, String sourceText,
        String notes, SusceptibilityForm form, List<double[]> points) implements FileContent {

    /** Metadata keys of a susceptibility table. */
    public static final List<String> KEYS = List.of("material", "density", "molar-mass", "source", "notes");

    public SusceptibilityTable {
        points = points.stream().map(double[]::clone).toList();
    }
}
