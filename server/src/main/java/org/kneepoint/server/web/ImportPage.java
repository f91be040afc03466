package org.kneepoint.server.web;

import java.util.List;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.ImportBatch;
import org.kneepoint.server.app.imports.ImportPlan;
import org.kneepoint.server.app.wording.Temperatures;

/**
 * The Import page ({@code /import}, templates {@code importForm.jte}, {@code importPreview.jte},
 * {@code importDone.jte}): a form to upload curve files and susceptibility tables, the preview of a dry run with
 * its validation message, and the result of the import; the preview also offers to store the files in a
 * background job ({@code /jobs/import}, answered by the job's page).
 */
final class ImportPage {

    private ImportPage() {
    }

    /** The upload form, after the message of a refused upload when {@code refusal} is not null. */
    record FormView(Layout.Frame frame, String refusal, FormAccess access) {
    }

    /** The checked files, and the key under which they wait (or null when there is nothing left to import). */
    record PreviewView(Layout.Frame frame, List<PlanRow> plans, String staged, FormAccess access) {
    }

    /** The stored files. */
    record DoneView(Layout.Frame frame, List<PlanRow> plans) {
    }

    /** One file: already imported (as {@code earlier}), or what it holds and its status. */
    record PlanRow(String file, String earlier, String status, String grades, long curves, long points, String temperatures) {
    }

    static String form(FormAccess access, boolean demoPresent) {
        return Templates.render("importForm.jte", new FormView(frame(demoPresent), null, access));
    }

    static String refused(String message, FormAccess access, boolean demoPresent) {
        return Templates.render("importForm.jte", new FormView(frame(demoPresent), message, access));
    }

    static String preview(List<ImportPlan> plans, String staged, FormAccess access, boolean demoPresent) {
        boolean anyNew = plans.stream().anyMatch(plan -> !plan.alreadyImported());
        return Templates.render("importPreview.jte", new PreviewView(frame(demoPresent), rows(plans, "valid"), anyNew ? staged : null,
                access));
    }

    static String done(List<ImportPlan> plans, boolean demoPresent) {
        return Templates.render("importDone.jte", new DoneView(frame(demoPresent), rows(plans, "imported")));
    }

    private static Layout.Frame frame(boolean demoPresent) {
        return new Layout.Frame("Import", "Import", demoPresent);
    }

    private static List<PlanRow> rows(List<ImportPlan> plans, String status) {
        return plans.stream().map(plan -> row(plan, status)).toList();
    }

    private static PlanRow row(ImportPlan plan, String status) {
        if (plan.alreadyImported()) {
            return new PlanRow(plan.fileName(), plan.earlier().fileName() + " at " + plan.earlier().importedAt(), null, null, 0, 0, null);
        }
        ImportBatch batch = plan.batch();
        List<Double> temperatures = batch.curves().stream().map(curve -> curve.curve().temperatureK()).distinct().sorted().toList();
        return new PlanRow(plan.fileName(), null, status, String.join(", ", batch.grades().stream().map(GradeInfo::name).toList()),
                batch.info().curves(), batch.info().points() + batch.info().susceptibilityPoints(),
                temperatures.isEmpty() ? "" : Temperatures.list(temperatures));
    }
}
