package org.kneepoint.importer.export;

import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/** The unit system of an export: SI (A/m, T) or CGS (Oe, G). */
public enum ExportUnits {
    SI("A/m", "T"),
    CGS("Oe", "G");

    private final Unit field;
    private final Unit flux;

    ExportUnits(String field, String flux) {
        this.field = UnitCatalog.require(field, Dimension.FIELD_STRENGTH);
        this.flux = UnitCatalog.require(flux, Dimension.FLUX_DENSITY);
    }

    public Unit field() {
        return field;
    }

    public Unit flux() {
        return flux;
    }
}
