package org.kneepoint.db;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.library.FitRecord;
import org.kneepoint.fitter.library.GradeDetails;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.ImportInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.SusceptibilityPoint;

/**
 * How long each stored text may be: the widths of the columns in the migrations, in one place, so
 * that an over-long text is refused with one line before any row is written (rather than as the
 * database's own error, which differs between engines).
 */
final class StorageLimits {

    static final int NAME = 500;
    static final int FAMILY = 200;
    static final int SUPPLIER = 1000;
    static final int FILE_NAME = 1000;
    static final int LONG_TEXT = 100_000;
    static final int FIT_MODEL = 40;
    static final int PROGRAM_VERSION = 64;

    private StorageLimits() {
    }

    static void check(GradeInfo grade) {
        require("grade name", grade.name(), NAME);
        require("family", grade.family(), FAMILY);
        require("supplier", grade.supplier(), SUPPLIER);
        require("notes", grade.notes(), LONG_TEXT);
        require("provenance", grade.provenance(), LONG_TEXT);
    }

    static void check(GradeDetails details) {
        require("grade details: supplier", details.supplier(), SUPPLIER);
        require("grade details: notes", details.notes(), LONG_TEXT);
    }

    static void check(ImportInfo info) {
        require("file name", info.fileName(), FILE_NAME);
    }

    static void check(LibraryCurve curve) {
        require("grade name", curve.grade(), NAME);
        require("curve source", curve.source(), LONG_TEXT);
    }

    static void check(SusceptibilityPoint point) {
        require("material", point.material(), NAME);
        require("susceptibility source", point.source(), LONG_TEXT);
    }

    static void check(FitRecord fit) {
        require("fit material", fit.material(), NAME);
        require("fit model", fit.model(), FIT_MODEL);
        require("fit parameters", fit.parametersJson(), LONG_TEXT);
        require("program version", fit.programVersion(), PROGRAM_VERSION);
    }

    static void check(org.kneepoint.fitter.library.LotInfo lot) {
        require("lot", lot.name(), NAME);
        require("lot notes", lot.notes(), LONG_TEXT);
    }

    static void check(org.kneepoint.fitter.library.LotCurve curve) {
        require("sample", curve.sample(), NAME);
        require("curve source", curve.source(), LONG_TEXT);
    }

    /** A text (may be null) no longer than its column. */
    private static void require(String what, String value, int maxLength) {
        if (value != null && value.length() > maxLength) {
            throw new BadInputException(what + " is " + value.length() + " characters long; at most " + maxLength + " are kept");
        }
    }
}
