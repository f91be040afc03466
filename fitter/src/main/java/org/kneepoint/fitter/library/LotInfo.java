package org.kneepoint.fitter.library;

import java.time.LocalDate;

/**
 * A delivered lot of a grade.
 *
 * @param grade      the grade's name
 * @param name       the lot's identifier, unique within the grade
 * @param measuredOn the day its samples were measured, or null
 * @param notes      free text, or null
 */
public record LotInfo(String grade, String name, LocalDate measuredOn, String notes) {

    public LotInfo {
        LibraryText.requireName("grade name", grade);
        LibraryText.requireName("lot", name);
    }
}
