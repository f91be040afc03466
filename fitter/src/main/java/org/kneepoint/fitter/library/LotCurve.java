package org.kneepoint.fitter.library;

import org.kneepoint.fitter.curve.DemagnetizationCurve;

/**
 * A curve measured on one sample of a lot, stored apart from the grade's reference curves: the
 * curve (with its temperature), where it came from, and the checksum of its import (null if none).
 */
public record LotCurve(String grade, String lot, String sample, DemagnetizationCurve curve, String source, String importSha256) {

    public LotCurve {
        LibraryText.requireName("grade name", grade);
        LibraryText.requireName("lot", lot);
        LibraryText.requireName("sample", sample);
        if (curve == null || curve.temperatureK() == null) {
            throw new IllegalArgumentException("a lot's curve needs a temperature");
        }
    }
}
