package org.kneepoint.tests;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.library.ImportBatch;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.app.imports.ImportPlan;
import org.kneepoint.server.app.imports.ImportPlanner;
import org.kneepoint.server.app.imports.ImportProgress;

/**
 * A library of many invented sintered-NdFeB grades (seeded), imported through the ordinary import path: each grade
 * has J–H curves at 20, 80 and 150 °C of the invented knee shape J = (Br + μ0(μrec − 1)H)(1 − exp(−(H + HcJ)/w)),
 * with Br and HcJ falling linearly and exponentially with temperature. Nothing here is a real product's data.
 */
final class GeneratedGrades {

    private static final int[] CELSIUS = {20, 80, 150};
    private static final int POINTS = 40;

    private GeneratedGrades() {
    }

    /** The name of the {@code index}th generated grade. */
    static String name(int index) {
        return String.format(Locale.ROOT, "Generated grade %04d", index);
    }

    /** Imports {@code count} generated grades (files written to {@code folder}, then planned and stored in one transaction). */
    static void load(Library library, Path folder, int count, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        try {
            Files.createDirectories(folder);
            List<Path> files = new ArrayList<>();
            for (int i = 0; i < count; i++) {
                Path file = folder.resolve("generated-" + i + ".csv");
                Files.writeString(file, curveFile(name(i), random));
                files.add(file);
            }
            List<ImportPlan> plans = new ImportPlanner(ReadLimits.defaults(), library.reader()).plan(files, Instant.now(),
                    ImportProgress.ignore());
            List<ImportBatch> batches = plans.stream().filter(plan -> !plan.alreadyImported()).map(ImportPlan::batch).toList();
            library.writer().importBatches(batches);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String curveFile(String grade, SplittableRandom random) {
        double br20 = 1.05 + 0.35 * random.nextDouble();
        double hcj20 = 9e5 + 2.1e6 * random.nextDouble();
        double muRec = 1.03 + 0.04 * random.nextDouble();
        double alpha = -0.09 - 0.04 * random.nextDouble();
        double beta = -0.45 - 0.2 * random.nextDouble();
        double width = 0.03 + 0.02 * random.nextDouble();
        StringBuilder out = new StringBuilder("# invented grade, generated for a load test\n# grade: " + grade
                + "\n# family: sintered NdFeB\nT [°C],H [kA/m],J [T]\n");
        for (int celsius : CELSIUS) {
            double br = br20 * (1 + alpha / 100 * (celsius - 20));
            double hcj = hcj20 * Math.exp(beta / 100 * (celsius - 20));
            for (int i = 0; i < POINTS; i++) {
                double h = 0.05 * hcj - 1.2 * hcj * i / (POINTS - 1);
                double j = h <= -hcj ? 0 : (br + MU0 * (muRec - 1) * h) * (1 - Math.exp(-(h + hcj) / (width * hcj)));
                out.append(String.format(Locale.ROOT, "%d,%.5g,%.5g%n", celsius, h / 1e3, j));
            }
        }
        return out.toString();
    }
}
