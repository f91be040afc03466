package org.kneepoint.server.http;

import org.kneepoint.server.app.serving.ServerSettings;

import io.javalin.http.Context;
import java.util.List;
import org.kneepoint.db.Library;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.app.imports.ImportPlan;
import org.kneepoint.server.app.imports.ImportRun;
import org.kneepoint.server.app.imports.ImportReport;

/** {@code POST /api/import?dryRun=}: the uploaded files checked and, unless a dry run, stored in one transaction. */
final class ImportApi {

    private final Library library;

    ImportApi(Library library) {
        this.library = library;
    }

    void upload(Context context) {
        boolean dryRun = new Query(context).flag("dryRun");
        try (Uploads uploads = Uploads.of(context)) {
            List<ImportPlan> plans = ImportRun.run(library, new ReadLimits(ServerSettings.MAX_UPLOAD_BYTES), uploads.files(), dryRun);
            LibraryApi.json(context, ImportReport.of(plans, dryRun));
        }
    }
}
