package org.kneepoint.importer.csv;

import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.limits.CurvePlausibility;

/**
 * Where in a table a plausibility finding is: the line of the point and the column of the value
 * at fault; for the whole curve, the file (and the curve's temperature line, when it has one).
 *
 * @param source          the file name
 * @param layout          which column holds what
 * @param points          the curve's points with their lines
 * @param temperatureLine the line of the {@code # temperature:} metadata, or 0
 */
record CurvePlaces(String source, TableLayout layout, PointColumns points, int temperatureLine) {

    InputLocation of(CurvePlausibility.Finding finding) {
        if (finding.point() < 0) {
            if (finding.part() == CurvePlausibility.Part.TEMPERATURE && layout.temperatureColumn() >= 0) {
                return column(points.line(0), layout.temperatureColumn());
            }
            if (finding.part() == CurvePlausibility.Part.TEMPERATURE && temperatureLine > 0) {
                return InputLocation.line(source, temperatureLine);
            }
            return points.size() > 0 && layout.temperatureColumn() >= 0
                    ? InputLocation.of(source + " (the curve starting on line " + points.line(0) + ")") : InputLocation.of(source);
        }
        int line = points.line(finding.point());
        return switch (finding.part()) {
            case FIELD -> column(line, layout.hColumn());
            case TEMPERATURE -> layout.temperatureColumn() >= 0 ? column(line, layout.temperatureColumn()) : InputLocation.line(source, line);
            default -> column(line, layout.valueColumn());
        };
    }

    private InputLocation column(int line, int column) {
        return InputLocation.cell(source, line, column + 1, layout.name(column));
    }
}
