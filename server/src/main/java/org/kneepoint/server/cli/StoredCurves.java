package org.kneepoint.server.cli;

import java.util.List;
import java.util.Locale;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.server.text.Temperatures;

/**
 * Finds a grade's stored curves at a temperature (within 0.01 K), or says which temperatures the
 * library has. Modeled curves at other temperatures come with the temperature model of the
 * fitting work; until then only stored temperatures answer.
 */
final class StoredCurves {

    static final double SAME_TEMPERATURE_K = 0.01;

    private StoredCurves() {
    }

    static List<LibraryCurve> at(LibraryReader library, String grade, double temperatureK) {
        if (library.grade(grade).isEmpty()) {
            throw new NotFoundException("no grade named '" + grade + "' in the library; 'kneepoint grades' lists them");
        }
        List<LibraryCurve> curves = library.curves(grade);
        List<LibraryCurve> matching = curves.stream()
                .filter(curve -> Math.abs(curve.curve().temperatureK() - temperatureK) <= SAME_TEMPERATURE_K).toList();
        if (matching.isEmpty()) {
            List<String> stored = curves.stream().map(curve -> curve.curve().temperatureK()).distinct()
                    .map(Temperatures::celsius).toList();
            throw new NotFoundException(String.format(Locale.ROOT,
                    "grade '%s' has no stored curve at %s; it has curves at %s (curves at other temperatures need the temperature model, not yet available)",
                    grade, Temperatures.celsius(temperatureK), stored.isEmpty() ? "no temperature" : String.join(", ", stored)));
        }
        return matching;
    }
}
