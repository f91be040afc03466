package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.tests.JilesAthertonSimulateCommandTest.assertBadInput;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.library.FitRecord;

class FitCurieWeissCommandTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final double DENSITY = 8000;

    @TempDir
    Path folder;

    /** A table of the invented paramagnet, χ divided by {@code divisor} (the density for a mass table). */
    private Path table(String name, String metadata, String unit, double divisor) throws IOException {
        StringBuilder text = new StringBuilder("# material: " + FitTestData.MATERIAL + "\n" + metadata + "T [K],chi [" + unit + "]\n");
        for (double[] point : FitTestData.curieWeissPoints()) {
            text.append(String.format(Locale.ROOT, "%.6f,%.12g%n", point[0], point[1] / divisor));
        }
        return Files.writeString(folder.resolve(name), text);
    }

    @Test
    void a_volume_table_gives_the_issue_keys_and_the_known_law() throws IOException {
        CliRun run = CliRun.of("fit", "curie-weiss", table("chi.csv", "", "SI", 1).toString(), "--json");
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.err());
        JsonNode json = MAPPER.readTree(run.out());
        for (String key : List.of("curieConstant", "weissTemperatureK", "chi0", "behaviour", "standardErrors",
                "correlation", "rmsResidual", "points", "temperatureMinK", "temperatureMaxK", "material", "saved")) {
            assertTrue(json.has(key), key);
        }
        assertEquals(FitTestData.CURIE_CONSTANT, json.get("curieConstant").asDouble(), 1e-6);
        assertEquals(FitTestData.WEISS_TEMPERATURE, json.get("weissTemperatureK").asDouble(), 1e-3);
        assertEquals(FitTestData.CHI0, json.get("chi0").asDouble(), 1e-9);
        assertEquals("paramagnetic", json.get("behaviour").asText());
        assertEquals(26, json.get("points").asInt());
    }

    @Test
    void a_mass_table_is_converted_to_volume_with_its_density() throws IOException {
        Path mass = table("mass.csv", "# density: 8 g/cm³\n", "m³/kg", DENSITY);
        CliRun run = CliRun.of("fit", "curie-weiss", mass.toString(), "--json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode json = MAPPER.readTree(run.out());
        assertEquals("mass", json.get("form").asText());
        assertEquals(FitTestData.CURIE_CONSTANT, json.get("curieConstant").asDouble(), 1e-6);
        assertEquals(FitTestData.CHI0, json.get("chi0").asDouble(), 1e-9);
        assertBadInput(CliRun.of("fit", "curie-weiss", table("bare.csv", "", "m³/kg", DENSITY).toString()),
                "bare.csv: gives mass susceptibility but no density");
    }

    @Test
    void a_stored_material_is_fitted_and_save_writes_exactly_one_fit() throws IOException {
        FitTestData.storeLibrary(folder);
        CliRun run = CliRun.of("fit", "curie-weiss", FitTestData.MATERIAL, "--save", "--db", folder.toString());
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("Curie–Weiss fit to " + FitTestData.MATERIAL + " (saved to the library)"), run.out());
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder))) {
            List<FitRecord> fits = library.reader().fits();
            assertEquals(1, fits.size());
            assertEquals("curie-weiss", fits.get(0).model());
            assertEquals(FitTestData.MATERIAL, fits.get(0).material());
            JsonNode parameters = MAPPER.readTree(fits.get(0).parametersJson());
            assertEquals(FitTestData.WEISS_TEMPERATURE, parameters.get("weissTemperatureK").asDouble(), 1e-3);
        }
    }

    @Test
    void saving_a_table_of_a_material_the_library_lacks_is_refused_and_writes_nothing() throws IOException {
        Path db = Files.createDirectory(folder.resolve("db"));
        assertBadInput(CliRun.of("fit", "curie-weiss", table("chi.csv", "", "SI", 1).toString(), "--save", "--db", db.toString()),
                "option --save: material 'Invented paramagnet' of chi.csv has no susceptibility in the library");
        assertEquals(0, FitTestData.storedFits(db));
    }

    @Test
    void bad_input_is_one_line_with_exit_code_2() throws IOException {
        Path db = Files.createDirectory(folder.resolve("db"));
        assertBadInput(CliRun.of("fit", "curie-weiss", "unobtainium", "--db", db.toString()),
                "no file or material named 'unobtainium'");
        Path two = Files.writeString(folder.resolve("two.csv"), "# material: x\nT [K],chi [SI]\n100,1e-4\n200,5e-5\n");
        assertBadInput(CliRun.of("fit", "curie-weiss", two.toString(), "--json"),
                "two.csv: a Curie–Weiss fit has three parameters and got 2 points; expected at least 3");
        Path noMaterial = Files.writeString(folder.resolve("anon.csv"), "T [K],chi [SI]\n100,1e-4\n200,5e-5\n300,3e-5\n");
        assertBadInput(CliRun.of("fit", "curie-weiss", noMaterial.toString()), "anon.csv: no material");
        assertEquals(0, FitTestData.storedFits(db));
    }
}
