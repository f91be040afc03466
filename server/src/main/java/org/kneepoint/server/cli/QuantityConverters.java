package org.kneepoint.server.cli;

import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityParser;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/**
 * picocli converters for options that take a quantity with its unit ({@code --hmax 5kA/m},
 * {@code --temperature 120°C}): the text is parsed to SI by {@link QuantityParser}, and a wrong or
 * missing unit becomes a {@link TypeConversionException}, which the CLI reports as bad input.
 */
final class QuantityConverters {

    private QuantityConverters() {
    }

    private static double convert(String text, Dimension dimension) {
        try {
            return QuantityParser.parse(text, dimension);
        } catch (IllegalArgumentException e) {
            throw new TypeConversionException(e.getMessage());
        }
    }

    /** A field strength: A/m, kA/m, MA/m, Oe, kOe. */
    static final class FieldStrength implements ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            return QuantityConverters.convert(text, Dimension.FIELD_STRENGTH);
        }
    }

    /** A magnetization: A/m, kA/m, MA/m, emu/cm³. */
    static final class Magnetization implements ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            return QuantityConverters.convert(text, Dimension.MAGNETIZATION);
        }
    }

    /** A temperature: K, °C, °F. */
    static final class Temperature implements ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            return QuantityConverters.convert(text, Dimension.TEMPERATURE);
        }
    }
}
