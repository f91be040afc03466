package org.kneepoint.server.http;

import io.javalin.http.Context;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.library.FitRecord;
import org.kneepoint.fitter.library.SusceptibilityPoint;
import org.kneepoint.server.text.Json;

/**
 * The weakly magnetic materials and the stored fits: {@code /api/materials} (each material with its number of
 * susceptibility points and their temperatures), {@code /api/materials/{name}} (its points, SI) and
 * {@code /api/fits} (every stored fit, by time).
 */
final class MaterialApi {

    private final Library library;

    MaterialApi(Library library) {
        this.library = library;
    }

    void materials(Context context) {
        Map<String, List<Double>> temperatures = new LinkedHashMap<>();
        for (SusceptibilityPoint point : library.reader().susceptibility(null)) {
            temperatures.computeIfAbsent(point.material(), name -> new ArrayList<>()).add(point.temperatureK());
        }
        List<Map<String, Object>> rows = new ArrayList<>();
        temperatures.forEach((name, kelvins) -> {
            Map<String, Object> row = new LinkedHashMap<>();
            row.put("name", name);
            row.put("points", kelvins.size());
            row.put("temperaturesK", kelvins.stream().distinct().toList());
            rows.add(row);
        });
        LibraryApi.json(context, rows);
    }

    void material(Context context) {
        String name = context.pathParam("name");
        List<SusceptibilityPoint> points = library.reader().susceptibility(name);
        if (points.isEmpty()) {
            throw new NotFoundException("no material named '" + name + "' with susceptibility points in the library");
        }
        List<Map<String, Object>> rows = new ArrayList<>();
        for (SusceptibilityPoint point : points) {
            Map<String, Object> row = new LinkedHashMap<>();
            row.put("temperatureK", point.temperatureK());
            row.put("chi", point.chi());
            row.put("form", point.form().name().toLowerCase(Locale.ROOT));
            row.put("density", point.density());
            row.put("molarMass", point.molarMass());
            row.put("source", point.source());
            rows.add(row);
        }
        Map<String, Object> material = new LinkedHashMap<>();
        material.put("name", name);
        material.put("points", rows);
        LibraryApi.json(context, material);
    }

    void fits(Context context) {
        List<Map<String, Object>> rows = new ArrayList<>();
        for (FitRecord fit : library.reader().fits()) {
            Map<String, Object> row = new LinkedHashMap<>();
            row.put("grade", fit.grade());
            row.put("curveTemperatureK", fit.curveTemperatureK());
            row.put("curveKind", fit.curveKind());
            row.put("material", fit.material());
            row.put("model", fit.model());
            row.put("parameters", Json.read(fit.parametersJson()));
            row.put("residual", fit.residual());
            row.put("fittedAt", fit.fittedAt().toString());
            row.put("programVersion", fit.programVersion());
            rows.add(row);
        }
        LibraryApi.json(context, rows);
    }
}
