package org.kneepoint.importer.plausible;

import java.util.function.Function;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.limits.CurvePlausibility;
import org.kneepoint.fitter.limits.NameCharacters;
import org.kneepoint.fitter.limits.PlausibleRange;

/** Refuses, as bad input at a given place, names with forbidden characters, values out of range and implausible curves. */
public final class PlausibleInput {

    private PlausibleInput() {
    }

    /**
     * The text unchanged, or bad input when it holds a character no name may hold.
     *
     * @param what      what the text is, for the message ("grade", "notes")
     * @param multiLine true for free texts, where tabs and line breaks are allowed
     */
    public static String text(InputLocation at, String what, String text, boolean multiLine) {
        if (text == null) {
            return null;
        }
        int index = NameCharacters.firstForbidden(text, multiLine);
        if (index >= 0) {
            throw new BadInputException(at, what + " holds " + NameCharacters.describe(text.codePointAt(index)) + " at character "
                    + (index + 1) + "; " + (multiLine ? "texts" : "names") + " may not hold control or bidirectional formatting characters");
        }
        return text;
    }

    /** The value unchanged, or bad input when it lies outside {@code range}. */
    public static double within(InputLocation at, String what, double value, PlausibleRange range) {
        if (!range.contains(value)) {
            throw new BadInputException(at, what + " " + range.format(value) + " is outside what is plausible ("
                    + range.describe() + "; see the limits in docs/curve-file-format.md)");
        }
        return value;
    }

    /** The curve unchanged, or bad input at the place {@code place} gives for the first problem found. */
    public static DemagnetizationCurve curve(DemagnetizationCurve curve, Function<CurvePlausibility.Finding, InputLocation> place) {
        CurvePlausibility.check(curve).ifPresent(finding -> {
            throw new BadInputException(place.apply(finding), finding.problem());
        });
        return curve;
    }
}
