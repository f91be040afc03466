package org.kneepoint.db;

import java.util.List;
import org.kneepoint.fitter.error.ConflictException;
import org.kneepoint.fitter.library.GradeSpecification;
import org.kneepoint.fitter.library.ImportInfo;
import org.kneepoint.fitter.library.LotBatch;
import org.kneepoint.fitter.library.LotCurve;
import org.kneepoint.fitter.qualification.Specification;

/**
 * Writes specifications and lots, each call one transaction taken in turn with the library's other
 * writers ({@link LibraryWriter}): nothing is written on any error.
 */
public final class QualificationWriter {

    private final LibraryWriter writer;

    QualificationWriter(LibraryWriter writer) {
        this.writer = writer;
    }

    /**
     * Sets the grade's specification at its temperature: the limits given replace those stored, the
     * others stay, and the version goes up by one. Returns what is stored now.
     */
    public GradeSpecification setSpecification(String grade, Specification specification) {
        GradeSpecification[] stored = new GradeSpecification[1];
        writer.inTransaction(rows -> {
            stored[0] = new QualificationRows(rows.context()).mergeSpecification(grade, specification);
            QualificationChecksums.seal(rows.context());
        });
        return stored[0];
    }

    /** Stores the lot files of one import: their import records, the lot (when new) and its curves. */
    public void importLot(List<LotBatch> batches) {
        writer.inTransaction(rows -> {
            QualificationRows lots = new QualificationRows(rows.context());
            for (LotBatch batch : batches) {
                ImportInfo info = batch.info();
                if (rows.importId(info.sha256()) != null) {
                    throw new ConflictException("the file " + info.fileName() + " was already imported (same SHA-256)");
                }
                long importId = rows.insertImport(info);
                long lotId = lots.ensureLot(lots.lockedGrade(batch.lot().grade()), batch.lot());
                for (LotCurve curve : batch.curves()) {
                    lots.insertLotCurve(lotId, curve, importId);
                }
            }
            QualificationChecksums.seal(rows.context());
        });
    }
}
