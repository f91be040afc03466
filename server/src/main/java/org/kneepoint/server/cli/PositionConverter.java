package org.kneepoint.server.cli;

import org.kneepoint.server.app.design.Position;
import picocli.CommandLine;
import picocli.CommandLine.TypeConversionException;

/** Reads a point "x,y,z" in metres ({@link Position#parse}); a bad point is a picocli conversion error. */
final class PositionConverter implements CommandLine.ITypeConverter<Position> {

    @Override
    public Position convert(String text) {
        try {
            return Position.parse(text);
        } catch (IllegalArgumentException e) {
            throw new TypeConversionException(e.getMessage());
        }
    }
}
