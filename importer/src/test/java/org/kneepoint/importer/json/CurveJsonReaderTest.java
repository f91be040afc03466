package org.kneepoint.importer.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.importer.csv.CurveFile;
import org.kneepoint.importer.input.InputFile;

class CurveJsonReaderTest {

    private static final String GOOD = """
            {"grade": "Invented N40SH", "family": "sintered NdFeB", "temperature": "20 °C",
             "columns": ["H [kOe]", "J [kG]"],
             "rows": [[0, 12.86], [-2.5, 12.81], [-5.0, 12.74]]}
            """;

    private static CurveFile read(String json) {
        return CurveJsonReader.read(InputFile.of("c.json", json.getBytes(StandardCharsets.UTF_8)));
    }

    private static String refused(String json) {
        String message = assertThrows(BadInputException.class, () -> read(json)).getMessage();
        assertFalse(message.contains("\n"), message);
        return message;
    }

    @Test
    void the_json_form_reads_like_the_text_form() {
        CurveFile file = read(GOOD);
        assertEquals("Invented N40SH", file.metadata().grade());
        assertEquals(CurveKind.INTRINSIC, file.curves().get(0).kind());
        assertEquals(1.281, file.curves().get(0).values()[1], 1e-15);
        assertEquals(293.15, file.curves().get(0).temperatureK(), 1e-12);
    }

    @Test
    void trailing_white_space_after_the_document_is_fine_but_trailing_content_is_not() {
        assertEquals(3, read(GOOD + "\n\n  ").curves().get(0).size());
        assertEquals("c.json, line 4, column 1: content after the end of the JSON document; a file holds one document",
                refused(GOOD + "{\"grade\": \"again\"}"));
    }

    @Test
    void garbage_after_the_document_is_refused_as_invalid_json() {
        assertEquals("c.json, line 4, column 1: not valid JSON: Unrecognized token 'xyz': was expecting (JSON String, Number, Array,"
                + " Object or token 'null', 'true' or 'false')", refused(GOOD + "xyz"));
    }

    @Test
    void a_number_of_5000_digits_is_bad_input_not_an_internal_error() {
        String json = GOOD.replace("12.81", "1" + "0".repeat(4999));
        assertEquals("c.json, line 3, column 5030: a number too long to be a measurement; a number has at most 40 characters", refused(json));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        truncated                | '{"grade": "x", "columns": ["H [kOe]", "J [kG]"], "rows": [[0, 12'   | c.json, line 1, column 65: not valid JSON: Unexpected end-of-input: expected close marker for Array
        not an object            | '[1, 2]'                                                          | c.json, line 1, column 2: expected a JSON object
        rows before columns      | '{"rows": [[0, 1]], "columns": ["H [kA/m]", "J [T]"]}'            | c.json, line 1, column 11 (rows): 'columns' must come before 'rows'
        unknown field            | '{"colour": "red"}'                                               | c.json, line 1, column 13 (colour): unknown field; expected columns, rows or one of [grade, family, supplier, density, temperature, kind, source, notes]
        text in a row            | '{"columns": ["H [kA/m]", "J [T]"], "rows": [[0, "1.2"]]}'        | c.json, line 1, column 50 (rows): expected a number, got the text "1.2"
        row that is no array     | '{"columns": ["H [kA/m]", "J [T]"], "rows": [0, 1]}'              | c.json, line 1, column 46: expected a row: an array of numbers such as [-2.5, 12.81]
        metadata not a string    | '{"grade": 42}'                                                   | c.json, line 1, column 13: expected a string
        no rows                  | '{"columns": ["H [kA/m]", "J [T]"], "rows": []}'                  | c.json: a JSON curve file needs 'columns' and at least one row in 'rows'
        field twice              | '{"grade": "a", "grade": "b"}'                                    | c.json, line 1, column 23: not valid JSON: Duplicate field 'grade'
        empty file               | ''                                                                | c.json, line 1, column 1: expected a JSON object
        NUL in the grade         | '{"grade": "N40\\u0000", "columns": ["H [kA/m]", "J [T]"], "rows": [[0, 1.2], [-100, 1.1]]}' | c.json, line 1: grade holds U+0000 (a control character) at character 4; names may not hold control or bidirectional formatting characters
        Br of 12.8 T             | '{"columns": ["H [kA/m]", "J [T]"], "rows": [[0, 12.8], [-100, 12.7]]}' | c.json, line 1, column 2 (J [T]): J = 12.8 T, beyond what any known material reaches (J from -4 T to 4 T)
        """)
    void bad_json_curve_files_are_refused_with_one_line(String name, String json, String message) {
        assertEquals(message, refused(json));
    }
}
