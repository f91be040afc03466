package org.kneepoint.server.cli;

import org.kneepoint.fitter.units.Dimension;
import picocli.CommandLine;
import picocli.CommandLine.TypeConversionException;

/**
 * Reads a point "x,y,z" in metres: each coordinate may carry its own length unit, and a unit after
 * the last number applies to the coordinates that have none ("2,0,3mm" is 2 mm, 0 mm, 3 mm).
 */
final class PositionConverter implements CommandLine.ITypeConverter<PositionConverter.Position> {

    /** A point in metres. */
    record Position(double x, double y, double z) {
    }

    @Override
    public Position convert(String text) {
        String[] parts = text.split(",", -1);
        if (parts.length != 3) {
            throw new TypeConversionException("expected a point x,y,z with a length unit such as 2,0,3mm, got '" + text.strip() + "'");
        }
        String last = parts[2].strip();
        int unitStart = last.length();
        while (unitStart > 0 && !Character.isDigit(last.charAt(unitStart - 1)) && last.charAt(unitStart - 1) != '.') {
            unitStart--;
        }
        String unit = last.substring(unitStart).strip();
        if (unit.isEmpty()) {
            throw new TypeConversionException("expected a point x,y,z with a length unit such as 2,0,3mm, got '" + text.strip()
                    + "' (no unit)");
        }
        double[] point = new double[3];
        for (int i = 0; i < 3; i++) {
            String part = parts[i].strip();
            boolean bare = !part.isEmpty() && (Character.isDigit(part.charAt(part.length() - 1)) || part.endsWith("."));
            point[i] = QuantityConverters.parse(bare ? part + unit : part, Dimension.LENGTH);
        }
        return new Position(point[0], point[1], point[2]);
    }
}
