package org.kneepoint.server.text;

import java.util.LinkedHashMap;
import java.util.Map;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.GradeSummary;
import org.kneepoint.fitter.library.StoredGrade;

/** The JSON objects of a grade, the same for the CLI and the API: a row of the grade list, and a grade's details. */
public final class GradeJson {

    private GradeJson() {
    }

    /** {@code name, family, supplier, temperaturesK, curves, price}. */
    public static Map<String, Object> summary(GradeSummary grade) {
        Map<String, Object> row = new LinkedHashMap<>();
        row.put("name", grade.name());
        row.put("family", grade.family());
        row.put("supplier", grade.supplier());
        row.put("temperaturesK", grade.temperaturesK());
        row.put("curves", grade.curves());
        row.put("price", grade.price());
        return row;
    }

    /** {@code name, family, supplier, density, notes, provenance, price, version}. */
    public static Map<String, Object> details(StoredGrade stored) {
        GradeInfo info = stored.grade();
        Map<String, Object> grade = new LinkedHashMap<>();
        grade.put("name", info.name());
        grade.put("family", info.family());
        grade.put("supplier", info.supplier());
        grade.put("density", info.density());
        grade.put("notes", info.notes());
        grade.put("provenance", info.provenance());
        grade.put("price", info.price());
        grade.put("version", stored.version());
        return grade;
    }
}
