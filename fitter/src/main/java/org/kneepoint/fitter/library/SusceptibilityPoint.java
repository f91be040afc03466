package org.kneepoint.fitter.library;

import org.kneepoint.fitter.units.SusceptibilityForm;

/**
 * One measured susceptibility of a weakly magnetic material, SI in the given form.
 *
 * @param material     material name
 * @param temperatureK K
 * @param chi          SI susceptibility (dimensionless, m³/kg or m³/mol by form)
 * @param form         volume, mass or molar
 * @param density      kg/m³, or null
 * @param molarMass    kg/mol, or null
 * @param source       where it came from, or null
 * @param importSha256 checksum of the import that brought it, or null
 */
public record SusceptibilityPoint(String material, double temperatureK, double chi, SusceptibilityForm form,
        Double density, Double molarMass, String source, String importSha256) {

    public SusceptibilityPoint {
        LibraryText.requireName("material", material);
        if (!(temperatureK > 0 && Double.isFinite(temperatureK)) || !Double.isFinite(chi) || form == null) {
            throw new IllegalArgumentException("a susceptibility point needs T > 0 K, a finite χ and a form");
        }
    }
}
