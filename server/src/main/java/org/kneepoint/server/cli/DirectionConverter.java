package org.kneepoint.server.cli;

import org.kneepoint.server.app.elements.Direction;
import picocli.CommandLine;
import picocli.CommandLine.TypeConversionException;

/** Reads a direction "x,y,z" ({@link Direction#parse}); a bad one is a picocli conversion error. */
final class DirectionConverter implements CommandLine.ITypeConverter<Direction> {

    @Override
    public Direction convert(String text) {
        try {
            return Direction.parse(text);
        } catch (IllegalArgumentException e) {
            throw new TypeConversionException(e.getMessage());
        }
    }
}
