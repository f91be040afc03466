package org.kneepoint.server.app.demo;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.qualification.SpecifiedQuantity;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.app.lots.LotImport;
import org.kneepoint.server.app.lots.LotImportRequest;
import org.kneepoint.server.app.lots.SpecificationRequest;
import org.kneepoint.server.app.lots.Specifications;

/**
 * The demo's lot qualification, all of it invented: the motor maker's specifications at 20 °C for two
 * demo grades and lots delivered of each, measured on two samples. The lots of "DEMO NdFeB 40/160"
 * pass comfortably; those of "DEMO NdFeB 38/200" have an HcJ just above its minimum, so a guard band
 * of 1 % makes them inconclusive and one lot falls below it. Curves follow the demo's knee shape
 * ({@link DemoLibrary}) at 20 °C. Loaded through the ordinary use cases, and only what is missing:
 * a grade that already has a specification, and a lot already stored, are left alone.
 */
final class DemoLots {

    /** An invented lot: grade, name, day of measurement, and per sample its Br (T) and HcJ (A/m) at 20 °C. */
    private record DemoLot(String grade, String name, LocalDate measuredOn, double[][] samples) {
    }

    private static final String COMFORTABLE = "DEMO NdFeB 40/160";
    private static final String MARGINAL = "DEMO NdFeB 38/200";
    private static final double ROOM_K = 293.15;
    /** Points per curve: about 4 kA/m apart, so a measured HcJ lies within 4 kA/m above the value it was made with. */
    private static final int POINTS = 600;

    /** The specifications: Br and HcJ minimums at 20 °C. */
    private static final Map<String, double[]> MINIMUMS = Map.of(COMFORTABLE, new double[] {1.24, 1.52e6}, MARGINAL, new double[] {1.21, 1.98e6});

    private static final List<DemoLot> LOTS = List.of(
            new DemoLot(COMFORTABLE, "N-2611", LocalDate.parse("2026-11-03"), new double[][] {{1.272, 1.61e6}, {1.268, 1.60e6}}),
            new DemoLot(COMFORTABLE, "N-2617", LocalDate.parse("2026-11-17"), new double[][] {{1.266, 1.62e6}, {1.270, 1.59e6}}),
            new DemoLot(MARGINAL, "S-2609", LocalDate.parse("2026-11-06"), new double[][] {{1.238, 1.990e6}, {1.241, 1.988e6}}),
            new DemoLot(MARGINAL, "S-2620", LocalDate.parse("2026-11-24"), new double[][] {{1.236, 1.984e6}, {1.240, 1.970e6}}));

    private DemoLots() {
    }

    static void load(Library library, Path folder) {
        MINIMUMS.forEach((grade, minimums) -> {
            if (library.qualificationReader().specifications(grade).isEmpty()) {
                Specifications.set(library, new SpecificationRequest(grade, ROOM_K,
                        Map.of(SpecifiedQuantity.BR, minimums[0], SpecifiedQuantity.HCJ, minimums[1]), Map.of()));
            }
        });
        for (DemoLot lot : LOTS) {
            if (library.qualificationReader().lot(lot.grade(), lot.name()).isEmpty()) {
                LotImport.run(library, ReadLimits.defaults(), new LotImportRequest(lot.grade(), lot.name(), files(lot, folder), lot.measuredOn(),
                        null, "DEMO DATA — invented lot"));
            }
        }
    }

    private static List<Path> files(DemoLot lot, Path folder) {
        DemoGrade grade = DemoLibrary.GRADES.stream().filter(candidate -> candidate.name().equals(lot.grade())).findFirst().orElseThrow();
        List<Path> files = new ArrayList<>();
        for (int s = 0; s < lot.samples().length; s++) {
            Path path = folder.resolve(lot.name() + "-s" + (s + 1) + ".csv");
            try {
                Files.writeString(path, curveFile(grade, lot, lot.samples()[s][0], lot.samples()[s][1], s), StandardCharsets.UTF_8);
            } catch (IOException e) {
                throw new UncheckedIOException("cannot write the demo lot files to a temporary folder", e);
            }
            files.add(path);
        }
        return files;
    }

    private static String curveFile(DemoGrade grade, DemoLot lot, double br, double hcj, int sample) {
        StringBuilder out = new StringBuilder();
        out.append("# DEMO DATA — an invented lot for the Kneepoint demo scenario; not a real delivery\n");
        out.append("# grade: ").append(grade.name()).append('\n');
        out.append("# temperature: 20 °C\n");
        out.append("# source: demo hysteresisgraph (invented)\n");
        out.append("H [kA/m],J [T]\n");
        SplittableRandom noise = new SplittableRandom((lot.name() + sample).hashCode());
        for (int i = 0; i < POINTS; i++) {
            double h = 0.05 * hcj - 1.2 * hcj * i / (POINTS - 1);
            double width = grade.roundness() * hcj;
            double j = h <= -hcj ? 0.0 : (br + MU0 * (grade.muRec() - 1) * h) * (1 - Math.exp(-(h + hcj) / width));
            out.append(String.format(Locale.ROOT, "%.6g,%.6g%n", h / 1e3, j * (1 + 2e-4 * noise.nextGaussian())));
        }
        return out.toString();
    }
}
