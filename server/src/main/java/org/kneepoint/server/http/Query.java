package org.kneepoint.server.http;

import io.javalin.http.Context;
import java.util.Locale;
import java.util.function.UnaryOperator;
import java.util.regex.Pattern;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityParser;
import org.kneepoint.server.app.InputLimits;
import org.kneepoint.server.app.design.Position;

/**
 * Reads query parameters of a request (or a page's form fields, {@link #form}) into SI values. A missing required
 * parameter, a value of the wrong kind or a value out of range is bad input naming the parameter and what was expected.
 */
final class Query {

    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    private final UnaryOperator<String> values;
    private final String kind;

    Query(Context context) {
        this(context::queryParam, "query parameter");
    }

    private Query(UnaryOperator<String> values, String kind) {
        this.values = values;
        this.kind = kind;
    }

    /** The fields of a page's form (URL-encoded or multipart), named in messages as form fields. */
    static Query form(Context context) {
        return new Query(context::formParam, "form field");
    }

    /** The text of a parameter, or null when it is absent or blank. */
    String text(String name) {
        String value = values.apply(name);
        return value == null || value.isBlank() ? null : value.strip();
    }

    String required(String name, String example) {
        String value = text(name);
        if (value == null) {
            throw bad(name, "missing; expected e.g. " + name + "=" + example);
        }
        return value;
    }

    /** A temperature with its unit ("120C", "393.15K"), in kelvin, above absolute zero. */
    double temperatureK(String name) {
        String text = required(name, "120C");
        double kelvin = quantity(name, text, Dimension.TEMPERATURE);
        InputLimits.temperatureProblem(kelvin, text).ifPresent(problem -> {
            throw bad(name, problem);
        });
        return kelvin;
    }

    /** A positive length with its unit ("10mm"), in metres, at most 100 m. */
    double length(String name) {
        String text = required(name, "10mm");
        double metres = quantity(name, text, Dimension.LENGTH);
        InputLimits.lengthProblem(metres, text).ifPresent(problem -> {
            throw bad(name, problem);
        });
        return metres;
    }

    /** An optional positive length, or null. */
    Double optionalLength(String name) {
        return text(name) == null ? null : length(name);
    }

    /** An optional whole number in [min, max], or null. */
    Integer optionalInteger(String name, int min, int max) {
        String text = text(name);
        if (text == null) {
            return null;
        }
        int value;
        try {
            value = Integer.parseInt(text);
        } catch (NumberFormatException e) {
            value = Integer.MIN_VALUE;
        }
        if (value < min || value > max) {
            throw bad(name, "expected a whole number between " + min + " and " + max + ", got '" + text + "'");
        }
        return value;
    }

    /** An optional true/false flag, false when absent. */
    boolean flag(String name) {
        String text = text(name);
        if (text == null) {
            return false;
        }
        return switch (text.toLowerCase(Locale.ROOT)) {
            case "true" -> true;
            case "false" -> false;
            default -> throw bad(name, "expected true or false, got '" + text + "'");
        };
    }

    /** One of the given words (lower case), or the default when absent. */
    String choice(String name, String fallback, String... allowed) {
        String text = text(name);
        if (text == null) {
            return fallback;
        }
        for (String word : allowed) {
            if (word.equals(text.toLowerCase(Locale.ROOT))) {
                return word;
            }
        }
        throw bad(name, "expected one of " + String.join(", ", allowed) + ", got '" + text + "'");
    }

    /** An optional temperature in kelvin, or null. */
    Double optionalTemperatureK(String name) {
        return text(name) == null ? null : temperatureK(name);
    }

    /** An optional quantity of a dimension with its unit, in SI, or null; {@code example} shows the form expected. */
    Double optionalQuantity(String name, Dimension dimension, String example) {
        return text(name) == null ? null : quantity(name, dimension, example);
    }

    /** A required quantity of a dimension with its unit, in SI, finite and at most 1e12 in size. */
    double quantity(String name, Dimension dimension, String example) {
        String text = required(name, example);
        double value = text.equals("0") ? 0.0 : quantity(name, text, dimension);
        if (!Double.isFinite(value) || Math.abs(value) > 1e12) {
            throw bad(name, "expected a value such as " + example + ", got '" + text + "'");
        }
        return value;
    }

    /** An optional plain number after stripping {@code suffix} (which must be there when not empty), or null. */
    Double optionalNumber(String name, String suffix, String example) {
        String text = text(name);
        if (text == null) {
            return null;
        }
        String digits = text.replace('\u2212', '-');
        if (!suffix.isEmpty()) {
            if (!digits.endsWith(suffix)) {
                throw bad(name, "expected a value such as " + example + ", got '" + text + "' (no " + suffix + ")");
            }
            digits = digits.substring(0, digits.length() - suffix.length()).strip();
        }
        if (NUMBER.matcher(digits).matches()) {
            double value = Double.parseDouble(digits);
            if (Math.abs(value) <= 1e12) {
                return value;
            }
        }
        throw bad(name, "expected a value such as " + example + ", got '" + text + "'");
    }

    /** A point x,y,z with a length unit ({@link Position#parse}), required. */
    Position position(String name) {
        String text = required(name, "2,0,3mm");
        try {
            return Position.parse(text);
        } catch (IllegalArgumentException e) {
            throw bad(name, e.getMessage());
        }
    }

    private double quantity(String name, String text, Dimension dimension) {
        try {
            return QuantityParser.parse(text, dimension);
        } catch (IllegalArgumentException e) {
            throw bad(name, e.getMessage());
        }
    }

    /** Where a value of this request comes from, for messages: "query parameter 'name'" or "form field 'name'". */
    InputLocation location(String name) {
        return InputLocation.of(kind + " '" + name + "'");
    }

    private BadInputException bad(String name, String problem) {
        return new BadInputException(location(name), problem);
    }
}
