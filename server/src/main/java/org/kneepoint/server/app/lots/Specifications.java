package org.kneepoint.server.app.lots;

import java.util.ArrayList;
import java.util.List;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.qualification.Limit;
import org.kneepoint.fitter.qualification.Specification;
import org.kneepoint.fitter.qualification.SpecifiedQuantity;

/**
 * Sets and shows a grade's specifications. Setting one names at least one quantity; the quantities
 * named replace what is stored at that temperature, the others stay, and the specification's
 * version goes up by one (one transaction; nothing is written on any error).
 */
public final class Specifications {

    private Specifications() {
    }

    /** Stores the request and answers the grade's specifications after it. */
    public static SpecificationDocument set(Library library, SpecificationRequest request) {
        requireGrade(library, request.grade());
        List<Limit> limits = new ArrayList<>();
        for (SpecifiedQuantity quantity : SpecifiedQuantity.values()) {
            Double minimum = request.minimums().get(quantity);
            Double typical = request.typicals().get(quantity);
            if (minimum != null || typical != null) {
                limits.add(valid(() -> new Limit(quantity, minimum, typical)));
            }
        }
        Specification specification = valid(() -> new Specification(request.temperatureK(), limits));
        library.qualificationWriter().setSpecification(request.grade(), specification);
        return show(library, request.grade());
    }

    public static SpecificationDocument show(Library library, String grade) {
        requireGrade(library, grade);
        return SpecificationDocument.of(grade, library.qualificationReader().specifications(grade));
    }

    static void requireGrade(Library library, String grade) {
        if (library.reader().grade(grade).isEmpty()) {
            throw new NotFoundException("no grade named '" + grade + "' in the library");
        }
    }

    private static <T> T valid(java.util.function.Supplier<T> value) {
        try {
            return value.get();
        } catch (IllegalArgumentException e) {
            throw new BadInputException(e.getMessage());
        }
    }
}
