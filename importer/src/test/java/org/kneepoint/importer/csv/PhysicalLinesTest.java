package org.kneepoint.importer.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class PhysicalLinesTest {

    @Test
    void an_empty_text_has_no_lines_and_a_final_line_break_starts_none() {
        assertEquals(0, PhysicalLines.of("").count());
        assertEquals(1, PhysicalLines.of("a\n").count());
        assertEquals(2, PhysicalLines.of("a\nb").count());
        assertEquals(2, PhysicalLines.of("\n\n").count());
    }

    @Test
    void lf_crlf_and_cr_each_end_one_line() {
        PhysicalLines lines = PhysicalLines.of("one\r\ntwo\rthree\nfour");
        assertEquals(4, lines.count());
        assertEquals("one", lines.text(1));
        assertEquals("two", lines.text(2));
        assertEquals("three", lines.text(3));
        assertEquals("four", lines.text(4));
        assertEquals(5, lines.start(2));
        assertEquals(9, lines.start(3));
    }

    @Test
    void empty_lines_and_lines_starting_with_a_hash_are_passed_over_but_indented_hashes_are_not() {
        PhysicalLines lines = PhysicalLines.of("\n# c\n  # d\nx\r\n\r\n");
        assertTrue(lines.passedOver(1));
        assertTrue(lines.passedOver(2));
        assertFalse(lines.passedOver(3));
        assertFalse(lines.passedOver(4));
        assertTrue(lines.passedOver(5));
    }

    @Test
    void many_lines_grow_the_index() {
        PhysicalLines lines = PhysicalLines.of("x\n".repeat(1000));
        assertEquals(1000, lines.count());
        assertEquals(1998, lines.start(1000));
        assertEquals("x", lines.text(1000));
    }
}
