package org.kneepoint.importer.input;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class ExcerptTest {

    @Test
    void short_text_is_quoted_whole_and_stripped() {
        assertEquals("kGauss", Excerpt.of("  kGauss "));
    }

    @Test
    void long_text_is_cut_after_forty_characters_with_its_length() {
        assertEquals("a".repeat(40) + "… (10000000 characters)", Excerpt.of("a".repeat(10_000_000)));
    }

    @Test
    void control_and_bidirectional_characters_are_written_as_escapes_so_the_message_stays_one_line() {
        assertEquals("a\\u000Ab\\u0000c\\u202Ed\\u0009e", Excerpt.of("a\nb\u0000c\u202Ed\te"));
    }

    @Test
    void a_cut_never_splits_a_surrogate_pair() {
        String text = "x".repeat(39) + "🧲" + "y";
        assertEquals("x".repeat(39) + "… (42 characters)", Excerpt.of(text));
        assertEquals("🧲", Excerpt.of("🧲"));
    }
}
