package org.kneepoint.importer.csv;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A {@code # key: value} line. A {@code #} line whose first word is not followed by a colon is a
 * comment; one whose key is not one of {@link CurveMetadata#KEYS} is refused, so a typing mistake
 * such as {@code # temprature: 20 °C} cannot pass silently.
 */
public record MetadataLine(String key, String value) {

    private static final Pattern KEY_VALUE = Pattern.compile("#\\s*([A-Za-z][A-Za-z_-]*)\\s*:(.*)");

    /** The key and value of a {@code #} line, or null when the line is a plain comment. */
    static MetadataLine parse(String line) {
        Matcher matcher = KEY_VALUE.matcher(line.strip());
        if (!matcher.matches()) {
            return null;
        }
        return new MetadataLine(matcher.group(1).toLowerCase(Locale.ROOT), matcher.group(2).strip());
    }
}
