package org.kneepoint.fitter.library;

import org.kneepoint.fitter.curve.DemagnetizationCurve;

/**
 * A curve stored for a grade: the curve (with its temperature, which the library requires), the
 * text saying where it came from, and the checksum of the import that brought it (null if none).
 */
public record LibraryCurve(String grade, DemagnetizationCurve curve, String source, String importSha256) {

    public LibraryCurve {
        LibraryText.requireName("grade name", grade);
        if (curve == null || curve.temperatureK() == null) {
            throw new IllegalArgumentException("a stored curve needs a temperature");
        }
    }
}
