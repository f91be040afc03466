package org.kneepoint.fitter.qualification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;

class SpecificationTest {

    @Test
    void a_specification_needs_at_least_one_limit() {
        assertThrows(IllegalArgumentException.class, () -> new Specification(293.15, List.of()));
    }

    @Test
    void a_limit_needs_a_positive_minimum_or_typical_value() {
        assertThrows(IllegalArgumentException.class, () -> new Limit(SpecifiedQuantity.BR, null, null));
        assertThrows(IllegalArgumentException.class, () -> new Limit(SpecifiedQuantity.BR, -1.0, null));
        assertThrows(IllegalArgumentException.class, () -> new Limit(SpecifiedQuantity.BR, 1.3, 1.2));
        assertThrows(IllegalArgumentException.class, () -> new Limit(SpecifiedQuantity.SQUARENESS, 1.2, null));
    }

    @Test
    void merging_replaces_the_named_values_and_keeps_the_others() {
        Specification stored = new Specification(293.15, List.of(new Limit(SpecifiedQuantity.HCJ, 1.0e6, null),
                new Limit(SpecifiedQuantity.BR, 1.2, 1.25)));
        Specification merged = stored.mergedWith(new Specification(293.15, List.of(new Limit(SpecifiedQuantity.BR, 1.22, null))));
        assertEquals(List.of(new Limit(SpecifiedQuantity.BR, 1.22, 1.25), new Limit(SpecifiedQuantity.HCJ, 1.0e6, null)), merged.limits());
    }

    @Test
    void quantity_keys_are_read_without_regard_to_case() {
        assertEquals(SpecifiedQuantity.BH_MAX, SpecifiedQuantity.ofKey("BHmax").orElseThrow());
    }
}
