package org.kneepoint.server.app.fits;

import org.kneepoint.server.app.version.VersionInfo;

import java.time.Instant;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.library.FitRecord;
import org.kneepoint.server.app.Json;

/**
 * {@code --save} of the fit commands: a fit is stored only with something the library holds — the
 * grade (and, when the library has it, the curve of that kind and temperature) or the material
 * whose susceptibility was fitted. A file fit names its grade or material in its metadata; the
 * check runs before the fit, so a refused save costs nothing and writes nothing.
 */
public final class FitSaving {

    private FitSaving() {
    }

    public static void requireGrade(Library library, String grade, String source) {
        if (grade == null) {
            throw new BadInputException(InputLocation.of("option --save"), source + " names no grade (no '# grade:' line),"
                    + " so the fit has nothing in the library to belong to; import the file and fit the stored grade");
        }
        if (library.reader().grade(grade).isEmpty()) {
            throw new BadInputException(InputLocation.of("option --save"), "grade '" + grade + "' of " + source
                    + " is not in the library at " + library.location().describe() + "; import it first");
        }
    }

    public static void requireMaterial(Library library, String material, String source) {
        if (library.reader().susceptibility(material).isEmpty()) {
            throw new BadInputException(InputLocation.of("option --save"), "material '" + material + "' of " + source
                    + " has no susceptibility in the library at " + library.location().describe() + "; import it first");
        }
    }

    /** A record of a fit made now by this program version; the parameters (a record) become a compact JSON object. */
    public static FitRecord record(String grade, Double curveTemperatureK, String curveKind, String material, String model,
            Object parameters, double residual) {
        return new FitRecord(grade, curveTemperatureK, curveKind, material, model, Json.compact(parameters), residual, Instant.now(),
                VersionInfo.version());
    }
}
