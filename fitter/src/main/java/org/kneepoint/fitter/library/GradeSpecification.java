package org.kneepoint.fitter.library;

import org.kneepoint.fitter.qualification.Specification;

/**
 * A grade's specification at one temperature as the library keeps it, with its edit version.
 *
 * @param grade         the grade's name
 * @param specification the limits at the temperature
 * @param version       1 when first set, one more after every change
 */
public record GradeSpecification(String grade, Specification specification, int version) {

    public GradeSpecification {
        LibraryText.requireName("grade name", grade);
        if (specification == null) {
            throw new IllegalArgumentException("a grade's specification needs its limits");
        }
        if (version < 1) {
            throw new IllegalArgumentException("a specification's version starts at 1, got " + version);
        }
    }
}
