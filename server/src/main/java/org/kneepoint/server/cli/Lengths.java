package org.kneepoint.server.cli;

import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/** Lengths in the commands' one-line descriptions, in millimetres. */
final class Lengths {

    private static final Unit MILLIMETRE = UnitCatalog.require("mm", Dimension.LENGTH);

    private Lengths() {
    }

    static String mm(double metres) {
        return QuantityFormatter.format(metres, MILLIMETRE, 5);
    }
}
