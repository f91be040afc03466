package org.kneepoint.importer.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;

class CurveKindsTest {

    @Test
    void without_a_kind_line_the_value_column_decides() {
        assertEquals(CurveKind.NORMAL, CurveKinds.of("k.csv", null, Quantity.B));
        assertEquals(CurveKind.INTRINSIC, CurveKinds.of("k.csv", null, Quantity.J));
    }

    @Test
    void a_loop_may_hold_either_quantity() {
        assertEquals(CurveKind.LOOP, CurveKinds.of("k.csv", "loop", Quantity.B));
        assertEquals(CurveKind.LOOP, CurveKinds.of("k.csv", "loop", Quantity.J));
    }

    @Test
    void a_kind_that_contradicts_the_column_is_refused() {
        assertEquals("k.csv: the metadata say kind: intrinsic but the value column holds B; an intrinsic curve has a J or M column",
                assertThrows(BadInputException.class, () -> CurveKinds.of("k.csv", "intrinsic", Quantity.B)).getMessage());
    }

    @Test
    void delimiters_allow_a_decimal_comma_except_the_comma_itself() {
        assertEquals(Delimiter.TAB, Delimiter.of("a\tb"));
        assertEquals(null, Delimiter.of("a b"));
        assertEquals(true, Delimiter.SEMICOLON.allowsDecimalComma());
        assertEquals(false, Delimiter.COMMA.allowsDecimalComma());
        assertEquals("tab", Delimiter.TAB.word());
        assertEquals(';', Delimiter.SEMICOLON.character());
    }

    @Test
    void read_limits_must_be_positive() {
        assertEquals(64L * 1024 * 1024, ReadLimits.defaults().maxBytes());
        assertThrows(IllegalArgumentException.class, () -> new ReadLimits(0));
    }
}
