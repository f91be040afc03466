package org.kneepoint.server.cli;

import org.kneepoint.fitter.units.Dimension;
import picocli.CommandLine;
import picocli.CommandLine.TypeConversionException;

/** Reads a positive area with its unit ("120mm²", "1.5 cm2") into square metres. */
final class AreaConverter implements CommandLine.ITypeConverter<Double> {

    @Override
    public Double convert(String text) {
        double area = QuantityConverters.parse(text, Dimension.AREA);
        if (!(area > 0)) {
            throw new TypeConversionException("expected a positive area, got '" + text.strip() + "'");
        }
        return area;
    }
}
