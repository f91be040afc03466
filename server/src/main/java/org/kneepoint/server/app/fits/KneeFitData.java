package org.kneepoint.server.app.fits;

import java.nio.file.Path;
import java.util.List;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.importer.csv.CurveFile;
import org.kneepoint.importer.csv.CurveFileReader;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.app.grades.GradeCurves;

/**
 * The curves a knee or temperature fit works on: the normal and intrinsic curves of a curve file,
 * or of a grade stored in the library (its loops are left to the Jiles–Atherton fit).
 *
 * @param source what to call them in messages
 * @param grade  the grade they belong to, or null for a file without one
 * @param curves the curves
 */
public record KneeFitData(String source, String grade, List<DemagnetizationCurve> curves) {

    public static KneeFitData of(String target, Library library) {
        var file = FitTarget.file(target);
        if (file.isPresent()) {
            return fromFile(file.get());
        }
        if (library.reader().grade(target).isEmpty()) {
            throw FitTarget.notFound("grade", target, library);
        }
        List<DemagnetizationCurve> curves = GradeCurves.stored(library.reader(), target).stream()
                .map(stored -> stored.curve()).filter(curve -> curve.kind() != CurveKind.LOOP).toList();
        return new KneeFitData(target, target, curves);
    }

    private static KneeFitData fromFile(Path path) {
        CurveFile file = new CurveFileReader(ReadLimits.defaults()).read(path);
        return new KneeFitData(file.source(), file.metadata().grade(),
                file.curves().stream().filter(curve -> curve.kind() != CurveKind.LOOP).toList());
    }

    /** True when the argument names a file (no library needed unless saving). */
    public static boolean isFile(String target) {
        return FitTarget.file(target).isPresent();
    }
}
