package org.kneepoint.server.app.grades;

import org.kneepoint.fitter.curve.DemagnetizationCurve;

/**
 * A grade's curve at a temperature as the application hands it on: a stored measurement, or the
 * temperature model's curve (modeled), which may lie outside the measured temperatures (extrapolated).
 */
public record GradeCurve(String grade, DemagnetizationCurve curve, String source, boolean modeled, boolean extrapolated) {
}
