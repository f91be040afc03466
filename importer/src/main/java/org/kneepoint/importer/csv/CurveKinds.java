package org.kneepoint.importer.csv;

import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;

/** The curve kind of a file: from its {@code # kind:} line, which must agree with its value column. */
final class CurveKinds {

    private CurveKinds() {
    }

    static CurveKind of(String source, String declared, Quantity quantity) {
        if (declared == null) {
            return quantity == Quantity.B ? CurveKind.NORMAL : CurveKind.INTRINSIC;
        }
        CurveKind kind = CurveKind.valueOf(declared.toUpperCase(java.util.Locale.ROOT));
        if (kind == CurveKind.NORMAL && quantity != Quantity.B || kind == CurveKind.INTRINSIC && quantity != Quantity.J) {
            throw new BadInputException(InputLocation.of(source), "the metadata say kind: " + declared
                    + " but the value column holds " + quantity + (kind == CurveKind.NORMAL ? "; a normal curve has a B column"
                            : "; an intrinsic curve has a J or M column"));
        }
        return kind;
    }
}
