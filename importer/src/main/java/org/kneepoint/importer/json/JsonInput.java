package org.kneepoint.importer.json;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.limits.PhysicalLimits;
import org.kneepoint.importer.input.Excerpt;

/**
 * How Kneepoint reads JSON: numbers no longer than a measurement can be
 * ({@link PhysicalLimits#NUMBER_LENGTH}), no field twice in one object, nothing after the
 * document; and how a parser's complaint becomes one line of bad input at its line and column.
 */
final class JsonInput {

    /** The parser factory every JSON reader uses. */
    static final JsonFactory FACTORY = JsonFactory.builder()
            .streamReadConstraints(StreamReadConstraints.builder().maxNumberLength(PhysicalLimits.NUMBER_LENGTH).build())
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .build();

    private JsonInput() {
    }

    /** The parser's complaint as bad input at the place it names, else where the parser stands. */
    static BadInputException refusal(String source, JsonProcessingException e, JsonParser parser) {
        JsonLocation at = e.getLocation() != null ? e.getLocation() : parser == null ? null : parser.currentLocation();
        InputLocation where = at == null ? InputLocation.of(source)
                : InputLocation.cell(source, Math.max(0, at.getLineNr()), Math.max(0, at.getColumnNr()), null);
        String message = e.getOriginalMessage() == null ? "" : e.getOriginalMessage();
        if (e instanceof StreamConstraintsException && message.startsWith("Number value length")) {
            return new BadInputException(where, "a number too long to be a measurement; a number has at most "
                    + PhysicalLimits.NUMBER_LENGTH + " characters");
        }
        return new BadInputException(where, "not valid JSON: " + oneLine(message));
    }

    /** After the document: anything but white space is refused. */
    static void requireEnd(String source, JsonParser parser) throws java.io.IOException {
        if (parser.nextToken() != null) {
            JsonLocation at = parser.currentTokenLocation();
            throw new BadInputException(InputLocation.cell(source, at.getLineNr(), at.getColumnNr(), null),
                    "content after the end of the JSON document; a file holds one document");
        }
    }

    private static String oneLine(String message) {
        String line = message.replaceAll("\\s*\\(start marker at \\[Source.*$", "").replaceAll("\\s+", " ").strip();
        return Excerpt.of(line, Excerpt.MESSAGE_LENGTH);
    }
}
