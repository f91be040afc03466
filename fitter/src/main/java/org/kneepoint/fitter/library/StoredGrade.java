package org.kneepoint.fitter.library;

/**
 * A grade as read for editing: its content and the row version an edit must name, so that of two
 * people editing the same grade at once the second is told instead of silently overwriting.
 *
 * @param grade   the grade
 * @param version 1 after import, one more after every edit
 */
public record StoredGrade(GradeInfo grade, int version) {

    public StoredGrade {
        if (version < 1) {
            throw new IllegalArgumentException("a grade's version starts at 1, got " + version);
        }
    }
}
