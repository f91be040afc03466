package org.kneepoint.server.http;

import io.javalin.http.Context;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.library.StoredGrade;
import org.kneepoint.server.app.grades.GradeEdit;

/**
 * Edits a grade's details from a request, for the API (query parameters) and the grade page's
 * form (form fields) alike: {@code version} (the version the edit was made from) is required, the
 * fields of {@link GradeEdit#FIELDS} that are present change, an empty one is cleared, any other
 * parameter is refused. The page's {@code token} field (the write token) and its form token are not details.
 */
public final class GradeEditRequests {

    private static final int MAX_VERSION = Integer.MAX_VALUE - 1;

    private GradeEditRequests() {
    }

    /** The edit from the query parameters. */
    static StoredGrade fromQuery(Context context, Library library) {
        return apply(context.pathParam("name"), context.queryParamMap(), "query parameter '%s'", library);
    }

    /** The edit from the fields of the grade page's form. */
    public static StoredGrade fromForm(Context context, Library library) {
        return apply(context.pathParam("name"), context.formParamMap(), "form field '%s'", library);
    }

    private static StoredGrade apply(String grade, Map<String, List<String>> parameters, String place, Library library) {
        Map<String, String> changes = new LinkedHashMap<>();
        String version = null;
        for (Map.Entry<String, List<String>> parameter : parameters.entrySet()) {
            String name = parameter.getKey();
            if (parameter.getValue().size() != 1) {
                throw bad(place, name, "given " + parameter.getValue().size() + " times; give it once");
            }
            String value = parameter.getValue().get(0);
            switch (name) {
                case "version" -> version = value;
                case "token", FormTokens.FIELD -> { }
                default -> changes.put(name, value);
            }
        }
        return new GradeEdit(changes, place).applyTo(library, grade, version(place, version));
    }

    private static int version(String place, String text) {
        if (text == null || text.isBlank()) {
            throw bad(place, "version", "missing; give the version the edit was made from (the grade's \"version\")");
        }
        try {
            int version = Integer.parseInt(text.strip());
            if (version >= 1 && version <= MAX_VERSION) {
                return version;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw bad(place, "version", "expected a whole number from 1, got '" + text + "'");
    }

    private static BadInputException bad(String place, String name, String problem) {
        return new BadInputException(InputLocation.of(String.format(place, name)), problem);
    }
}
