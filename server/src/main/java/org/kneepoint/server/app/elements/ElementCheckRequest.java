package org.kneepoint.server.app.elements;

import java.util.List;
import java.util.Objects;
import org.kneepoint.fitter.elements.TransverseRule;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.importer.csv.ElementFile;
import org.kneepoint.server.app.InputLimits;
import org.kneepoint.server.app.design.GradeChoice;

/**
 * An element check as every front end asks for it: the grade, the element-field files of the load cases in order
 * (already read, {@link ElementChecks#read}, so that a bad file stops everything before the grade is looked up),
 * the temperature of elements whose file has none (null: every file has its own), the direction of elements whose
 * file gives none, the loss limit (a fraction) and the transverse-field rule.
 */
public record ElementCheckRequest(GradeChoice grade, List<ElementFile> files, Double temperature, Direction direction, double lossLimit,
        TransverseRule transverse) {

    public ElementCheckRequest {
        Objects.requireNonNull(grade, "grade");
        files = List.copyOf(files);
        if (files.isEmpty()) {
            throw new BadInputException("name at least one element-field file (one per load case, in order)");
        }
        if (temperature != null) {
            InputLimits.temperatureProblem(temperature, temperature + " K").ifPresent(problem -> {
                throw new BadInputException(problem);
            });
        }
        direction = direction == null ? Direction.ALONG_Z : direction;
        transverse = transverse == null ? TransverseRule.ALONG : transverse;
    }
}
