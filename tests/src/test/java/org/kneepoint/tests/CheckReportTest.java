package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CheckReportTest {

    @TempDir
    Path folder;

    @Test
    void the_report_is_one_offline_html_file_with_inputs_results_chart_sources_and_cautions() throws Exception {
        String db = folder.resolve("library").toString();
        assertEquals(0, CliRun.of("demo", "--db", db).exitCode());
        Path report = folder.resolve("review.html");
        CliRun run = CliRun.of("check", "DEMO NdFeB 40/160", "--diameter", "10mm", "--length", "5mm", "--temperature", "120C",
                "--opposing-field", "300kA/m", "--report", report.toString(), "--db", db);
        assertEquals(0, run.exitCode(), run.err());
        String html = Files.readString(report);
        for (String part : new String[] {"<h2>Inputs</h2>", "kneepoint check DEMO NdFeB 40/160", "<h2>Results at 120 °C</h2>",
            "operating point", "<svg", "<h2>Assumptions</h2>", "Chen, J. A. Brug, R. B. Goldfarb", "Aharoni",
            "confirm them by measurement", "implanted medical devices"}) {
            assertTrue(html.contains(part), part);
        }
        assertFalse(html.contains("<script"), "no script");
        assertFalse(html.contains("href=\"/") || html.contains("src=\"/"), "nothing to fetch from a server");
    }

    @Test
    void a_report_that_is_not_html_is_refused_and_nothing_is_written() {
        Path report = folder.resolve("review.pdf");
        CliRun run = CliRun.of("check", "--pc", "2", "--br", "1.3T", "--mu-rec", "1.05", "--hcj", "1600kA/m", "--temperature", "20C",
                "--report", report.toString());
        assertEquals(2, run.exitCode());
        assertEquals("", run.out());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertFalse(Files.exists(report));
    }
}
