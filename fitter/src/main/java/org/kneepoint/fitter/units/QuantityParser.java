package org.kneepoint.fitter.units;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Parses text such as "1.2T", "1.2 T", "1.2 tesla", "−955 kA/m" or "20 °C" into an SI value of
 * the expected {@link Dimension}. A missing unit, an unknown unit or a unit of another dimension
 * is refused with a message that says what was expected.
 */
public final class QuantityParser {

    private static final Pattern NUMBER_THEN_UNIT =
            Pattern.compile("([+\\-\u2212]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*)");

    private QuantityParser() {
    }

    /** Parses a quantity with its unit to SI; throws {@link IllegalArgumentException} with the reason. */
    public static double parse(String text, Dimension expected) {
        if (text == null || text.isBlank()) {
            throw new IllegalArgumentException(UnitMessages.wrongQuantity("", expected, " (empty)"));
        }
        String stripped = text.strip();
        Matcher matcher = NUMBER_THEN_UNIT.matcher(stripped);
        if (!matcher.matches()) {
            throw new IllegalArgumentException(UnitMessages.wrongQuantity(stripped, expected, " (no number)"));
        }
        double number = DecimalNumber.parseOrNaN(matcher.group(1), false);
        String unitText = matcher.group(2).strip();
        Unit unit = UnitCatalog.find(unitText, expected).orElseThrow(() -> new IllegalArgumentException(
                UnitMessages.isSusceptibility(expected) && UnitMessages.isMomentPerAmount(unitText)
                        ? UnitMessages.momentPerAmount(unitText)
                        : UnitMessages.wrongQuantity(stripped, expected, detail(unitText))));
        double si = unit.toSi(number);
        if (!Double.isFinite(si)) {
            throw new IllegalArgumentException(UnitMessages.wrongQuantity(stripped, expected, " (out of range)"));
        }
        return si;
    }

    private static String detail(String unitText) {
        if (unitText.isEmpty()) {
            return " (no unit)";
        }
        return UnitCatalog.dimensionOf(unitText)
                .map(other -> " ('" + unitText + "' is a " + other.description() + " unit)")
                .orElse(" ('" + unitText + "' is not a unit Kneepoint knows)");
    }
}
