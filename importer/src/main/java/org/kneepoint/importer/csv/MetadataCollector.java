package org.kneepoint.importer.csv;

import java.util.LinkedHashMap;
import java.util.Map;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityParser;

/** Gathers the metadata lines of a file, refusing unknown and repeated keys and bad values. */
final class MetadataCollector {

    private final String source;
    private final Map<String, String> values = new LinkedHashMap<>();
    private Double temperatureK;

    MetadataCollector(String source) {
        this.source = source;
    }

    void add(MetadataLine entry, int line) {
        InputLocation at = InputLocation.line(source, line);
        if (!CurveMetadata.KEYS.contains(entry.key())) {
            throw new BadInputException(at, "unknown metadata key '" + entry.key() + "'; expected one of " + CurveMetadata.KEYS);
        }
        if (values.containsKey(entry.key())) {
            throw new BadInputException(at, "metadata key '" + entry.key() + "' is given twice");
        }
        if (entry.value().isEmpty()) {
            throw new BadInputException(at, "metadata key '" + entry.key() + "' has no value");
        }
        if (entry.key().equals("temperature")) {
            try {
                temperatureK = QuantityParser.parse(entry.value(), Dimension.TEMPERATURE);
            } catch (IllegalArgumentException e) {
                throw new BadInputException(at, e.getMessage());
            }
            if (!(temperatureK > 0)) {
                throw new BadInputException(at, "temperature must be above absolute zero, got '" + entry.value() + "'");
            }
        }
        if (entry.key().equals("kind") && !CurveMetadata.KINDS.contains(entry.value())) {
            throw new BadInputException(at, "unknown kind '" + entry.value() + "'; expected one of " + CurveMetadata.KINDS);
        }
        values.put(entry.key(), entry.value());
    }

    CurveMetadata metadata() {
        return new CurveMetadata(values.get("grade"), values.get("family"), values.get("supplier"), temperatureK,
                values.get("kind"), values.get("source"), values.get("notes"));
    }
}
