package org.kneepoint.server.app.imports;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.library.ImportBatch;
import org.kneepoint.importer.csv.ReadLimits;

/**
 * One import of files, as the CLI and the web application run it: plan every file (read, check,
 * skip what is already imported), then, unless it is a dry run, store all new batches in one
 * transaction. On any error nothing is written.
 */
public final class ImportRun {

    private ImportRun() {
    }

    /** Runs the import without reporting its progress. */
    public static List<ImportPlan> run(Library library, ReadLimits limits, List<Path> files, boolean dryRun) {
        return run(library, limits, files, dryRun, ImportProgress.ignore());
    }

    /** Runs the import, reporting each file's steps and then the storing to {@code progress}. */
    public static List<ImportPlan> run(Library library, ReadLimits limits, List<Path> files, boolean dryRun, ImportProgress progress) {
        List<ImportPlan> plans = new ImportPlanner(limits, library.reader()).plan(files, Instant.now(), progress);
        List<ImportBatch> batches = plans.stream().filter(plan -> !plan.alreadyImported()).map(ImportPlan::batch).toList();
        if (!dryRun && !batches.isEmpty()) {
            int curves = batches.stream().mapToInt(batch -> batch.info().curves()).sum();
            progress.report(new ImportStep(ImportStep.Stage.STORING, null, files.size(), files.size(), curves, curves));
            library.writer().importBatches(batches);
        }
        return plans;
    }
}
