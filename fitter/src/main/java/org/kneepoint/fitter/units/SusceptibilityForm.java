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

    /**
     * The susceptibility unit written as {@code text}, of whichever form; refuses anything else —
     * emu/g and emu/mol above all, which are moments per gram or mole, not susceptibilities — with
     * a message naming the units that are right.
     */
    public static Unit unitOf(String text) {
        for (SusceptibilityForm form : values()) {
            var unit = UnitCatalog.find(text, form.dimension());
            if (unit.isPresent()) {
                return unit.get();
            }
        }
        if (UnitMessages.isMomentPerAmount(text)) {
            throw new IllegalArgumentException(UnitMessages.momentPerAmount(text));
        }
        throw new IllegalArgumentException("expected a susceptibility unit: SI or emu/cm³ (volume), m³/kg or cm³/g ="
                + " emu/(g·Oe) (mass), m³/mol or cm³/mol = emu/(mol·Oe) (molar), got '" + text + "'");
    }
}
