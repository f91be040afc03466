package org.kneepoint.server.app.demo;

import org.kneepoint.server.app.imports.ImportPlan;
import org.kneepoint.server.app.imports.ImportPlanner;
import org.kneepoint.server.app.imports.ImportProgress;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.library.GradeDetails;
import org.kneepoint.fitter.library.ImportBatch;
import org.kneepoint.importer.csv.ReadLimits;

/**
 * Loads the demo library through the ordinary import path: the generated files are written to a
 * temporary folder, checked and planned like any user file, and stored in one transaction; then
 * each new demo grade gets its invented price by an ordinary edit, and two grades their invented
 * specifications and lots ({@link DemoLots}). Files already loaded (same checksum) are skipped and
 * edited grades are left alone, so loading twice changes nothing.
 */
public final class DemoLoader {

    private DemoLoader() {
    }

    /** Loads what is missing; returns the plans (new and already loaded). */
    public static List<ImportPlan> load(Library library) {
        Path folder = null;
        try {
            folder = Files.createTempDirectory("kneepoint-demo-");
            List<Path> files = new ArrayList<>();
            for (Map.Entry<String, String> file : DemoLibrary.files().entrySet()) {
                Path path = folder.resolve(file.getKey());
                Files.writeString(path, file.getValue(), StandardCharsets.UTF_8);
                files.add(path);
            }
            List<ImportPlan> plans = new ImportPlanner(ReadLimits.defaults(), library.reader()).plan(files, Instant.now(), ImportProgress.ignore());
            List<ImportBatch> batches = plans.stream().filter(plan -> !plan.alreadyImported()).map(ImportPlan::batch).toList();
            if (!batches.isEmpty()) {
                library.writer().importBatches(batches);
            }
            setPrices(library);
            DemoLots.load(library, folder);
            return plans;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the demo files to a temporary folder", e);
        } finally {
            deleteQuietly(folder);
        }
    }

    /** Prices of demo grades that are as imported (version 1, no price). */
    private static void setPrices(Library library) {
        DemoLibrary.prices().forEach((name, price) -> library.reader().storedGrade(name)
                .filter(stored -> stored.version() == 1 && stored.grade().price() == null)
                .ifPresent(stored -> {
                    GradeDetails details = GradeDetails.of(stored.grade());
                    library.writer().editGrade(name, 1, new GradeDetails(details.supplier(), details.density(), details.notes(), price));
                }));
    }

    private static void deleteQuietly(Path folder) {
        if (folder == null) {
            return;
        }
        try (Stream<Path> paths = Files.walk(folder)) {
            paths.sorted(Comparator.reverseOrder()).forEach(path -> path.toFile().delete());
        } catch (IOException e) {
            folder.toFile().deleteOnExit();
        }
    }
}
