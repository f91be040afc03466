package org.kneepoint.importer.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.importer.csv.CurveFile;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.importer.csv.SusceptibilityTable;
import org.kneepoint.importer.input.InputFile;

class CurveFilesTest {

    @TempDir
    Path folder;

    private static final String CURVE = "# grade: Invented N40\n# family: invented\nH [kA/m],J [T]\n0,1.3\n-500,1.25\n";

    private static InputFile file(String name, String text) {
        return InputFile.of(name, text.getBytes(StandardCharsets.UTF_8));
    }

    @Test
    void a_text_curve_file_a_json_curve_file_and_a_susceptibility_table_each_get_their_reader() {
        assertInstanceOf(CurveFile.class, CurveFiles.read(file("n40.csv", CURVE)));
        assertInstanceOf(CurveFile.class, CurveFiles.read(file("N40.JSON",
                "{\"grade\": \"Invented N40\", \"columns\": [\"H [kA/m]\", \"J [T]\"], \"rows\": [[0, 1.3], [-500, 1.25]]}")));
        assertInstanceOf(SusceptibilityTable.class, CurveFiles.read(file("salt.tsv", "# material: m\nT [K]\tchi [SI]\n4\t1e-5\n")));
    }

    @Test
    void the_json_reader_is_chosen_by_the_name_so_text_named_json_is_refused_as_json() {
        assertEquals("n40.json, line 1, column 1: not valid JSON: Unexpected character ('#' (code 35)): expected a valid value (JSON String,"
                + " Number, Array, Object or token 'null', 'true' or 'false')", assertThrows(BadInputException.class, () -> CurveFiles.read(file("n40.json", "# grade: x\n"))).getMessage()
                .replaceAll("\\s+", " "));
    }

    @Test
    void the_text_and_json_forms_of_one_curve_read_the_same() {
        CurveFile text = (CurveFile) CurveFiles.read(file("a.csv", CURVE));
        CurveFile json = (CurveFile) CurveFiles.read(file("a.json", "{\"grade\": \"Invented N40\", \"family\": \"invented\","
                + " \"columns\": [\"H [kA/m]\", \"J [T]\"], \"rows\": [[0, 1.3], [-500, 1.25]]}"));
        assertEquals(text.curves(), json.curves());
        assertEquals(text.metadata(), json.metadata());
    }

    @Test
    void a_file_on_disk_is_read_once_with_its_size_checked_first() throws IOException {
        Path path = folder.resolve("n40.csv");
        Files.writeString(path, CURVE);
        assertInstanceOf(CurveFile.class, CurveFiles.read(path, ReadLimits.defaults()));
        assertEquals("n40.csv: the file is 72 bytes, larger than the limit of 10 bytes",
                assertThrows(BadInputException.class, () -> CurveFiles.read(path, new ReadLimits(10))).getMessage());
    }
}
