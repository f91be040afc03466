package org.kneepoint.server.text;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.ImportBatch;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.server.library.ImportPlan;

/** The report of an import (or a dry run) as JSON and as lines of text. */
public final class ImportView {

    private ImportView() {
    }

    public static Map<String, Object> json(List<ImportPlan> plans, boolean dryRun) {
        List<Map<String, Object>> files = new ArrayList<>();
        for (ImportPlan plan : plans) {
            Map<String, Object> file = new LinkedHashMap<>();
            file.put("file", plan.fileName());
            if (plan.alreadyImported()) {
                file.put("status", "already-imported");
                file.put("sha256", plan.earlier().sha256());
                file.put("importedAt", plan.earlier().importedAt().toString());
                file.put("importedAs", plan.earlier().fileName());
            } else {
                ImportBatch batch = plan.batch();
                file.put("status", dryRun ? "valid" : "imported");
                file.put("sha256", batch.info().sha256());
                file.put("grades", batch.grades().stream().map(GradeInfo::name).toList());
                file.put("curves", batch.info().curves());
                file.put("points", batch.info().points());
                file.put("susceptibilityPoints", batch.info().susceptibilityPoints());
                file.put("temperaturesK", temperatures(batch));
            }
            files.add(file);
        }
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("dryRun", dryRun);
        json.put("files", files);
        return json;
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
                        .append(Temperatures.list(temperatures(batch)))
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

    private static List<Double> temperatures(ImportBatch batch) {
        TreeSet<Double> temperatures = new TreeSet<>();
        for (LibraryCurve curve : batch.curves()) {
            temperatures.add(curve.curve().temperatureK());
        }
        return new ArrayList<>(temperatures);
    }
}
