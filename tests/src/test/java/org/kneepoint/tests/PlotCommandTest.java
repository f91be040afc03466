package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PlotCommandTest {

    @TempDir
    Path folder;

    @Test
    void plot_writes_an_svg_with_units_and_a_legend_and_a_png() throws Exception {
        String db = folder.resolve("library").toString();
        assertEquals(0, CliRun.of("demo", "--db", db).exitCode());
        Path svg = folder.resolve("chart.svg");
        CliRun run = CliRun.of("plot", "DEMO NdFeB 40/160", "--temperature", "20C,100C", "-o", svg.toString(), "--db", db);
        assertEquals(0, run.exitCode(), run.err());
        String text = Files.readString(svg);
        assertTrue(text.startsWith("<svg") || text.contains("<svg"), "an SVG document");
        assertTrue(text.contains("kA/m") && text.contains("(T)"), "units on both axes");
        assertTrue(text.contains("J at 100 °C"), "the modeled temperature is in the legend");
        Path png = folder.resolve("chart.png");
        assertEquals(0, CliRun.of("plot", "DEMO SmCo 28/200", "-o", png.toString(), "--db", db).exitCode());
        byte[] magic = Arrays.copyOf(Files.readAllBytes(png), 4);
        assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G'}, magic);
    }

    @Test
    void bad_requests_give_exit_code_2_and_write_no_file() {
        String db = folder.resolve("library").toString();
        Path target = folder.resolve("chart.gif");
        CliRun format = CliRun.of("plot", "Anything", "-o", target.toString(), "--db", db);
        assertEquals(2, format.exitCode());
        assertEquals(1, format.err().strip().lines().count(), format.err());
        CliRun unknown = CliRun.of("plot", "No such grade", "-o", folder.resolve("x.svg").toString(), "--db", db);
        assertEquals(2, unknown.exitCode());
        assertTrue(unknown.err().contains("no grade named 'No such grade'"), unknown.err());
        assertFalse(Files.exists(folder.resolve("x.svg")));
        assertFalse(Files.exists(target));
    }

    @Test
    void a_grade_with_only_a_loop_is_drawn_as_its_whole_loop() throws Exception {
        String db = folder.resolve("library").toString();
        assertEquals(0, CliRun.of("import", Path.of("..", "examples", "invented-soft-iron-loop.csv").toString(), "--db", db).exitCode());
        Path svg = folder.resolve("loop.svg");
        assertEquals(0, CliRun.of("plot", "Invented soft iron", "-o", svg.toString(), "--db", db).exitCode());
        assertTrue(Files.readString(svg).contains("B loop at 20 °C"), "the loop is in the legend");
    }
}
