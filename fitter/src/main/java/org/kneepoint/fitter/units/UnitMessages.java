package org.kneepoint.fitter.units;

/** The wording of unit errors, kept in one place so every edge of the program says the same. */
final class UnitMessages {

    private UnitMessages() {
    }

    /** "expected a field strength such as 955 kA/m or 12 kOe, got 'T' (a flux density unit)". */
    static String unknownUnit(String unitText, Dimension expected) {
        if (isSusceptibility(expected) && isMomentPerAmount(unitText)) {
            return momentPerAmount(unitText);
        }
        String known = UnitCatalog.dimensionOf(unitText)
                .map(other -> " (a " + other.description() + " unit)")
                .orElse(unitText.isEmpty() ? " (no unit)" : " (not a unit Kneepoint knows)");
        return "expected " + expected.expectation() + ", got '" + unitText + "'" + known;
    }

    /** Whether the text is emu/g or emu/mol: a moment per gram or mole, which people mistake for a susceptibility. */
    static boolean isMomentPerAmount(String unitText) {
        return unitText.equals("emu/g") || unitText.equals("emu/mol");
    }

    /** Why emu/g or emu/mol is not a susceptibility, and which units are. */
    static String momentPerAmount(String unitText) {
        return "'" + unitText + "' is a magnetic moment per " + (unitText.endsWith("g") ? "gram" : "mole")
                + ", not a susceptibility; write a mass susceptibility in cm³/g (= emu/(g·Oe)), a molar one in"
                + " cm³/mol (= emu/(mol·Oe)), or a volume one in SI or emu/cm³";
    }

    static boolean isSusceptibility(Dimension dimension) {
        return dimension == Dimension.VOLUME_SUSCEPTIBILITY || dimension == Dimension.MASS_SUSCEPTIBILITY
                || dimension == Dimension.MOLAR_SUSCEPTIBILITY;
    }

    static String wrongQuantity(String text, Dimension expected, String detail) {
        return "expected " + expected.expectation() + ", got '" + text + "'" + detail;
    }
}
