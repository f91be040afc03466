package org.kneepoint.importer.export;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.util.ArrayList;
import java.util.List;
import org.kneepoint.fitter.curve.CurveTable;

/**
 * Writes an exported curve. CSV: {@code # key: value} lines (control characters in values become
 * spaces, so each stays one line), a header {@code H [A/m],B [T]} and one row per point, numbers
 * in full precision — a file the curve-file reader reads back. JSON: the JSON curve format with
 * the same fields. Bare: only the rows, for solvers that read numbers alone.
 */
public final class CurveExportWriter {

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private CurveExportWriter() {
    }

    public static String csv(ExportHeader header, CurveTable table, ExportUnits units) {
        StringBuilder out = new StringBuilder();
        metadata(out, "grade", header.grade());
        metadata(out, "family", header.family());
        metadata(out, "temperature", header.temperatureK() + " K");
        metadata(out, "kind", header.kind());
        metadata(out, "source", header.source());
        metadata(out, "notes", header.notes());
        out.append(columns(table, units).get(0)).append(',').append(columns(table, units).get(1)).append('\n');
        rows(out, table, units);
        return out.toString();
    }

    public static String bare(CurveTable table, ExportUnits units) {
        StringBuilder out = new StringBuilder();
        rows(out, table, units);
        return out.toString();
    }

    public static String json(ExportHeader header, CurveTable table, ExportUnits units) {
        try {
            return JSON.writeValueAsString(document(header, table, units)) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write the export as JSON", e);
        }
    }

    /** The JSON export as a record. */
    private static CurveExportDocument document(ExportHeader header, CurveTable table, ExportUnits units) {
        double[] h = table.h();
        double[] values = table.values();
        List<double[]> rows = new ArrayList<>(h.length);
        for (int i = 0; i < h.length; i++) {
            rows.add(new double[] {units.field().fromSi(h[i]), units.flux().fromSi(values[i])});
        }
        return new CurveExportDocument(header.grade(), header.family(), header.temperatureK() + " K", header.kind(), header.source(),
                header.notes(), columns(table, units), rows);
    }

    private static List<String> columns(CurveTable table, ExportUnits units) {
        return List.of("H [" + units.field().symbol() + "]", table.quantity() + " [" + units.flux().symbol() + "]");
    }

    private static void rows(StringBuilder out, CurveTable table, ExportUnits units) {
        double[] h = table.h();
        double[] values = table.values();
        for (int i = 0; i < h.length; i++) {
            out.append(units.field().fromSi(h[i])).append(',').append(units.flux().fromSi(values[i])).append('\n');
        }
    }

    private static void metadata(StringBuilder out, String key, String value) {
        if (value != null && !value.isBlank()) {
            out.append("# ").append(key).append(": ").append(value.replaceAll("\\p{Cntrl}", " ").strip()).append('\n');
        }
    }
}
