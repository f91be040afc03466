package org.kneepoint.server.app;

import java.util.Optional;

/**
 * The limits every front end applies to what a person types, so that the command line and the HTTP routes accept
 * and refuse the same values: a temperature above absolute zero and at most {@value #MAX_TEMPERATURE_K} K, a
 * length above zero and at most {@value #MAX_LENGTH_M} m. Each check answers the problem in words (empty when
 * the value is fine); the front end adds where the value came from (an option, a query parameter).
 */
public final class InputLimits {

    /** Highest temperature accepted, in kelvin: far above any magnet's Curie temperature, so only typing errors meet it. */
    public static final double MAX_TEMPERATURE_K = 5000;

    /** Longest length accepted, in metres. */
    public static final double MAX_LENGTH_M = 100;

    private InputLimits() {
    }

    /** What is wrong with a temperature {@code kelvin} typed as {@code text}, or empty when it is fine. */
    public static Optional<String> temperatureProblem(double kelvin, String text) {
        if (kelvin > 0 && kelvin <= MAX_TEMPERATURE_K) {
            return Optional.empty();
        }
        return Optional.of("expected a temperature above absolute zero and below " + (int) MAX_TEMPERATURE_K + " K, got '"
                + text.strip() + "'");
    }

    /** What is wrong with a length {@code metres} typed as {@code text}, or empty when it is fine. */
    public static Optional<String> lengthProblem(double metres, String text) {
        if (metres > 0 && metres <= MAX_LENGTH_M) {
            return Optional.empty();
        }
        return Optional.of("expected a positive length up to " + (int) MAX_LENGTH_M + " m, got '" + text.strip() + "'");
    }
}
