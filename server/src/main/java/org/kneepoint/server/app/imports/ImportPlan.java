package org.kneepoint.server.app.imports;

import org.kneepoint.fitter.library.ImportBatch;
import org.kneepoint.fitter.library.ImportInfo;

/**
 * What importing one file will do: store a new batch, or nothing because a file with the same
 * checksum was imported before (then {@code earlier} says when and under which name).
 */
public record ImportPlan(String fileName, ImportBatch batch, ImportInfo earlier) {

    public boolean alreadyImported() {
        return earlier != null;
    }
}
