package org.kneepoint.server.app.fits;

import org.kneepoint.server.app.grades.CurveChoice;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.stream.IntStream;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.model.ja.MeasuredLoop;
import org.kneepoint.importer.csv.CurveFile;
import org.kneepoint.importer.csv.CurveFileReader;
import org.kneepoint.importer.csv.ReadLimits;

/**
 * What a Jiles–Atherton fit runs on, and where it came from. A loop ({@code kind: loop}) keeps
 * its rows in measurement order and starts demagnetized; with a magnetizing field, that field is
 * visited first. A normal or intrinsic (second-quadrant) curve needs the magnetizing field it was
 * measured after; its points are taken in falling H, the order of a demagnetization measurement.
 *
 * @param source           file name or "grade NAME"
 * @param grade            the grade named by the file's metadata or the library, or null
 * @param curve            the chosen curve
 * @param magnetizingField field visited before the first point, A/m, or null
 * @param loop             the data as the fitter takes them
 */
public record JilesAthertonFitData(String source, String grade, DemagnetizationCurve curve, Double magnetizingField,
        MeasuredLoop loop) {

    public boolean isLoop() {
        return curve.kind() == CurveKind.LOOP;
    }

    public static JilesAthertonFitData fromFile(Path file, Double temperatureK, Double magnetizingField) {
        CurveFile read = new CurveFileReader(ReadLimits.defaults()).read(file);
        DemagnetizationCurve curve = CurveChoice.choose(read.curves(), temperatureK, read.source());
        return of(read.source(), read.metadata().grade(), curve, magnetizingField);
    }

    public static JilesAthertonFitData fromGrade(LibraryReader reader, String grade, Double temperatureK, Double magnetizingField) {
        List<DemagnetizationCurve> stored = reader.curves(grade).stream().map(LibraryCurve::curve).toList();
        List<DemagnetizationCurve> loops = stored.stream().filter(c -> c.kind() == CurveKind.LOOP).toList();
        String where = "grade " + grade;
        if (loops.isEmpty() && magnetizingField == null) {
            throw new BadInputException(InputLocation.of(where), "has no stored loop curve; to fit one of its "
                    + "second-quadrant curves give the field it was magnetized at, e.g. --magnetizing-field 3MA/m");
        }
        DemagnetizationCurve curve = CurveChoice.choose(loops.isEmpty() ? stored : loops, temperatureK, where);
        return of(where, grade, curve, magnetizingField);
    }

    private static JilesAthertonFitData of(String source, String grade, DemagnetizationCurve curve, Double magnetizingField) {
        try {
            return new JilesAthertonFitData(source, grade, curve, magnetizingField, toLoop(curve, magnetizingField, source));
        } catch (BadInputException e) {
            throw e.location().isPresent() ? e : new BadInputException(InputLocation.of(source), e.getMessage());
        }
    }

    private static MeasuredLoop toLoop(DemagnetizationCurve curve, Double magnetizingField, String source) {
        double[] h = curve.h();
        double[] b = curve.b();
        if (curve.kind() == CurveKind.LOOP) {
            double[] prior = magnetizingField == null ? new double[0] : new double[] {magnetizingField};
            return new MeasuredLoop(h, b, prior, 0);
        }
        if (magnetizingField == null) {
            throw new BadInputException(InputLocation.of(source), "is a " + curve.kind().name().toLowerCase()
                    + " (second-quadrant) curve, not a loop; give the field it was magnetized at, e.g."
                    + " --magnetizing-field 3MA/m, or mark a full loop '# kind: loop'");
        }
        int[] falling = IntStream.range(0, h.length).boxed()
                .sorted(Comparator.comparingDouble((Integer i) -> -h[i])).mapToInt(Integer::intValue).toArray();
        double[] sortedH = Arrays.stream(falling).mapToDouble(i -> h[i]).toArray();
        double[] sortedB = Arrays.stream(falling).mapToDouble(i -> b[i]).toArray();
        return MeasuredLoop.secondQuadrant(sortedH, sortedB, magnetizingField);
    }
}
