package org.kneepoint.fitter.library;

import java.time.Instant;

/**
 * A stored fit: what it was fitted to (a grade, optionally one of its curves by temperature and
 * kind, or a material's susceptibility), the model, its parameters as a JSON object, the residual,
 * when and by which program version.
 */
public record FitRecord(String grade, Double curveTemperatureK, String curveKind, String material, String model,
        String parametersJson, Double residual, Instant fittedAt, String programVersion) {

    public FitRecord {
        if (model == null || model.isBlank() || parametersJson == null || fittedAt == null || programVersion == null) {
            throw new IllegalArgumentException("a fit needs a model, parameters, a time and a program version");
        }
        if (grade == null && material == null) {
            throw new IllegalArgumentException("a fit belongs to a grade or to a material");
        }
        fittedAt = fittedAt.truncatedTo(java.time.temporal.ChronoUnit.MILLIS);
    }
}
