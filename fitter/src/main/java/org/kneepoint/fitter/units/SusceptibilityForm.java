package org.kneepoint.fitter.units;

/**
 * The three ways susceptibility is tabulated: per volume (dimensionless), per mass (m³/kg) and
 * per mole (m³/mol). Each maps to its {@link Dimension}, so a table's header unit tells its form.
 */
public enum SusceptibilityForm {
    VOLUME(Dimension.VOLUME_SUSCEPTIBILITY),
    MASS(Dimension.MASS_SUSCEPTIBILITY),
    MOLAR(Dimension.MOLAR_SUSCEPTIBILITY);

    private final Dimension dimension;

    SusceptibilityForm(Dimension dimension) {
        this.dimension = dimension;
    }

    public Dimension dimension() {
        return dimension;
    }
}
