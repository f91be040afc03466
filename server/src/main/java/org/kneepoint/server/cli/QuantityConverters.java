package org.kneepoint.server.cli;

import java.util.regex.Pattern;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityParser;
import org.kneepoint.server.app.InputLimits;
import picocli.CommandLine;
import picocli.CommandLine.TypeConversionException;

/**
 * Command-line converters from text with a unit ("1.3T", "1600 kA/m", "120C", "-0.12%/K") to SI
 * values; a bad value becomes a picocli {@link TypeConversionException}, which the program reports
 * as bad input (exit 2).
 */
final class QuantityConverters {

    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    private QuantityConverters() {
    }

    static double parse(String text, Dimension dimension) {
        try {
            return QuantityParser.parse(text, dimension);
        } catch (IllegalArgumentException e) {
            throw new TypeConversionException(e.getMessage());
        }
    }

    /** A flux density, e.g. "1.3T" or "13 kG". */
    static final class FluxDensity implements CommandLine.ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            return parse(text, Dimension.FLUX_DENSITY);
        }
    }

    /** A field strength, e.g. "1600kA/m" or "20 kOe"; a bare "0" is zero. */
    static final class FieldStrength implements CommandLine.ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            return fieldStrength(text);
        }
    }

    /** A temperature, e.g. "120C", "393.15 K" or "248F"; returned in kelvin, above absolute zero. */
    static final class Temperature implements CommandLine.ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            double kelvin = parse(text, Dimension.TEMPERATURE);
            InputLimits.temperatureProblem(kelvin, text).ifPresent(problem -> {
                throw new TypeConversionException(problem);
            });
            return kelvin;
        }
    }

    /** A magnetization, e.g. "1.6e6A/m" or "1270 emu/cm³". */
    static final class Magnetization implements CommandLine.ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            return parse(text, Dimension.MAGNETIZATION);
        }
    }

    /** A temperature coefficient in %/K (or %/°C, the same step), e.g. "-0.12%/K"; returned in %/K. */
    static final class PercentPerKelvin implements CommandLine.ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            String stripped = text.strip();
            for (String unit : new String[] {"%/K", "%/°C", "%/C"}) {
                if (stripped.endsWith(unit)) {
                    return number(stripped.substring(0, stripped.length() - unit.length()), text, "a coefficient such as -0.12%/K");
                }
            }
            throw new TypeConversionException("expected a temperature coefficient such as -0.12%/K, got '" + stripped + "' (no %/K)");
        }
    }

    /** A percentage, e.g. "1%"; returned in percent. */
    static final class Percent implements CommandLine.ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            String stripped = text.strip();
            if (!stripped.endsWith("%")) {
                throw new TypeConversionException("expected a percentage such as 1%, got '" + stripped + "' (no %)");
            }
            return number(stripped.substring(0, stripped.length() - 1), text, "a percentage such as 1%");
        }
    }

    static double fieldStrength(String text) {
        return text.strip().equals("0") ? 0.0 : parse(text, Dimension.FIELD_STRENGTH);
    }

    private static double number(String digits, String text, String expected) {
        String number = digits.strip().replace('\u2212', '-');
        if (NUMBER.matcher(number).matches()) {
            double value = Double.parseDouble(number);
            if (Double.isFinite(value)) {
                return value;
            }
        }
        throw new TypeConversionException("expected " + expected + ", got '" + text.strip() + "'");
    }
}
