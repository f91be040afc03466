package org.kneepoint.server.cli;

import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.server.app.InputLimits;
import picocli.CommandLine;
import picocli.CommandLine.TypeConversionException;

/** Reads a positive length with its unit from the command line ("10mm", "0.5 in") into metres. */
final class LengthConverter implements CommandLine.ITypeConverter<Double> {

    @Override
    public Double convert(String text) {
        double metres = QuantityConverters.parse(text, Dimension.LENGTH);
        InputLimits.lengthProblem(metres, text).ifPresent(problem -> {
            throw new TypeConversionException(problem);
        });
        return metres;
    }
}
