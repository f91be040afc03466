package org.kneepoint.importer.export;

import org.kneepoint.fitter.elements.ElementCheckResult;
import org.kneepoint.fitter.elements.ElementField;
import org.kneepoint.fitter.elements.GivenField;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;
import org.kneepoint.importer.csv.ElementFile;

/**
 * Writes the demagnetized state of every element for a solver's next pass (docs/element-fields.md): one row per
 * element in the order of the tables read, {@code x, y, z} in the first table's length unit, the new remanence
 * {@code Br} in its flux-density unit (tesla when it gave H), the recoil permeability {@code mu_rec} and the
 * element's irreversible loss in percent; numbers in full precision.
 */
public final class ElementResultWriter {

    private ElementResultWriter() {
    }

    public static String csv(ElementFile first, ElementCheckResult result) {
        ElementField field = first.field();
        Unit length = first.positionUnit();
        Unit flux = field.given() == GivenField.FLUX_DENSITY ? first.fieldUnit() : UnitCatalog.si(Dimension.FLUX_DENSITY);
        StringBuilder out = new StringBuilder(64 * (result.elements() + 1));
        out.append("x [").append(length.symbol()).append("],y [").append(length.symbol()).append("],z [").append(length.symbol())
                .append("],Br [").append(flux.symbol()).append("],mu_rec,loss [%]\n");
        for (int i = 0; i < result.elements(); i++) {
            out.append(length.fromSi(field.position(i, 0))).append(',').append(length.fromSi(field.position(i, 1))).append(',')
                    .append(length.fromSi(field.position(i, 2))).append(',').append(flux.fromSi(result.remanence(i))).append(',')
                    .append(result.recoilPermeability(i)).append(',').append(100.0 * result.loss(i)).append('\n');
        }
        return out.toString();
    }
}
