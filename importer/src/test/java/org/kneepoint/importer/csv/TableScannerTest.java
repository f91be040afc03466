package org.kneepoint.importer.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kneepoint.fitter.error.BadInputException;

class TableScannerTest {

    /** Writes down what the scanner handed over, one line per part. */
    private static final class Recording implements TableHandler {
        final List<String> parts = new ArrayList<>();

        @Override
        public void metadata(MetadataLine entry, int line) {
            parts.add(line + " meta " + entry.key() + "=" + entry.value());
        }

        @Override
        public void header(String[] cells, Delimiter delimiter, int line) {
            parts.add(line + " header " + delimiter + " " + String.join("|", cells));
        }

        @Override
        public void row(String[] cells, int line) {
            parts.add(line + " row " + String.join("|", cells));
        }
    }

    private static List<String> scan(String text) {
        Recording recording = new Recording();
        TableScanner.scan("t.csv", text, recording);
        return recording.parts;
    }

    private static String refused(String text) {
        return assertThrows(BadInputException.class, () -> scan(text)).getMessage();
    }

    @Test
    void quoted_header_cells_are_read_without_their_quotes() {
        assertEquals(List.of("1 header COMMA H [kOe]|J [kG]", "2 row 0|12.5"), scan("\"H [kOe]\",\"J [kG]\"\n0,12.5\n"));
    }

    @Test
    void a_quoted_cell_may_hold_the_delimiter_and_a_doubled_quote() {
        assertEquals(List.of("1 header COMMA H [kA/m]|J [T]", "2 row 0|a,\"b\""), scan("H [kA/m],J [T]\n0,\"a,\"\"b\"\"\"\n"));
    }

    @Test
    void a_quoted_cell_spanning_two_lines_keeps_the_line_numbers_of_later_rows_right() {
        List<String> parts = scan("H [kA/m],J [T]\n\"0\n\",1.2\n-1,1.1\n# note\n\n-2,1.0\n");
        assertEquals(List.of("1 header COMMA H [kA/m]|J [T]", "2 row 0\n|1.2", "4 row -1|1.1", "7 row -2|1.0"), parts);
    }

    @Test
    void metadata_comments_and_blank_lines_before_the_header_are_handed_over_with_their_lines() {
        List<String> parts = scan("\uFEFF# grade: A\n# just a comment\n\n  # family: B\nH [kA/m];J [T]\n0;1,2\n");
        assertEquals(List.of("1 meta grade=A", "4 meta family=B", "5 header SEMICOLON H [kA/m]|J [T]", "6 row 0|1,2"), parts);
    }

    @Test
    void windows_and_old_mac_line_endings_count_lines_alike() {
        List<String> expected = List.of("1 header COMMA H [kA/m]|J [T]", "2 row 0|1.2", "4 row -1|1.1");
        assertEquals(expected, scan("H [kA/m],J [T]\r\n0,1.2\r\n\r\n-1,1.1\r\n"));
        assertEquals(expected, scan("H [kA/m],J [T]\r0,1.2\r\r-1,1.1\r"));
        assertEquals(expected, scan("H [kA/m],J [T]\n0,1.2\n\n-1,1.1"));
    }

    @Test
    void white_space_around_cells_and_whole_blank_lines_are_passed_over() {
        assertEquals(List.of("1 header TAB H [kA/m]|J [T]", "3 row 0|1.2"), scan("H [kA/m]\tJ [T]\n   \t \n 0 \t 1.2 \n"));
        assertEquals(List.of("1 header COMMA H [kA/m]|J [T]", "2 row 0|1.2"), scan("H [kA/m] , \"J [T]\" \n0, 1.2\n"));
    }

    @Test
    void comments_between_rows_are_allowed_even_when_indented() {
        assertEquals(List.of("1 header COMMA H [kA/m]|J [T]", "2 row 0|1.2", "4 row -1|1.1"), scan("H [kA/m],J [T]\n0,1.2\n   # a, \"comment\n-1,1.1\n"));
    }

    @Test
    void the_first_delimiter_found_in_the_header_in_the_order_tab_semicolon_comma_wins() {
        assertEquals("1 header TAB a,b|c;d", scan("a,b\tc;d\n1\t2\n").get(0));
        assertEquals("1 header SEMICOLON a,b|c", scan("a,b;c\n1;2\n").get(0));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        empty file                     | ''                                         | t.csv: the file is empty; expected a header such as 'H [kOe],J [kG]' followed by rows of numbers
        byte-order mark only           | '\uFEFF'                                   | t.csv: the file is empty; expected a header such as 'H [kOe],J [kG]' followed by rows of numbers
        blank lines only               | '\n \n'                                    | t.csv: the file has no header row; expected a header such as 'H [kOe],J [kG]' followed by rows of numbers
        header without delimiter       | '# grade: x\nH [kA/m]\n0\n'                | t.csv, line 2: expected a header row of at least two columns separated by commas, semicolons or tabs, such as 'H [kOe],J [kG]'
        header and comments only       | 'H [kA/m],J [T]\n# nothing\n\n'            | t.csv: the file has a header but no data rows
        metadata after the header      | 'H [kA/m],J [T]\n0,1\n# grade: late\n'     | t.csv, line 3: metadata lines must come before the header row
        indented metadata after header | 'H [kA/m],J [T]\n0,1\n  # grade: late\n'   | t.csv, line 3: metadata lines must come before the header row
        quote never closed             | 'H [kA/m],J [T]\n0,1\n"-1,1\n-2,1\n'       | t.csv, line 3: a quoted cell is not closed properly: expected its closing quote, then a separator or the end of the line (inside quotes, write a quote twice: "")
        text after a closing quote     | 'H [kA/m],J [T]\n0,1\n"-1"x,1\n'           | t.csv, line 3: a quoted cell is not closed properly: expected its closing quote, then a separator or the end of the line (inside quotes, write a quote twice: "")
        """)
    void malformed_tables_are_refused_at_their_line(String name, String text, String message) {
        assertEquals(message, refused(text.replace("\\n", "\n")));
    }
}
