package org.kneepoint.importer.export;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.List;

/**
 * An exported curve in the JSON curve format (what {@code export --format json} writes and {@code import} reads back):
 * the grade, its family, the temperature with its unit, the curve's kind, where it came from (left out when unknown),
 * notes, the two column headers with their units and the rows of [H, B or J] in those units.
 *
 * @param temperature the temperature as text with its unit, e.g. {@code 293.15 K}
 */
public record CurveExportDocument(String grade, String family, String temperature, String kind,
        @JsonInclude(JsonInclude.Include.NON_NULL) String source, String notes, List<String> columns, List<double[]> rows) {
}
