package org.kneepoint.importer.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.limits.PhysicalLimits;
import org.kneepoint.fitter.units.Dimension;

class MetadataCollectorTest {

    private static MetadataCollector collector() {
        return new MetadataCollector("m.csv", CurveMetadata.KEYS);
    }

    @Test
    void a_metadata_line_has_a_lower_case_key_and_a_stripped_value_and_a_comment_has_none() {
        assertEquals(new MetadataLine("grade", "N40 SH"), MetadataLine.parse("  #  Grade :  N40 SH  "));
        assertEquals(new MetadataLine("molar-mass", "200 g/mol"), MetadataLine.parse("# molar-mass: 200 g/mol"));
        assertNull(MetadataLine.parse("# invented data, not a measurement"));
        assertNull(MetadataLine.parse("# 20: degrees"));
    }

    @Test
    void values_are_kept_with_their_lines_and_quantities_are_converted_to_si() {
        MetadataCollector metadata = collector();
        metadata.add(new MetadataLine("grade", "N40"), 1);
        metadata.add(new MetadataLine("density", "7.5 g/cm³"), 2);
        metadata.add(new MetadataLine("temperature", "68 °F"), 3);
        assertEquals("N40", metadata.text("grade"));
        assertEquals(2, metadata.line("density"));
        assertEquals(0, metadata.line("notes"));
        assertEquals(7500.0, metadata.quantity("density", Dimension.DENSITY, PhysicalLimits.DENSITY), 1e-9);
        assertEquals(293.15, metadata.quantity("temperature", Dimension.TEMPERATURE, PhysicalLimits.CURVE_TEMPERATURE), 1e-9);
        assertNull(metadata.quantity("notes", Dimension.DENSITY, PhysicalLimits.DENSITY));
    }

    @Test
    void unknown_repeated_and_empty_keys_are_refused_at_their_line() {
        MetadataCollector metadata = collector();
        metadata.add(new MetadataLine("grade", "N40"), 1);
        assertEquals("m.csv, line 2: metadata key 'grade' is given twice",
                assertThrows(BadInputException.class, () -> metadata.add(new MetadataLine("grade", "N42"), 2)).getMessage());
        assertEquals("m.csv, line 3: metadata key 'notes' has no value",
                assertThrows(BadInputException.class, () -> metadata.add(new MetadataLine("notes", ""), 3)).getMessage());
        assertEquals("m.csv, line 4: unknown metadata key '" + "k".repeat(40) + "… (5000 characters)'; expected one of " + CurveMetadata.KEYS,
                assertThrows(BadInputException.class, () -> metadata.add(new MetadataLine("k".repeat(5000), "v"), 4)).getMessage());
    }

    @Test
    void quantities_must_be_positive_plausible_and_a_long_value_is_quoted_only_in_part() {
        MetadataCollector metadata = collector();
        metadata.add(new MetadataLine("density", "-5 kg/m³"), 1);
        metadata.add(new MetadataLine("temperature", "9".repeat(1000) + " K"), 2);
        assertEquals("m.csv, line 1: density must be positive, got '-5 kg/m³'",
                assertThrows(BadInputException.class, () -> metadata.quantity("density", Dimension.DENSITY, PhysicalLimits.DENSITY)).getMessage());
        String message = assertThrows(BadInputException.class,
                () -> metadata.quantity("temperature", Dimension.TEMPERATURE, PhysicalLimits.CURVE_TEMPERATURE)).getMessage();
        assertEquals("m.csv, line 2: expected a temperature such as 20 °C or 293.15 K, got '" + "9".repeat(40) + "… (1002 characters)'", message);
    }

    @Test
    void a_choice_must_be_one_of_the_allowed_words() {
        MetadataCollector metadata = collector();
        metadata.add(new MetadataLine("kind", "spiral"), 5);
        assertEquals("m.csv, line 5: unknown kind 'spiral'; expected one of [normal, intrinsic, loop]",
                assertThrows(BadInputException.class, () -> metadata.choice("kind", CurveMetadata.KINDS)).getMessage());
        assertNull(collector().choice("kind", List.of("normal")));
    }

    @Test
    void notes_may_not_hold_a_nul() {
        MetadataCollector metadata = collector();
        assertEquals("m.csv, line 7: notes holds U+0000 (a control character) at character 2; texts may not hold control or bidirectional"
                + " formatting characters",
                assertThrows(BadInputException.class, () -> metadata.add(new MetadataLine("notes", "a\u0000"), 7)).getMessage());
    }
}
