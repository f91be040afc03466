package org.kneepoint.server.library;

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
import org.kneepoint.fitter.library.ImportBatch;
import org.kneepoint.importer.csv.ReadLimits;

/**
 * Loads the demo library through the ordinary import path: the generated files are written to a
 * temporary folder, checked and planned like any user file, and stored in one transaction. Files
 * already loaded (same checksum) are skipped, so loading twice changes nothing.
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
            return plans;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the demo files to a temporary folder", e);
        } finally {
            deleteQuietly(folder);
        }
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
