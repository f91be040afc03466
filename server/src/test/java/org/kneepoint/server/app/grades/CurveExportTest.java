package org.kneepoint.server.app.grades;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.importer.export.ExportUnits;
import org.kneepoint.server.app.DemoLibraryFixture;
import org.kneepoint.server.app.Json;
import org.kneepoint.server.app.JsonKeys;

/** A grade's curve written for another program: CSV the importer reads back, JSON, bare numbers; stored or modeled. */
class CurveExportTest {

    private static final String GRADE = "DEMO NdFeB 42/100";

    @TempDir
    static Path folder;

    private static DemoLibraryFixture demo;

    @BeforeAll
    static void load() {
        demo = DemoLibraryFixture.in(folder);
    }

    @AfterAll
    static void close() {
        demo.close();
    }

    private static String export(double temperatureK, CurveExport.Format format, Integer points, boolean bare) {
        return new CurveExport(GRADE, temperatureK, format, Quantity.B, points, ExportUnits.SI, false, bare).write(demo.reader(), "test");
    }

    @Test
    void a_csv_export_has_its_metadata_its_header_and_the_points_asked_for() {
        String csv = export(293.15, CurveExport.Format.CSV, 20, false);
        List<String> lines = csv.lines().toList();
        assertTrue(lines.contains("# grade: " + GRADE), csv);
        assertTrue(lines.stream().anyMatch(line -> line.startsWith("# notes: exported by kneepoint test from the stored")), csv);
        assertEquals("H [A/m],B [T]", lines.stream().filter(line -> !line.startsWith("#")).findFirst().orElseThrow());
        assertEquals(20, lines.stream().filter(line -> !line.startsWith("#") && !line.startsWith("H ")).count());
    }

    @Test
    void a_json_export_writes_the_json_curve_format_keys() {
        JsonNode json = Json.read(export(293.15, CurveExport.Format.JSON, 10, false));
        assertEquals(List.of("grade", "family", "temperature", "kind", "source", "notes", "columns", "rows"), JsonKeys.of(json));
        assertEquals("normal", json.get("kind").asText());
        assertEquals(10, json.get("rows").size());
        assertEquals(2, json.get("rows").get(0).size());
    }

    @Test
    void between_the_measured_temperatures_the_export_is_of_the_modeled_curve() {
        String csv = export(273.15 + 70, CurveExport.Format.CSV, 10, false);
        assertTrue(csv.contains("from the modeled"), csv);
    }

    @Test
    void a_bare_export_has_only_numbers_and_bare_json_is_refused() {
        String bare = export(293.15, CurveExport.Format.CSV, 5, true);
        assertEquals(5, bare.lines().count());
        assertTrue(bare.lines().allMatch(line -> line.matches("[-0-9.E]+,[-0-9.E]+")), bare);
        BadInputException error = assertThrows(BadInputException.class,
                () -> new CurveExport(GRADE, 293.15, CurveExport.Format.JSON, Quantity.B, null, ExportUnits.SI, false, true));
        assertTrue(error.getMessage().contains("--bare"), error.getMessage());
    }
}
