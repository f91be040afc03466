package org.kneepoint.fitter.units;

/**
 * Converts SI susceptibilities between the volume, mass and molar forms of one material:
 * χ_volume = χ_mass·ρ and χ_mass = χ_molar / M (the definitions of mass and molar
 * susceptibility; e.g. IEEE Trans. Magn. author guide, "Units for magnetic properties", Table I).
 *
 * @param density   ρ in kg/m³ (needed for mass and molar forms)
 * @param molarMass M in kg/mol (needed for the molar form), or NaN when not known
 */
public record SusceptibilityConverter(double density, double molarMass) {

    public SusceptibilityConverter {
        if (!(density > 0) || !Double.isFinite(density)) {
            throw new IllegalArgumentException("density must be a positive finite value in kg/m³, got " + density);
        }
        if (!Double.isNaN(molarMass) && !(molarMass > 0 && Double.isFinite(molarMass))) {
            throw new IllegalArgumentException("molar mass must be a positive finite value in kg/mol, got " + molarMass);
        }
    }

    /** SI volume susceptibility from an SI value of the given form. */
    public double toVolume(double chi, SusceptibilityForm form) {
        return switch (form) {
            case VOLUME -> chi;
            case MASS -> chi * density;
            case MOLAR -> chi / requireMolarMass() * density;
        };
    }

    /** SI value of the given form from an SI volume susceptibility. */
    public double fromVolume(double chiVolume, SusceptibilityForm form) {
        return switch (form) {
            case VOLUME -> chiVolume;
            case MASS -> chiVolume / density;
            case MOLAR -> chiVolume / density * requireMolarMass();
        };
    }

    private double requireMolarMass() {
        if (Double.isNaN(molarMass)) {
            throw new IllegalArgumentException("molar susceptibility needs the molar mass of the material");
        }
        return molarMass;
    }
}
