package org.kneepoint.importer.csv;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityParser;

/** Gathers the metadata lines of a file: only the allowed keys, each once, each with a value. */
final class MetadataCollector {

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
            throw new BadInputException(at, "unknown metadata key '" + entry.key() + "'; expected one of " + allowedKeys);
        }
        if (values.containsKey(entry.key())) {
            throw new BadInputException(at, "metadata key '" + entry.key() + "' is given twice");
        }
        if (entry.value().isEmpty()) {
            throw new BadInputException(at, "metadata key '" + entry.key() + "' has no value");
        }
        values.put(entry.key(), entry.value());
        lines.put(entry.key(), line);
    }

    String text(String key) {
        return values.get(key);
    }

    /** The value of a key parsed as a quantity of the dimension, or null when the key is absent. */
    Double quantity(String key, Dimension dimension) {
        String value = values.get(key);
        if (value == null) {
            return null;
        }
        InputLocation at = InputLocation.line(source, lines.get(key));
        double parsed;
        try {
            parsed = QuantityParser.parse(value, dimension);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(at, e.getMessage());
        }
        if (!(parsed > 0)) {
            throw new BadInputException(at, key + " must be positive" + (dimension == Dimension.TEMPERATURE ? " (above absolute zero)" : "")
                    + ", got '" + value + "'");
        }
        return parsed;
    }

    /** The value of a key, which must be one of {@code allowed}; null when absent. */
    String choice(String key, List<String> allowed) {
        String value = values.get(key);
        if (value != null && !allowed.contains(value)) {
            throw new BadInputException(InputLocation.line(source, lines.get(key)),
                    "unknown " + key + " '" + value + "'; expected one of " + allowed);
        }
        return value;
    }
}
