package org.kneepoint.server.cli;

import org.kneepoint.fitter.units.Dimension;
import picocli.CommandLine;
import picocli.CommandLine.TypeConversionException;

/** Reads a positive length with its unit from the command line ("10mm", "0.5 in") into metres. */
final class LengthConverter implements CommandLine.ITypeConverter<Double> {

    @Override
    public Double convert(String text) {
        double metres = QuantityConverters.parse(text, Dimension.LENGTH);
        if (!(metres > 0)) {
            throw new TypeConversionException("expected a positive length, got '" + text.strip() + "'");
        }
        return metres;
    }
}
