package org.kneepoint.importer.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;

class ColumnHeaderTest {

    private static final InputLocation AT = InputLocation.cell("h.csv", 1, 2, null);

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        H [kOe]    | H | kOe
        ' J [kG] ' | J | kG
        B[mT]      | B | mT
        M [emu/cm³]| M | emu/cm³
        T [°C]     | T | °C
        T [F]      | T | °F
        """)
    void a_header_cell_names_its_quantity_and_unit(String cell, char letter, String unit) {
        ColumnHeader header = ColumnHeader.parse(cell, AT);
        assertEquals(letter, header.letter());
        assertEquals(unit, header.unit().symbol());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        'X [T]'        | h.csv, line 1, column 2: unknown column 'X'; expected H, B, J, M or T with a unit, such as 'J [T]'
        'J'            | h.csv, line 1, column 2: column J has no unit; write it as 'J [T]'
        'M'            | h.csv, line 1, column 2: column M has no unit; write it as 'M [kA/m]'
        'T'            | h.csv, line 1, column 2: column T has no unit; write it as 'T [°C]'
        'H [kOe'       | h.csv, line 1, column 2: expected a column name with its unit in brackets such as 'H [kA/m]', got 'H [kOe'
        'B [kA/m]'     | h.csv, line 1, column 2: column B: expected a flux density such as 1.2 T or 12 kG, got 'kA/m' (a field strength unit)
        ''             | h.csv, line 1, column 2: expected a column name with its unit in brackets such as 'H [kA/m]', got ''
        """)
    void bad_header_cells_say_what_was_expected(String cell, String message) {
        assertEquals(message, assertThrows(BadInputException.class, () -> ColumnHeader.parse(cell, AT)).getMessage());
    }

    @Test
    void a_layout_finds_the_h_value_and_temperature_columns_in_any_order() {
        TableLayout layout = TableLayout.of("h.csv", 1, new String[] {"J [T]", "T [K]", "H [A/m]"});
        assertEquals(2, layout.hColumn());
        assertEquals(0, layout.valueColumn());
        assertEquals(1, layout.temperatureColumn());
        assertEquals(Quantity.J, layout.quantity());
        assertEquals(3, layout.columns());
        assertEquals("T [K]", layout.name(1));
    }

    @Test
    void a_magnetization_column_is_read_as_polarization() {
        TableLayout layout = TableLayout.of("h.csv", 1, new String[] {"H [A/m]", "M [kA/m]"});
        assertEquals(Quantity.J, layout.quantity());
        assertEquals(true, layout.magnetization());
        assertEquals(-1, layout.temperatureColumn());
    }

    @Test
    void a_layout_needs_an_h_and_a_value_column_and_at_most_one_temperature() {
        assertEquals("h.csv, line 1: no H column; expected a header such as 'H [kOe],J [kG]'",
                assertThrows(BadInputException.class, () -> TableLayout.of("h.csv", 1, new String[] {"J [T]", "T [K]"})).getMessage());
        assertEquals("h.csv, line 1: no B, J or M column; expected a header such as 'H [kOe],J [kG]'",
                assertThrows(BadInputException.class, () -> TableLayout.of("h.csv", 1, new String[] {"H [A/m]", "T [K]"})).getMessage());
        assertEquals("h.csv, line 1, column 3: a second T column, after 'T [K]' in column 1; a curve file has one H column, one of B, J or M,"
                + " and at most one T", assertThrows(BadInputException.class,
                        () -> TableLayout.of("h.csv", 1, new String[] {"T [K]", "H [A/m]", "T [°C]", "J [T]"})).getMessage());
    }
}
