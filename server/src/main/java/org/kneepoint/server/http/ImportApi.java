package org.kneepoint.server.http;

import io.javalin.http.Context;
import java.util.List;
import org.kneepoint.db.Library;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.library.ImportPlan;
import org.kneepoint.server.library.ImportRun;
import org.kneepoint.server.text.ImportView;

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
            LibraryApi.json(context, ImportView.json(plans, dryRun));
        }
    }
}
