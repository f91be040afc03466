package org.kneepoint.fitter.limits;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class NameCharactersTest {

    @Test
    void ordinary_names_in_any_script_pass() {
        assertEquals(-1, NameCharacters.firstForbidden("N42SH – 烧结钕铁硼 – Феррит 🧲", false));
        assertEquals(-1, NameCharacters.firstForbidden("tab\tseparated", false));
    }

    @Test
    void nul_and_other_control_characters_are_found_at_their_index() {
        assertEquals(3, NameCharacters.firstForbidden("N40\u0000", false));
        assertEquals(1, NameCharacters.firstForbidden("a\u0085b", false));
        assertEquals(1, NameCharacters.firstForbidden("a\nb", false));
    }

    @Test
    void line_breaks_are_allowed_in_free_texts_but_nul_is_not() {
        assertEquals(-1, NameCharacters.firstForbidden("line one\r\nline two", true));
        assertEquals(4, NameCharacters.firstForbidden("note\u0000", true));
    }

    @Test
    void every_bidirectional_formatting_character_is_refused() {
        // UAX #9, Table 4 (from memory): ALM, LRM, RLM, LRE, RLE, PDF, LRO, RLO, LRI, RLI, FSI, PDI.
        for (char c : new char[] {'\u061C', '\u200E', '\u200F', '\u202A', '\u202B', '\u202C', '\u202D', '\u202E', '\u2066', '\u2067',
            '\u2068', '\u2069'}) {
            assertEquals(2, NameCharacters.firstForbidden("ab" + c + "cd", true), Integer.toHexString(c));
        }
    }

    @Test
    void unpaired_surrogates_and_noncharacters_are_refused_but_pairs_pass() {
        assertEquals(0, NameCharacters.firstForbidden("\uD800x", false));
        assertEquals(1, NameCharacters.firstForbidden("x\uDC00", false));
        assertEquals(2, NameCharacters.firstForbidden("ab\uFFFF", false));
        assertEquals(-1, NameCharacters.firstForbidden("\uD83E\uDDF2", false));
    }

    @Test
    void forbidden_characters_are_named_with_their_code_point_and_kind() {
        assertEquals("U+202E (a bidirectional formatting character)", NameCharacters.describe(0x202E));
        assertEquals("U+0000 (a control character)", NameCharacters.describe(0));
        assertEquals("U+D800 (an unpaired surrogate)", NameCharacters.describe(0xD800));
        assertEquals("U+FFFE (a noncharacter)", NameCharacters.describe(0xFFFE));
    }
}
