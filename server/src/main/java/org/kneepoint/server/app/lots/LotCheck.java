package org.kneepoint.server.app.lots;

import java.util.List;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.library.GradeSpecification;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.LotCurve;
import org.kneepoint.fitter.qualification.CurveDeviation;
import org.kneepoint.fitter.qualification.LotAssessment;
import org.kneepoint.fitter.qualification.LotQualification;
import org.kneepoint.fitter.qualification.QuantityCheck;
import org.kneepoint.fitter.qualification.SampleAssessment;
import org.kneepoint.fitter.qualification.SampleCurve;
import org.kneepoint.fitter.qualification.Specification;

/**
 * Checks a stored lot against its grade's specifications and reference curves
 * ({@link LotQualification}) and answers the result with its reasons. An unknown grade or lot, or a
 * lot stored under another grade, is not found (the message names the grade it is of).
 */
public final class LotCheck {

    private LotCheck() {
    }

    public static LotCheckDocument run(Library library, LotCheckRequest request) {
        List<SampleCurve> curves = lotCurves(library, request.grade(), request.lot()).stream()
                .map(curve -> new SampleCurve(curve.sample(), curve.curve())).toList();
        List<Specification> specifications = library.qualificationReader().specifications(request.grade()).stream()
                .map(GradeSpecification::specification).toList();
        List<DemagnetizationCurve> references = library.reader().curves(request.grade()).stream().map(LibraryCurve::curve).toList();
        LotAssessment assessment = LotQualification.assess(curves, specifications, references, request.band());
        return new LotCheckDocument(request.lot(), request.grade(), assessment.samples().stream().map(LotCheck::sample).toList(),
                assessment.verdict().word(), LotReasons.of(assessment, !specifications.isEmpty()));
    }

    /** The lot's curves; not found when the grade or the lot is unknown, naming the grade a lot of that name is of. */
    static List<LotCurve> lotCurves(Library library, String grade, String lot) {
        Specifications.requireGrade(library, grade);
        if (library.qualificationReader().lot(grade, lot).isEmpty()) {
            List<String> others = library.qualificationReader().gradesWithLot(lot);
            throw new NotFoundException("grade '" + grade + "' has no lot '" + lot + "'"
                    + (others.isEmpty() ? "; 'kneepoint lot list " + grade + "' shows its lots"
                            : "; a lot of that name is of grade " + String.join(", ", others.stream().map(name -> "'" + name + "'").toList())));
        }
        return library.qualificationReader().lotCurves(grade, lot);
    }

    private static LotCheckDocument.Sample sample(SampleAssessment sample) {
        CurveDeviation deviation = sample.deviation();
        return new LotCheckDocument.Sample(sample.sample(), sample.temperatureK(), sample.checks().stream().map(LotCheck::quantity).toList(),
                deviation == null ? null : deviation.share(), deviation == null ? null : deviation.atH());
    }

    private static LotCheckDocument.QuantityResult quantity(QuantityCheck check) {
        return new LotCheckDocument.QuantityResult(check.quantity().key(), check.value(), check.limit(), check.margin(), check.verdict().word());
    }
}
