package org.kneepoint.server.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The one JSON writer: records in declaration order, nulls kept, numbers that are not finite written as null. */
class JsonTest {

    record Sample(String name, Double missing, double notANumber, List<Double> values, boolean flag) {
    }

    @Test
    void a_record_is_written_with_its_components_in_declaration_order_and_its_nulls() {
        String json = Json.compact(new Sample("x", null, 1.5, List.of(1.0, 2.0), true));
        assertEquals("{\"name\":\"x\",\"missing\":null,\"notANumber\":1.5,\"values\":[1.0,2.0],\"flag\":true}", json);
    }

    @Test
    void a_number_that_is_not_finite_is_written_as_null_never_as_a_token_or_a_string() {
        String json = Json.compact(new Sample("x", Double.POSITIVE_INFINITY, Double.NaN, Arrays.asList(Double.NEGATIVE_INFINITY, 3.0), false));
        assertEquals("{\"name\":\"x\",\"missing\":null,\"notANumber\":null,\"values\":[null,3.0],\"flag\":false}", json);
    }

    @Test
    void the_indented_form_parses_back_to_the_same_tree() {
        Sample sample = new Sample("a \"quoted\" name", 2.0, 0.25, List.of(), false);
        assertEquals(Json.tree(sample), Json.read(Json.write(sample)));
        assertTrue(Json.write(sample).contains("\n"));
    }

    @Test
    void a_stored_document_that_does_not_parse_is_a_bug_named_as_such() {
        IllegalStateException error = assertThrows(IllegalStateException.class, () -> Json.read("{\"br\": "));
        assertTrue(error.getMessage().startsWith("stored JSON does not parse"), error.getMessage());
    }

    @Test
    void one_or_many_answers_the_only_document_itself_and_a_list_otherwise() {
        assertEquals("a", OneOrMany.of(List.of("a")));
        assertEquals(List.of("a", "b"), OneOrMany.of(List.of("a", "b")));
        assertEquals(List.of(), OneOrMany.of(List.of()));
    }
}
