package org.kneepoint.importer.csv;

import org.kneepoint.fitter.elements.ElementField;
import org.kneepoint.fitter.units.Unit;

/**
 * An element-field file read into SI, with the units its positions and field were written in (results for the
 * solver's next pass are written back in them).
 *
 * @param field        the elements
 * @param positionUnit the unit of x, y, z
 * @param fieldUnit    the unit of the field columns (a field strength or a flux density)
 * @param depth        the depth of 2-D data, m; null for 3-D data
 */
public record ElementFile(ElementField field, Unit positionUnit, Unit fieldUnit, Double depth) {
}
