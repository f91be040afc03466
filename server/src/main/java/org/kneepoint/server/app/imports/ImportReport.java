package org.kneepoint.server.app.imports;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.List;
import java.util.TreeSet;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.ImportBatch;
import org.kneepoint.fitter.library.LibraryCurve;

/**
 * The report of an import or a dry run ({@code kneepoint import --json}, {@code POST /api/import}, the result of an
 * import job): each file with what it holds, or when and as what it was imported before.
 */
public record ImportReport(boolean dryRun, List<FileReport> files) {

    public ImportReport {
        files = List.copyOf(files);
    }

    /**
     * One file. {@code status} is {@code already-imported} (then {@code importedAt} and {@code importedAs} say when and
     * under which name, and the counts are left out), {@code valid} (a dry run) or {@code imported}; the keys that do
     * not apply are left out.
     *
     * @param sha256        the file's SHA-256, hex
     * @param importedAt    ISO-8601 instant of the earlier import
     * @param temperaturesK the distinct temperatures of the file's curves, ascending, K
     */
    public record FileReport(String file, String status, String sha256,
            @JsonInclude(JsonInclude.Include.NON_NULL) String importedAt,
            @JsonInclude(JsonInclude.Include.NON_NULL) String importedAs,
            @JsonInclude(JsonInclude.Include.NON_NULL) List<String> grades,
            @JsonInclude(JsonInclude.Include.NON_NULL) Integer curves,
            @JsonInclude(JsonInclude.Include.NON_NULL) Integer points,
            @JsonInclude(JsonInclude.Include.NON_NULL) Integer susceptibilityPoints,
            @JsonInclude(JsonInclude.Include.NON_NULL) List<Double> temperaturesK) {

        /** The status of a file imported before. */
        public static final String ALREADY_IMPORTED = "already-imported";

        /** True when the file was imported before and skipped. */
        public boolean alreadyImported() {
            return ALREADY_IMPORTED.equals(status);
        }

        static FileReport of(ImportPlan plan, boolean dryRun) {
            if (plan.alreadyImported()) {
                return new FileReport(plan.fileName(), ALREADY_IMPORTED, plan.earlier().sha256(), plan.earlier().importedAt().toString(),
                        plan.earlier().fileName(), null, null, null, null, null);
            }
            ImportBatch batch = plan.batch();
            return new FileReport(plan.fileName(), dryRun ? "valid" : "imported", batch.info().sha256(), null, null,
                    batch.grades().stream().map(GradeInfo::name).toList(), batch.info().curves(), batch.info().points(),
                    batch.info().susceptibilityPoints(), temperatures(batch));
        }
    }

    /** The report of the planned (and, unless a dry run, stored) files. */
    public static ImportReport of(List<ImportPlan> plans, boolean dryRun) {
        return new ImportReport(dryRun, plans.stream().map(plan -> FileReport.of(plan, dryRun)).toList());
    }

    /** The distinct temperatures of a batch's curves, ascending, K. */
    public static List<Double> temperatures(ImportBatch batch) {
        TreeSet<Double> temperatures = new TreeSet<>();
        for (LibraryCurve curve : batch.curves()) {
            temperatures.add(curve.curve().temperatureK());
        }
        return List.copyOf(temperatures);
    }
}
