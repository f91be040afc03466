package org.kneepoint.server.app.grades;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.library.GradeDetails;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.StoredGrade;
import org.kneepoint.fitter.units.DecimalNumber;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityParser;

/**
 * An edit of a grade's details as people type it, for the CLI and the web alike: only the fields
 * named change, an empty value clears one; density carries its unit ("7.5 g/cm3"), price is a
 * plain number per kilogram. The edit is made from the version the person read, so an edit made
 * meanwhile by someone else is reported as a conflict instead of being overwritten.
 *
 * @param changes  field name ({@link #FIELDS}) → typed value, "" to clear
 * @param place    how to name a field in messages, e.g. "query parameter '%s'" or "--%s"
 */
public record GradeEdit(Map<String, String> changes, String place) {

    /** The editable fields, in the order they are shown. */
    public static final List<String> FIELDS = List.of("supplier", "density", "notes", "price");
    /** Prices above this are taken for a typing error. */
    private static final double MAX_PRICE = 1e9;

    public GradeEdit {
        changes = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(changes));
        for (String field : changes.keySet()) {
            if (!FIELDS.contains(field)) {
                throw bad(place, field, "not an editable detail of a grade (expected " + String.join(", ", FIELDS) + ")");
            }
        }
    }

    /**
     * Applies the edit to the grade as stored at {@code expectedVersion} (null: at the version read
     * now); returns the grade after it.
     */
    public StoredGrade applyTo(Library library, String grade, Integer expectedVersion) {
        StoredGrade stored = library.reader().storedGrade(grade)
                .orElseThrow(() -> new NotFoundException("no grade named '" + grade + "' in the library"));
        GradeDetails details = changed(GradeDetails.of(stored.grade()));
        int version = library.writer().editGrade(grade, expectedVersion != null ? expectedVersion : stored.version(), details);
        GradeInfo before = stored.grade();
        return new StoredGrade(new GradeInfo(before.name(), before.family(), details.supplier(), details.density(), details.notes(),
                before.provenance(), details.price()), version);
    }

    /** The details with this edit's changes. */
    public GradeDetails changed(GradeDetails current) {
        String supplier = changes.containsKey("supplier") ? text(changes.get("supplier")) : current.supplier();
        String notes = changes.containsKey("notes") ? text(changes.get("notes")) : current.notes();
        Double density = changes.containsKey("density") ? density(changes.get("density")) : current.density();
        Double price = changes.containsKey("price") ? price(changes.get("price")) : current.price();
        try {
            return new GradeDetails(supplier, density, notes, price);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("grade details: " + e.getMessage());
        }
    }

    private static String text(String value) {
        return value == null || value.isBlank() ? null : value;
    }

    private Double density(String value) {
        if (text(value) == null) {
            return null;
        }
        double density;
        try {
            density = QuantityParser.parse(value.strip(), Dimension.DENSITY);
        } catch (IllegalArgumentException e) {
            throw bad(place, "density", e.getMessage());
        }
        if (!(density > 0 && density < 1e5)) {
            throw bad(place, "density", "expected a density such as 7.5 g/cm3 or 7500 kg/m3, got '" + value + "'");
        }
        return density;
    }

    private Double price(String value) {
        if (text(value) == null) {
            return null;
        }
        double price = DecimalNumber.parseOrNaN(value.strip(), false);
        if (!(price >= 0 && price <= MAX_PRICE)) {
            throw bad(place, "price", "expected a price per kilogram such as 42.5 (a plain number, 0 to 1e9), got '" + value + "'");
        }
        return price;
    }

    private static BadInputException bad(String place, String field, String problem) {
        return new BadInputException(InputLocation.of(String.format(place, field)), problem);
    }
}
