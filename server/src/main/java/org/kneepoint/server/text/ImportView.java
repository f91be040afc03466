package org.kneepoint.server.text;

import org.kneepoint.server.app.wording.Temperatures;

import java.util.List;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.ImportBatch;
import org.kneepoint.server.app.imports.ImportPlan;
import org.kneepoint.server.app.imports.ImportReport;

/** The report of an import (or a dry run) as lines of text; its JSON document is {@link ImportReport}. */
public final class ImportView {

    private ImportView() {
    }

    public static String table(List<ImportPlan> plans, boolean dryRun) {
        StringBuilder out = new StringBuilder();
        for (ImportPlan plan : plans) {
            out.append(PlainText.printable(plan.fileName())).append(": ");
            if (plan.alreadyImported()) {
                out.append("already imported at ").append(plan.earlier().importedAt())
                        .append(" as ").append(plan.earlier().fileName()).append(" (same SHA-256); skipped\n");
                continue;
            }
            ImportBatch batch = plan.batch();
            if (!batch.grades().isEmpty()) {
                GradeInfo grade = batch.grades().get(0);
                out.append("grade '").append(PlainText.printable(grade.name())).append("' (").append(PlainText.printable(grade.family())).append("), ")
                        .append(batch.info().curves()).append(batch.info().curves() == 1 ? " curve" : " curves").append(" at ")
                        .append(Temperatures.list(ImportReport.temperatures(batch)))
                        .append(", ").append(batch.info().points()).append(" points");
            } else {
                out.append(batch.info().susceptibilityPoints()).append(" susceptibility points of '")
                        .append(PlainText.printable(batch.susceptibility().get(0).material())).append("'");
            }
            out.append(dryRun ? ": valid\n" : ": imported\n");
        }
        if (dryRun) {
            out.append("dry run: nothing was written\n");
        }
        return out.toString();
    }
}
