package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class GradeModelSectionTest {

    @TempDir
    static Path folder;

    private static RunningServer server;

    @BeforeAll
    static void start() throws Exception {
        server = RunningServer.withDemo(folder, null);
        Path single = folder.resolve("single.csv");
        Files.writeString(single, "# grade: Invented one-temperature grade\n# family: invented family\n# temperature: 20 °C\n"
                + "H [kA/m],J [T]\n50,1.2913\n0,1.2888\n-400,1.2636\n-800,1.2382\n-1100,1.1871\n-1300,0.9\n-1400,0.2\n-1500,0\n");
        assertEquals(0, CliRun.of("import", single.toString(), "--db", folder.resolve("library").toString()).exitCode());
    }

    @AfterAll
    static void stop() {
        server.close();
    }

    @Test
    void the_grade_page_shows_the_temperature_model_with_alpha_beta_and_each_knee_fit() throws Exception {
        var page = server.get("/grades/DEMO%20NdFeB%2040%2F160");
        assertEquals(200, page.statusCode());
        assertTrue(page.body().contains("<h2>Fitted models</h2>"), page.body());
        java.util.regex.Matcher alpha = java.util.regex.Pattern.compile("α of Br (-?[0-9.]+) %/K").matcher(page.body());
        assertTrue(alpha.find(), page.body());
        assertEquals(-0.12, Double.parseDouble(alpha.group(1)), 0.002, "α of the invented grade, generated with -0.12 %/K");
        assertTrue(page.body().contains("150 °C"), "a row per measured temperature");
    }

    @Test
    void a_grade_measured_at_one_temperature_says_why_it_has_no_model() throws Exception {
        var page = server.get("/grades/Invented%20one-temperature%20grade");
        assertEquals(200, page.statusCode(), page.body());
        assertTrue(page.body().contains("No temperature model"), page.body());
    }
}
