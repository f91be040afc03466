package org.kneepoint.fitter.study;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.units.QuantityParser;

/**
 * One {@code NAME=SPEC} tolerance as typed: a symmetric band {@code ±2%} (or {@code +-2%}), {@code ±0.05mm},
 * {@code ±5K}, or an asymmetric one {@code -5%..+0%}. Percent is relative to the nominal value; otherwise the number
 * carries a unit of the input's dimension ({@link ToleranceName#dimension()}; kelvin only for a temperature, a plain
 * number for {@code mu-rec} and {@code pc}). Both ends of an asymmetric band are of one kind.
 */
public record ToleranceSpec(ToleranceName name, ToleranceBand band) {

    private static final Pattern SYMMETRIC = Pattern.compile("(?:±|\\+-|\\+/-)(.*)");
    private static final Pattern ASYMMETRIC = Pattern.compile("(.+?)\\.\\.(.+)");
    private static final Pattern NUMBER = Pattern.compile("[+\\-\u2212]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?");

    /** Parses {@code text}; {@code option} names where it came from (e.g. {@code --tolerance}) for the message. */
    public static ToleranceSpec parse(String text, String option) {
        String typed = text == null ? "" : text.strip();
        int equals = typed.indexOf('=');
        if (equals < 0) {
            throw refused(option, typed, "expected NAME=SPEC, e.g. br=±2%");
        }
        String label = typed.substring(0, equals).strip();
        ToleranceName name = ToleranceName.of(label)
                .orElseThrow(() -> refused(option, typed, "unknown input '" + label + "'; one of " + ToleranceName.all()));
        String spec = typed.substring(equals + 1).replace(" ", "");
        try {
            return new ToleranceSpec(name, band(name, spec));
        } catch (IllegalArgumentException e) {
            throw refused(option, typed, e.getMessage());
        }
    }

    private static ToleranceBand band(ToleranceName name, String spec) {
        Matcher symmetric = SYMMETRIC.matcher(spec);
        if (symmetric.matches()) {
            String magnitude = symmetric.group(1);
            if (magnitude.isEmpty() || !Character.isDigit(magnitude.charAt(0)) && magnitude.charAt(0) != '.') {
                throw new IllegalArgumentException("a symmetric band needs a positive number after ±, e.g. ±2%");
            }
            End end = end(name, magnitude);
            return new ToleranceBand(-end.value(), end.value(), end.relative());
        }
        Matcher asymmetric = ASYMMETRIC.matcher(spec);
        if (asymmetric.matches()) {
            End lower = end(name, asymmetric.group(1));
            End upper = end(name, asymmetric.group(2));
            if (lower.relative() != upper.relative()) {
                throw new IllegalArgumentException("both ends of a band must be percent, or both absolute");
            }
            if (!(lower.value() < upper.value())) {
                throw new IllegalArgumentException("the band's lower end must lie below its upper end, e.g. -5%..+0%");
            }
            return new ToleranceBand(lower.value(), upper.value(), lower.relative());
        }
        throw new IllegalArgumentException("expected a band such as ±2%, +-2%, " + example(name) + " or -5%..+0%");
    }

    private record End(double value, boolean relative) {
    }

    private static End end(ToleranceName name, String text) {
        if (text.endsWith("%")) {
            String number = text.substring(0, text.length() - 1);
            if (!NUMBER.matcher(number).matches()) {
                throw new IllegalArgumentException("'" + text + "' is not a percentage");
            }
            return new End(Double.parseDouble(number.replace('\u2212', '-')) / 100.0, true);
        }
        if (name.dimension() == null) {
            if (!NUMBER.matcher(text).matches()) {
                throw new IllegalArgumentException("'" + text + "' is not a number or a percentage (" + name.label()
                        + " has no unit)");
            }
            return new End(Double.parseDouble(text.replace('\u2212', '-')), false);
        }
        if (name == ToleranceName.TEMPERATURE) {
            if (!text.endsWith("K") || !NUMBER.matcher(text.substring(0, text.length() - 1)).matches()) {
                throw new IllegalArgumentException("a temperature band is in K or %, e.g. ±5K, got '" + text + "'");
            }
            return new End(Double.parseDouble(text.substring(0, text.length() - 1).replace('\u2212', '-')), false);
        }
        return new End(QuantityParser.parse(text, name.dimension()), false);
    }

    private static String example(ToleranceName name) {
        if (name.dimension() == null) {
            return "±0.02";
        }
        return switch (name.dimension()) {
            case LENGTH -> "±0.05mm";
            case TEMPERATURE -> "±5K";
            case FLUX_DENSITY -> "±0.02T";
            default -> "±10kA/m";
        };
    }

    private static BadInputException refused(String option, String typed, String problem) {
        return new BadInputException(option + " '" + typed + "': " + problem);
    }
}
