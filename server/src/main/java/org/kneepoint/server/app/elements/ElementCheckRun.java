package org.kneepoint.server.app.elements;

import java.util.List;
import org.kneepoint.fitter.elements.ElementCheckResult;
import org.kneepoint.importer.csv.ElementFile;
import org.kneepoint.importer.export.ElementResultWriter;
import org.kneepoint.server.app.design.GradeModel;

/**
 * An element check that ran: where the grade's model came from, the files read (in load-case order), the
 * temperatures the curves were taken at, and the result.
 *
 * @param model              the grade's temperature model and its description
 * @param files              the element-field files, one per load case
 * @param lowestTemperature  the lowest element temperature of any case, K
 * @param highestTemperature the highest, K
 * @param result             the check
 */
public record ElementCheckRun(GradeModel model, List<ElementFile> files, double lowestTemperature, double highestTemperature,
        ElementCheckResult result) {

    public ElementCheckRun {
        files = List.copyOf(files);
    }

    /** The check's JSON document, the same for {@code check-elements --json} and the API. */
    public ElementCheckDocument document() {
        return ElementCheckDocument.of(this);
    }

    /** Every element's new remanence and recoil permeability, for the solver's next pass (docs/element-fields.md). */
    public String resultsCsv() {
        return ElementResultWriter.csv(files.get(0), result);
    }
}
