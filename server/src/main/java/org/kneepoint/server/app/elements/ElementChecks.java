package org.kneepoint.server.app.elements;

import java.nio.file.Path;
import java.util.List;
import java.util.function.Function;
import org.kneepoint.fitter.elements.ElementCheck;
import org.kneepoint.fitter.elements.ElementCheckResult;
import org.kneepoint.fitter.elements.ElementField;
import org.kneepoint.fitter.elements.ElementSettings;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.importer.csv.ElementFile;
import org.kneepoint.importer.csv.ElementFileReader;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.importer.input.InputFile;
import org.kneepoint.server.app.design.GradeModel;

/**
 * The element check for the command line and the API alike: every file is read first ({@link #read}; a bad one
 * stops the check before anything else is done), then the grade's model is chosen at the temperatures the elements
 * ask for, then every element is judged ({@link ElementCheck}).
 */
public final class ElementChecks {

    private ElementChecks() {
    }

    /** The files named on a command line, in order, each refused when larger than {@code maxBytes}. */
    public static List<ElementFile> read(List<Path> paths, long maxBytes) {
        ElementFileReader reader = new ElementFileReader(new ReadLimits(maxBytes));
        return paths.stream().map(reader::read).toList();
    }

    /** Files already in memory (uploads), in order. */
    public static List<ElementFile> readUploads(List<InputFile> uploads) {
        return uploads.stream().map(ElementFileReader::read).toList();
    }

    /** The check; {@code stored} looks a grade of the library up, called only when the request names one. */
    public static ElementCheckRun check(ElementCheckRequest request, Function<String, GradeModel> stored) {
        List<ElementFile> files = request.files();
        double lowest = Double.POSITIVE_INFINITY;
        double highest = Double.NEGATIVE_INFINITY;
        for (ElementFile file : files) {
            ElementField field = file.field();
            if (field.hasTemperatures()) {
                for (int i = 0; i < field.size(); i++) {
                    lowest = Math.min(lowest, field.temperature(i));
                    highest = Math.max(highest, field.temperature(i));
                }
            } else if (request.temperature() != null) {
                lowest = Math.min(lowest, request.temperature());
                highest = Math.max(highest, request.temperature());
            }
        }
        List<ElementField> cases = files.stream().map(ElementFile::field).toList();
        ElementSettings settings = new ElementSettings(request.direction().x(), request.direction().y(), request.direction().z(),
                request.temperature(), request.lossLimit(), request.transverse());
        if (lowest > highest) {
            throw new BadInputException(InputLocation.of(files.get(0).field().source()),
                    "has no temperature column T; give one, or the temperature of the elements");
        }
        GradeModel model = request.grade().model(stored, List.of(lowest, highest));
        ElementCheckResult result = ElementCheck.run(model.model(), cases, settings);
        return new ElementCheckRun(model, files, lowest, highest, result);
    }
}
