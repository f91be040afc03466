package org.kneepoint.server.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.time.Instant;
import java.util.Map;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.library.FitRecord;

/**
 * {@code --save} of the fit commands: a fit is stored only with something the library holds — the
 * grade (and, when the library has it, the curve of that kind and temperature) or the material
 * whose susceptibility was fitted. A file fit names its grade or material in its metadata; the
 * check runs before the fit, so a refused save costs nothing and writes nothing.
 */
final class FitSaving {

    private static final ObjectMapper COMPACT = new ObjectMapper();

    private FitSaving() {
    }

    static void requireGrade(Library library, String grade, String source) {
        if (grade == null) {
            throw new BadInputException(InputLocation.of("option --save"), source + " names no grade (no '# grade:' line),"
                    + " so the fit has nothing in the library to belong to; import the file and fit the stored grade");
        }
        if (library.reader().grade(grade).isEmpty()) {
            throw new BadInputException(InputLocation.of("option --save"), "grade '" + grade + "' of " + source
                    + " is not in the library at " + library.location().describe() + "; import it first");
        }
    }

    static void requireMaterial(Library library, String material, String source) {
        if (library.reader().susceptibility(material).isEmpty()) {
            throw new BadInputException(InputLocation.of("option --save"), "material '" + material + "' of " + source
                    + " has no susceptibility in the library at " + library.location().describe() + "; import it first");
        }
    }

    /** A record of a fit made now by this program version; the parameters become a compact JSON object. */
    static FitRecord record(String grade, Double curveTemperatureK, String curveKind, String material, String model,
            Map<String, Object> parameters, double residual) {
        try {
            return new FitRecord(grade, curveTemperatureK, curveKind, material, model,
                    COMPACT.writeValueAsString(parameters), residual, Instant.now(), VersionInfo.version());
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write the fit parameters as JSON", e);
        }
    }
}
