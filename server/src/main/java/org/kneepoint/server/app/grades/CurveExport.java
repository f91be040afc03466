package org.kneepoint.server.app.grades;

import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.CurveTable;
import org.kneepoint.fitter.curve.CurveTables;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.loadline.DamagedCurve;
import org.kneepoint.fitter.loadline.IntrinsicCurve;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.importer.export.CurveExportWriter;
import org.kneepoint.importer.export.ExportHeader;
import org.kneepoint.importer.export.ExportUnits;
import org.kneepoint.server.app.wording.Temperatures;

/**
 * A grade's curve at a temperature written for another program (CSV re-readable by import, JSON,
 * or bare numbers): the stored curve at T, or else the temperature model's, marked modeled and,
 * outside the measured temperatures, extrapolated. The CLI's {@code export} and the HTTP export
 * both write through here, so they say the same thing. With {@code after} (null: none) the curve is that of a magnet
 * damaged by those steps ({@link CurveDamage}, {@link DamagedCurve}): what a field solver should use for it.
 */
public record CurveExport(String grade, double temperatureK, Format format, Quantity quantity, Integer points,
        ExportUnits units, boolean shifted, boolean bare, CurveDamage after) {

    /** The text formats of an export. */
    public enum Format { CSV, JSON }

    public CurveExport {
        if (bare && format == Format.JSON) {
            throw new BadInputException("--bare writes CSV numbers only; leave out --format json");
        }
    }

    /** An export of the undamaged curve. */
    public CurveExport(String grade, double temperatureK, Format format, Quantity quantity, Integer points, ExportUnits units,
            boolean shifted, boolean bare) {
        this(grade, temperatureK, format, quantity, points, units, shifted, bare, null);
    }

    /** The export's text; {@code version} names the program in the notes. */
    public String write(LibraryReader library, String version) {
        List<GradeCurve> curves = GradeCurves.at(library, grade, temperatureK);
        GradeCurve stored = curves.stream().min(Comparator.comparing(c -> c.curve().kind() == CurveKind.LOOP)).orElseThrow();
        GradeInfo info = library.grade(grade).orElseThrow();
        DemagnetizationCurve curve = stored.curve();
        String damage = "";
        if (after != null) {
            if (curve.kind() == CurveKind.LOOP) {
                throw new BadInputException("grade '" + grade + "' has only a loop at " + Temperatures.celsius(temperatureK)
                        + "; --after needs a demagnetization curve there");
            }
            TemperatureModel model = GradeCurves.measured(grade, GradeCurves.stored(library, grade))
                    .bounded(GradeCurves.family(library, grade));
            CurveDamage.Outcome outcome = after.outcome(model);
            IntrinsicCurve atT = model.at(temperatureK);
            curve = DamagedCurve.of(curve, outcome.loss(), atT.remanence(), atT.recoilPermeability());
            damage = outcome.describe(after);
        }
        CurveTable table = CurveTables.of(curve, quantity, points, shifted);
        String notes = String.format(Locale.ROOT, "exported by kneepoint %s from the %s %s curve at %s%s%s: %s",
                version, stored.modeled() ? "modeled" : "stored", stored.curve().kind().name().toLowerCase(Locale.ROOT),
                Temperatures.celsius(stored.curve().temperatureK()),
                stored.extrapolated() ? " (EXTRAPOLATED beyond the measured temperatures)" : "", damage, table.description());
        ExportHeader header = new ExportHeader(info.name(), info.family(), stored.curve().temperatureK(),
                quantity == Quantity.B ? "normal" : "intrinsic", stored.source(), notes);
        return bare ? CurveExportWriter.bare(table, units)
                : format == Format.JSON ? CurveExportWriter.json(header, table, units)
                : CurveExportWriter.csv(header, table, units);
    }
}
