package org.kneepoint.importer.csv;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.limits.PlausibleRange;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityParser;
import org.kneepoint.importer.input.Excerpt;
import org.kneepoint.importer.plausible.PlausibleInput;

/**
 * Gathers the metadata lines of a file: only the allowed keys, each once, each with a value; names
 * without control or bidirectional formatting characters, quantities within their plausible range.
 */
final class MetadataCollector {

    /** Keys whose values are free texts, where line breaks may appear (in the JSON form). */
    private static final List<String> FREE_TEXTS = List.of("source", "notes");

    private final String source;
    private final List<String> allowedKeys;
    private final Map<String, String> values = new LinkedHashMap<>();
    private final Map<String, Integer> lines = new LinkedHashMap<>();

    MetadataCollector(String source, List<String> allowedKeys) {
        this.source = source;
        this.allowedKeys = List.copyOf(allowedKeys);
    }

    void add(MetadataLine entry, int line) {
        InputLocation at = InputLocation.line(source, line);
        if (!allowedKeys.contains(entry.key())) {
            throw new BadInputException(at, "unknown metadata key '" + Excerpt.of(entry.key()) + "'; expected one of " + allowedKeys);
        }
        if (values.containsKey(entry.key())) {
            throw new BadInputException(at, "metadata key '" + entry.key() + "' is given twice");
        }
        if (entry.value().isEmpty()) {
            throw new BadInputException(at, "metadata key '" + entry.key() + "' has no value");
        }
        PlausibleInput.text(at, entry.key(), entry.value(), FREE_TEXTS.contains(entry.key()));
        values.put(entry.key(), entry.value());
        lines.put(entry.key(), line);
    }

    String text(String key) {
        return values.get(key);
    }

    /** The line a key was given on, or 0 when it is absent. */
    int line(String key) {
        return lines.getOrDefault(key, 0);
    }

    /** The value of a key parsed as a quantity of the dimension and checked against {@code plausible}; null when absent. */
    Double quantity(String key, Dimension dimension, PlausibleRange plausible) {
        String value = values.get(key);
        if (value == null) {
            return null;
        }
        InputLocation at = InputLocation.line(source, lines.get(key));
        double parsed;
        try {
            parsed = QuantityParser.parse(value, dimension);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(at, value.length() <= Excerpt.LENGTH ? e.getMessage()
                    : "expected " + dimension.expectation() + ", got '" + Excerpt.of(value) + "'");
        }
        if (!(parsed > 0)) {
            throw new BadInputException(at, key + " must be positive" + (dimension == Dimension.TEMPERATURE ? " (above absolute zero)" : "")
                    + ", got '" + Excerpt.of(value) + "'");
        }
        return PlausibleInput.within(at, key, parsed, plausible);
    }

    /** The value of a key, which must be one of {@code allowed}; null when absent. */
    String choice(String key, List<String> allowed) {
        String value = values.get(key);
        if (value != null && !allowed.contains(value)) {
            throw new BadInputException(InputLocation.line(source, lines.get(key)),
                    "unknown " + key + " '" + Excerpt.of(value) + "'; expected one of " + allowed);
        }
        return value;
    }
}
