package org.kneepoint.server.app.lots;

import java.util.List;
import org.kneepoint.fitter.library.GradeSpecification;
import org.kneepoint.fitter.qualification.Limit;

/**
 * A grade's specifications, one per temperature (the JSON of {@code spec show} and {@code spec set}).
 *
 * @param grade          the grade
 * @param specifications by temperature
 */
public record SpecificationDocument(String grade, List<Entry> specifications) {

    /** The limits at one temperature, with the specification's edit version. */
    public record Entry(double temperatureK, int version, List<LimitEntry> limits) {
    }

    /** One quantity's minimum and typical value (SI; null when not given). */
    public record LimitEntry(String name, Double minimum, Double typical) {
    }

    static SpecificationDocument of(String grade, List<GradeSpecification> stored) {
        return new SpecificationDocument(grade, stored.stream().map(SpecificationDocument::entry).toList());
    }

    private static Entry entry(GradeSpecification stored) {
        return new Entry(stored.specification().temperatureK(), stored.version(),
                stored.specification().limits().stream().map(SpecificationDocument::limit).toList());
    }

    private static LimitEntry limit(Limit limit) {
        return new LimitEntry(limit.quantity().key(), limit.minimum(), limit.typical());
    }
}
