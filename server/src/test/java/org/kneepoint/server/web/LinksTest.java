package org.kneepoint.server.web;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Stored names become one URL segment each: percent-encoded, a space as %20, never +, a slash never a path step. */
class LinksTest {

    @Test
    void a_grade_name_is_one_percent_encoded_path_segment() {
        assertEquals("/grades/DEMO%20NdFeB%2042%2F100", Links.grade("DEMO NdFeB 42/100"));
        assertEquals("a%2Bb%20c", Links.segment("a+b c"));
        assertEquals("%3Cscript%3E%22%27", Links.segment("<script>\"'"));
        assertEquals("Ferrit%C3%A9", Links.segment("Ferrité"));
    }

    @Test
    void a_link_to_a_grade_is_labelled_with_the_name_as_it_is() {
        Links.Link link = Links.Link.toGrade("N42 <b>");
        assertEquals("/grades/N42%20%3Cb%3E", link.href());
        assertEquals("N42 <b>", link.label());
    }
}
