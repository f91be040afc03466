package org.kneepoint.server.cli;

import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityParser;
import picocli.CommandLine;

/** Reads a temperature with its unit from the command line ("120C", "393.15 K", "250 °F") into kelvin. */
final class TemperatureConverter implements CommandLine.ITypeConverter<Double> {

    @Override
    public Double convert(String text) {
        double kelvin;
        try {
            kelvin = QuantityParser.parse(text, Dimension.TEMPERATURE);
        } catch (IllegalArgumentException e) {
            throw new CommandLine.TypeConversionException(e.getMessage());
        }
        if (!(kelvin > 0)) {
            throw new CommandLine.TypeConversionException("expected a temperature above absolute zero, got '" + text + "'");
        }
        return kelvin;
    }
}
