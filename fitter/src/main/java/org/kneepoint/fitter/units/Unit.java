package org.kneepoint.fitter.units;

import java.util.List;

/**
 * A unit of one {@link Dimension}: SI value = value · factor + offset (the offset is non-zero only
 * for °C and °F). The symbol is how the unit is written on output; aliases are the other
 * spellings accepted on input.
 *
 * @param symbol    canonical symbol, e.g. "kA/m"
 * @param dimension what it measures
 * @param factor    SI value of one unit (for affine units, of one degree)
 * @param offset    SI value of zero in this unit
 * @param aliases   other accepted spellings, matched exactly
 */
public record Unit(String symbol, Dimension dimension, double factor, double offset, List<String> aliases) {

    public Unit {
        if (symbol == null || symbol.isBlank() || dimension == null) {
            throw new IllegalArgumentException("a unit needs a symbol and a dimension");
        }
        if (!(factor > 0) || !Double.isFinite(factor) || !Double.isFinite(offset)) {
            throw new IllegalArgumentException("unit " + symbol + " needs a positive finite factor");
        }
        aliases = List.copyOf(aliases);
    }

    /** A unit that is a plain multiple of the SI unit. */
    public static Unit of(String symbol, Dimension dimension, double factor, String... aliases) {
        return new Unit(symbol, dimension, factor, 0.0, List.of(aliases));
    }

    /** Converts a value in this unit to SI. */
    public double toSi(double value) {
        return value * factor + offset;
    }

    /** Converts an SI value to this unit. */
    public double fromSi(double si) {
        return (si - offset) / factor;
    }

    /** True when the text is this unit's symbol or one of its aliases. */
    public boolean isWrittenAs(String text) {
        return symbol.equals(text) || aliases.contains(text);
    }
}
