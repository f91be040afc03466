package org.kneepoint.server.app.wording;

import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/** Lengths in the commands' one-line descriptions, in millimetres. */
public final class Lengths {

    private static final Unit MILLIMETRE = UnitCatalog.require("mm", Dimension.LENGTH);

    private Lengths() {
    }

    public static String mm(double metres) {
        return QuantityFormatter.format(metres, MILLIMETRE, 5);
    }
}
