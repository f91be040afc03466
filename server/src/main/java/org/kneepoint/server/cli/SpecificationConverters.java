package org.kneepoint.server.cli;

import org.kneepoint.fitter.units.Dimension;
import picocli.CommandLine;
import picocli.CommandLine.TypeConversionException;

/** Converters for specification limits that {@link QuantityConverters} has no converter for: energy products and ratios. */
final class SpecificationConverters {

    private SpecificationConverters() {
    }

    /** An energy product, e.g. "40 MGOe" or "318 kJ/m³". */
    static final class EnergyProduct implements CommandLine.ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            return QuantityConverters.parse(text, Dimension.ENERGY_PRODUCT);
        }
    }

    /** A ratio such as Hk/HcJ, as a number ("0.95") or in percent ("95%"). */
    static final class Ratio implements CommandLine.ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            String stripped = text.strip();
            boolean percent = stripped.endsWith("%");
            String digits = percent ? stripped.substring(0, stripped.length() - 1).strip() : stripped;
            try {
                double value = Double.parseDouble(digits) / (percent ? 100 : 1);
                if (Double.isFinite(value) && digits.matches("[0-9.eE+-]+")) {
                    return value;
                }
            } catch (NumberFormatException e) {
                // reported below
            }
            throw new TypeConversionException("expected a ratio such as 0.95 or 95%, got '" + stripped + "'");
        }
    }
}
