package org.kneepoint.server.app.lots;

import java.util.List;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.library.LotCurve;
import org.kneepoint.fitter.library.LotInfo;

/** Lists a grade's lots. */
public final class LotListing {

    private LotListing() {
    }

    public static LotListDocument list(Library library, String grade) {
        Specifications.requireGrade(library, grade);
        List<LotCurve> curves = library.qualificationReader().lotCurves(grade);
        return new LotListDocument(grade, library.qualificationReader().lots(grade).stream().map(lot -> entry(lot, curves)).toList());
    }

    private static LotListDocument.Entry entry(LotInfo lot, List<LotCurve> all) {
        List<LotCurve> curves = all.stream().filter(curve -> curve.lot().equals(lot.name())).toList();
        return new LotListDocument.Entry(lot.name(), lot.measuredOn() == null ? null : lot.measuredOn().toString(), lot.notes(),
                curves.stream().map(LotCurve::sample).distinct().sorted().toList(),
                curves.stream().map(curve -> curve.curve().temperatureK()).distinct().sorted().toList(), curves.size());
    }
}
