package org.kneepoint.server.app.grades;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.library.SusceptibilityPoint;

/**
 * The weakly magnetic materials of the library: each with its number of susceptibility points and their temperatures
 * ({@code GET /api/materials}), and one material's points ({@code GET /api/materials/{name}}).
 */
public final class Materials {

    private Materials() {
    }

    /** A material: its name, its number of points and their distinct temperatures (K) in stored order. */
    public record MaterialRow(String name, int points, List<Double> temperaturesK) {
    }

    /** One material's stored points. */
    public record MaterialDocument(String name, List<Point> points) {
    }

    /**
     * One susceptibility point, SI.
     *
     * @param chi       the susceptibility in the stored {@code form} ({@code volume}, {@code mass} in m³/kg, {@code molar}
     *                  in m³/mol)
     * @param density   kg/m³, or null
     * @param molarMass kg/mol, or null
     */
    public record Point(double temperatureK, double chi, String form, Double density, Double molarMass, String source) {
    }

    /** Every material with susceptibility points. */
    public static List<MaterialRow> list(LibraryReader reader) {
        Map<String, List<Double>> temperatures = new LinkedHashMap<>();
        for (SusceptibilityPoint point : reader.susceptibility(null)) {
            temperatures.computeIfAbsent(point.material(), name -> new ArrayList<>()).add(point.temperatureK());
        }
        List<MaterialRow> rows = new ArrayList<>();
        temperatures.forEach((name, kelvins) -> rows.add(new MaterialRow(name, kelvins.size(), kelvins.stream().distinct().toList())));
        return rows;
    }

    /** One material's points; a material without points is not found. */
    public static MaterialDocument detail(LibraryReader reader, String name) {
        List<SusceptibilityPoint> points = reader.susceptibility(name);
        if (points.isEmpty()) {
            throw new NotFoundException("no material named '" + name + "' with susceptibility points in the library");
        }
        return new MaterialDocument(name, points.stream().map(point -> new Point(point.temperatureK(), point.chi(),
                point.form().name().toLowerCase(Locale.ROOT), point.density(), point.molarMass(), point.source())).toList());
    }
}
