package org.kneepoint.fitter.units;

/** The wording of unit errors, kept in one place so every edge of the program says the same. */
final class UnitMessages {

    private UnitMessages() {
    }

    /** "expected a field strength such as 955 kA/m or 12 kOe, got 'T' (a flux density unit)". */
    static String unknownUnit(String unitText, Dimension expected) {
        String known = UnitCatalog.dimensionOf(unitText)
                .map(other -> " (a " + other.description() + " unit)")
                .orElse(unitText.isEmpty() ? " (no unit)" : " (not a unit Kneepoint knows)");
        return "expected " + expected.expectation() + ", got '" + unitText + "'" + known;
    }

    static String wrongQuantity(String text, Dimension expected, String detail) {
        return "expected " + expected.expectation() + ", got '" + text + "'" + detail;
    }
}
