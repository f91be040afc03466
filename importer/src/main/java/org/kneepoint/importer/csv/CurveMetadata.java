package org.kneepoint.importer.csv;

import java.util.List;

/**
 * The {@code # key: value} lines of a curve file. Every field is optional (null when absent); the
 * density is in kg/m³, the temperature in kelvin and the kind is "normal", "intrinsic" or "loop".
 */
public record CurveMetadata(String grade, String family, String supplier, Double density, Double temperatureK,
        String kind, String source, String notes) {

    /** The keys a curve file may use, in the order they are documented. */
    public static final List<String> KEYS = List.of("grade", "family", "supplier", "density", "temperature", "kind", "source", "notes");

    /** The kinds a {@code # kind:} line may name. */
    public static final List<String> KINDS = List.of("normal", "intrinsic", "loop");

    public static CurveMetadata empty() {
        return new CurveMetadata(null, null, null, null, null, null, null, null);
    }
}
